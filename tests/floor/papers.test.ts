import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { GET as installSheetGet } from "@/app/api/orders/[id]/papers/install-sheet/route";
import { GET as asBuiltGet } from "@/app/api/orders/[id]/papers/as-built/route";
import { EmailMessage, OrderEvent, Payment } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { releaseOrder, submitStep } from "@/lib/floor/work-orders";
import { placeOrder } from "@/lib/orders/place-order";
import { authRequest, sessionCookie } from "../setup/auth-requests";
import { dbTest } from "../setup/db";
import { newCustomer, saveDesign } from "../setup/orders";
import { code, good, key, staff } from "./helpers";

/** The text of a PDF as poppler's pdftotext reads it (whitespace runs folded to one space). */
function pdfText(bytes: ArrayBuffer): string {
  const dir = mkdtempSync(path.join(tmpdir(), "papers-"));
  try {
    const file = path.join(dir, "paper.pdf");
    writeFileSync(file, Buffer.from(bytes));
    return execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" }).replace(/\s+/g, " ");
  } catch (error) {
    rmSync(dir, { recursive: true, force: true });
    throw error;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

async function cookieOf(email: string) {
  return sessionCookie(await authRequest("/sign-in/email", { email, password: "a-long-password-1" }));
}

function get(handler: typeof installSheetGet, orderId: string, paper: string, cookie?: string) {
  return handler(
    new NextRequest(`http://127.0.0.1/api/orders/${orderId}/papers/${paper}`, {
      headers: cookie ? { cookie } : {},
    }),
    { params: Promise.resolve({ id: orderId }) },
  );
}

describe("the customer's papers", () => {
  dbTest(
    "install sheet at any time, as-built certificate once final inspection passed; only for the owner and staff",
    { timeout: 60_000 },
    async () => {
      const a = await newCustomer();
      const b = await newCustomer();
      const order = await placeOrder(a.user, {
        designIds: [(await saveDesign(a.customer, a.user.id)).id],
        fulfilment: "pickup",
      });
      const counter = await staff("counter");
      const serial = (await releaseOrder(order.id, counter, "Paper test: pays on pickup")).workOrders[0]!
        .serial;
      const [cookieA, cookieB] = [await cookieOf(a.user.email), await cookieOf(b.user.email)];

      const sheet = await get(installSheetGet, order.id, "install-sheet", cookieA);
      expect(sheet.status).toBe(200);
      expect(sheet.headers.get("content-type")).toBe("application/pdf");
      expect(sheet.headers.get("content-disposition")).toContain(`install-sheet-${order.number}.pdf`);
      const text = pdfText(await sheet.arrayBuffer());
      expect(text).toContain("Install sheet");
      expect(text).toContain(`Serial ${serial}`);
      // README street truck: YL-X41 weld yokes at both ends; the demo catalogue's X41 strap torque
      // is 41 N·m (demo data), 41 / 1.3558 = 30 lbf·ft.
      expect(text).toContain("strap / U-bolt nuts, tightened evenly: 41 N·m (30 lbf·ft)");
      expect(text).toContain("demo data (invented)");
      expect(text).toMatch(/Grease each joint through its fitting/);
      expect(text).toContain("After the first 500 km (300 miles)");
      // The service speed the design was evaluated for (README: 5566 rpm, vehicle-governed).
      expect(text).toMatch(/Maximum shaft speed 5566 rpm/);
      expect(text).toContain(
        "they do not replace a qualified engineer, the component makers' ratings, or the local rules",
      );

      // No certificate before final inspection.
      const early = await get(asBuiltGet, order.id, "as-built", cookieA);
      expect(early.status).toBe(409);
      expect(((await early.json()) as { error: { code: string } }).error.code).toBe("conflict");

      const floor = await staff("floor");
      for (const step of ["CUT", "WLD", "RUN", "BAL", "FIN"])
        await submitStep(code(serial, step), good[step]!, floor, key());

      // Released by hand with nothing paid: the balance is not requested; the desk gets a note.
      const em = (await getEm()).fork();
      expect(await em.count(Payment, { order: order.id })).toBe(0);
      expect(
        await em.count(OrderEvent, {
          order: order.id,
          public: false,
          label: { $like: "Ready with nothing paid%" },
        }),
      ).toBe(1);
      const [ready] = await em.find(EmailMessage, { orderId: order.id, template: "shaft-ready" });
      expect(ready?.text).toContain("Left to pay");

      const cert = await get(asBuiltGet, order.id, "as-built", cookieA);
      expect(cert.status).toBe(200);
      const certText = pdfText(await cert.arrayBuffer());
      expect(certText).toContain("As-built certificate");
      expect(certText).toContain(`Serial ${serial} · traveller revision 1`);
      expect(certText).toContain("signed off by Test floor");
      // What was measured, in the shop's units (the demo floor works in inches), beside its limit.
      expect(certText).toContain("Tube heat / lot number H-2291");
      expect(certText).toMatch(/Cut length 46\.803 in \(limit 46\.803 in ± 0\.\d+ in\)/);
      expect(certText).toContain("Runout near the front weld 0.0060 in");
      expect(certText).toContain("Residual, front plane 0.100 oz·in");
      expect(certText).toContain("Joints turn freely yes");

      // Another customer: 404 for both papers; nobody signed in: 401; the counter: 200.
      expect((await get(installSheetGet, order.id, "install-sheet", cookieB)).status).toBe(404);
      expect((await get(asBuiltGet, order.id, "as-built", cookieB)).status).toBe(404);
      expect((await get(installSheetGet, order.id, "install-sheet")).status).toBe(401);
      const counterUser = await import("@/lib/users/staff").then((m) =>
        m.createStaffUser(
          {
            name: "Desk",
            email: `desk-${key().slice(0, 8)}@test.example`,
            role: "counter",
            password: "a-long-password-1",
          },
          null,
        ),
      );
      expect((await get(asBuiltGet, order.id, "as-built", await cookieOf(counterUser.email))).status).toBe(
        200,
      );
    },
  );
});

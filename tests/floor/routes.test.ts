import { describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { PDFDocument } from "pdf-lib";
import { GET as scanGet } from "@/app/api/floor/scan/route";
import { POST as stepsPost } from "@/app/api/floor/steps/route";
import { POST as concessionPost } from "@/app/api/floor/work-orders/[id]/concession/route";
import { GET as travellerGet } from "@/app/(staff)/desk/orders/[id]/traveller/route";
import { StepRecord } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { releaseOrder } from "@/lib/floor/work-orders";
import { createStaffUser } from "@/lib/users/staff";
import { authRequest, sessionCookie } from "../setup/auth-requests";
import { dbTest } from "../setup/db";
import { code, good, key, paidOrder, staff } from "./helpers";

const BASE = "http://127.0.0.1";

async function staffCookie(role: "floor" | "owner" | "counter") {
  const user = await createStaffUser(
    {
      name: `Route ${role}`,
      email: `route-${role}-${key().slice(0, 8)}@test.example`,
      role,
      password: "a-long-password-1",
    },
    null,
  );
  return sessionCookie(
    await authRequest("/sign-in/email", { email: user.email, password: "a-long-password-1" }),
  );
}

const scan = (text: string, cookie?: string) =>
  scanGet(
    new NextRequest(`${BASE}/api/floor/scan?code=${encodeURIComponent(text)}`, {
      headers: cookie ? { cookie } : {},
    }),
    {
      params: Promise.resolve({}),
    },
  );

const post = (body: unknown, cookie: string) =>
  stepsPost(
    new NextRequest(`${BASE}/api/floor/steps`, {
      method: "POST",
      headers: { cookie, "content-type": "application/json" },
      body: JSON.stringify(body),
    }),
    { params: Promise.resolve({}) },
  );

describe("the floor's route handlers", () => {
  dbTest(
    "scan: a step's sheet, 422 naming the field for a mistyped or empty code, 401 and 403",
    { timeout: 60_000 },
    async () => {
      const order = await paidOrder();
      const [wo] = (await releaseOrder(order.id, await staff("counter"))).workOrders;
      const floor = await staffCookie("floor");

      const ok = await scan(code(wo!.serial, "CUT"), floor);
      expect(ok.status).toBe(200);
      expect(await ok.json()).toMatchObject({ kind: "step", status: "next", step: { code: "CUT" } });

      const typo = await scan(code(wo!.serial, "CUT").slice(0, -1) + "#", floor);
      expect(typo.status).toBe(422);
      expect(
        ((await typo.json()) as { error: { fields: Record<string, string> } }).error.fields,
      ).toHaveProperty("code");
      const empty = await scan("", floor);
      expect(empty.status).toBe(422);
      expect(
        ((await empty.json()) as { error: { fields: Record<string, string> } }).error.fields,
      ).toHaveProperty("code");

      expect((await scan(code(wo!.serial, "CUT"))).status).toBe(401);
      expect((await scan(code(wo!.serial, "CUT"), await staffCookie("counter"))).status).toBe(403);
    },
  );

  dbTest(
    "steps: the same submission twice records once; a hold lists the value and limit; the owner concedes",
    { timeout: 60_000 },
    async () => {
      const order = await paidOrder();
      const [wo] = (await releaseOrder(order.id, await staff("counter"))).workOrders;
      const floor = await staffCookie("floor");
      const body = { code: code(wo!.serial, "CUT"), values: good.CUT, idempotencyKey: key() };
      const first = await post(body, floor);
      expect(first.status).toBe(201);
      const again = await post(body, floor);
      expect(again.status).toBe(200);
      expect(await again.json()).toMatchObject({ outcome: "pass", replayed: true });
      expect(await (await getEm()).count(StepRecord, { workOrder: wo!.id })).toBe(1);

      const bad = await post(
        { code: code(wo!.serial, "WLD"), values: { ...good.WLD, weldedLengthMm: "" }, idempotencyKey: key() },
        floor,
      );
      expect(bad.status).toBe(422);
      expect(
        ((await bad.json()) as { error: { fields: Record<string, string> } }).error.fields,
      ).toHaveProperty("weldedLengthMm");
      const noKey = await post({ code: code(wo!.serial, "WLD"), values: good.WLD }, floor);
      expect(
        ((await noKey.json()) as { error: { fields: Record<string, string> } }).error.fields,
      ).toHaveProperty("idempotencyKey");

      const hold = await post(
        { code: code(wo!.serial, "WLD"), values: { ...good.WLD, weldedLengthMm: 53 }, idempotencyKey: key() },
        floor,
      );
      expect(hold.status).toBe(201);
      expect(await hold.json()).toMatchObject({
        outcome: "hold",
        failures: [
          {
            key: "weldedLengthMm",
            message: expect.stringContaining("53.000 in is outside the limit 52.000 in ±"),
          },
        ],
      });

      const concede = (cookie: string, reason: string) =>
        concessionPost(
          new NextRequest(`${BASE}/api/floor/work-orders/${wo!.id}/concession`, {
            method: "POST",
            headers: { cookie, "content-type": "application/json" },
            body: JSON.stringify({ reason }),
          }),
          { params: Promise.resolve({ id: wo!.id }) },
        );
      expect((await concede(floor, "Customer accepts it")).status).toBe(403);
      const owner = await staffCookie("owner");
      const noReason = await concede(owner, "");
      expect(noReason.status).toBe(422);
      expect(
        ((await noReason.json()) as { error: { fields: Record<string, string> } }).error.fields,
      ).toHaveProperty("reason");
      const conceded = await concede(owner, "Customer accepts 1 mm long: slip yoke takes it up");
      expect(conceded.status).toBe(201);
      expect(await conceded.json()).toMatchObject({ outcome: "concession", next: { code: "RUN" } });
    },
  );

  dbTest(
    "the traveller PDF: staff only, one page per shaft, 409 before release",
    { timeout: 60_000 },
    async () => {
      const order = await paidOrder({ shafts: 2 });
      const get = (cookie?: string) =>
        travellerGet(
          new NextRequest(`${BASE}/desk/orders/${order.id}/traveller`, { headers: cookie ? { cookie } : {} }),
          {
            params: Promise.resolve({ id: order.id }),
          },
        );
      const counter = await staffCookie("counter");
      expect((await get(counter)).status).toBe(409);
      await releaseOrder(order.id, await staff("counter"));
      const res = await get(counter);
      expect(res.status).toBe(200);
      expect(res.headers.get("content-type")).toBe("application/pdf");
      expect((await PDFDocument.load(await res.arrayBuffer())).getPageCount()).toBe(2);
      expect((await get()).status).toBe(401);
    },
  );
});

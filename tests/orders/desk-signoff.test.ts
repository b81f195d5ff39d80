import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, vi } from "vitest";
import { AuditEvent, Order, OrderShaft, ShopConfig, WorkOrder } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { sendPaymentLink, startCheckout } from "@/lib/orders/payments";
import { recordCounterPayment } from "@/lib/orders/counter-payment";
import { acceptFailedCheck, needsSignoff } from "@/lib/orders/engineering-signoff";
import { addOrderNote } from "@/lib/orders/notes";
import { orderView, populateOrder } from "@/lib/orders/queries";
import { releaseOrder, travellerViewFor } from "@/lib/floor/work-orders";
import { renderTravellers } from "@/lib/traveller/pdf";
import { getShopEngineering, invalidateShopEngineering } from "@/lib/shop/config";
import { acceptFailedCheckAction } from "@/lib/actions/accept-failed-check";
import { addOrderNoteAction } from "@/lib/actions/add-order-note";
import { cancelOrderAction } from "@/lib/actions/cancel-order";
import { recordCounterPaymentAction } from "@/lib/actions/record-counter-payment";
import { sendPaymentLinkAction } from "@/lib/actions/send-payment-link";
import { createStaffUser } from "@/lib/users/staff";
import { authRequest, sessionCookie, uniqueEmail } from "../setup/auth-requests";
import { dbTest, requireDatabase } from "../setup/db";
import { placedOrder, startPaymentsHarness } from "../setup/orders";
import { exampleReport } from "../traveller/fixtures";
import { staff } from "../floor/helpers";

import { updateOrderDetailsAction } from "@/lib/actions/update-order-details";
import { shopToday } from "@/lib/shop/locale";
import { shopIsoDate } from "@/lib/dates";

// Server actions read the session from next/headers; outside a Next request we hand it the cookie.
const session = vi.hoisted(() => ({ cookie: "" }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ cookie: session.cookie }) }));
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const PASSWORD = "a-long-password-1";
const cookies: Record<"counter" | "owner" | "floor" | "customer", string> = {
  counter: "",
  owner: "",
  floor: "",
  customer: "",
};

let harness: Awaited<ReturnType<typeof startPaymentsHarness>>;
beforeAll(async () => {
  requireDatabase();
  harness = await startPaymentsHarness({ duplicateDelivery: false });
  for (const role of ["counter", "owner", "floor"] as const) {
    const email = uniqueEmail(role);
    await createStaffUser({ name: `Desk ${role}`, email, role, password: PASSWORD }, null);
    cookies[role] = sessionCookie(await authRequest("/sign-in/email", { email, password: PASSWORD }));
  }
});
afterAll(async () => harness?.close());

async function signIn(email: string) {
  return sessionCookie(await authRequest("/sign-in/email", { email, password: PASSWORD }));
}

/**
 * An order whose frozen evaluation fails a check, as the counter may place one (another branch):
 * the placed shaft's evaluation is replaced by the evaluation of the examples' long van, which
 * fails the critical-speed check.
 */
async function failingOrder() {
  const placed = await placedOrder();
  const em = await getEm();
  const shaft = await em.findOneOrFail(OrderShaft, { order: placed.order.id });
  const report = exampleReport("long-van-critical-speed-fail.json");
  shaft.evaluation = report as unknown as Record<string, unknown>;
  shaft.overall = report.overall;
  await em.flush();
  const failed = report.checks.filter((c) => c.status === "fail");
  expect(failed.length).toBeGreaterThan(0);
  return { ...placed, shaft, failed };
}

function pdfText(pdf: Uint8Array): string {
  const dir = mkdtempSync(path.join(tmpdir(), "desk-traveller-"));
  try {
    writeFileSync(path.join(dir, "t.pdf"), pdf);
    return execFileSync("pdftotext", ["-raw", path.join(dir, "t.pdf"), "-"], { encoding: "utf8" });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

describe("engineering sign-off", () => {
  dbTest("while a failed check is not accepted: no checkout, link, counter payment or release", async () => {
    const counter = await staff("counter");
    const { user, order } = await failingOrder();
    const review = { code: "conflict", message: expect.stringContaining("an owner must review") };
    await expect(startCheckout(order.id, user)).rejects.toMatchObject(review);
    await expect(sendPaymentLink(order.id, counter)).rejects.toMatchObject(review);
    await expect(
      recordCounterPayment(counter, { orderId: order.id, method: "cash", amountCents: 100 }),
    ).rejects.toMatchObject(review);
    await expect(releaseOrder(order.id, counter, "Customer is a regular")).rejects.toMatchObject(review);
    const em = await getEm();
    expect(await em.count(WorkOrder, { order: order.id })).toBe(0);
    expect((await em.findOneOrFail(Order, { id: order.id }, { refresh: true })).paidCents).toBe(0);
  });

  dbTest(
    "the counter cannot accept; an owner accepts each failed check with a reason, audited and printed on the traveller",
    async () => {
      const counter = await staff("counter");
      const owner = await staff("owner");
      const { order, shaft, failed } = await failingOrder();
      const check = failed[0]!;
      const reason =
        "Slow industrial conveyor drive, 300 rpm max; the road-vehicle speed limit does not apply.";
      const settingsBefore = JSON.stringify((await getShopEngineering()).settings);

      await expect(
        acceptFailedCheck(counter, { orderId: order.id, shaftId: shaft.id, checkId: check.id, reason }),
      ).rejects.toMatchObject({ code: "forbidden" });
      await expect(
        acceptFailedCheck(owner, { orderId: order.id, shaftId: shaft.id, checkId: check.id, reason: "fine" }),
      ).rejects.toMatchObject({ code: "invalid", fields: { reason: expect.any(String) } });
      await expect(
        acceptFailedCheck(owner, { orderId: order.id, shaftId: shaft.id, checkId: "no-such-check", reason }),
      ).rejects.toMatchObject({ code: "invalid", fields: { checkId: expect.any(String) } });

      for (const c of failed)
        await acceptFailedCheck(owner, { orderId: order.id, shaftId: shaft.id, checkId: c.id, reason });
      await expect(
        acceptFailedCheck(owner, { orderId: order.id, shaftId: shaft.id, checkId: check.id, reason }),
      ).rejects.toMatchObject({ code: "conflict" });

      const em = await getEm();
      const after = await em.findOneOrFail(OrderShaft, { id: shaft.id }, { refresh: true });
      expect(needsSignoff(after)).toBe(false);
      // The frozen evaluation still says fail; the shop's limits are unchanged.
      expect(after.overall).toBe("fail");
      expect(
        (after.evaluation as { checks: { id: string; status: string }[] }).checks.find(
          (c) => c.id === check.id,
        )?.status,
      ).toBe("fail");
      invalidateShopEngineering();
      expect(JSON.stringify((await getShopEngineering()).settings)).toBe(settingsBefore);
      expect(await em.count(ShopConfig, {})).toBe(0);
      const audits = await em.find(AuditEvent, {
        subjectId: order.id,
        action: "engineering.accept-failed-check",
      });
      expect(audits).toHaveLength(failed.length);
      expect(audits[0]!.actor?.id).toBe(owner.id);
      expect(audits[0]!.details).toMatchObject({ checkId: check.id, reason, shaftId: shaft.id });

      // Now the counter may release it; the traveller carries the acceptance.
      const released = await releaseOrder(order.id, counter, "Owner accepted the speed check");
      const view = await travellerViewFor(em, released.workOrders[0]!.id);
      expect(view.acceptedExceptions).toHaveLength(failed.length);
      const text = pdfText(await renderTravellers([view])).replace(/\s+/g, " ");
      expect(text).toContain(`ACCEPTED EXCEPTION - check "${check.id}" FAILED`);
      expect(text).toContain("Slow industrial conveyor drive");
      expect(text).toContain(`accepted by ${owner.name}`);
      // The traveller dates the acceptance in the shop's own day, not UTC's.
      expect(text).toContain(shopIsoDate(new Date(), (await getShopEngineering()).priceBook.timeZone));
    },
  );

  dbTest("a traveller of a shaft that passed prints no exception", async () => {
    const counter = await staff("counter");
    const { order } = await placedOrder();
    const released = await releaseOrder(order.id, counter, "Paying at pickup");
    const view = await travellerViewFor(await getEm(), released.workOrders[0]!.id);
    expect(view.acceptedExceptions).toEqual([]);
    expect(pdfText(await renderTravellers([view]))).not.toContain("ACCEPTED EXCEPTION");
  });
});

describe("notes on an order", () => {
  dbTest("customer-visible notes reach the customer; staff-only notes never do", async () => {
    const counter = await staff("counter");
    const { user, order } = await placedOrder();
    await addOrderNote(counter, {
      orderId: order.id,
      visibility: "customer",
      body: "Bring the old shaft for the yokes.",
    });
    await addOrderNote(counter, {
      orderId: order.id,
      visibility: "staff",
      body: "Customer disputes last invoice; cash only.",
    });
    const em = await getEm();
    const row = await em.findOneOrFail(Order, { id: order.id });
    await populateOrder(em, row);

    const customerView = orderView(row, user, await shopToday());
    expect(customerView.shopNotes.map((n) => n.body)).toEqual(["Bring the old shaft for the yokes."]);
    expect(JSON.stringify(customerView)).not.toContain("cash only");
    expect(customerView.shopNotes[0]).toMatchObject({ byName: counter.name, visibility: "customer" });

    const staffView = orderView(row, counter, await shopToday());
    expect(staffView.shopNotes.map((n) => [n.visibility, n.body])).toEqual([
      ["customer", "Bring the old shaft for the yokes."],
      ["staff", "Customer disputes last invoice; cash only."],
    ]);
    expect(await em.count(AuditEvent, { subjectId: order.id, action: "order.note" })).toBe(2);
  });
});

describe("the desk's actions refuse who may not use them", () => {
  const orderInput = (orderId: string) => ({
    link: () => sendPaymentLinkAction({ orderId }),
    counterPayment: () => recordCounterPaymentAction({ orderId, method: "cash", amountCents: 100 }),
    note: () => addOrderNoteAction({ orderId, visibility: "customer", body: "Hello there" }),
    cancel: () => cancelOrderAction({ orderId, reason: "Not wanted any more" }),
    details: () =>
      updateOrderDetailsAction({ orderId, version: 1, promisedDate: "2027-01-15", shipTo: null }),
  });

  dbTest(
    "anonymous → unauthenticated; a customer (even the order's own) and the floor → forbidden",
    async () => {
      const { customer, order } = await placedOrder();
      cookies.customer = await signIn(customer.email);
      for (const [who, expected] of [
        ["", "unauthenticated"],
        [cookies.customer, "forbidden"],
        [cookies.floor, "forbidden"],
      ] as const) {
        session.cookie = who;
        for (const [name, run] of Object.entries(orderInput(order.id))) {
          const result = await run();
          expect(result, `${name} as ${expected}`).toMatchObject({ ok: false, error: { code: expected } });
        }
      }
      const em = await getEm();
      const after = await em.findOneOrFail(
        Order,
        { id: order.id },
        { refresh: true, populate: ["orderNotes"] },
      );
      expect(after.status).toBe("awaiting_payment");
      expect(after.orderNotes).toHaveLength(0);
    },
  );

  dbTest(
    "only an owner accepts a failed check (counter → forbidden); bad input names the field",
    async () => {
      const { order, shaft, failed } = await failingOrder();
      const input = {
        orderId: order.id,
        shaftId: shaft.id,
        checkId: failed[0]!.id,
        reason: "Test rig shaft at 200 rpm; the road limit does not apply.",
      };
      session.cookie = cookies.counter;
      expect(await acceptFailedCheckAction(input)).toMatchObject({ ok: false, error: { code: "forbidden" } });
      session.cookie = cookies.owner;
      expect(await acceptFailedCheckAction({ ...input, reason: "short" })).toMatchObject({
        ok: false,
        error: { code: "invalid", fields: { reason: expect.stringContaining("15 characters") } },
      });
      expect(await acceptFailedCheckAction({ ...input, shaftId: "x" })).toMatchObject({
        ok: false,
        error: { code: "invalid", fields: { shaftId: expect.any(String) } },
      });
      expect(await acceptFailedCheckAction({ ...input, orderId: randomUUID() })).toMatchObject({
        ok: false,
        error: { code: "not_found" },
      });
      expect(await acceptFailedCheckAction(input)).toMatchObject({
        ok: true,
        data: { checkId: failed[0]!.id },
      });
    },
  );

  dbTest(
    "the counter's forms answer field errors: terminal without reference, a bad amount, an empty note",
    async () => {
      const { order } = await placedOrder();
      session.cookie = cookies.counter;
      expect(await recordCounterPaymentAction({ orderId: order.id, method: "terminal" })).toMatchObject({
        ok: false,
        error: { code: "invalid", fields: { reference: "The terminal reference is required." } },
      });
      expect(
        await recordCounterPaymentAction({ orderId: order.id, method: "cash", amountCents: -5 }),
      ).toMatchObject({ ok: false, error: { code: "invalid", fields: { amountCents: expect.any(String) } } });
      expect(await addOrderNoteAction({ orderId: order.id, visibility: "everyone", body: "" })).toMatchObject(
        {
          ok: false,
          error: { code: "invalid", fields: { visibility: expect.any(String), body: expect.any(String) } },
        },
      );
      expect(await cancelOrderAction({ orderId: "nope", reason: "x" })).toMatchObject({
        ok: false,
        error: { code: "invalid", fields: { orderId: expect.any(String), reason: expect.any(String) } },
      });
      const paid = await recordCounterPaymentAction({
        orderId: order.id,
        method: "terminal",
        reference: "TRM-7781",
      });
      expect(paid).toMatchObject({ ok: true, data: { amountCents: order.depositCents, kind: "deposit" } });
    },
  );
});

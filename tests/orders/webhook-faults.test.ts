/**
 * Payment events duplicated, out of order or replayed: each changes the order's state at most
 * once, and a late event never undoes a later state. Real PostgreSQL and the local payment fake
 * (a real checkout is opened there); events are applied through applyPaymentEvent, as the
 * verified webhook route does.
 */
import { randomUUID } from "node:crypto";
import { describe, expect } from "vitest";
import { Order, OrderEvent, Payment } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { placeOrder } from "@/lib/orders/place-order";
import { applyPaymentEvent, startCheckout } from "@/lib/orders/payments";
import { dbTest } from "../setup/db";
import { newCustomer, paymentsHarnessForFile, saveDesign } from "../setup/orders";

// Checkouts open at the Stripe fake.
paymentsHarnessForFile();

async function openCheckout() {
  const { user, customer } = await newCustomer();
  const design = await saveDesign(customer, user.id);
  const order = await placeOrder(user, { designIds: [design.id], fulfilment: "pickup" });
  const payment = await startCheckout(order.id, user);
  return { order, payment };
}

const completed = (sessionId: string, amountCents: number, id = `evt_${randomUUID()}`) =>
  ({
    id,
    type: "checkout.session.completed",
    sessionId,
    paymentIntentId: `pi_${sessionId}`,
    amountCents,
    paid: true,
    raw: {},
  }) as const;

async function state(orderId: string) {
  const em = (await getEm()).fork();
  const order = await em.findOneOrFail(Order, { id: orderId });
  const events = await em.find(OrderEvent, { order: orderId });
  const payments = await em.find(Payment, { order: orderId });
  return {
    paidCents: order.paidCents,
    paymentState: order.paymentState,
    paidEvents: events.filter((e) => e.kind === "paid").length,
    declinedEvents: events.filter((e) => e.kind === "payment_failed").length,
    paymentStatuses: payments.map((p) => p.status),
    failureMessages: payments.map((p) => p.failureMessage),
  };
}

describe("payment events that arrive twice, late or out of order", () => {
  dbTest("one event delivered 10 times at once credits the deposit once", { timeout: 30_000 }, async () => {
    const { order, payment } = await openCheckout();
    const event = completed(payment.checkoutSessionId!, payment.amountCents);
    const outcomes = await Promise.all(Array.from({ length: 10 }, () => applyPaymentEvent(event)));
    expect(outcomes.filter((o) => o === "applied")).toHaveLength(1);
    expect(outcomes.filter((o) => o === "duplicate")).toHaveLength(9);
    const s = await state(order.id);
    expect(s.paidCents).toBe(order.depositCents);
    expect(s.paidEvents).toBe(1);
  });

  dbTest(
    "the same payment reported again under a new event id (a provider replay) changes nothing",
    async () => {
      const { order, payment } = await openCheckout();
      expect(await applyPaymentEvent(completed(payment.checkoutSessionId!, payment.amountCents))).toBe(
        "applied",
      );
      expect(await applyPaymentEvent(completed(payment.checkoutSessionId!, payment.amountCents))).toBe(
        "ignored",
      );
      const s = await state(order.id);
      expect(s.paidCents).toBe(order.depositCents);
      expect(s.paidEvents).toBe(1);
    },
  );

  dbTest("an 'expired' or 'declined' event arriving after the payment succeeded undoes nothing", async () => {
    const { order, payment } = await openCheckout();
    await applyPaymentEvent(completed(payment.checkoutSessionId!, payment.amountCents));
    const before = await state(order.id);
    expect(
      await applyPaymentEvent({
        id: `evt_${randomUUID()}`,
        type: "checkout.session.expired",
        sessionId: payment.checkoutSessionId!,
        raw: {},
      }),
    ).toBe("ignored");
    expect(
      await applyPaymentEvent({
        id: `evt_${randomUUID()}`,
        type: "payment_intent.payment_failed",
        paymentId: payment.id,
        message: "Your card was declined.",
        raw: {},
      }),
    ).toBe("ignored");
    const after = await state(order.id);
    expect(after).toEqual(before);
    expect(after.paymentStatuses).toEqual(["succeeded"]);
    expect(after.declinedEvents).toBe(0);
  });

  dbTest("a decline, then the success (out of order on a retried card): paid once", async () => {
    const { order, payment } = await openCheckout();
    expect(
      await applyPaymentEvent({
        id: `evt_${randomUUID()}`,
        type: "payment_intent.payment_failed",
        paymentId: payment.id,
        message: "Your card was declined.",
        raw: {},
      }),
    ).toBe("applied");
    expect(await applyPaymentEvent(completed(payment.checkoutSessionId!, payment.amountCents))).toBe(
      "applied",
    );
    const s = await state(order.id);
    expect(s.paidCents).toBe(order.depositCents);
    expect(s.paymentStatuses).toEqual(["succeeded"]);
    expect(s.failureMessages).toEqual([null]); // the success clears the earlier decline
  });

  dbTest("a refund reported twice under two event ids is recorded once", async () => {
    const { order, payment } = await openCheckout();
    await applyPaymentEvent(completed(payment.checkoutSessionId!, payment.amountCents));
    const refund = (id: string) =>
      applyPaymentEvent({
        id,
        type: "charge.refunded",
        paymentIntentId: `pi_${payment.checkoutSessionId}`,
        refundIds: ["re_1"],
        amountRefundedCents: 1000,
        raw: {},
      });
    expect(await refund(`evt_${randomUUID()}`)).toBe("applied");
    expect(await refund(`evt_${randomUUID()}`)).toBe("ignored");
    const em = (await getEm()).fork();
    const o = await em.findOneOrFail(Order, { id: order.id });
    expect(o.refundedCents).toBe(1000);
    expect(o.paymentState).toBe("partially_refunded");
  });
});

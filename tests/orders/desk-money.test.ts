import { afterAll, beforeAll, describe, expect } from "vitest";
import Stripe from "stripe";
import {
  AuditEvent,
  EmailMessage,
  Order,
  OrderEvent,
  Payment,
  Refund,
  ShopConfig,
  WorkOrder,
} from "@/entities";
import { getEm } from "@/lib/db/orm";
import { refundPayment, sendPaymentLink, startCheckout } from "@/lib/orders/payments";
import { recordCounterPayment } from "@/lib/orders/counter-payment";
import { cancelOrder, cancellationQuote } from "@/lib/orders/cancel";
import { orderView, populateOrder } from "@/lib/orders/queries";
import { scanCode } from "@/lib/floor/scan";
import { orderFloorState } from "@/lib/floor/work-orders";
import { invalidateShopEngineering } from "@/lib/shop/config";
import { defaultCatalogue } from "@/lib/driveline";
import { defaultPriceBook } from "@/lib/pricing/price-book";
import { formatStepCode } from "@/lib/traveller/codes";
import { dbTest, requireDatabase } from "../setup/db";
import { payWithCard, placedOrder, reloadOrder, startPaymentsHarness } from "../setup/orders";
import { staff } from "../floor/helpers";
import { shopToday } from "@/lib/shop/locale";

// Demo data: the invented shop keeps 10 % of the deposit when an order is cancelled before release.
const FEE_PERCENT = 10;

let harness: Awaited<ReturnType<typeof startPaymentsHarness>>;
beforeAll(async () => {
  requireDatabase();
  harness = await startPaymentsHarness({ duplicateDelivery: false });
  const em = await getEm();
  await em.nativeDelete(ShopConfig, { id: 1 });
  em.create(ShopConfig, {
    id: 1,
    catalogue: defaultCatalogue,
    priceBook: { ...defaultPriceBook, cancellationFeePercent: FEE_PERCENT },
  });
  await em.flush();
  invalidateShopEngineering();
});
afterAll(async () => {
  requireDatabase();
  const em = await getEm();
  await em.nativeDelete(ShopConfig, { id: 1 });
  invalidateShopEngineering();
  await harness?.close();
});

const released = async (orderId: string) => (await getEm()).count(WorkOrder, { order: orderId });

describe("payments taken at the counter", () => {
  dbTest(
    "a terminal payment defaults to the deposit, is audited, shown to the customer and releases the order",
    async () => {
      const counter = await staff("counter");
      const { user, order } = await placedOrder();
      // Demo policy: a 50 % deposit (lib/pricing/price-book.ts defaultPriceBook).
      expect(order.depositCents).toBe(Math.round(order.totalCents / 2));

      const payment = await recordCounterPayment(counter, {
        orderId: order.id,
        method: "terminal",
        reference: "TRM-0042-118",
      });
      expect(payment).toMatchObject({
        method: "terminal",
        reference: "TRM-0042-118",
        status: "succeeded",
        kind: "deposit",
        amountCents: order.depositCents,
        checkoutSessionId: null,
      });

      const after = await reloadOrder(order.id);
      expect(after.paidCents).toBe(order.depositCents);
      expect(after.paymentState).toBe("deposit_paid");
      expect(after.status).toBe("in_shop"); // deposit met: released through the floor hooks
      expect(await released(order.id)).toBe(1);

      const em = await getEm();
      const audit = await em.findOneOrFail(AuditEvent, { subjectId: order.id, action: "payment.counter" });
      expect(audit.actor?.id).toBe(counter.id);
      expect(audit.details).toMatchObject({
        method: "terminal",
        reference: "TRM-0042-118",
        amountCents: order.depositCents,
        before: { paidCents: 0, paymentState: "unpaid" },
        after: { paidCents: order.depositCents, paymentState: "deposit_paid" },
      });
      expect(await em.count(EmailMessage, { orderId: order.id, template: "payment-receipt" })).toBe(1);

      // The customer sees it like any payment.
      const mine = await em.findOneOrFail(Order, { id: order.id });
      await populateOrder(em, mine);
      const view = orderView(mine, user, await shopToday());
      expect(view.payments).toEqual([
        expect.objectContaining({ method: "terminal", status: "succeeded", amountCents: order.depositCents }),
      ]);
      expect(view.events.map((e) => e.label)).toContain(
        `Deposit of $${(order.depositCents / 100).toFixed(2)} received (card terminal)`,
      );
    },
  );

  dbTest("a cheque needs its number; the balance in full makes the order paid", async () => {
    const counter = await staff("counter");
    const { order } = await placedOrder();
    await recordCounterPayment(counter, {
      orderId: order.id,
      method: "cash",
      amountCents: order.depositCents,
    });
    await expect(
      recordCounterPayment(counter, { orderId: order.id, method: "cheque", reference: "  " }),
    ).rejects.toMatchObject({ code: "invalid", fields: { reference: expect.any(String) } });
    const balance = await recordCounterPayment(counter, {
      orderId: order.id,
      method: "cheque",
      reference: "Cheque 004417",
    });
    expect(balance.kind).toBe("balance");
    expect(balance.amountCents).toBe(order.totalCents - order.depositCents);
    const after = await reloadOrder(order.id);
    expect(after.paidCents).toBe(order.totalCents);
    expect(after.paymentState).toBe("paid");
  });

  dbTest("more than is owed is refused and nothing is recorded", async () => {
    const counter = await staff("counter");
    const { order } = await placedOrder();
    await expect(
      recordCounterPayment(counter, { orderId: order.id, method: "cash", amountCents: order.totalCents + 1 }),
    ).rejects.toMatchObject({ code: "invalid", fields: { amountCents: expect.stringContaining("At most") } });
    const after = await reloadOrder(order.id);
    expect(after.paidCents).toBe(0);
    expect(after.payments).toHaveLength(0);
    expect(await released(order.id)).toBe(0);
  });

  dbTest(
    "a refund of a counter payment is recorded by hand, with its reason, never sent to the provider",
    async () => {
      const counter = await staff("counter");
      const owner = await staff("owner");
      const { order } = await placedOrder();
      const cash = await recordCounterPayment(counter, {
        orderId: order.id,
        method: "cash",
        amountCents: 2_000,
      });
      const refund = await refundPayment(owner, {
        paymentId: cash.id,
        amountCents: 500,
        reason: "Overcharged for pickup",
      });
      expect(refund.providerRefundId).toBeNull();
      const em = await getEm();
      const audit = await em.findOneOrFail(AuditEvent, {
        subjectId: order.id,
        action: "payment.refund-recorded",
      });
      expect(audit.details).toMatchObject({
        amountCents: 500,
        reason: "Overcharged for pickup",
        method: "cash",
      });
      const after = await reloadOrder(order.id);
      expect(after.refundedCents).toBe(500);
      expect(after.paymentState).toBe("partially_refunded");
    },
  );
});

describe("cancelling an order", () => {
  dbTest(
    "before release the counter cancels; the refund is paid minus the kept share of the deposit",
    async () => {
      const counter = await staff("counter");
      const { order } = await placedOrder();
      // Part of the deposit in cash: not enough to release the order.
      const paidCents = order.depositCents - 1_000;
      await recordCounterPayment(counter, { orderId: order.id, method: "cash", amountCents: paidCents });
      expect(await released(order.id)).toBe(0);
      // Shop policy (demo data): FEE_PERCENT of the deposit is kept.
      const feeCents = Math.round((order.depositCents * FEE_PERCENT) / 100);
      const em = await getEm();
      const quote = await cancellationQuote(
        em,
        await em.findOneOrFail(Order, { id: order.id }, { refresh: true }),
      );
      expect(quote).toMatchObject({
        paidCents,
        feeCents,
        refundCents: paidCents - feeCents,
        released: false,
      });

      const result = await cancelOrder(counter, { orderId: order.id, reason: "Customer sold the truck" });
      expect(result).toEqual({ refundCents: paidCents - feeCents, feeCents });
      const after = await reloadOrder(order.id);
      expect(after.status).toBe("cancelled");
      expect(after.cancelReason).toBe("Customer sold the truck");
      expect(after.refundedCents).toBe(paidCents - feeCents);
      expect(after.paymentState).toBe("partially_refunded");
      const refunds = await em.find(Refund, { payment: { order: order.id } });
      expect(refunds.map((r) => [r.amountCents, r.providerRefundId])).toEqual([[paidCents - feeCents, null]]);
      const audit = await em.findOneOrFail(AuditEvent, { subjectId: order.id, action: "order.cancel" });
      expect(audit.actor?.id).toBe(counter.id);
      expect(audit.details).toMatchObject({
        reason: "Customer sold the truck",
        feeCents,
        refundCents: paidCents - feeCents,
        before: { status: "received" },
        after: { status: "cancelled" },
      });
      const mail = await em.findOneOrFail(EmailMessage, { orderId: order.id, template: "order-cancelled" });
      expect(mail.to).toBe(order.customer.email);
      await expect(cancelOrder(counter, { orderId: order.id, reason: "again" })).rejects.toMatchObject({
        code: "conflict",
      });
    },
  );

  dbTest(
    "after release the counter is refused; an owner cancels, the card deposit is refunded at the provider and the travellers are void",
    async () => {
      const counter = await staff("counter");
      const owner = await staff("owner");
      const { user, order } = await placedOrder();
      const checkout = await startCheckout(order.id, user);
      expect((await payWithCard(harness.fake, checkout.checkoutSessionId, "4242424242424242")).status).toBe(
        200,
      );
      expect(await harness.fake.idle(10_000)).toBe(true);
      expect(await released(order.id)).toBe(1);

      await expect(cancelOrder(counter, { orderId: order.id, reason: "Changed mind" })).rejects.toMatchObject(
        {
          code: "forbidden",
          message: expect.stringContaining("only an owner"),
        },
      );
      expect((await reloadOrder(order.id)).status).toBe("in_shop");

      const feeCents = Math.round((order.depositCents * FEE_PERCENT) / 100);
      const result = await cancelOrder(owner, { orderId: order.id, reason: "Vehicle written off" });
      expect(result.refundCents).toBe(order.depositCents - feeCents);
      await harness.fake.idle(10_000); // the provider's charge.refunded echo is not counted twice

      const em = await getEm();
      const refunds = await em.find(Refund, { payment: checkout.id });
      expect(refunds).toHaveLength(1);
      expect(refunds[0]!.providerRefundId).toMatch(/^re_/);
      const stripe = new Stripe("sk_test_harness", {
        host: "127.0.0.1",
        port: harness.fake.port,
        protocol: "http",
      });
      const paid = await em.findOneOrFail(Payment, { id: checkout.id }, { refresh: true });
      const atProvider = await stripe.refunds.list({ payment_intent: paid.paymentIntentId! });
      expect(atProvider.data.map((r) => r.amount)).toEqual([order.depositCents - feeCents]);
      expect((await reloadOrder(order.id)).refundedCents).toBe(order.depositCents - feeCents);

      const [wo] = await em.find(WorkOrder, { order: order.id }, { refresh: true });
      expect(wo!.voidedAt).toBeInstanceOf(Date);
      await expect(
        scanCode(em, formatStepCode({ serial: wo!.serial, step: "CUT", revision: 1 })),
      ).rejects.toMatchObject({ code: "conflict", message: expect.stringContaining("void") });
      expect((await orderFloorState(em, order.id)).shafts).toHaveLength(1);
    },
  );

  dbTest("a cancelled order refuses the checkout, the payment link and a counter payment", async () => {
    const counter = await staff("counter");
    const { user, order } = await placedOrder();
    await cancelOrder(counter, { orderId: order.id, reason: "Ordered twice by mistake" });
    const refused = { code: "conflict", message: "This order is cancelled; it takes no payment." };
    await expect(startCheckout(order.id, user)).rejects.toMatchObject(refused);
    await expect(sendPaymentLink(order.id, counter)).rejects.toMatchObject(refused);
    await expect(
      recordCounterPayment(counter, { orderId: order.id, method: "cash", amountCents: 100 }),
    ).rejects.toMatchObject(refused);
    const em = await getEm();
    expect(await em.count(Payment, { order: order.id })).toBe(0);
    expect(await em.count(EmailMessage, { orderId: order.id, template: "payment-link" })).toBe(0);
    expect(await em.count(OrderEvent, { order: order.id, kind: "cancelled" })).toBe(1);
  });
});

describe("the payment link", () => {
  dbTest(
    "e-mails the customer the checkout of what is due; the customer pays it and the order is credited",
    async () => {
      const counter = await staff("counter");
      const { order } = await placedOrder();
      const payment = await sendPaymentLink(order.id, counter);
      expect(payment.amountCents).toBe(order.depositCents);
      const em = await getEm();
      const mail = await em.findOneOrFail(EmailMessage, { orderId: order.id, template: "payment-link" });
      expect(mail.to).toBe(order.customer.email);
      expect(mail.text).toContain(payment.checkoutUrl!);
      expect(await em.count(AuditEvent, { subjectId: order.id, action: "payment.link-sent" })).toBe(1);
      // Sending again reuses the one open checkout.
      expect((await sendPaymentLink(order.id, counter)).id).toBe(payment.id);

      await payWithCard(harness.fake, payment.checkoutSessionId, "4242424242424242");
      await harness.fake.idle(10_000);
      const after = await reloadOrder(order.id);
      expect(after.paidCents).toBe(order.depositCents);
      expect(after.paymentState).toBe("deposit_paid");
    },
  );
});

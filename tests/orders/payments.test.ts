import { describe, expect } from "vitest";
import Stripe from "stripe";
import { EmailMessage, Order, OrderEvent, Payment, Refund, WebhookEvent } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { placeOrder } from "@/lib/orders/place-order";
import { refundPayment, startCheckout, webhookDeliveries } from "@/lib/orders/payments";
import { POST as webhookPost } from "@/app/api/payments/webhook/route";
import { createStaffUser } from "@/lib/users/staff";
import { uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";
import {
  compoundOffset,
  failingVan,
  newCustomer,
  payWithCard,
  paymentsHarnessForFile,
  placedOrder,
  reloadOrder,
  saveDesign,
} from "../setup/orders";

const harness = paymentsHarnessForFile();

describe("paying an order through the local Stripe fake", () => {
  dbTest(
    "a deposit paid with the success card marks the order paid once, though the webhook arrives twice",
    async () => {
      const { user, order } = await placedOrder();
      expect(order.status).toBe("awaiting_payment");
      expect(order.depositCents).toBe(Math.round(order.totalCents / 2)); // demo policy: 50 % deposit

      const payment = await startCheckout(order.id, user);
      expect(payment.kind).toBe("deposit");
      expect(payment.checkoutUrl).toContain(`/pay/${payment.checkoutSessionId}`);
      // Asking again reuses the open checkout rather than opening a second one.
      expect((await startCheckout(order.id, user)).id).toBe(payment.id);

      const paid = await payWithCard(harness.fake, payment.checkoutSessionId, "4242424242424242");
      expect(paid.status).toBe(200);
      expect(await harness.fake.idle(10_000)).toBe(true);

      const after = await reloadOrder(order.id);
      expect(after.status).toBe("in_shop"); // the deposit met the policy: released to the shop (lib/floor/hooks.ts)
      expect(after.paymentState).toBe("deposit_paid");
      expect(after.paidCents).toBe(order.depositCents);
      expect(after.events.getItems().filter((e) => e.kind === "paid")).toHaveLength(1);
      // One confirmation and one receipt in the outbox, though the event came twice.
      const em = await getEm();
      expect(await em.count(EmailMessage, { orderId: order.id, template: "order-received" })).toBe(1);
      expect(await em.count(EmailMessage, { orderId: order.id, template: "payment-receipt" })).toBe(1);

      const events = (await (
        await fetch(`${harness.fake.url}/_fake/events?type=checkout.session.completed`)
      ).json()) as {
        data: { id: string; event: { data: { object: { id: string } } } }[];
      };
      const completed = events.data.find((e) => e.event.data.object.id === payment.checkoutSessionId)!;
      expect(await webhookDeliveries(completed.id)).toBeGreaterThanOrEqual(2); // delivered twice, applied once
    },
  );

  dbTest("a declined card leaves the order unpaid and says why", async () => {
    const { user, order } = await placedOrder();
    const payment = await startCheckout(order.id, user);
    const declined = await payWithCard(harness.fake, payment.checkoutSessionId, "4000000000000002");
    expect(declined.status).toBe(402);
    await harness.fake.idle(10_000);

    const after = await reloadOrder(order.id);
    expect(after.paymentState).toBe("unpaid");
    expect(after.paidCents).toBe(0);
    const row = after.payments.getItems()[0]!;
    expect(row.status).toBe("open"); // the customer can try another card on the same checkout
    expect(row.failureMessage).toBe("The bank turned this card down.");
    expect(after.events.getItems().some((e) => e.kind === "payment_failed")).toBe(true);

    // …and a good card afterwards completes it.
    expect((await payWithCard(harness.fake, payment.checkoutSessionId, "4242424242424242")).status).toBe(200);
    await harness.fake.idle(10_000);
    expect((await reloadOrder(order.id)).paymentState).toBe("deposit_paid");
  });

  dbTest("a webhook with a tampered signature is refused and changes nothing", async () => {
    const { order } = await placedOrder();
    const payload = JSON.stringify({
      id: "evt_tampered_1",
      object: "event",
      type: "checkout.session.completed",
      data: {
        object: { id: "cs_forged", object: "checkout.session", payment_status: "paid", amount_total: 1 },
      },
    });
    const good = Stripe.webhooks.generateTestHeaderString({ payload, secret: "whsec_test_harness" });
    const forged = good.replace(/v1=([0-9a-f])/, (_, c: string) => `v1=${c === "0" ? "1" : "0"}`);
    for (const signature of [
      forged,
      "",
      Stripe.webhooks.generateTestHeaderString({ payload, secret: "whsec_wrong" }),
    ]) {
      const res = await webhookPost(
        new Request("http://x/api/payments/webhook", {
          method: "POST",
          body: payload,
          headers: { "stripe-signature": signature },
        }),
      );
      expect(res.status).toBe(400);
    }
    const em = await getEm();
    expect(await em.findOne(WebhookEvent, { id: "evt_tampered_1" })).toBeNull();
    expect((await reloadOrder(order.id)).paymentState).toBe("unpaid");
  });

  dbTest(
    "an owner refunds part of a payment; more than was paid is refused; the provider's echo is not counted twice",
    async () => {
      const { user, order } = await placedOrder();
      const payment = await startCheckout(order.id, user);
      await payWithCard(harness.fake, payment.checkoutSessionId, "4242424242424242");
      await harness.fake.idle(10_000);
      const owner = await createStaffUser(
        { name: "Owner T", email: uniqueEmail("owner"), role: "owner", password: "a-long-password-1" },
        null,
      );
      const ownerUser = { id: owner.id, name: owner.name, email: owner.email, role: "owner" as const };

      await expect(
        refundPayment(ownerUser, {
          paymentId: payment.id,
          amountCents: payment.amountCents + 1,
          reason: "too much",
        }),
      ).rejects.toMatchObject({ code: "invalid" });
      const refund = await refundPayment(ownerUser, {
        paymentId: payment.id,
        amountCents: 1000,
        reason: "Customer supplied own yokes",
      });
      expect(refund.amountCents).toBe(1000);
      await harness.fake.idle(10_000); // charge.refunded comes back from the provider

      const em = await getEm();
      const after = await em.findOneOrFail(Payment, { id: payment.id }, { populate: ["order"] });
      expect(after.refundedCents).toBe(1000);
      expect(after.order.refundedCents).toBe(1000);
      expect(after.order.paymentState).toBe("partially_refunded");
      expect(await em.count(Refund, { payment: payment.id })).toBe(1);
      expect(await em.count(OrderEvent, { order: order.id, kind: "refunded" })).toBe(1);
    },
  );
});

describe("placing an order", () => {
  dbTest("one order can hold several shafts, each priced on its own", async () => {
    const { user, customer } = await newCustomer();
    const front = await saveDesign(customer, user.id, undefined, "Front shaft");
    const rear = await saveDesign(customer, user.id, compoundOffset, "Rear shaft");
    const order = await placeOrder(user, {
      designIds: [front.id, rear.id],
      fulfilment: "ship",
      shipTo: "9 Elm Row, Millbrook",
    });
    const em = await getEm();
    const loaded = await em.findOneOrFail(Order, { id: order.id }, { populate: ["shafts"] });
    expect(loaded.shafts.getItems().map((s) => [s.position, s.name])).toEqual([
      [1, "Front shaft"],
      [2, "Rear shaft"],
    ]);
    expect(loaded.subtotalCents).toBe(loaded.shafts.getItems().reduce((sum, s) => sum + s.priceCents, 0));
    expect(loaded.shippingCents).toBeGreaterThan(0);
  });

  dbTest("a design that fails a check cannot be ordered", async () => {
    const { user, customer } = await newCustomer();
    const design = await saveDesign(customer, user.id, failingVan, "Long van");
    await expect(placeOrder(user, { designIds: [design.id], fulfilment: "pickup" })).rejects.toMatchObject({
      code: "invalid",
    });
  });

  dbTest("a customer cannot order another customer's design", async () => {
    const a = await newCustomer();
    const b = await newCustomer();
    const design = await saveDesign(a.customer, a.user.id);
    await expect(placeOrder(b.user, { designIds: [design.id], fulfilment: "pickup" })).rejects.toMatchObject({
      code: "not_found",
    });
  });

  dbTest(
    "freezes each shaft's design, evaluation and price, numbers the order, and sets the promised date",
    async () => {
      const { order } = await placedOrder();
      const em = await getEm();
      const loaded = await em.findOneOrFail(Order, { id: order.id }, { populate: ["shafts"] });
      const shaft = loaded.shafts.getItems()[0]!;
      expect(shaft.evaluation).toHaveProperty("criticalSpeedRpm");
      expect(shaft.priceLines.map((l) => l.code)).toEqual(
        expect.arrayContaining(["tube", "fitting", "joint", "labour", "balance"]),
      );
      expect(loaded.subtotalCents).toBe(shaft.priceCents);
      expect(loaded.totalCents).toBe(loaded.subtotalCents + loaded.taxCents + loaded.shippingCents);
      expect(loaded.number).toMatch(/^Y\d{2}-\d{4}$/);
      expect(loaded.promisedDate > new Date().toISOString().slice(0, 10)).toBe(true);
    },
  );
});

import { describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { AuditEvent, Order, OrderEvent, Payment, Refund } from "@/entities";
import { getEm, inTransaction } from "@/lib/db/orm";
import { requestBalance, startCheckout } from "@/lib/orders/payments";
import { payments } from "@/lib/payments";
import { POST as checkoutPost } from "@/app/api/orders/[id]/checkout/route";
import { createStaffUser } from "@/lib/users/staff";
import type { Role } from "@/lib/auth/roles";
import { authRequest, sessionCookie, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";
import { newCustomer, payWithCard, paymentsHarnessForFile, placedOrder, reloadOrder } from "../setup/orders";

const harness = paymentsHarnessForFile();

async function staff(role: Exclude<Role, "customer">) {
  const email = uniqueEmail(role);
  const row = await createStaffUser(
    { name: `Staff ${role}`, email, role, password: "a-long-password-1" },
    null,
  );
  const cookie = sessionCookie(await authRequest("/sign-in/email", { email, password: "a-long-password-1" }));
  return { user: { id: row.id, name: row.name, email: row.email, role }, cookie };
}

async function postCheckout(orderId: string, cookie: string) {
  return checkoutPost(
    new NextRequest(`http://127.0.0.1/api/orders/${orderId}/checkout`, {
      method: "POST",
      headers: { cookie },
    }),
    { params: Promise.resolve({ id: orderId }) },
  );
}

/**
 * Opens `n` pooled connections at once, so concurrent requests each get one straight away and
 * really overlap (a cold pool would hand them out one by one, hiding a race).
 */
async function warmPool(n: number): Promise<void> {
  await Promise.all(
    Array.from({ length: n }, () =>
      inTransaction((em) =>
        em.getConnection().execute("select pg_sleep(0.05)", [], "all", em.getTransactionContext()),
      ),
    ),
  );
}

/** Status of a checkout session at the provider (the fake), as Stripe's API reports it. */
async function sessionStatus(sessionId: string): Promise<string> {
  return harness.fake.core.storedSession(sessionId).session.status;
}

describe("at most one open checkout per order", () => {
  dbTest("two checkout requests at the same moment open one payable session", async () => {
    const { user, order } = await placedOrder();
    await warmPool(3);
    const [a, b, c] = await Promise.all([
      startCheckout(order.id, user),
      startCheckout(order.id, user),
      startCheckout(order.id, user),
    ]);
    expect(new Set([a.id, b.id, c.id]).size).toBe(1);
    const em = await getEm();
    expect(await em.count(Payment, { order: order.id })).toBe(1);
    const sessions = Object.values(harness.fake.core.state.sessions).filter(
      (s) => s.session.metadata["orderId"] === order.id,
    );
    expect(sessions.map((s) => s.session.status)).toEqual(["open"]);
  });

  dbTest("over HTTP too: two POSTs at once answer the same checkout", async () => {
    const { user, order } = await placedOrder();
    const cookie = sessionCookie(
      await authRequest("/sign-in/email", { email: user.email, password: "a-long-password-1" }),
    );
    await warmPool(2);
    const responses = await Promise.all([postCheckout(order.id, cookie), postCheckout(order.id, cookie)]);
    expect(responses.map((r) => r.status)).toEqual([200, 200]);
    const [x, y] = await Promise.all(responses.map((r) => r.json()));
    expect(x.checkoutUrl).toBe(y.checkoutUrl);
    expect(x.amountCents).toBe(order.depositCents);
  });

  dbTest("a balance cannot be requested before the deposit is paid", async () => {
    const { order } = await placedOrder();
    const counter = await staff("counter");
    const deposit = await startCheckout(order.id, counter.user);
    await expect(requestBalance(order.id, counter.user)).rejects.toMatchObject({ code: "conflict" });
    await expect(startCheckout(order.id, counter.user, "balance")).rejects.toMatchObject({
      code: "conflict",
    });
    // The deposit checkout is untouched and still the only one.
    expect(await sessionStatus(deposit.checkoutSessionId!)).toBe("open");
    expect((await reloadOrder(order.id)).payments.getItems().map((p) => p.status)).toEqual(["open"]);
  });

  dbTest("asking for the balance expires the open deposit checkout at the provider", async () => {
    const { user, order } = await placedOrder();
    const first = await startCheckout(order.id, user);
    await payWithCard(harness.fake, first.checkoutSessionId, "4242424242424242");
    await harness.fake.idle(10_000);
    // A deposit checkout left open from before (as older versions made) must not stay payable.
    const em = await getEm();
    const legacy = await startCheckout(order.id, null, "full");
    expect(legacy.amountCents).toBe(order.totalCents - order.depositCents); // what is owed now
    const balance = await requestBalance(order.id, null);
    expect(balance.id).not.toBe(legacy.id);
    expect(await sessionStatus(legacy.checkoutSessionId!)).toBe("expired");
    expect((await em.findOneOrFail(Payment, { id: legacy.id })).status).toBe("expired");
    expect(await em.count(Payment, { order: order.id, status: "open" })).toBe(1);
  });
});

describe("the webhook never credits more than is owed", () => {
  dbTest(
    "a stale checkout paid after the order is paid in full is refunded automatically and audited",
    async () => {
      const { user, order } = await placedOrder();
      const deposit = await startCheckout(order.id, user);
      // A second browser tab kept the deposit page open; meanwhile the deposit is paid…
      await payWithCard(harness.fake, deposit.checkoutSessionId, "4242424242424242");
      await harness.fake.idle(10_000);
      const balance = await startCheckout(order.id, user);
      expect(balance.kind).toBe("balance");
      await payWithCard(harness.fake, balance.checkoutSessionId, "4242424242424242");
      await harness.fake.idle(10_000);
      expect((await reloadOrder(order.id)).paymentState).toBe("paid");

      // …and a stale session (made at the provider before these rules, never expired) is paid late.
      const em = await getEm();
      const staleSession = harness.fake.core.createCheckoutSession({
        mode: "payment",
        success_url: "http://127.0.0.1/ok",
        line_items: [
          {
            quantity: "1",
            price_data: {
              currency: "usd",
              unit_amount: String(order.depositCents),
              product_data: { name: "Deposit" },
            },
          },
        ],
        metadata: { orderId: order.id },
      });
      const stale = em.create(Payment, {
        order: em.getReference(Order, order.id),
        kind: "deposit",
        amountCents: order.depositCents,
        currency: order.currency,
        checkoutSessionId: staleSession.id,
        checkoutUrl: staleSession.url!,
      });
      await em.flush();
      expect((await payWithCard(harness.fake, staleSession.id, "4242424242424242")).status).toBe(200);
      await harness.fake.idle(10_000);

      const after = await reloadOrder(order.id);
      expect(after.paidCents).toBe(order.totalCents);
      expect(after.refundedCents).toBe(0); // the order never counted the excess as paid
      expect(after.paymentState).toBe("paid");
      const row = after.payments.getItems().find((p) => p.id === stale.id)!;
      expect(row.status).toBe("succeeded");
      expect(row.refundedCents).toBe(order.depositCents);
      const refunds = await em.find(Refund, { payment: stale.id });
      expect(refunds.map((r) => r.amountCents)).toEqual([order.depositCents]);
      // Refunded at the provider, once, though the events arrive twice.
      const providerRefunds = Object.values(harness.fake.core.state.refunds).filter(
        (r) => r.payment_intent === row.paymentIntentId,
      );
      expect(providerRefunds.map((r) => r.amount)).toEqual([order.depositCents]);
      const audit = await em.find(AuditEvent, { subjectId: order.id, action: "payment.excess-refunded" });
      expect(audit).toHaveLength(1);
      expect(audit[0]!.details).toMatchObject({ paymentId: stale.id, amountCents: order.depositCents });
      expect(
        after.events
          .getItems()
          .filter((e) => e.kind === "refunded")
          .map((e) => e.public),
      ).toEqual([true]);
    },
  );

  dbTest(
    "a cancelled order refuses a checkout, and a payment completing on it is refunded in full",
    async () => {
      const { user, order } = await placedOrder();
      const open = await startCheckout(order.id, user);
      const em = await getEm();
      await em.nativeUpdate(Order, { id: order.id }, { status: "cancelled" });

      await expect(startCheckout(order.id, user)).rejects.toMatchObject({ code: "conflict" });
      const cookie = sessionCookie(
        await authRequest("/sign-in/email", { email: user.email, password: "a-long-password-1" }),
      );
      const res = await postCheckout(order.id, cookie);
      expect(res.status).toBe(409);
      expect((await res.json()).error.message).toMatch(/cancelled/);

      // The customer still had the checkout page open and pays on it.
      await payWithCard(harness.fake, open.checkoutSessionId, "4242424242424242");
      await harness.fake.idle(10_000);
      const after = await reloadOrder(order.id);
      expect(after.status).toBe("cancelled");
      expect(after.paidCents).toBe(0);
      expect(after.paymentState).toBe("unpaid");
      const payment = after.payments.getItems()[0]!;
      expect(payment.refundedCents).toBe(payment.amountCents);
      expect(await em.count(OrderEvent, { order: order.id, kind: "paid" })).toBe(0);
      expect(await em.count(AuditEvent, { subjectId: order.id, action: "payment.excess-refunded" })).toBe(1);
      const charge = Object.values(harness.fake.core.state.charges).find(
        (c) => c.payment_intent === payment.paymentIntentId,
      )!;
      expect(charge.refunded).toBe(true);
    },
  );
});

describe("the payments port closes checkouts", () => {
  dbTest("expireCheckout says expired (also when asked twice) or completed when it was paid", async () => {
    const { user, order } = await placedOrder();
    const first = await startCheckout(order.id, user);
    expect(await payments().expireCheckout(first.checkoutSessionId!)).toBe("expired");
    expect(await payments().expireCheckout(first.checkoutSessionId!)).toBe("expired");
    expect(await sessionStatus(first.checkoutSessionId!)).toBe("expired");
    await harness.fake.idle(10_000); // checkout.session.expired marks our row too
    const em = await getEm();
    expect((await em.findOneOrFail(Payment, { id: first.id })).status).toBe("expired");

    const second = await startCheckout(order.id, user);
    expect(second.id).not.toBe(first.id);
    await payWithCard(harness.fake, second.checkoutSessionId, "4242424242424242");
    expect(await payments().expireCheckout(second.checkoutSessionId!)).toBe("completed");
    await harness.fake.idle(10_000);
  });
});

describe("who may open a checkout", () => {
  dbTest("floor staff get 403; the counter and the owner may", async () => {
    const { order } = await placedOrder();
    const floor = await staff("floor");
    const res = await postCheckout(order.id, floor.cookie);
    expect(res.status).toBe(403);
    expect((await res.json()).error.code).toBe("forbidden");
    await expect(startCheckout(order.id, floor.user)).rejects.toMatchObject({ code: "forbidden" });
    const em = await getEm();
    expect(await em.count(Payment, { order: order.id })).toBe(0);

    for (const role of ["counter", "owner"] as const) {
      const res = await postCheckout(order.id, (await staff(role)).cookie);
      expect(res.status).toBe(200);
    }
    expect(await em.count(Payment, { order: order.id })).toBe(1);
  });

  dbTest("another customer gets 404", async () => {
    const { order } = await placedOrder();
    const other = await newCustomer();
    const cookie = sessionCookie(
      await authRequest("/sign-in/email", { email: other.user.email, password: "a-long-password-1" }),
    );
    expect((await postCheckout(order.id, cookie)).status).toBe(404);
  });
});

import { describe, expect } from "vitest";
import { randomUUID } from "node:crypto";
import { Customer, Order } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { dbTest } from "../setup/db";
import { createTestOrder } from "../setup/test-orders";

/** Runs raw SQL on its own connection and returns the error PostgreSQL answers (or null). */
async function refused(
  sql: string,
  params: unknown[] = [],
): Promise<{ code?: string; constraint?: string } | null> {
  const em = await getEm();
  try {
    await em.getConnection().execute(sql, params);
    return null;
  } catch (error) {
    return error as { code?: string; constraint?: string };
  }
}

async function paymentRow(orderId: string, amountCents = 5_400): Promise<string> {
  const em = await getEm();
  const id = randomUUID();
  await em
    .getConnection()
    .execute(
      `insert into payment (id, order_id, kind, amount_cents, currency, checkout_session_id, checkout_url) values (?, ?, 'deposit', ?, 'USD', ?, 'http://x')`,
      [id, orderId, amountCents, `cs_${id}`],
    );
  return id;
}

describe("the database refuses impossible money", () => {
  // Each row: an update that breaks one rule, and the constraint that must refuse it.
  const orderCases: [string, string][] = [
    ["deposit_cents = -1", "shop_order_money_nonnegative_check"],
    ["refunded_cents = -1", "shop_order_money_nonnegative_check"],
    ["subtotal_cents = -100", "shop_order_money_nonnegative_check"],
    ["tax_cents = -1", "shop_order_money_nonnegative_check"],
    ["shipping_cents = -1", "shop_order_money_nonnegative_check"],
    ["paid_cents = -1", "shop_order_money_nonnegative_check"],
    ["deposit_cents = total_cents + 1", "shop_order_deposit_within_total_check"],
    ["paid_cents = total_cents + 1", "shop_order_paid_within_total_check"],
    ["paid_cents = 100, refunded_cents = 101", "shop_order_refunded_within_paid_check"],
  ];
  for (const [set, constraint] of orderCases) {
    dbTest(`order: ${set} is refused by ${constraint}`, async () => {
      const em = await getEm();
      const order = await createTestOrder(em);
      const error = await refused(`update shop_order set ${set} where id = ?`, [order.id]);
      expect(error).toMatchObject({ code: "23514", constraint });
      const fresh = await (await getEm()).findOneOrFail(Order, { id: order.id });
      expect(fresh).toMatchObject({ totalCents: 10_800, paidCents: 0, refundedCents: 0 });
    });
  }

  dbTest("an order paid in full and partly refunded is allowed", async () => {
    const em = await getEm();
    const order = await createTestOrder(em);
    expect(
      await refused(`update shop_order set paid_cents = total_cents, refunded_cents = 1000 where id = ?`, [
        order.id,
      ]),
    ).toBeNull();
  });

  dbTest("payments, refunds and shaft prices cannot go negative or refund more than was paid", async () => {
    const em = await getEm();
    const order = await createTestOrder(em);
    const payment = await paymentRow(order.id);
    expect(await refused(`update payment set amount_cents = 0 where id = ?`, [payment])).toMatchObject({
      constraint: "payment_amount_positive_check",
    });
    expect(await refused(`update payment set refunded_cents = -1 where id = ?`, [payment])).toMatchObject({
      constraint: "payment_refunded_within_amount_check",
    });
    expect(
      await refused(`update payment set refunded_cents = amount_cents + 1 where id = ?`, [payment]),
    ).toMatchObject({
      constraint: "payment_refunded_within_amount_check",
    });
    expect(
      await refused(`update payment set refunded_cents = amount_cents where id = ?`, [payment]),
    ).toBeNull();
    expect(
      await refused(
        `insert into refund (id, payment_id, amount_cents, provider_refund_id, reason) values (?, ?, -5, ?, 'x')`,
        [randomUUID(), payment, `re_${randomUUID()}`],
      ),
    ).toMatchObject({ constraint: "refund_amount_positive_check" });
    expect(
      await refused(
        `insert into order_shaft (id, order_id, position, name, design, evaluation, overall, price_lines, price_cents) values (?, ?, 1, 'x', '{}', '{}', 'pass', '[]', -1)`,
        [randomUUID(), order.id],
      ),
    ).toMatchObject({ constraint: "order_shaft_price_nonnegative_check" });
  });
});

describe("one customer per e-mail address", () => {
  dbTest(
    "a second customer with the same address, in other capitals, is refused by the database",
    async () => {
      const email = `dup-${randomUUID().slice(0, 8)}@test.example`;
      const em = await getEm();
      em.create(Customer, { name: "First", email });
      await em.flush();
      const error = await refused(`insert into customer (id, name, email) values (?, 'Second', ?)`, [
        randomUUID(),
        email.toUpperCase(),
      ]);
      expect(error).toMatchObject({ code: "23505", constraint: "customer_email_lower_unique" });

      // Through the ORM too, and a route answers it as 409 (errorResponse maps 23505).
      const again = await getEm();
      again.create(Customer, { name: "Third", email: ` ${email}`.trim() });
      const thrown = await again.flush().then(
        () => null,
        (e: unknown) => e,
      );
      const { errorResponse } = await import("@/lib/http/route");
      expect(errorResponse(thrown).status).toBe(409);
      expect(await (await getEm()).count(Customer, { email })).toBe(1);
    },
  );
});

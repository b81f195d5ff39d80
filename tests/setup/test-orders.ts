import { randomUUID } from "node:crypto";
import type { EntityManager } from "@mikro-orm/postgresql";
import { Customer, Order, User } from "@/entities";

/**
 * A minimal counter order for tests that need something to attach to: for the customer `customerId`,
 * the customer record of `userId` (the one sign-up made, or a new one), or a new customer without
 * an account.
 */
export async function createTestOrder(
  em: EntityManager,
  options: { userId?: string; email?: string; customerId?: string } = {},
): Promise<Order> {
  const suffix = randomUUID().slice(0, 8);
  const existing = options.customerId
    ? em.getReference(Customer, options.customerId)
    : options.userId
      ? await em.findOne(Customer, { user: options.userId })
      : null;
  const customer =
    existing ??
    em.create(Customer, {
      name: `Test customer ${suffix}`,
      email: options.email ?? `customer-${suffix}@test.example`,
      user: options.userId ? em.getReference(User, options.userId) : null,
      createdAt: new Date(),
    });
  const order = em.create(Order, {
    number: `T-${suffix}`,
    customer,
    channel: "counter",
    fulfilment: "pickup",
    currency: "USD",
    subtotalCents: 10_000,
    taxCents: 800,
    shippingCents: 0,
    totalCents: 10_800,
    depositCents: 5_400,
    promisedDate: "2026-12-24",
    createdAt: new Date(),
    updatedAt: new Date(),
  });
  await em.persistAndFlush(existing ? [order] : [customer, order]);
  return order;
}

import { randomUUID } from "node:crypto";
import type { EntityManager } from "@mikro-orm/postgresql";
import { Customer, Order, User } from "@/entities";

/** A minimal customer and order for tests that need something to attach to (optionally owned by a user). */
export async function createTestOrder(em: EntityManager, options: { userId?: string; email?: string } = {}): Promise<Order> {
  const suffix = randomUUID().slice(0, 8);
  const customer = em.create(Customer, {
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
  await em.persistAndFlush([customer, order]);
  return order;
}

import "server-only";
import { isUuid } from "@/lib/http/known-errors";
import type { EntityManager } from "@mikro-orm/postgresql";
import { Order } from "@/entities";
import type { CurrentUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { AppError } from "@/lib/http/errors";

/** Whether a user may see every order (counter, floor, owner) rather than only their own. */
export function seesAllOrders(user: CurrentUser): boolean {
  return can(user.role, "orders.desk") || can(user.role, "floor.scan");
}

/**
 * Loads an order the user may see: staff see any, a customer only their own. Anything else is
 * "not found" (404), so a customer cannot even learn that another customer's order exists.
 */
export async function loadOrderForUser(
  em: EntityManager,
  user: CurrentUser,
  orderId: string,
): Promise<Order> {
  const uuid = isUuid(orderId);
  const order = uuid
    ? await em.findOne(
        Order,
        seesAllOrders(user) ? { id: orderId } : { id: orderId, customer: { user: user.id } },
        { populate: ["customer"] },
      )
    : null;
  if (!order) throw new AppError("not_found", "No such order.");
  return order;
}

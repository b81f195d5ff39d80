import "server-only";
import { getCurrentUser } from "@/lib/auth/guard";
import { can, type Permission } from "@/lib/auth/permissions";
import { getEm } from "@/lib/db/orm";
import { loadOrderForUser } from "./access";

/**
 * An order page's title: "Order Y26-0042" for someone who may see that order on that page (the
 * same scoping as the page, so a title never tells anyone an order exists), else just "Order".
 */
export async function orderPageTitle(orderId: string, permission: Permission): Promise<string> {
  const user = await getCurrentUser();
  if (!user || !can(user.role, permission)) return "Order";
  const order = await loadOrderForUser(await getEm(), user, orderId).catch(() => null);
  return order ? `Order ${order.number}` : "Order";
}

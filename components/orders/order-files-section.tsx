import type { EntityManager } from "@mikro-orm/postgresql";
import type { Order } from "@/entities";
import type { CurrentUser } from "@/lib/auth/guard";
import { listOrderUploads, mayAttachFiles } from "@/lib/uploads";
import { OrderFiles } from "@/components/order-files";

/** Photos and measurement sheets on an order, with the upload control for those who may attach. */
export async function OrderFilesSection({
  em,
  order,
  user,
}: {
  em: EntityManager;
  order: Order;
  user: CurrentUser;
}) {
  const files = await listOrderUploads(em, order);
  return <OrderFiles orderId={order.id} files={files} canUpload={mayAttachFiles(user)} />;
}

import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePermission } from "@/lib/auth/guard";
import { getEm } from "@/lib/db/orm";
import { loadOrderForUser } from "@/lib/orders/access";
import { orderView, populateOrder } from "@/lib/orders/queries";
import { AppError } from "@/lib/http/errors";
import { PageHeader } from "@/components/ui/page-header";
import { OrderPage } from "@/components/orders/order-page";
import { OrderFilesSection } from "@/components/orders/order-files-section";

export const metadata: Metadata = { title: "Order" };

export default async function CustomerOrderPage({ params, searchParams }: PageProps<"/orders/[id]">) {
  const { id } = await params;
  const user = await requirePermission("orders.own", `/orders/${id}`);
  const em = await getEm();
  const order = await loadOrderForUser(em, user, id).catch((e: unknown) => {
    if (e instanceof AppError && e.code === "not_found") notFound();
    throw e;
  });
  await populateOrder(em, order);
  const query = await searchParams;
  return (
    <>
      <PageHeader
        title={`Order ${order.number}`}
        description={`Placed ${order.createdAt.toISOString().slice(0, 10)}`}
      />
      <OrderPage
        order={orderView(order, user)}
        returnedFromCheckout={Boolean(query.paid)}
        cancelledCheckout={Boolean(query.cancelled)}
        files={<OrderFilesSection em={em} order={order} user={user} />}
      />
    </>
  );
}

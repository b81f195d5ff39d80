import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { getEm } from "@/lib/db/orm";
import { loadOrderForUser } from "@/lib/orders/access";
import { orderView, populateOrder } from "@/lib/orders/queries";
import { AppError } from "@/lib/http/errors";
import { PageHeader } from "@/components/ui/page-header";
import { Alert } from "@/components/ui/alert";
import { OrderPage } from "@/components/orders/order-page";
import { OrderFilesSection } from "@/components/orders/order-files-section";
import { InviteButton } from "@/components/customers/invite-button";
import { orderFloorState } from "@/lib/floor/work-orders";
import { StaffActions } from "./_components/staff-actions";
import { FloorActions } from "./_components/floor-actions";

export const metadata: Metadata = { title: "Order" };

export default async function DeskOrderPage({ params, searchParams }: PageProps<"/desk/orders/[id]">) {
  const { id } = await params;
  const user = await requirePermission("orders.desk", `/desk/orders/${id}`);
  const em = await getEm();
  const order = await loadOrderForUser(em, user, id).catch((e: unknown) => {
    if (e instanceof AppError && e.code === "not_found") notFound();
    throw e;
  });
  await populateOrder(em, order);
  const floor = await orderFloorState(em, order.id);
  const view = orderView(order, user);
  const { placed, paid, cancelled } = await searchParams;
  return (
    <>
      <PageHeader
        title={`Order ${order.number}`}
        description={`${order.customer.name} · ${order.customer.email}${order.customer.phone ? ` · ${order.customer.phone}` : ""} · ${order.channel === "counter" ? "phone order" : "online"}`}
      />
      {!order.customer.user && (
        <p className="mb-4 text-sm text-ink-muted">
          {order.customer.name} has no account yet. <InviteButton customerId={order.customer.id} />
        </p>
      )}
      {placed && (
        <div className="mb-4">
          <Alert tone="success" title="Order placed">
            Take the payment now with the button under Payment, or send the customer the link from their order
            e-mail.
          </Alert>
        </div>
      )}
      <OrderPage
        order={view}
        payVerb="Take"
        returnedFromCheckout={Boolean(paid)}
        cancelledCheckout={Boolean(cancelled)}
        files={<OrderFilesSection em={em} order={order} user={user} />}
        staffActions={
          <>
            <FloorActions
              orderId={order.id}
              depositPaid={order.paymentState !== "unpaid"}
              cancelled={order.status === "cancelled"}
              floor={floor}
            />
            <StaffActions
              orderId={order.id}
              currency={order.currency}
              canRequestBalance={view.due?.kind === "balance"}
              canRefund={can(user.role, "payments.refund")}
              payments={view.payments}
            />
          </>
        }
      />
    </>
  );
}

import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { getEm } from "@/lib/db/orm";
import { orderPageTitle } from "@/lib/orders/order-title";
import { loadOrderForUser } from "@/lib/orders/access";
import { shopToday } from "@/lib/shop/locale";
import { orderView, populateOrder } from "@/lib/orders/queries";
import { AppError } from "@/lib/http/errors";
import { PageHeader } from "@/components/ui/page-header";
import { Alert } from "@/components/ui/alert";
import { OrderPage } from "@/components/orders/order-page";
import { OrderFiles } from "@/components/order-files";
import { listOrderUploads, mayAttachFiles } from "@/lib/uploads";
import { InviteButton } from "@/components/customers/invite-button";
import { orderFloorState } from "@/lib/floor/work-orders";
import { cancellationQuote } from "@/lib/orders/cancel";
import { signoffView } from "@/lib/orders/engineering-signoff";
import { StaffActions } from "./_components/staff-actions";
import { FloorActions } from "./_components/floor-actions";
import { TakePayment } from "./_components/take-payment";
import { OrderNotesPanel } from "./_components/order-notes-panel";
import { CancelOrderPanel } from "./_components/cancel-order-panel";
import { SignoffPanel } from "./_components/signoff-panel";
import { OrderDetailsPanel } from "./_components/order-details-panel";

// The browser tab and history name the order (for those who may see it).
export async function generateMetadata({ params }: PageProps<"/desk/orders/[id]">): Promise<Metadata> {
  return { title: await orderPageTitle((await params).id, "orders.desk") };
}

export default async function DeskOrderPage({ params, searchParams }: PageProps<"/desk/orders/[id]">) {
  const { id } = await params;
  const user = await requirePermission("orders.desk", `/desk/orders/${id}`);
  const em = await getEm();
  const order = await loadOrderForUser(em, user, id).catch((e: unknown) => {
    if (e instanceof AppError && e.code === "not_found") notFound();
    throw e;
  });
  await populateOrder(em, order);
  const [floor, quote] = await Promise.all([orderFloorState(em, order.id), cancellationQuote(em, order)]);
  const view = orderView(order, user, await shopToday());
  const signoff = signoffView(order.shafts.getItems());
  const cancelled = order.status === "cancelled";
  const blocked = cancelled
    ? "This order is cancelled; it takes no payment."
    : view.needsSignoff
      ? "A shaft fails an engineering check: an owner must review it before any payment is taken."
      : null;
  const { placed, paid, cancelled: leftCheckout } = await searchParams;
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
      {signoff.length > 0 && !cancelled && (
        <div className="mb-6">
          <SignoffPanel
            orderId={order.id}
            shafts={signoff}
            canAccept={can(user.role, "engineering.signoff")}
          />
        </div>
      )}
      {placed && (
        <div className="mb-4">
          <Alert tone="success" title="Order placed">
            Take the payment now under Take payment: record it at the counter, or e-mail the customer a
            payment link.
          </Alert>
        </div>
      )}
      <OrderPage
        order={view}
        payVerb="Take"
        returnedFromCheckout={Boolean(paid)}
        cancelledCheckout={Boolean(leftCheckout)}
        files={
          <OrderFiles
            orderId={order.id}
            files={await listOrderUploads(em, order)}
            canUpload={mayAttachFiles(user)}
          />
        }
        staffActions={
          <>
            <TakePayment
              orderId={order.id}
              currency={order.currency}
              customerEmail={order.customer.email}
              due={view.due}
              owedCents={Math.max(0, order.totalCents - order.paidCents)}
              blocked={blocked}
            />
            <FloorActions
              orderId={order.id}
              depositPaid={order.paymentState !== "unpaid"}
              cancelled={cancelled}
              blocked={
                view.needsSignoff ? "An owner must review the failed engineering check before release." : null
              }
              floor={floor}
            />
            <StaffActions
              orderId={order.id}
              currency={order.currency}
              canRequestBalance={view.due?.kind === "balance"}
              canRefund={can(user.role, "payments.refund")}
              payments={view.payments}
            />
            {!cancelled && order.status !== "shipped" && (
              <OrderDetailsPanel
                key={order.version}
                orderId={order.id}
                details={{
                  version: order.version,
                  promisedDate: order.promisedDate,
                  shipTo: order.shipTo ?? null,
                  fulfilment: order.fulfilment,
                }}
              />
            )}
            <OrderNotesPanel orderId={order.id} notes={view.shopNotes} />
            {quote && (
              <CancelOrderPanel
                orderId={order.id}
                orderNumber={order.number}
                currency={order.currency}
                quote={quote}
                mayCancel={!quote.released || can(user.role, "orders.cancel-released")}
              />
            )}
          </>
        }
      />
    </>
  );
}

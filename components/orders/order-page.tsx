import type { OrderView } from "@/lib/orders/views";
import { formatMoney } from "@/lib/money";
import { formatCalendarDate } from "@/lib/dates";
import { ShopTime } from "@/components/shop-locale";
import { Alert } from "@/components/ui/alert";
import { OrderStatusBadge, PaymentBadge } from "./status-badge";
import { OrderTimeline } from "./order-timeline";
import { ShaftSummary, Totals } from "./shaft-summary";
import { PayButton } from "./pay-button";
import { PaymentConfirming } from "./payment-confirming";
import { OrderPapers } from "./order-papers";

const PAYMENT_STATUS: Record<string, string> = {
  open: "not paid yet",
  succeeded: "paid",
  failed: "failed",
  expired: "expired",
};
const KIND_LABEL = { deposit: "deposit", balance: "balance", full: "payment" } as const;
const METHOD_LABEL: Record<string, string> = {
  checkout: "card online",
  cash: "cash at the shop",
  cheque: "cheque",
  terminal: "card at the shop",
};

/** The body of an order page, for the customer and (with `staffActions`) for the shop. */
export function OrderPage({
  order,
  returnedFromCheckout,
  cancelledCheckout,
  checkoutUnavailable,
  files,
  staffActions,
  payVerb = "Pay",
}: {
  order: OrderView;
  returnedFromCheckout?: boolean;
  cancelledCheckout?: boolean;
  checkoutUnavailable?: boolean;
  files?: React.ReactNode;
  staffActions?: React.ReactNode;
  /** "Pay" for the customer; the counter "Take"s the payment with the customer on the phone. */
  payVerb?: string;
}) {
  const lastFailure = order.payments.findLast((p) => p.status === "open" && p.failureMessage);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center gap-3">
        <OrderStatusBadge status={order.status} label={order.statusLabel} onHold={order.onHold} />
        <PaymentBadge state={order.paymentState} />
        <span className="text-sm text-ink-muted">
          Promised {formatCalendarDate(order.promisedDate)} ·{" "}
          {order.fulfilment === "ship" ? "Shipping" : "Pickup at the shop"}
        </span>
        {order.late && (
          <span className="rounded-full bg-fail-soft px-2.5 py-0.5 text-xs font-semibold text-fail">
            Late
          </span>
        )}
      </div>
      {returnedFromCheckout && order.paymentState === "unpaid" && <PaymentConfirming />}
      {returnedFromCheckout && order.paymentState !== "unpaid" && (
        <Alert tone="success" title="Payment received">
          Thank you. A receipt is on its way to {order.customerEmail}.
        </Alert>
      )}
      {cancelledCheckout && order.paymentState === "unpaid" && (
        <Alert tone="info">You left the payment page; nothing was charged.</Alert>
      )}
      {checkoutUnavailable && order.paymentState === "unpaid" && (
        <Alert tone="warning" title="Your order is placed">
          The payment page could not be opened just now. Nothing was charged; try the payment button again in
          a moment.
        </Alert>
      )}
      {order.status === "cancelled" && (
        <Alert tone="warning" title="This order is cancelled">
          {order.cancelReason ?? "The shop cancelled this order."}
          {order.refundedCents > 0
            ? ` ${formatMoney(order.refundedCents, order.currency)} was refunded.`
            : ""}
        </Alert>
      )}
      {lastFailure && (
        <Alert tone="error" title="The last card payment was declined">
          {lastFailure.failureMessage} Try another card.
        </Alert>
      )}

      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <div className="space-y-6">
          <section aria-labelledby="timeline">
            <h2 id="timeline" className="mb-3 text-lg font-semibold">
              Timeline
            </h2>
            <div className="card p-5">
              <OrderTimeline order={order} />
            </div>
          </section>
          <section aria-labelledby="shafts" className="space-y-3">
            <h2 id="shafts" className="text-lg font-semibold">
              {order.shaftViews.length === 1 ? "Shaft" : "Shafts"}
            </h2>
            {order.shaftViews.map((s) => (
              <ShaftSummary key={s.id} shaft={s} currency={order.currency} />
            ))}
          </section>
          {!staffActions && order.shopNotes.length > 0 && (
            <section aria-labelledby="shop-notes" className="space-y-3">
              <h2 id="shop-notes" className="text-lg font-semibold">
                Notes from the shop
              </h2>
              <ul className="space-y-3 card p-5">
                {order.shopNotes.map((n) => (
                  <li key={n.id} className="text-sm">
                    <p className="whitespace-pre-wrap">{n.body}</p>
                    <p className="mt-1 text-xs text-ink-muted">
                      {n.byName} · <ShopTime at={n.at} format="date" />
                    </p>
                  </li>
                ))}
              </ul>
            </section>
          )}
          {files}
        </div>
        <aside className={`space-y-4 ${order.due ? "order-first lg:order-none" : ""}`}>
          <section className="space-y-4 card p-5" aria-labelledby="money">
            <h2 id="money" className="text-lg font-semibold">
              Payment
            </h2>
            <Totals
              currency={order.currency}
              subtotalCents={order.subtotalCents}
              shippingCents={order.shippingCents}
              taxCents={order.taxCents}
              totalCents={order.totalCents}
            >
              <div className="flex justify-between py-1">
                <dt>Paid</dt>
                <dd className="tabular-nums">{formatMoney(order.paidCents, order.currency)}</dd>
              </div>
              {order.refundedCents > 0 && (
                <div className="flex justify-between py-1">
                  <dt>Refunded</dt>
                  <dd className="tabular-nums">−{formatMoney(order.refundedCents, order.currency)}</dd>
                </div>
              )}
            </Totals>
            {order.due && order.status !== "cancelled" && order.needsSignoff && (
              <p className="text-sm text-ink-muted">
                The shop is reviewing this design before taking payment; we will be in touch.
              </p>
            )}
            {order.due && order.status !== "cancelled" && !order.needsSignoff && (
              <div className="no-print">
                <PayButton
                  orderId={order.id}
                  label={`${payVerb} ${KIND_LABEL[order.due.kind]} of ${formatMoney(order.due.amountCents, order.currency)}`}
                />
              </div>
            )}
            {order.payments.length > 0 && (
              <ul className="divide-y divide-line text-sm">
                {order.payments.map((p) => (
                  <li key={p.id} className="flex justify-between gap-2 py-1.5">
                    <span>
                      <span className="capitalize">{p.kind}</span>
                      <span className="block text-xs text-ink-muted">
                        {METHOD_LABEL[p.method] ?? p.method}
                        {p.reference ? ` · ${p.reference}` : ""}
                      </span>
                    </span>
                    <span className="text-ink-muted">
                      {PAYMENT_STATUS[p.status] ?? p.status}
                      {p.paidAt ? (
                        <>
                          {" "}
                          <ShopTime at={p.paidAt} format="date" />
                        </>
                      ) : (
                        ""
                      )}
                    </span>
                    <span className="tabular-nums">{formatMoney(p.amountCents, order.currency)}</span>
                  </li>
                ))}
              </ul>
            )}
          </section>
          {order.status !== "cancelled" && <OrderPapers order={order} />}
          {staffActions}
        </aside>
      </div>
    </div>
  );
}

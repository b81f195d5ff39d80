import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { Order, Payment } from "@/entities";
import { flushQueuedEmails, queueEmail, type EmailLine } from "@/lib/mail";
import { appUrl } from "@/lib/http/app-url";
import { formatMoney } from "@/lib/money";
import { formatCalendarDate, formatLongDate } from "@/lib/dates";
import { getShopLocale } from "@/lib/shop/locale";

const longDate = (iso: string) => formatCalendarDate(iso, "long");

async function shaftLines(em: EntityManager, order: Order): Promise<EmailLine[]> {
  if (!order.shafts.isInitialized()) await em.populate(order, ["shafts"]);
  return order.shafts.getItems().map((s) => {
    const r = s.evaluation as {
      lengthMm?: number;
      tube?: { odMm?: number; wallMm?: number; materialId?: string };
    };
    return {
      description: `${s.position}. ${s.name}`,
      detail:
        r.lengthMm && r.tube
          ? `${r.lengthMm.toFixed(1)} mm · tube ${r.tube.odMm?.toFixed(1)} × ${r.tube.wallMm?.toFixed(2)} mm ${r.tube.materialId}`
          : undefined,
      amount: formatMoney(s.priceCents, order.currency),
    };
  });
}

const money = (order: Order, cents: number) => formatMoney(cents, order.currency);

const paymentLabel = (kind: Payment["kind"]) =>
  kind === "deposit" ? "Deposit" : kind === "balance" ? "Balance" : "Payment in full";

/**
 * The e-mails an order sends. Each writes an outbox row in the caller's transaction; delivery
 * happens afterwards (afterCommit), so a failed send never blocks the order.
 */
export async function notifyOrderReceived(em: EntityManager, order: Order): Promise<void> {
  await queueEmail(em, {
    template: "order-received",
    to: order.customer.email,
    orderId: order.id,
    props: {
      orderNumber: order.number,
      customerName: order.customer.name,
      lines: await shaftLines(em, order),
      subtotal: money(order, order.subtotalCents),
      tax: money(order, order.taxCents),
      shipping: money(order, order.shippingCents),
      total: money(order, order.totalCents),
      paid: money(order, order.paidCents),
      promisedDate: longDate(order.promisedDate),
      fulfilment: order.fulfilment,
      orderUrl: `${appUrl()}/orders/${order.id}`,
    },
  });
}

export async function notifyPaymentReceived(
  em: EntityManager,
  order: Order,
  payment: Payment,
): Promise<void> {
  await queueEmail(em, {
    template: "payment-receipt",
    to: order.customer.email,
    orderId: order.id,
    props: {
      orderNumber: order.number,
      customerName: order.customer.name,
      paymentLabel: paymentLabel(payment.kind),
      amountPaid: money(order, payment.amountCents),
      paidOn: formatLongDate(payment.paidAt ?? new Date(), (await getShopLocale()).timeZone),
      totalPaid: money(order, order.paidCents),
      balanceRemaining: money(order, Math.max(0, order.totalCents - order.paidCents)),
      lines: await shaftLines(em, order),
      total: money(order, order.totalCents),
      orderUrl: `${appUrl()}/orders/${order.id}`,
    },
  });
}

export async function notifyBalanceDue(em: EntityManager, order: Order, payment: Payment): Promise<void> {
  await queueEmail(em, {
    template: "balance-due",
    to: order.customer.email,
    orderId: order.id,
    props: {
      orderNumber: order.number,
      customerName: order.customer.name,
      balanceDue: money(order, payment.amountCents),
      total: money(order, order.totalCents),
      paidSoFar: money(order, order.paidCents),
      payUrl: payment.checkoutUrl ?? `${appUrl()}/orders/${order.id}`,
      promisedDate: longDate(order.promisedDate),
      lines: await shaftLines(em, order),
      orderUrl: `${appUrl()}/orders/${order.id}`,
    },
  });
}

/** The counter e-mails a link to pay what is due now (the payment's hosted checkout). */
export async function notifyPaymentLink(em: EntityManager, order: Order, payment: Payment): Promise<void> {
  const orderUrl = `${appUrl()}/orders/${order.id}`;
  await queueEmail(em, {
    template: "payment-link",
    to: order.customer.email,
    orderId: order.id,
    props: {
      orderNumber: order.number,
      customerName: order.customer.name,
      paymentLabel: paymentLabel(payment.kind),
      amountDue: money(order, payment.amountCents),
      total: money(order, order.totalCents),
      paidSoFar: money(order, order.paidCents),
      payUrl: payment.checkoutUrl ?? orderUrl,
      promisedDate: longDate(order.promisedDate),
      lines: await shaftLines(em, order),
      orderUrl,
    },
  });
}

/** The order was cancelled: the reason, what was paid, kept and refunded. */
export async function notifyOrderCancelled(
  em: EntityManager,
  order: Order,
  money_: { paidCents: number; feeCents: number; refundCents: number; refundHow: string | null },
  reason: string,
): Promise<void> {
  await queueEmail(em, {
    template: "order-cancelled",
    to: order.customer.email,
    orderId: order.id,
    props: {
      orderNumber: order.number,
      customerName: order.customer.name,
      reason,
      paid: money(order, money_.paidCents),
      refund: money(order, money_.refundCents),
      kept: money_.feeCents > 0 ? money(order, money_.feeCents) : null,
      refundHow: money_.refundCents > 0 ? money_.refundHow : null,
      lines: await shaftLines(em, order),
      orderUrl: `${appUrl()}/orders/${order.id}`,
    },
  });
}

/** After a transaction that queued e-mails commits: hand them to the delivery job (never throws). */
export async function afterCommit(): Promise<void> {
  await flushQueuedEmails();
}

/** Final inspection passed on every shaft: "your order is ready", with what is left to pay. */
export async function notifyOrderReady(em: EntityManager, order: Order): Promise<void> {
  const owedCents = Math.max(0, order.totalCents - order.paidCents);
  const orderUrl = `${appUrl()}/orders/${order.id}`;
  await queueEmail(em, {
    template: "shaft-ready",
    to: order.customer.email,
    orderId: order.id,
    props: {
      orderNumber: order.number,
      customerName: order.customer.name,
      fulfilment: order.fulfilment,
      lines: await shaftLines(em, order),
      balanceDue: owedCents > 0 ? money(order, owedCents) : null,
      // The order page opens (or reuses) the checkout; a checkout link itself expires.
      payUrl: owedCents > 0 ? orderUrl : null,
      orderUrl,
    },
  });
}

/** Every shaft has shipped: one e-mail with each carrier and tracking number used. */
export async function notifyOrderShipped(
  em: EntityManager,
  order: Order,
  parcels: { carrier: string; trackingNumber: string }[],
  shippedAt: Date,
): Promise<void> {
  const unique = (xs: string[]) => [...new Set(xs.filter(Boolean))].join(", ");
  await queueEmail(em, {
    template: "shaft-shipped",
    to: order.customer.email,
    orderId: order.id,
    props: {
      orderNumber: order.number,
      customerName: order.customer.name,
      carrier: unique(parcels.map((p) => p.carrier)),
      trackingNumber: unique(parcels.map((p) => p.trackingNumber)),
      trackingUrl: null,
      shipTo: order.shipTo ?? "",
      shippedOn: formatLongDate(shippedAt, (await getShopLocale()).timeZone),
      lines: await shaftLines(em, order),
      orderUrl: `${appUrl()}/orders/${order.id}`,
    },
  });
}

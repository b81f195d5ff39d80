import { LockMode } from "@mikro-orm/core";
import type { EntityManager } from "@mikro-orm/postgresql";
import { randomUUID } from "node:crypto";
import { Order, OrderEvent, Payment, Refund, User, WebhookEvent } from "@/entities";
import type { CurrentUser } from "@/lib/auth/guard";
import { recordAudit } from "@/lib/audit";
import { getEm, inTransaction } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import { logger } from "@/lib/logger";
import { payments } from "@/lib/payments/stripe";
import type { PaymentEvent } from "@/lib/payments/port";
import { appUrl } from "@/lib/http/app-url";
import { formatMoney } from "@/lib/pricing/price-book";
import { afterCommit, notifyBalanceDue, notifyPaymentReceived } from "./notify";

/** What is still owed for each kind of request, given what has been paid. */
export function amountDue(order: Order, kind: Payment["kind"]): number {
  const outstanding = Math.max(0, order.totalCents - order.paidCents);
  if (kind === "deposit") return Math.min(outstanding, Math.max(0, order.depositCents - order.paidCents));
  return outstanding;
}

/** The kind of payment an order asks for next: the deposit first (or all of it), then the balance. */
export function nextPaymentKind(order: Order): Payment["kind"] | null {
  if (order.paidCents >= order.totalCents || order.status === "cancelled") return null;
  if (order.paidCents === 0) return order.depositCents >= order.totalCents ? "full" : "deposit";
  return "balance";
}

/**
 * Opens (or reuses) a hosted checkout for the order's next payment and returns its address.
 * The provider call carries an idempotency key, so a retried request never charges twice.
 */
export async function startCheckout(
  orderId: string,
  requestedBy: CurrentUser | null,
  kind?: Payment["kind"],
): Promise<Payment> {
  const em = await getEm();
  const order = await em.findOneOrFail(Order, { id: orderId }, { populate: ["customer"] });
  const want = kind ?? nextPaymentKind(order);
  if (!want) throw new AppError("conflict", "Nothing is owed on this order.");
  const amountCents = amountDue(order, want);
  if (amountCents <= 0) throw new AppError("conflict", "Nothing is owed on this order for that payment.");

  const open = await em.findOne(
    Payment,
    { order, kind: want, status: "open", amountCents },
    { orderBy: { createdAt: "desc" } },
  );
  if (open) return open;

  const paymentId = randomUUID();
  const label = want === "deposit" ? "Deposit" : want === "balance" ? "Balance" : "Payment";
  const session = await payments().createCheckout({
    orderId: order.id,
    orderNumber: order.number,
    paymentId,
    amountCents,
    currency: order.currency,
    description: `${label} for Yokeline order ${order.number}`,
    customerEmail: order.customer.email,
    successUrl: `${appUrl()}/orders/${order.id}?paid={CHECKOUT_SESSION_ID}`,
    cancelUrl: `${appUrl()}/orders/${order.id}?cancelled=1`,
    idempotencyKey: `checkout-${paymentId}`,
  });
  const payment = em.create(Payment, {
    id: paymentId,
    order,
    kind: want,
    amountCents,
    currency: order.currency,
    status: "open",
    checkoutSessionId: session.id,
    checkoutUrl: session.url,
    requestedBy: requestedBy ? em.getReference(User, requestedBy.id) : null,
    createdAt: new Date(),
  });
  await em.flush();
  return payment;
}

/** Asks for the balance (after final inspection): a checkout for what is owed, and an e-mail with its link. */
export async function requestBalance(orderId: string, by: CurrentUser | null): Promise<Payment> {
  const payment = await startCheckout(orderId, by, "balance");
  await inTransaction(async (em) => {
    const order = await em.findOneOrFail(Order, { id: orderId }, { populate: ["customer"] });
    em.create(OrderEvent, {
      order,
      kind: "note",
      label: `Balance of ${formatMoney(payment.amountCents, order.currency)} requested`,
      at: new Date(),
    });
    await recordAudit(
      {
        actorId: by?.id ?? null,
        action: "payment.request-balance",
        subjectType: "order",
        subjectId: order.id,
        details: { amountCents: payment.amountCents },
      },
      em,
    );
    await notifyBalanceDue(em, order, em.merge(payment));
  });
  await afterCommit();
  return payment;
}

function refreshPaymentState(order: Order): void {
  if (order.refundedCents > 0)
    order.paymentState = order.refundedCents >= order.paidCents ? "refunded" : "partially_refunded";
  else if (order.paidCents >= order.totalCents) order.paymentState = "paid";
  else order.paymentState = order.paidCents > 0 ? "deposit_paid" : "unpaid";
}

/** Records the event id first; a second delivery of the same event changes nothing. */
async function firstDelivery(em: EntityManager, event: PaymentEvent): Promise<boolean> {
  const rows = await em.getConnection().execute<{ inserted: boolean }[]>(
    `insert into webhook_event (id, type, payload, received_at, deliveries) values (?, ?, ?, now(), 1)
     on conflict (id) do update set deliveries = webhook_event.deliveries + 1
     returning (xmax = 0) as inserted`,
    [event.id, event.type === "other" ? event.providerType : event.type, JSON.stringify(event.raw)],
    "all",
    em.getTransactionContext(),
  );
  // xmax = 0 only on a freshly inserted row; an update means this event was seen before.
  return rows[0]?.inserted === true;
}

export type ApplyOutcome = "applied" | "duplicate" | "ignored";

/** Applies one verified provider event to Yokeline's records, exactly once. */
export async function applyPaymentEvent(event: PaymentEvent): Promise<ApplyOutcome> {
  const outcome = await inTransaction(async (em): Promise<ApplyOutcome> => {
    if (!(await firstDelivery(em, event))) return "duplicate";
    switch (event.type) {
      case "checkout.session.completed": {
        const payment = await em.findOne(
          Payment,
          { checkoutSessionId: event.sessionId },
          { populate: ["order", "order.customer"], lockMode: LockMode.PESSIMISTIC_WRITE },
        );
        if (!payment || !event.paid || payment.status === "succeeded") return "ignored";
        const order = payment.order;
        payment.status = "succeeded";
        payment.paymentIntentId = event.paymentIntentId;
        payment.paidAt = new Date();
        payment.failureMessage = null;
        order.paidCents += payment.amountCents;
        if (order.status === "awaiting_payment") order.status = "received";
        refreshPaymentState(order);
        const what =
          payment.kind === "deposit" ? "Deposit" : payment.kind === "balance" ? "Balance" : "Payment";
        em.create(OrderEvent, {
          order,
          kind: "paid",
          label: `${what} of ${formatMoney(payment.amountCents, order.currency)} received`,
          at: new Date(),
        });
        await recordAudit(
          {
            actorId: null,
            action: "payment.succeeded",
            subjectType: "order",
            subjectId: order.id,
            details: { paymentId: payment.id, amountCents: payment.amountCents, event: event.id },
          },
          em,
        );
        await notifyPaymentReceived(em, order, payment);
        return "applied";
      }
      case "payment_intent.payment_failed": {
        const payment = event.paymentId
          ? await em.findOne(Payment, { id: event.paymentId }, { populate: ["order"] })
          : null;
        if (!payment) return "ignored";
        payment.failureMessage = event.message;
        em.create(OrderEvent, {
          order: payment.order,
          kind: "payment_failed",
          label: `Card payment declined: ${event.message}`,
          at: new Date(),
        });
        return "applied";
      }
      case "checkout.session.expired": {
        const payment = await em.findOne(Payment, { checkoutSessionId: event.sessionId });
        if (!payment || payment.status !== "open") return "ignored";
        payment.status = "expired";
        return "applied";
      }
      case "charge.refunded": {
        const payment = event.paymentIntentId
          ? await em.findOne(
              Payment,
              { paymentIntentId: event.paymentIntentId },
              { populate: ["order"], lockMode: LockMode.PESSIMISTIC_WRITE },
            )
          : null;
        if (!payment) return "ignored";
        const missing = event.amountRefundedCents - payment.refundedCents;
        if (missing <= 0) return "ignored"; // already recorded when the owner refunded here
        const known = new Set((await em.find(Refund, { payment })).map((r) => r.providerRefundId));
        em.create(Refund, {
          payment,
          amountCents: missing,
          providerRefundId: event.refundIds.find((id) => !known.has(id)) ?? `external-${event.id}`,
          reason: "Refunded at the payment provider",
          by: null,
          createdAt: new Date(),
        });
        applyRefund(em, payment, missing, "Refunded at the payment provider");
        return "applied";
      }
      default:
        return "ignored";
    }
  });
  await afterCommit();
  if (outcome !== "duplicate") logger.info({ event: event.id, type: event.type, outcome }, "payment event");
  return outcome;
}

function applyRefund(em: EntityManager, payment: Payment, amountCents: number, reason: string): void {
  const order = payment.order;
  payment.refundedCents += amountCents;
  order.refundedCents += amountCents;
  refreshPaymentState(order);
  em.create(OrderEvent, {
    order,
    kind: "refunded",
    label: `Refund of ${formatMoney(amountCents, order.currency)}: ${reason}`,
    at: new Date(),
  });
}

/** An owner refunds part or all of a payment; recorded with who did it and why. */
export async function refundPayment(
  user: CurrentUser,
  input: { paymentId: string; amountCents: number; reason: string },
): Promise<Refund> {
  return inTransaction(async (em) => {
    const payment = await em.findOne(
      Payment,
      { id: input.paymentId },
      { populate: ["order"], lockMode: LockMode.PESSIMISTIC_WRITE },
    );
    if (!payment) throw new AppError("not_found", "No such payment.");
    if (payment.status !== "succeeded" || !payment.paymentIntentId)
      throw new AppError("conflict", "Only a completed payment can be refunded.");
    const refundable = payment.amountCents - payment.refundedCents;
    if (input.amountCents > refundable) {
      throw new AppError(
        "invalid",
        `At most ${formatMoney(refundable, payment.currency)} can be refunded on this payment.`,
        {
          amountCents: `At most ${formatMoney(refundable, payment.currency)}.`,
        },
      );
    }
    const result = await payments().refund({
      paymentIntentId: payment.paymentIntentId,
      amountCents: input.amountCents,
      reason: input.reason,
      idempotencyKey: `refund-${payment.id}-${payment.refundedCents}-${input.amountCents}`,
    });
    const refund = em.create(Refund, {
      payment,
      amountCents: result.amountCents,
      providerRefundId: result.id,
      reason: input.reason,
      by: em.getReference(User, user.id),
      createdAt: new Date(),
    });
    applyRefund(em, payment, result.amountCents, input.reason);
    await recordAudit(
      {
        actorId: user.id,
        action: "payment.refund",
        subjectType: "order",
        subjectId: payment.order.id,
        details: {
          paymentId: payment.id,
          amountCents: result.amountCents,
          reason: input.reason,
          providerRefundId: result.id,
        },
      },
      em,
    );
    return refund;
  });
}

/** How many times an event id has been delivered (0 when never seen); for tests and diagnostics. */
export async function webhookDeliveries(eventId: string): Promise<number> {
  const em = await getEm();
  return (await em.findOne(WebhookEvent, { id: eventId }))?.deliveries ?? 0;
}

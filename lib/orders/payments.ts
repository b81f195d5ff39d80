import "server-only";
import { LockMode } from "@mikro-orm/core";
import type { EntityManager } from "@mikro-orm/postgresql";
import { randomUUID } from "node:crypto";
import { Order, OrderEvent, Payment, Refund, User, WebhookEvent } from "@/entities";
import type { CurrentUser } from "@/lib/auth/guard";
import { recordAudit } from "@/lib/audit";
import { getEm, inTransaction } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import { logger } from "@/lib/logger";
import { payments } from "@/lib/payments";
import { PaymentsUnavailableError, type PaymentEvent } from "@/lib/payments/port";
import { can } from "@/lib/auth/permissions";
import { appUrl } from "@/lib/http/app-url";
import { formatMoney } from "@/lib/money";
import { releaseAfterPayment } from "@/lib/floor/hooks";
import { afterCommit, notifyBalanceDue, notifyPaymentLink, notifyPaymentReceived } from "./notify";
import { assertSignedOff } from "./engineering-signoff";

/** What a cancelled order answers to every way of paying. */
export const CANCELLED_NO_PAYMENT = "This order is cancelled; it takes no payment.";

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

/** Who may open a checkout: the owning customer (scoped by the caller), the counter and owners — not the floor. */
export function mayOpenCheckout(user: CurrentUser): boolean {
  return can(user.role, "orders.own") || can(user.role, "orders.desk");
}

const UNAVAILABLE =
  "The payment service cannot be reached just now. The order is saved; try paying again in a few minutes.";
const REFUND_UNAVAILABLE =
  "The payment service cannot be reached just now, so nothing was refunded. Try again in a few minutes.";

/** Calls the payments port, turning "provider unreachable" into a 503 the caller can show. */
async function provider<T>(call: () => Promise<T>, message = UNAVAILABLE): Promise<T> {
  try {
    return await call();
  } catch (error) {
    if (error instanceof PaymentsUnavailableError) {
      logger.warn({ err: error }, "payment provider unavailable");
      throw new AppError("unavailable", message);
    }
    throw error;
  }
}

/**
 * Locks the order's row for the rest of the transaction and loads it fresh. Every change to an
 * order's money takes this lock first, so checkouts, webhooks and refunds of one order run one
 * after the other (and always in the same lock order: order, then its payments).
 */
export async function lockOrder(em: EntityManager, orderId: string): Promise<Order> {
  const order = await em.findOneOrFail(
    Order,
    { id: orderId },
    { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true },
  );
  await em.populate(order, ["customer"]);
  return order;
}

/**
 * Opens (or reuses) the hosted checkout for the order's next payment and returns it. An order has
 * at most one open checkout: under the order's row lock, a checkout for the same kind and amount
 * is reused and any other open one is expired at the provider first. Its amount is what is owed
 * now; the provider call carries an idempotency key, so a retried request never charges twice.
 */
export async function startCheckout(
  orderId: string,
  requestedBy: CurrentUser | null,
  kind?: Payment["kind"],
): Promise<Payment> {
  if (requestedBy && !mayOpenCheckout(requestedBy))
    throw new AppError("forbidden", "Only the customer, the counter or an owner can take a payment.");
  return inTransaction(async (em) => {
    const order = await lockOrder(em, orderId);
    if (order.status === "cancelled") throw new AppError("conflict", CANCELLED_NO_PAYMENT);
    await assertSignedOff(em, order, "it can take a payment");
    const want = kind ?? nextPaymentKind(order);
    if (!want) throw new AppError("conflict", "Nothing is owed on this order.");
    if (want === "balance" && (order.paidCents === 0 || order.paidCents < order.depositCents))
      throw new AppError("conflict", "The deposit has not been paid yet; ask for the balance once it has.");
    const amountCents = amountDue(order, want);
    if (amountCents <= 0) throw new AppError("conflict", "Nothing is owed on this order for that payment.");

    const open = await em.find(Payment, { order, status: "open" }, { orderBy: { createdAt: "desc" } });
    const reuse = open.find((p) => p.kind === want && p.amountCents === amountCents);
    for (const stale of open) {
      if (stale === reuse) continue;
      const sessionId = stale.checkoutSessionId;
      const closed = sessionId ? await provider(() => payments().expireCheckout(sessionId)) : "expired";
      if (closed === "completed")
        throw new AppError(
          "conflict",
          "A payment on this order has just been made; reload to see what is still owed.",
        );
      stale.status = "expired";
    }
    if (reuse) return reuse;

    const paymentId = randomUUID();
    const label = want === "deposit" ? "Deposit" : want === "balance" ? "Balance" : "Payment";
    const session = await provider(() =>
      payments().createCheckout({
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
      }),
    );
    return em.create(Payment, {
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
  });
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

/**
 * The counter e-mails the customer a link to pay what the order asks for next (the deposit, the
 * balance or all of it): the same one open checkout per order, an outbox e-mail, a note and an audit row.
 */
export async function sendPaymentLink(orderId: string, by: CurrentUser): Promise<Payment> {
  const payment = await startCheckout(orderId, by);
  await inTransaction(async (em) => {
    const order = await em.findOneOrFail(Order, { id: orderId }, { populate: ["customer"] });
    em.create(OrderEvent, {
      order,
      kind: "note",
      label: `Payment link for ${formatMoney(payment.amountCents, order.currency)} e-mailed to ${order.customer.email}`,
      public: false,
      actor: em.getReference(User, by.id),
      at: new Date(),
    });
    await recordAudit(
      {
        actorId: by.id,
        action: "payment.link-sent",
        subjectType: "order",
        subjectId: order.id,
        details: { paymentId: payment.id, kind: payment.kind, amountCents: payment.amountCents },
      },
      em,
    );
    await notifyPaymentLink(em, order, em.merge(payment));
  });
  await afterCommit();
  return payment;
}

export function refreshPaymentState(order: Order): void {
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
  // An order whose deposit policy this payment met: released to the shop after the commit.
  let release: string | null = null;
  const outcome = await inTransaction(async (em): Promise<ApplyOutcome> => {
    release = null;
    if (!(await firstDelivery(em, event))) return "duplicate";
    switch (event.type) {
      case "checkout.session.completed": {
        const found = await em.findOne(Payment, { checkoutSessionId: event.sessionId });
        if (!found || !event.paid) return "ignored";
        const order = await lockOrder(em, found.order.id);
        const payment = await em.findOneOrFail(Payment, { id: found.id }, { refresh: true });
        if (payment.status === "succeeded") return "ignored";
        payment.status = "succeeded";
        payment.paymentIntentId = event.paymentIntentId;
        payment.paidAt = new Date();
        payment.failureMessage = null;
        // Never credit more than is still owed; a cancelled order owes nothing.
        const owed = order.status === "cancelled" ? 0 : Math.max(0, order.totalCents - order.paidCents);
        const creditCents = Math.min(payment.amountCents, owed);
        const excessCents = payment.amountCents - creditCents;
        if (creditCents > 0) {
          order.paidCents += creditCents;
          if (order.status === "awaiting_payment") order.status = "received";
          refreshPaymentState(order);
          const what =
            payment.kind === "deposit" ? "Deposit" : payment.kind === "balance" ? "Balance" : "Payment";
          em.create(OrderEvent, {
            order,
            kind: "paid",
            label: `${what} of ${formatMoney(creditCents, order.currency)} received`,
            at: new Date(),
          });
          await recordAudit(
            {
              actorId: null,
              action: "payment.succeeded",
              subjectType: "order",
              subjectId: order.id,
              details: { paymentId: payment.id, amountCents: creditCents, event: event.id },
            },
            em,
          );
          await notifyPaymentReceived(em, order, payment);
          if (order.status !== "cancelled" && order.paidCents >= order.depositCents) release = order.id;
        }
        if (excessCents > 0) {
          const why =
            order.status === "cancelled"
              ? "the order is cancelled, so the payment was returned"
              : "paid more than was still owed, so the difference was returned";
          await refundExcess(em, order, payment, excessCents, why, event.id);
        }
        return "applied";
      }
      case "payment_intent.payment_failed": {
        const payment = event.paymentId
          ? await em.findOne(Payment, { id: event.paymentId }, { populate: ["order"] })
          : null;
        // Late news of a declined attempt never touches a payment that has since succeeded.
        if (!payment || payment.status !== "open") return "ignored";
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
        const found = event.paymentIntentId
          ? await em.findOne(Payment, { paymentIntentId: event.paymentIntentId })
          : null;
        if (!found) return "ignored";
        await lockOrder(em, found.order.id);
        const payment = await em.findOneOrFail(
          Payment,
          { id: found.id },
          { refresh: true, populate: ["order"] },
        );
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
  // Never inside the payment's transaction: a failed release must not roll the payment back.
  if (release) await releaseAfterPayment(release);
  return outcome;
}

/** How a payment came in, in words. */
export function methodLabel(method: Payment["method"]): string {
  return { checkout: "card online", cash: "cash", cheque: "cheque", terminal: "card terminal" }[method];
}

export function applyRefund(em: EntityManager, payment: Payment, amountCents: number, reason: string): void {
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

/**
 * Returns money a payment brought in beyond what the order still owed (a stale checkout paid
 * late, or any payment on a cancelled order). It is refunded at the provider in the webhook's
 * transaction: if that fails, the whole event is rolled back and the provider delivers it again.
 * Only the payment's refunded amount grows; the order never counted the excess as paid.
 */
async function refundExcess(
  em: EntityManager,
  order: Order,
  payment: Payment,
  amountCents: number,
  why: string,
  eventId: string,
): Promise<void> {
  const label = `Refund of ${formatMoney(amountCents, order.currency)}: ${why}`;
  if (!payment.paymentIntentId) {
    // Cannot happen with a hosted card checkout; leave a trace for the owner instead of guessing.
    logger.error({ payment: payment.id, amountCents }, "excess payment without a payment intent");
    em.create(OrderEvent, { order, kind: "note", label: `${label} (to be refunded by hand)`, public: false });
    await recordAudit(
      {
        actorId: null,
        action: "payment.excess-unrefunded",
        subjectType: "order",
        subjectId: order.id,
        details: { paymentId: payment.id, amountCents, event: eventId },
      },
      em,
    );
    return;
  }
  const paymentIntentId = payment.paymentIntentId;
  const result = await payments().refund({
    paymentIntentId,
    amountCents,
    reason: why,
    idempotencyKey: `excess-${payment.id}`,
  });
  em.create(Refund, {
    payment,
    amountCents: result.amountCents,
    providerRefundId: result.id,
    reason: why,
    by: null,
    createdAt: new Date(),
  });
  payment.refundedCents += result.amountCents;
  em.create(OrderEvent, { order, kind: "refunded", label, at: new Date() });
  await recordAudit(
    {
      actorId: null,
      action: "payment.excess-refunded",
      subjectType: "order",
      subjectId: order.id,
      details: {
        paymentId: payment.id,
        amountCents: result.amountCents,
        providerRefundId: result.id,
        reason: why,
        event: eventId,
      },
    },
    em,
  );
}

/** An owner refunds part or all of a payment; recorded with who did it and why. */
export async function refundPayment(
  user: CurrentUser,
  input: { paymentId: string; amountCents: number; reason: string },
): Promise<Refund> {
  return inTransaction(async (em) => {
    const found = await em.findOne(Payment, { id: input.paymentId });
    if (!found) throw new AppError("not_found", "No such payment.");
    await lockOrder(em, found.order.id);
    const payment = await em.findOneOrFail(Payment, { id: found.id }, { refresh: true, populate: ["order"] });
    const byHand = payment.method !== "checkout";
    if (payment.status !== "succeeded" || (!byHand && !payment.paymentIntentId))
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
    // A payment taken at the counter is given back by hand (cash, cheque, the terminal): recorded, no provider call.
    const paymentIntentId = payment.paymentIntentId ?? "";
    const result = byHand
      ? { id: null, amountCents: input.amountCents }
      : await provider(
          () =>
            payments().refund({
              paymentIntentId,
              amountCents: input.amountCents,
              reason: input.reason,
              idempotencyKey: `refund-${payment.id}-${payment.refundedCents}-${input.amountCents}`,
            }),
          REFUND_UNAVAILABLE,
        );
    const refund = em.create(Refund, {
      payment,
      amountCents: result.amountCents,
      providerRefundId: result.id,
      reason: input.reason,
      by: em.getReference(User, user.id),
      createdAt: new Date(),
    });
    applyRefund(
      em,
      payment,
      result.amountCents,
      byHand ? `${input.reason} (${methodLabel(payment.method)} refunded by hand)` : input.reason,
    );
    await recordAudit(
      {
        actorId: user.id,
        action: byHand ? "payment.refund-recorded" : "payment.refund",
        subjectType: "order",
        subjectId: payment.order.id,
        details: {
          paymentId: payment.id,
          amountCents: result.amountCents,
          reason: input.reason,
          providerRefundId: result.id,
          method: payment.method,
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

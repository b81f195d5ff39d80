import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import { OrderEvent, Payment, Refund, User, WorkOrder, type Order } from "@/entities";
import type { CurrentUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { recordAudit } from "@/lib/audit";
import { inTransaction } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import { logger } from "@/lib/logger";
import { payments } from "@/lib/payments";
import { PaymentsUnavailableError } from "@/lib/payments/port";
import { formatMoney } from "@/lib/money";
import { getShopEngineering } from "@/lib/shop/config";
import { afterCommit, notifyOrderCancelled } from "./notify";
import { applyRefund, lockOrder, methodLabel } from "./payments";

/** What cancelling an order now would give back, per the shop's cancellation policy. */
export interface CancellationQuote {
  /** Paid and not yet refunded. */
  paidCents: number;
  /** The share of the deposit the shop keeps (price book `cancellationFeePercent`), never more than was paid. */
  feeCents: number;
  feePercent: number;
  refundCents: number;
  /** Released to the shop: only an owner may cancel. */
  released: boolean;
}

/**
 * The refund on cancellation: everything paid (less earlier refunds) minus the kept fee, the fee
 * being `feePercent` of the deposit the order asked for, capped at what was paid.
 */
export function cancellationRefund(
  order: Pick<Order, "paidCents" | "refundedCents" | "depositCents">,
  feePercent: number,
): { paidCents: number; feeCents: number; refundCents: number } {
  const paidCents = Math.max(0, order.paidCents - order.refundedCents);
  const feeCents = Math.min(paidCents, Math.round((order.depositCents * feePercent) / 100));
  return { paidCents, feeCents, refundCents: paidCents - feeCents };
}

async function quoteFor(em: EntityManager, order: Order): Promise<CancellationQuote> {
  const [{ priceBook }, released] = await Promise.all([
    getShopEngineering(),
    em.count(WorkOrder, { order: order.id }),
  ]);
  const feePercent = priceBook.cancellationFeePercent;
  return { ...cancellationRefund(order, feePercent), feePercent, released: released > 0 };
}

/** For the confirmation dialog: what a cancellation would refund now (null when it cannot be cancelled). */
export async function cancellationQuote(em: EntityManager, order: Order): Promise<CancellationQuote | null> {
  if (order.status === "cancelled" || order.status === "shipped") return null;
  return quoteFor(em, order);
}

async function provider<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (error) {
    if (error instanceof PaymentsUnavailableError) {
      logger.warn({ err: error }, "payment provider unavailable during a cancellation");
      throw new AppError(
        "unavailable",
        "The payment service cannot be reached just now, so the order was not cancelled. Try again in a few minutes.",
      );
    }
    throw error;
  }
}

/**
 * Cancels an order with a reason. Before release the counter or an owner may; after release only
 * an owner (its travellers are voided: the floor's codes are refused). Under the order's row lock:
 * open checkouts are closed, the refund per the shop's policy (paid − the kept share of the
 * deposit) goes back through the provider for card payments and is recorded for counter payments
 * (given back by hand), newest payment first. Audited; the customer is e-mailed.
 */
export async function cancelOrder(
  user: CurrentUser,
  input: { orderId: string; reason: string },
): Promise<{ refundCents: number; feeCents: number }> {
  if (!can(user.role, "orders.desk"))
    throw new AppError("forbidden", "Only the counter or an owner can cancel an order.");
  const reason = input.reason.trim();
  const result = await inTransaction(async (em) => {
    const order = await lockOrder(em, input.orderId);
    if (order.status === "cancelled")
      throw new AppError("conflict", `Order ${order.number} is already cancelled.`);
    if (order.status === "shipped")
      throw new AppError("conflict", `Order ${order.number} has left the shop; it cannot be cancelled.`);
    const quote = await quoteFor(em, order);
    if (quote.released && !can(user.role, "orders.cancel-released"))
      throw new AppError(
        "forbidden",
        `Order ${order.number} is released to the shop: only an owner can cancel it now.`,
      );
    const before = {
      status: order.status,
      paymentState: order.paymentState,
      paidCents: order.paidCents,
      refundedCents: order.refundedCents,
    };
    const by = em.getReference(User, user.id);
    const now = new Date();

    // No payment is taken from here on: close the open checkouts (a late one is refunded by the webhook).
    for (const open of await em.find(Payment, { order: order.id, status: "open" })) {
      if (open.checkoutSessionId) {
        const sessionId = open.checkoutSessionId;
        await provider(() => payments().expireCheckout(sessionId));
      }
      open.status = "expired";
    }

    const refundNote = `Order cancelled: ${reason}`;
    let left = quote.refundCents;
    const refunds: {
      paymentId: string;
      method: Payment["method"];
      amountCents: number;
      providerRefundId: string | null;
    }[] = [];
    const paid = await em.find(
      Payment,
      { order: order.id, status: "succeeded" },
      { orderBy: { paidAt: "desc", createdAt: "desc" }, populate: ["order"] },
    );
    for (const payment of paid) {
      if (left <= 0) break;
      const amountCents = Math.min(left, payment.amountCents - payment.refundedCents);
      if (amountCents <= 0) continue;
      let providerRefundId: string | null = null;
      if (payment.method === "checkout") {
        const paymentIntentId = payment.paymentIntentId;
        if (!paymentIntentId) continue;
        const done = await provider(() =>
          payments().refund({
            paymentIntentId,
            amountCents,
            reason: refundNote,
            idempotencyKey: `cancel-${payment.id}-${payment.refundedCents}-${amountCents}`,
          }),
        );
        providerRefundId = done.id;
      }
      em.create(Refund, {
        payment,
        amountCents,
        providerRefundId,
        reason: refundNote,
        by,
        createdAt: now,
      });
      applyRefund(
        em,
        payment,
        amountCents,
        payment.method === "checkout"
          ? "order cancelled"
          : `order cancelled (${methodLabel(payment.method)} given back by hand)`,
      );
      refunds.push({ paymentId: payment.id, method: payment.method, amountCents, providerRefundId });
      left -= amountCents;
    }
    if (left > 0) {
      // Cannot happen while payments add up to what the order counts as paid; leave a trace, refund nothing silently.
      logger.error({ order: order.id, left }, "cancellation refund could not be placed on a payment");
      throw new AppError(
        "conflict",
        "The order's payments do not add up to what it counts as paid; ask an owner.",
      );
    }

    const voided = await em.find(WorkOrder, { order: order.id, voidedAt: null });
    for (const wo of voided) {
      wo.voidedAt = now;
      wo.voidReason = `Order cancelled: ${reason}`;
    }
    order.status = "cancelled";
    order.cancelledAt = now;
    order.cancelReason = reason;
    em.create(OrderEvent, { order, kind: "cancelled", label: `Cancelled: ${reason}`, actor: by, at: now });
    await recordAudit(
      {
        actorId: user.id,
        action: "order.cancel",
        subjectType: "order",
        subjectId: order.id,
        details: {
          reason,
          feePercent: quote.feePercent,
          feeCents: quote.feeCents,
          refundCents: quote.refundCents,
          refunds,
          voidedWorkOrders: voided.map((w) => w.serial),
          before,
          after: {
            status: order.status,
            paymentState: order.paymentState,
            paidCents: order.paidCents,
            refundedCents: order.refundedCents,
          },
        },
      },
      em,
    );
    const methods = new Set(refunds.map((r) => r.method));
    const refundHow =
      methods.size === 0
        ? null
        : [...methods].every((m) => m === "checkout")
          ? "to the card you paid with"
          : "the way you paid (the shop will arrange it with you)";
    await notifyOrderCancelled(
      em,
      order,
      { paidCents: quote.paidCents, feeCents: quote.feeCents, refundCents: quote.refundCents, refundHow },
      reason,
    );
    return { refundCents: quote.refundCents, feeCents: quote.feeCents, currency: order.currency };
  });
  await afterCommit();
  logger.info(
    { order: input.orderId, refund: formatMoney(result.refundCents, result.currency) },
    "order cancelled",
  );
  return { refundCents: result.refundCents, feeCents: result.feeCents };
}

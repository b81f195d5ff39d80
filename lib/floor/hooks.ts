/**
 * What happens on the floor's milestones, inside the transaction that reached them. Today: the
 * order's status and its public timeline. The wiring still to come goes here too (marked TODO):
 * the balance request per the shop's policy and the "ready" e-mail on final inspection, the
 * "shipped" e-mail with the tracking number on dispatch (lib/orders/notify.ts, afterCommit()).
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import { OrderEvent, WorkOrder, type Order, type StepRecord, type WorkOrderStep } from "@/entities";

export interface Milestone {
  order: Order;
  workOrder: WorkOrder;
  record: StepRecord;
}

/** States of every shaft of the order, with the one just changed as it is now (not yet flushed). */
async function shaftStates(em: EntityManager, m: Milestone) {
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

/** Final inspection passed: the order is ready once every shaft is. */
export async function onFinalInspectionPassed(em: EntityManager, m: Milestone): Promise<void> {
  const states = await shaftStates(em, m);
  if (
    states.every((s) => s === "ready" || s === "shipped" || s === "picked_up") &&
    m.order.status === "in_shop"
  ) {
    m.order.status = "ready";
    em.persist(
      em.create(OrderEvent, { order: m.order, kind: "ready", label: "Ready", public: true, at: m.record.at }),
    );
    // TODO(wiring): request the balance per the shop's policy; queue the "your shaft is ready" e-mail.
  }
}

/** A shaft shipped or picked up: the order is shipped once every shaft has left. */
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
  if (states.every((s) => s === "shipped" || s === "picked_up")) {
    m.order.status = "shipped";
    // TODO(wiring): queue the "shipped" e-mail with the carrier and tracking number.
  }
}

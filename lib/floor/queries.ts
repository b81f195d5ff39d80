import "server-only";
/**
 * Read models for the floor's screens (plain objects, not entities): the work queue and a shaft's
 * as-built record.
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import { StepRecord, WorkOrder, WorkOrderStep } from "@/entities";
import type { StepOutcome, WorkOrderState } from "@/lib/floor/states";
import type { Failure, SiValues } from "@/lib/traveller/measure";
import type { StepSpec } from "@/lib/traveller/steps";
import { findWorkOrderBySerial } from "./work-orders";
import { retubeView } from "@/lib/orders/queries";
import type { RetubeView } from "@/lib/orders/views";

export interface QueueItem {
  workOrderId: string;
  serial: string;
  revision: number;
  state: WorkOrderState;
  orderId: string;
  orderNumber: string;
  customerName: string;
  promisedDate: string;
  shaftName: string;
  next: { position: number; code: string; name: string } | null;
  stepCount: number;
  /** Why it is on hold: the step and its failed values with their limits. */
  hold: { step: string; failures: Failure[]; at: Date } | null;
}

/** Every shaft still in the shop (not shipped or picked up), earliest promised date first. */
export async function workQueue(em: EntityManager): Promise<QueueItem[]> {
  const wos = await em.find(
    WorkOrder,
    { state: { $nin: ["shipped", "picked_up"] } },
    {
      populate: ["order", "order.customer", "orderShaft"],
      orderBy: { order: { promisedDate: "asc" }, serialSequence: "asc" },
    },
  );
  if (!wos.length) return [];
  const steps = await em.find(WorkOrderStep, {
    $or: wos.map((w) => ({ workOrder: w.id, revision: w.revision })),
  });
  const heldIds = steps.filter((s) => s.state === "on_hold").map((s) => s.id);
  const holds = heldIds.length
    ? await em.find(StepRecord, { step: { $in: heldIds }, outcome: "hold" }, { orderBy: { at: "desc" } })
    : [];
  return wos.map((w) => {
    const mine = steps.filter((s) => s.workOrder.id === w.id);
    const next = mine.find((s) => s.position === w.currentPosition);
    const held = mine.find((s) => s.state === "on_hold");
    const hold = held ? holds.find((h) => h.step.id === held.id) : undefined;
    return {
      workOrderId: w.id,
      serial: w.serial,
      revision: w.revision,
      state: w.state,
      orderId: w.order.id,
      orderNumber: w.order.number,
      customerName: w.order.customer.name,
      promisedDate: w.order.promisedDate,
      shaftName: w.orderShaft.name,
      next: next ? { position: next.position, code: next.code, name: next.spec.name } : null,
      stepCount: w.stepCount,
      hold: held && hold ? { step: held.spec.name, failures: hold.failures ?? [], at: hold.at } : null,
    };
  });
}

export interface AsBuiltRecord {
  serial: string;
  revision: number;
  state: WorkOrderState;
  orderId: string;
  orderNumber: string;
  customerId: string;
  shaft: { name: string; application: { description: string; use: string } | null };
  /** A re-tube of the customer's shaft: the counter's intake (null for a new shaft). */
  retube: RetubeView | null;
  /** The frozen design and evaluation the shaft was built to. */
  design: Record<string, unknown>;
  evaluation: Record<string, unknown>;
  steps: {
    position: number;
    code: string;
    spec: StepSpec;
    state: WorkOrderStep["state"];
    completion: WorkOrderStep["completion"];
    completedAt: Date | null;
    records: {
      outcome: StepOutcome;
      values: SiValues;
      failures: Failure[];
      reason: string | null;
      byName: string | null;
      at: Date;
    }[];
  }[];
  /** Revisions replaced after a design change, newest first. */
  voidRevisions: number[];
}

/** The serials of an order's shafts, in order (links to their as-built records). */
export async function orderShaftSerials(em: EntityManager, orderId: string): Promise<string[]> {
  const wos = await em.find(WorkOrder, { order: orderId }, { orderBy: { serialSequence: "asc" } });
  return wos.map((w) => w.serial);
}

/** Whether a shaft with this (parsed) serial exists: the find-a-shaft form's answer. */
export async function shaftExists(em: EntityManager, serial: string): Promise<boolean> {
  return (await em.count(WorkOrder, { serial })) > 0;
}

/** Everything measured on one shaft (found by its serial), in routing order, for its revision in force. */
export async function asBuiltRecord(em: EntityManager, serial: string): Promise<AsBuiltRecord> {
  const found = await findWorkOrderBySerial(em, serial);
  const wo = await em.findOneOrFail(WorkOrder, { id: found.id }, { populate: ["order", "orderShaft"] });
  const [steps, records] = await Promise.all([
    em.find(WorkOrderStep, { workOrder: wo.id, revision: wo.revision }, { orderBy: { position: "asc" } }),
    em.find(
      StepRecord,
      { workOrder: wo.id, revision: wo.revision },
      { populate: ["by"], orderBy: { at: "asc" } },
    ),
  ]);
  return {
    serial: wo.serial,
    revision: wo.revision,
    state: wo.state,
    orderId: wo.order.id,
    orderNumber: wo.order.number,
    customerId: wo.order.customer.id,
    shaft: { name: wo.orderShaft.name, application: wo.orderShaft.application ?? null },
    retube: wo.orderShaft.job === "retube" ? retubeView(wo.orderShaft.repair) : null,
    design: wo.orderShaft.design,
    evaluation: wo.orderShaft.evaluation,
    steps: steps.map((s) => ({
      position: s.position,
      code: s.code,
      spec: s.spec,
      state: s.state,
      completion: s.completion ?? null,
      completedAt: s.completedAt ?? null,
      records: records
        .filter((r) => r.step.id === s.id)
        .map((r) => ({
          outcome: r.outcome,
          values: r.values,
          failures: r.failures ?? [],
          reason: r.reason ?? null,
          byName: r.by?.name ?? null,
          at: r.at,
        })),
    })),
    voidRevisions: Array.from({ length: wo.revision - 1 }, (_, i) => wo.revision - 1 - i),
  };
}

import "server-only";
/**
 * The shop floor's service: releasing orders into work orders, signing off steps with measured
 * values, holds and concessions, void-and-reissue, and the order's floor state. Each function
 * runs in one transaction and locks the work order row it changes, so two stations submitting the
 * same step at the same instant record one completion.
 */
import { LockMode, UniqueConstraintViolationException } from "@mikro-orm/core";
import type { EntityManager } from "@mikro-orm/postgresql";
import { Order, OrderEvent, OrderShaft, Shop, StepRecord, User, WorkOrder, WorkOrderStep } from "@/entities";
import type { StepOutcome, WorkOrderState } from "@/lib/floor/states";
import { AccessError, type CurrentUser } from "@/lib/auth/access";
import { can, type Permission } from "@/lib/auth/permissions";
import { recordAudit } from "@/lib/audit";
import { getEm, inTransaction } from "@/lib/db/orm";
import type { EvaluationReport } from "@/lib/driveline/report";
import { AppError } from "@/lib/http/errors";
import { getShopEngineering } from "@/lib/shop/config";
import { formatSerial, parseSerial, parseStepCode } from "@/lib/traveller/codes";
import { checkMeasurements, type Failure, type SiValues } from "@/lib/traveller/measure";
import type { FloorSettings } from "@/lib/traveller/settings";
import { deriveSteps, missingForRouting, type StepSpec } from "@/lib/traveller/steps";
import { buildTravellerView, type TravellerView } from "@/lib/traveller/view";
import { acceptedExceptions, assertSignedOff } from "@/lib/orders/engineering-signoff";
import { reusedParts, RETUBE_PART_LABEL, type RepairBlock } from "@/lib/retube/intake";
import {
  newAfterCommit,
  onFinalInspectionPassed,
  onReissued,
  onShaftDispatched,
  onStepCompleted,
  resetAfterCommit,
  runAfterCommit,
  type AfterCommit,
} from "./hooks";

function ensure(by: CurrentUser, permission: Permission): void {
  if (!can(by.role, permission)) throw new AccessError(403);
}

const userRef = (em: EntityManager, by: CurrentUser) => em.getReference(User, by.id);

async function stepsFor(em: EntityManager, wo: WorkOrder, revision = wo.revision): Promise<WorkOrderStep[]> {
  return em.find(WorkOrderStep, { workOrder: wo.id, revision }, { orderBy: { position: "asc" } });
}

function specsFor(shaft: OrderShaft, order: Order, floor: FloorSettings): StepSpec[] {
  return deriveSteps({
    report: shaft.evaluation as unknown as EvaluationReport,
    fulfilment: order.fulfilment,
    floor,
    // A re-tube starts with teardown and inspection, and is cut to the customer's weld-to-weld.
    repair: retubeIntakeOf(shaft),
  });
}

/** A re-tube's intake, or null for a new shaft. */
function retubeIntakeOf(shaft: OrderShaft): RepairBlock | null {
  return shaft.job === "retube" ? shaft.repair : null;
}

function addSteps(em: EntityManager, wo: WorkOrder, specs: StepSpec[]): void {
  for (const spec of specs) {
    em.persist(
      em.create(WorkOrderStep, {
        workOrder: wo,
        revision: wo.revision,
        position: spec.position,
        code: spec.code,
        spec,
      }),
    );
  }
}

export interface ReleaseResult {
  orderId: string;
  workOrders: { id: string; serial: string; shaftId: string; stepCount: number }[];
}

/**
 * Releases an order to the shop: each shaft becomes a work order with a new serial and the
 * shop's routing. Staff only. Without the deposit paid a reason is required (a release by hand);
 * an order is released once.
 */
export async function releaseOrder(
  orderId: string,
  by: CurrentUser,
  reason?: string | null,
): Promise<ReleaseResult> {
  ensure(by, "orders.desk");
  return release(orderId, by, reason?.trim() || null);
}

/**
 * The automatic release, for the payments wiring to call once the deposit policy is met (after
 * the payment's transaction commits). No actor; does nothing (null) when the order is already
 * released, cancelled or not yet paid.
 */
export async function releaseOrderOnDeposit(orderId: string): Promise<ReleaseResult | null> {
  try {
    return await release(orderId, null, null);
  } catch (error) {
    if (error instanceof UnroutableOrderError) throw error; // not a quiet "not now": the desk must look
    if (error instanceof AppError && (error.code === "conflict" || error.code === "invalid")) return null;
    throw error;
  }
}

/**
 * An order whose stored evaluation lacks what the routing reads (e.g. its `shopFloor` tolerances):
 * nothing is released, and the message names the order, the shaft and what is missing.
 */
export class UnroutableOrderError extends AppError {
  /** E.g. "shaft 1's stored evaluation has no shopFloor". */
  readonly detail: string;

  constructor(
    readonly orderNumber: string,
    readonly missing: { shaft: number; parts: string[] }[],
  ) {
    const detail = missing
      .map((m) => `shaft ${m.shaft}'s stored evaluation has no ${m.parts.join(", ")}`)
      .join("; ");
    super("conflict", `Order ${orderNumber} cannot be released to the shop: ${detail}.`);
    this.detail = detail;
  }
}

async function release(orderId: string, by: CurrentUser | null, note: string | null): Promise<ReleaseResult> {
  const shop = await getShopEngineering();
  return inTransaction(async (em) => {
    const order = await em.findOne(Order, { id: orderId }, { lockMode: LockMode.PESSIMISTIC_WRITE });
    if (!order) throw new AppError("not_found", "No such order.");
    if (order.status === "cancelled") throw new AppError("conflict", `Order ${order.number} is cancelled.`);
    if ((await em.count(WorkOrder, { order: order.id })) > 0) {
      throw new AppError("conflict", `Order ${order.number} is already released to the shop.`);
    }
    await assertSignedOff(em, order, "it can be released to the shop");
    if (order.paymentState === "unpaid" && !note) {
      throw new AppError("invalid", "The deposit is not paid: give a reason to release by hand.", {
        reason: "required when the deposit is not paid",
      });
    }
    const shafts = await em.find(OrderShaft, { order: order.id }, { orderBy: { position: "asc" } });
    if (!shafts.length) throw new AppError("conflict", `Order ${order.number} has no shafts.`);
    const unroutable = shafts
      .map((s) => ({ shaft: s.position, parts: missingForRouting(s.evaluation) }))
      .filter((m) => m.parts.length > 0);
    if (unroutable.length) throw new UnroutableOrderError(order.number, unroutable);

    // Serials run per year; one release at a time takes the next numbers.
    const year = new Date().getUTCFullYear();
    await em.execute("select pg_advisory_xact_lock(hashtext('yokeline.work_order.serial'))");
    const [top] = await em.execute<{ max: number | null }[]>(
      "select max(serial_sequence) as max from work_order where serial_year = ?",
      [year],
    );
    let sequence = Number(top?.max ?? 0);
    const made: WorkOrder[] = [];
    for (const shaft of shafts) {
      sequence += 1;
      const specs = specsFor(shaft, order, shop.floor);
      const wo = em.create(WorkOrder, {
        order,
        orderShaft: shaft,
        serial: formatSerial({ shopCode: shop.floor.shopCode, year, sequence }),
        serialYear: year,
        serialSequence: sequence,
        stepCount: specs.length,
        releasedBy: by ? userRef(em, by) : null,
        releaseReason: note,
      });
      addSteps(em, wo, specs);
      made.push(wo);
    }
    if (order.status === "awaiting_payment" || order.status === "received") order.status = "in_shop";
    em.persist(
      em.create(OrderEvent, {
        order,
        kind: "step",
        label: shafts.some((s) => s.job === "retube")
          ? "Released to the shop: your shaft is taken apart and its parts inspected first"
          : "Released to the shop",
        actor: by ? userRef(em, by) : null,
        public: true,
      }),
    );
    await recordAudit(
      {
        actorId: by?.id ?? null,
        action: "order.release",
        subjectType: "order",
        subjectId: order.id,
        details: { reason: note, serials: made.map((w) => w.serial), paymentState: order.paymentState },
      },
      em,
    );
    await em.flush();
    return {
      orderId: order.id,
      workOrders: made.map((w) => ({
        id: w.id,
        serial: w.serial,
        shaftId: w.orderShaft.id,
        stepCount: w.stepCount,
      })),
    };
  });
}

export interface StepResult {
  outcome: StepOutcome;
  serial: string;
  step: { position: number; code: string; name: string };
  workOrderState: WorkOrderState;
  /** The step to scan next (null once the shaft has left the shop). */
  next: { position: number; code: string; name: string } | null;
  values: SiValues;
  failures: Failure[];
  recordId: string;
  /** True when this call repeated an earlier submission with the same key (nothing new was recorded). */
  replayed: boolean;
}

function nextStep(wo: WorkOrder, steps: WorkOrderStep[]): StepResult["next"] {
  const s = steps.find((x) => x.position === wo.currentPosition);
  return s ? { position: s.position, code: s.code, name: s.spec.name } : null;
}

function result(
  wo: WorkOrder,
  step: WorkOrderStep,
  steps: WorkOrderStep[],
  record: StepRecord,
  replayed: boolean,
): StepResult {
  return {
    outcome: record.outcome,
    serial: wo.serial,
    step: { position: step.position, code: step.code, name: step.spec.name },
    workOrderState: wo.state,
    next: nextStep(wo, steps),
    values: record.values,
    failures: record.failures ?? [],
    recordId: record.id,
    replayed,
  };
}

/** Loads and locks the work order a code names, refusing void revisions and unknown codes. */
/** A scanned code must be of the shaft's current traveller: an older revision is void (409). */
export function assertCurrentRevision(wo: { serial: string; revision: number }, revision: number): void {
  if (revision < wo.revision) {
    throw new AppError(
      "conflict",
      `This traveller is void: ${wo.serial} revision ${revision} was replaced by revision ${wo.revision} after the design changed. Scan the revision ${wo.revision} traveller.`,
    );
  }
  if (revision > wo.revision) {
    throw new AppError(
      "not_found",
      `${wo.serial} has no revision ${revision} (the current one is ${wo.revision}).`,
    );
  }
}

/** A work order of a cancelled order: every code of its traveller is refused. */
export function assertNotVoided(wo: {
  serial: string;
  /** An entity's Date, or a raw row's timestamp text: only whether it is set matters. */
  voidedAt?: Date | string | null;
  voidReason?: string | null;
}): void {
  if (wo.voidedAt)
    throw new AppError(
      "conflict",
      `This traveller is void: ${wo.serial} — ${wo.voidReason ?? "the order was cancelled"}. Do not work on this shaft.`,
    );
}

async function lockForCode(em: EntityManager, code: string) {
  const parsed = parseStepCode(code);
  if (!parsed.ok) throw new AppError("invalid", parsed.message, { code: parsed.message });
  const wo = await em.findOne(WorkOrder, { serial: parsed.serial }, { lockMode: LockMode.PESSIMISTIC_WRITE });
  if (!wo) throw new AppError("not_found", `No shaft with serial ${parsed.serial}.`);
  assertCurrentRevision(wo, parsed.revision);
  assertNotVoided(wo);
  const steps = await stepsFor(em, wo);
  const step = steps.find((s) => s.code === parsed.step);
  if (!step) throw new AppError("not_found", `${wo.serial} has no step ${parsed.step}.`);
  return { wo, steps, step };
}

/** Marks `step` done and moves the work order on; runs the hooks for the milestones reached. */
async function complete(
  em: EntityManager,
  wo: WorkOrder,
  step: WorkOrderStep,
  steps: WorkOrderStep[],
  record: StepRecord,
  completion: "pass" | "rework" | "concession",
  by: CurrentUser,
  after: AfterCommit,
): Promise<void> {
  step.state = "done";
  step.completion = completion;
  step.completedAt = record.at;
  step.completedBy = userRef(em, by);
  record.completionOf = step.id;
  wo.currentPosition = step.position + 1;
  const order = await em.findOneOrFail(Order, { id: wo.order.id });
  const fulfilled = steps.some((s) => s.spec.kind === "dispatch" && s.position <= step.position);
  const inspected = steps.some((s) => s.spec.kind === "final-inspection" && s.position <= step.position);
  if (wo.currentPosition > wo.stepCount || fulfilled) {
    wo.state = order.fulfilment === "ship" ? "shipped" : "picked_up";
  } else wo.state = inspected ? "ready" : "in_shop";
  const m = { order, workOrder: wo, record, after };
  await onStepCompleted(em, { ...m, step });
  if (step.spec.kind === "final-inspection") await onFinalInspectionPassed(em, m);
  if (step.spec.kind === "dispatch") await onShaftDispatched(em, m);
}

async function replay(em: EntityManager, key: string) {
  return em.findOne(StepRecord, { idempotencyKey: key }, { populate: ["step", "workOrder"] });
}

/**
 * Signs off one step from its scanned code with the values measured (in the shop's units).
 * In limit → pass (or rework, when it clears a hold) and the shaft moves on; out of limit → hold,
 * listing each failed value with its limit. Steps run in routing order. The same
 * `idempotencyKey` always answers the first result without recording again.
 */
export async function submitStep(
  code: string,
  values: Record<string, unknown>,
  by: CurrentUser,
  idempotencyKey: string,
): Promise<StepResult> {
  ensure(by, "floor.scan");
  const key = idempotencyKey.trim();
  if (!key || key.length > 200)
    throw new AppError("invalid", "A submission key (1–200 characters) is required.");
  const shop = await getShopEngineering();
  const after = newAfterCommit();
  try {
    const out = await inTransaction(async (em) => {
      resetAfterCommit(after);
      const { wo, steps, step } = await lockForCode(em, code);
      const earlier = await replay(em, key);
      if (earlier) {
        if (earlier.step.id !== step.id)
          throw new AppError("conflict", "This submission key was used for another step.");
        return result(wo, step, steps, earlier, true);
      }
      if (wo.state === "shipped" || wo.state === "picked_up") {
        throw new AppError("conflict", `${wo.serial} has left the shop; nothing more to sign off.`);
      }
      if (step.position !== wo.currentPosition) {
        const next = nextStep(wo, steps);
        const where = next ? `Next for ${wo.serial} is step ${next.position}: ${next.name}.` : "";
        throw new AppError(
          "conflict",
          step.position < wo.currentPosition
            ? `${step.spec.name} is already signed off. ${where}`
            : `${step.spec.name} is not next. ${where}`,
        );
      }
      const checked = checkMeasurements(step.spec, values, shop.floor.units);
      if (checked.outcome === "invalid") {
        throw new AppError(
          "invalid",
          checked.issues.map((i) => i.message).join("; "),
          Object.fromEntries(checked.issues.map((i) => [i.path, i.message])),
        );
      }
      const wasOnHold = step.state === "on_hold";
      const outcome: StepOutcome = checked.outcome === "hold" ? "hold" : wasOnHold ? "rework" : "pass";
      const record = em.create(StepRecord, {
        workOrder: wo,
        step,
        revision: wo.revision,
        by: userRef(em, by),
        values: checked.values,
        outcome,
        failures: checked.outcome === "hold" ? checked.failures : null,
        idempotencyKey: key,
        at: new Date(),
      });
      if (checked.outcome === "hold") {
        step.state = "on_hold";
        wo.state = "on_hold";
        em.persist(
          em.create(OrderEvent, {
            order: wo.order,
            kind: "note",
            label: `${wo.serial} on hold at ${step.spec.name}: ${checked.failures.map((f) => f.message).join("; ")}`,
            public: false,
            actor: userRef(em, by),
          }),
        );
      } else {
        await complete(em, wo, step, steps, record, outcome as "pass" | "rework", by, after);
      }
      await em.flush();
      return result(wo, step, steps, record, false);
    });
    await runAfterCommit(after);
    return out;
  } catch (error) {
    // A parallel submission with the same key won the race: answer its result.
    if (error instanceof UniqueConstraintViolationException) {
      const em = await getEm();
      const earlier = await replay(em, key);
      if (earlier) {
        const wo = await em.findOneOrFail(WorkOrder, { id: earlier.workOrder.id });
        return result(wo, earlier.step, await stepsFor(em, wo, earlier.revision), earlier, true);
      }
      throw new AppError("conflict", "This step was signed off by another station at the same moment.");
    }
    throw error;
  }
}

/**
 * An owner accepts the held step as it is (a concession), with a reason: the step is done and
 * the shaft moves on. Audited.
 */
export async function concedeHold(workOrderId: string, by: CurrentUser, reason: string): Promise<StepResult> {
  ensure(by, "shop.manage");
  const why = reason.trim();
  if (!why) throw new AppError("invalid", "A concession needs a reason.", { reason: "required" });
  const after = newAfterCommit();
  const out = await inTransaction(async (em) => {
    resetAfterCommit(after);
    const wo = await em.findOne(WorkOrder, { id: workOrderId }, { lockMode: LockMode.PESSIMISTIC_WRITE });
    if (!wo) throw new AppError("not_found", "No such work order.");
    const steps = await stepsFor(em, wo);
    const step = steps.find((s) => s.state === "on_hold");
    if (wo.state !== "on_hold" || !step) throw new AppError("conflict", `${wo.serial} is not on hold.`);
    const hold = await em.findOneOrFail(
      StepRecord,
      { step: step.id, outcome: "hold" },
      { orderBy: { at: "desc" } },
    );
    const record = em.create(StepRecord, {
      workOrder: wo,
      step,
      revision: wo.revision,
      by: userRef(em, by),
      values: hold.values,
      outcome: "concession",
      failures: hold.failures,
      reason: why,
      idempotencyKey: `concession:${step.id}`,
      at: new Date(),
    });
    await complete(em, wo, step, steps, record, "concession", by, after);
    await recordAudit(
      {
        actorId: by.id,
        action: "floor.concession",
        subjectType: "work_order",
        subjectId: wo.id,
        details: {
          serial: wo.serial,
          step: step.code,
          revision: wo.revision,
          reason: why,
          failures: hold.failures,
        },
      },
      em,
    );
    await em.flush();
    return result(wo, step, steps, record, false);
  });
  await runAfterCommit(after);
  return out;
}

/**
 * After the design changed: the traveller in force is void (its codes are refused) and a new
 * revision is issued from the order shaft's current frozen design and evaluation. The shaft
 * starts the routing again under the new revision; earlier records stay in its history.
 */
export async function voidAndReissue(
  workOrderId: string,
  by: CurrentUser,
  reason: string,
): Promise<{ serial: string; revision: number }> {
  ensure(by, "orders.desk");
  const why = reason.trim();
  if (!why) throw new AppError("invalid", "Say why the traveller is reissued.", { reason: "required" });
  const shop = await getShopEngineering();
  return inTransaction(async (em) => {
    const wo = await em.findOne(
      WorkOrder,
      { id: workOrderId },
      { lockMode: LockMode.PESSIMISTIC_WRITE, populate: ["orderShaft"] },
    );
    if (!wo) throw new AppError("not_found", "No such work order.");
    if (wo.state === "shipped" || wo.state === "picked_up") {
      throw new AppError("conflict", `${wo.serial} has left the shop; its traveller cannot be reissued.`);
    }
    const order = await em.findOneOrFail(Order, { id: wo.order.id });
    const voided = wo.revision;
    wo.revision += 1;
    const specs = specsFor(wo.orderShaft, order, shop.floor);
    wo.stepCount = specs.length;
    wo.currentPosition = 1;
    wo.state = "released";
    addSteps(em, wo, specs);
    onReissued(order);
    await recordAudit(
      {
        actorId: by.id,
        action: "floor.reissue",
        subjectType: "work_order",
        subjectId: wo.id,
        details: { serial: wo.serial, voidedRevision: voided, revision: wo.revision, reason: why },
      },
      em,
    );
    await em.flush();
    return { serial: wo.serial, revision: wo.revision };
  });
}

/** An order's floor state: its shafts' least advanced state, or not released yet. */
export type OrderFloorState = "not_released" | WorkOrderState;

export interface OrderFloorSummary {
  state: OrderFloorState;
  /** "in the shop, step k of n": the least advanced shaft's next step, of its step count. */
  step: { k: number; n: number } | null;
  label: string;
  shafts: {
    workOrderId: string;
    serial: string;
    revision: number;
    state: WorkOrderState;
    next: { position: number; code: string; name: string } | null;
    stepCount: number;
    hold: { step: string; failures: Failure[] } | null;
  }[];
}

/** Where an order is on the floor: released → in the shop (step k of n) → on hold → ready → shipped / picked up. */
export async function orderFloorState(em: EntityManager, orderId: string): Promise<OrderFloorSummary> {
  const wos = await em.find(WorkOrder, { order: orderId }, { orderBy: { serialSequence: "asc" } });
  if (!wos.length)
    return { state: "not_released", step: null, label: "Not released to the shop", shafts: [] };
  const shafts: OrderFloorSummary["shafts"] = [];
  for (const wo of wos) {
    const steps = await stepsFor(em, wo);
    const held = steps.find((s) => s.state === "on_hold");
    const hold = held
      ? await em.findOne(StepRecord, { step: held.id, outcome: "hold" }, { orderBy: { at: "desc" } })
      : null;
    shafts.push({
      workOrderId: wo.id,
      serial: wo.serial,
      revision: wo.revision,
      state: wo.state,
      next: nextStep(wo, steps),
      stepCount: wo.stepCount,
      hold: held ? { step: held.spec.name, failures: hold?.failures ?? [] } : null,
    });
  }
  const states = new Set(wos.map((w) => w.state));
  const all = (s: WorkOrderState) => wos.every((w) => w.state === s);
  const least = wos.reduce((a, b) => (b.currentPosition < a.currentPosition ? b : a));
  const step = { k: Math.min(least.currentPosition, least.stepCount), n: least.stepCount };
  let state: OrderFloorState;
  if (states.has("on_hold")) state = "on_hold";
  else if (all("shipped")) state = "shipped";
  else if (all("picked_up")) state = "picked_up";
  else if (wos.every((w) => ["ready", "shipped", "picked_up"].includes(w.state))) state = "ready";
  else if (all("released")) state = "released";
  else state = "in_shop";
  const labels: Record<OrderFloorState, string> = {
    not_released: "Not released to the shop",
    released: "Released to the shop",
    in_shop: `In the shop, step ${step.k} of ${step.n}`,
    on_hold: "On hold",
    ready: "Ready",
    shipped: "Shipped",
    picked_up: "Picked up",
  };
  return {
    state,
    step: state === "in_shop" || state === "released" || state === "on_hold" ? step : null,
    label: labels[state],
    shafts,
  };
}

/** The traveller view model of a work order's revision in force (or an earlier, void one). */
export async function travellerViewFor(
  em: EntityManager,
  workOrderId: string,
  revision?: number,
): Promise<TravellerView> {
  const wo = await em.findOne(
    WorkOrder,
    { id: workOrderId },
    { populate: ["orderShaft", "order", "order.customer"] },
  );
  if (!wo) throw new AppError("not_found", "No such work order.");
  const rev = revision ?? wo.revision;
  if (rev < 1 || rev > wo.revision) throw new AppError("not_found", `${wo.serial} has no revision ${rev}.`);
  const [steps, shop, shafts, engineering] = await Promise.all([
    stepsFor(em, wo, rev),
    em.findOne(Shop, { id: 1 }),
    em.count(OrderShaft, { order: wo.order.id }),
    getShopEngineering(),
  ]);
  const shaft = wo.orderShaft;
  return buildTravellerView({
    shop: {
      name: shop?.name ?? "Yokeline",
      phone: shop?.phone ?? null,
      timeZone: engineering.priceBook.timeZone,
    },
    serial: wo.serial,
    revision: rev,
    voidedBy: rev < wo.revision ? wo.revision : null,
    order: {
      number: wo.order.number,
      customerName: wo.order.customer.name,
      promisedDate: wo.order.promisedDate,
      fulfilment: wo.order.fulfilment,
    },
    shaft: {
      name: shaft.name,
      position: shaft.position,
      count: shafts,
      application: shaft.application ?? null,
    },
    floor: engineering.floor,
    report: shaft.evaluation as unknown as EvaluationReport,
    acceptedExceptions: acceptedExceptions(shaft),
    retube: retubeTravellerOf(shaft),
    steps: steps.map((s) => s.spec),
  });
}

/** What the traveller prints about a re-tube (null for a new shaft). */
function retubeTravellerOf(shaft: OrderShaft): TravellerView["retube"] {
  const repair = retubeIntakeOf(shaft);
  return repair
    ? {
        weldToWeldMm: repair.weldToWeldMm,
        reused: reusedParts(repair).map((p) => `${RETUBE_PART_LABEL[p]} (${repair.parts[p].note})`),
      }
    : null;
}

/** Finds a shaft by its serial (scanned from its QR code or typed). */
export async function findWorkOrderBySerial(em: EntityManager, serial: string): Promise<WorkOrder> {
  const parsed = parseSerial(serial);
  if (!parsed.ok) throw new AppError("invalid", parsed.message);
  const wo = await em.findOne(WorkOrder, { serial: parsed.serial });
  if (!wo) throw new AppError("not_found", `No shaft with serial ${parsed.serial}.`);
  return wo;
}

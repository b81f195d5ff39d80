import "server-only";
/**
 * What a scanned code means at the scan station (read only, plain data for the screen): a step
 * of a shaft with its record sheet and limits in the shop's units, or a serial (its as-built
 * record). Void revisions and codes that fail their check character are refused with a message.
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import { StepRecord, WorkOrder, WorkOrderStep } from "@/entities";
import type { WorkOrderState } from "@/lib/floor/states";
import { AppError } from "@/lib/http/errors";
import { assertCurrentRevision, assertNotVoided } from "./work-orders";
import { getShopEngineering } from "@/lib/shop/config";
import { normaliseCode, parseSerial, parseStepCode } from "@/lib/traveller/codes";
import { describeLimit, type Failure } from "@/lib/traveller/measure";
import type { FieldSpec, StepSpec } from "@/lib/traveller/steps";
import { formatQuantity, fromSi, unitOf, type FloorUnits } from "@/lib/traveller/units";

/** One field of a step's form, as the station shows it (limits already in the shop's units). */
export type StationField =
  | { key: string; label: string; type: "text" | "confirm" | "weights"; unit: null; limit: null }
  | {
      key: string;
      label: string;
      type: "number";
      /** The unit the value is typed in, e.g. "in", "oz·in". */
      unit: string;
      /** Decimals the shop reads this quantity to (a hint for the input's step). */
      decimals: number;
      /** e.g. "52.000 in ± 0.063 in — common shop practice …"; null when unlimited. */
      limit: string | null;
      source: string | null;
      /** Runout only: where to read it, e.g. "2.953 in from the front weld". */
      station: string | null;
    };

export interface StationStep {
  position: number;
  code: string;
  name: string;
  instructions: string[];
  fields: StationField[];
}

export type ScanResult =
  | {
      kind: "step";
      code: string;
      workOrderId: string;
      serial: string;
      revision: number;
      orderNumber: string;
      customerName: string;
      promisedDate: string;
      shaftName: string;
      units: FloorUnits;
      workOrderState: WorkOrderState;
      stepCount: number;
      step: StationStep;
      /** next: it is this step's turn; done: already signed off; ahead: an earlier step is not done. */
      status: "next" | "on_hold" | "done" | "ahead" | "left";
      next: { position: number; code: string; name: string } | null;
      /** When on hold: each failed value with its limit (messages in the shop's units). */
      hold: { failures: Pick<Failure, "key" | "label" | "message">[]; at: string } | null;
    }
  | { kind: "serial"; serial: string; href: string };

function stationField(field: FieldSpec, units: FloorUnits): StationField {
  if (field.type !== "number")
    return { key: field.key, label: field.label, type: field.type, unit: null, limit: null };
  const u = unitOf(field.quantity, units);
  return {
    key: field.key,
    label: field.label,
    type: "number",
    unit: u.symbol,
    decimals: u.decimals,
    limit: field.limit ? describeLimit(field.quantity, units, field.limit) : null,
    source: field.limit?.source ?? null,
    station:
      field.stationMm != null
        ? `${formatQuantity("length", units, field.stationMm)} from the front weld`
        : null,
  };
}

export function stationStep(spec: StepSpec, units: FloorUnits): StationStep {
  return {
    position: spec.position,
    code: spec.code,
    name: spec.name,
    instructions: spec.instructions,
    fields: spec.fields.map((f) => stationField(f, units)),
  };
}

/** The as-built record's address for staff (the floor) or for the owning customer. */
export const asBuiltHref = (serial: string, audience: "staff" | "customer" = "staff") =>
  audience === "staff" ? `/floor/shafts/${serial}` : `/shafts/${serial}`;

/**
 * Reads a scanned or typed code. A step code → that step for that shaft (and whether it is its
 * turn); a serial → where its record is. Anything else is 422 on `code`; a void revision is 409.
 */
export async function scanCode(em: EntityManager, raw: string): Promise<ScanResult> {
  const text = normaliseCode(raw);
  const asStep = parseStepCode(text);
  if (!asStep.ok) {
    const asSerial = parseSerial(text);
    if (asSerial.ok) {
      const wo = await em.findOne(WorkOrder, { serial: asSerial.serial });
      if (!wo) throw new AppError("not_found", `No shaft with serial ${asSerial.serial}.`);
      return { kind: "serial", serial: wo.serial, href: asBuiltHref(wo.serial) };
    }
    // A serial-shaped code with a bad check character says so; otherwise the step code's message.
    const message = /^[A-Z]{2,4}-\d{2}-\d{5}-[0-9A-Z]$/.test(text) ? asSerial.message : asStep.message;
    throw new AppError("invalid", message, { code: message });
  }
  const wo = await em.findOne(WorkOrder, { serial: asStep.serial });
  if (!wo) throw new AppError("not_found", `No shaft with serial ${asStep.serial}.`);
  assertCurrentRevision(wo, asStep.revision);
  assertNotVoided(wo);
  // The four words the station shows of the order, read plainly (populating the order, its
  // customer and the shaft with its design and report cost more than the rest of the scan).
  const [[shown], steps, { floor }] = await Promise.all([
    em.execute<{ number: string; promised_date: string; customer_name: string; shaft_name: string }[]>(
      `select o.number, o.promised_date::text as promised_date, c.name as customer_name, s.name as shaft_name
         from shop_order o join customer c on c.id = o.customer_id join order_shaft s on s.id = ?
        where o.id = ?`,
      [wo.orderShaft.id, wo.order.id],
    ),
    em.find(WorkOrderStep, { workOrder: wo.id, revision: wo.revision }, { orderBy: { position: "asc" } }),
    getShopEngineering(),
  ]);
  if (!shown) throw new AppError("not_found", `No shaft with serial ${asStep.serial}.`);
  const step = steps.find((s) => s.code === asStep.step);
  if (!step) throw new AppError("not_found", `${wo.serial} has no step ${asStep.step}.`);
  const nextStep = steps.find((s) => s.position === wo.currentPosition);
  const left = wo.state === "shipped" || wo.state === "picked_up";
  const status: Extract<ScanResult, { kind: "step" }>["status"] = left
    ? "left"
    : step.state === "done"
      ? "done"
      : step.state === "on_hold"
        ? "on_hold"
        : step.position === wo.currentPosition
          ? "next"
          : "ahead";
  const holdRecord =
    status === "on_hold"
      ? await em.findOne(StepRecord, { step: step.id, outcome: "hold" }, { orderBy: { at: "desc" } })
      : null;
  return {
    kind: "step",
    code: text,
    workOrderId: wo.id,
    serial: wo.serial,
    revision: wo.revision,
    orderNumber: shown.number,
    customerName: shown.customer_name,
    promisedDate: shown.promised_date,
    shaftName: shown.shaft_name,
    units: floor.units,
    workOrderState: wo.state,
    stepCount: wo.stepCount,
    step: stationStep(step.spec, floor.units),
    status,
    next: nextStep ? { position: nextStep.position, code: nextStep.code, name: nextStep.spec.name } : null,
    hold: holdRecord
      ? {
          failures: (holdRecord.failures ?? []).map((f) => ({
            key: f.key,
            label: f.label,
            message: f.message,
          })),
          at: holdRecord.at.toISOString(),
        }
      : null,
  };
}

/** A value in SI shown back in the shop's units (for the as-built record). */
export function shownValue(field: FieldSpec | undefined, value: unknown, units: FloorUnits): string {
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (typeof value === "number" && field?.type === "number")
    return formatQuantity(field.quantity, units, value);
  if (Array.isArray(value)) {
    if (!value.length) return "none";
    return value
      .map(
        (w: { plane: string; massG: number; angleDeg: number }) =>
          `${w.plane} ${fromSi("mass", units, w.massG).toFixed(unitOf("mass", units).decimals)} ${unitOf("mass", units).symbol} at ${w.angleDeg}°`,
      )
      .join("; ");
  }
  return String(value ?? "");
}

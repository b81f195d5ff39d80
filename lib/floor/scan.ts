import "server-only";
/**
 * What a scanned code means at the scan station (read only, plain data for the screen): a step
 * of a shaft with its record sheet and limits in the shop's units, or a serial (its as-built
 * record). Void revisions and codes that fail their check character are refused with a message.
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import { WorkOrder } from "@/entities";
import type { StepState, WorkOrderState } from "@/lib/floor/states";
import { AppError } from "@/lib/http/errors";
import { assertCurrentRevision, assertNotVoided } from "./work-orders";
import { preparedRows } from "@/lib/db/prepared";
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

interface ScanRow {
  id: string;
  serial: string;
  revision: number;
  state: WorkOrderState;
  current_position: number;
  step_count: number;
  /** As PostgreSQL writes it (the ORM's connection leaves timestamps as text). */
  voided_at: string | null;
  void_reason: string | null;
  number: string;
  promised_date: string;
  customer_name: string;
  shaft_name: string;
  steps: { position: number; code: string; state: StepState; spec: StepSpec }[] | null;
  /** The latest hold record of the scanned step, when that step is on hold (`at` in ISO 8601, UTC). */
  hold: { failures: Failure[] | null; at: string } | null;
}

// Bindings: the scanned step's code, then the serial.
const SCAN_SQL = `select w.id, w.serial, w.revision, w.state, w.current_position, w.step_count,
       w.voided_at, w.void_reason, o.number, o.promised_date::text as promised_date,
       c.name as customer_name, s.name as shaft_name,
       (select json_agg(json_build_object('position', st.position, 'code', st.code, 'state', st.state,
                                          'spec', st.spec) order by st.position)
          from work_order_step st where st.work_order_id = w.id and st.revision = w.revision) as steps,
       (select json_build_object('failures', r.failures,
                                 'at', to_char(r.at at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"'))
          from work_order_step hs join step_record r on r.step_id = hs.id and r.outcome = 'hold'
         where hs.work_order_id = w.id and hs.revision = w.revision and hs.code = ? and hs.state = 'on_hold'
         order by r.at desc limit 1) as hold
  from work_order w
  join shop_order o on o.id = w.order_id
  join customer c on c.id = o.customer_id
  join order_shaft s on s.id = w.order_shaft_id
 where w.serial = ?`;

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
  // One prepared statement: the work order, the four words the station shows of its order, its
  // steps of the current revision and, for a step on hold, the latest hold record. The ORM's
  // look-ups took three or four statements in two or three round trips, most of a scan's time.
  const [[row], { floor }] = await Promise.all([
    preparedRows<ScanRow>(em, SCAN_SQL, [asStep.step, asStep.serial], "floor_scan"),
    getShopEngineering(),
  ]);
  if (!row) throw new AppError("not_found", `No shaft with serial ${asStep.serial}.`);
  assertCurrentRevision(row, asStep.revision);
  assertNotVoided({ serial: row.serial, voidedAt: row.voided_at, voidReason: row.void_reason });
  const steps = row.steps ?? [];
  const step = steps.find((s) => s.code === asStep.step);
  if (!step) throw new AppError("not_found", `${row.serial} has no step ${asStep.step}.`);
  const nextStep = steps.find((s) => s.position === row.current_position);
  const left = row.state === "shipped" || row.state === "picked_up";
  const status: Extract<ScanResult, { kind: "step" }>["status"] = left
    ? "left"
    : step.state === "done"
      ? "done"
      : step.state === "on_hold"
        ? "on_hold"
        : step.position === row.current_position
          ? "next"
          : "ahead";
  const holdRecord = status === "on_hold" ? row.hold : null;
  return {
    kind: "step",
    code: text,
    workOrderId: row.id,
    serial: row.serial,
    revision: row.revision,
    orderNumber: row.number,
    customerName: row.customer_name,
    promisedDate: row.promised_date,
    shaftName: row.shaft_name,
    units: floor.units,
    workOrderState: row.state,
    stepCount: row.step_count,
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
          at: holdRecord.at,
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

/**
 * The measurement check (pure): what a station submitted, in the shop's units, against the step's
 * frozen limits → pass, or hold listing each value outside its limit beside the limit. Values are
 * converted to SI first and stored in SI.
 */
import type { FieldSpec, NumericLimit, StepSpec } from "./steps";
import { formatQuantity, toSi, type FloorQuantity, type FloorUnits } from "./units";

export interface BalanceWeight {
  plane: "front" | "rear";
  massG: number;
  angleDeg: number;
}

/** Submitted values after conversion: numbers in SI, texts trimmed, confirmations as booleans. */
export type SiValues = Record<string, number | string | boolean | BalanceWeight[]>;

export interface Failure {
  key: string;
  label: string;
  /** SI; null for a confirmation that was answered "no". */
  value: number | null;
  limit: NumericLimit | null;
  message: string;
}

export type MeasurementResult =
  | { outcome: "pass"; values: SiValues }
  | { outcome: "hold"; values: SiValues; failures: Failure[] }
  | { outcome: "invalid"; issues: { path: string; message: string }[] };

function toNumber(raw: unknown): number | null {
  if (typeof raw === "number") return Number.isFinite(raw) ? raw : null;
  if (typeof raw === "string" && raw.trim() !== "") {
    const n = Number(raw.trim().replace(",", "."));
    return Number.isFinite(n) ? n : null;
  }
  return null;
}

function toBoolean(raw: unknown): boolean | null {
  if (typeof raw === "boolean") return raw;
  if (raw === "yes" || raw === "true" || raw === "on") return true;
  if (raw === "no" || raw === "false") return false;
  return null;
}

/** Signed distance of an index from its target, folded into (−90°, 90°]. */
export function angularDeviationDeg(valueDeg: number, targetDeg: number): number {
  let d = (((valueDeg - targetDeg) % 180) + 180) % 180;
  if (d > 90) d -= 180;
  return d;
}

/** Limit as text in the shop's units, e.g. "0.000–0.0100 in" or "52.000 in ± 0.063 in". */
export function describeLimit(quantity: FloorQuantity, units: FloorUnits, limit: NumericLimit): string {
  const f = (v: number) => formatQuantity(quantity, units, v);
  if (limit.nominal != null && limit.max != null)
    return `${f(limit.nominal)} ± ${f(limit.max - limit.nominal)}`;
  if (limit.max != null && (limit.min == null || limit.min === 0)) return `at most ${f(limit.max)}`;
  if (limit.min != null && limit.max == null) return `at least ${f(limit.min)}`;
  return `${f(limit.min ?? 0)} to ${f(limit.max ?? 0)}`;
}

function withinLimit(value: number, limit: NumericLimit): boolean {
  // A hair of slack so a value typed exactly at the limit in inches is not refused by rounding.
  const eps = 1e-9 * Math.max(1, Math.abs(value));
  if (limit.angular && limit.nominal != null && limit.max != null) {
    return Math.abs(angularDeviationDeg(value, limit.nominal)) <= limit.max - limit.nominal + eps;
  }
  if (limit.min != null && value < limit.min - eps) return false;
  if (limit.max != null && value > limit.max + eps) return false;
  return true;
}

function parseWeights(raw: unknown, units: FloorUnits): BalanceWeight[] | string {
  if (raw == null || raw === "") return [];
  if (!Array.isArray(raw)) return "must be a list of weights";
  const out: BalanceWeight[] = [];
  for (const w of raw as unknown[]) {
    const item = (w ?? {}) as Record<string, unknown>;
    const mass = toNumber(item.mass);
    const angle = toNumber(item.angleDeg);
    if (item.plane !== "front" && item.plane !== "rear") return "each weight needs a plane (front or rear)";
    if (mass == null || mass <= 0) return "each weight needs a mass above zero";
    if (angle == null || angle < 0 || angle >= 360) return "each weight needs an angle from 0° to below 360°";
    out.push({ plane: item.plane, massG: toSi("mass", units, mass), angleDeg: angle });
  }
  return out;
}

/**
 * Checks one step's submitted values. `input` maps each field key to what the station typed (in
 * `units`); missing or malformed values are "invalid" (nothing is recorded), values outside their
 * limits are a "hold".
 */
export function checkMeasurements(
  step: Pick<StepSpec, "fields">,
  input: Record<string, unknown>,
  units: FloorUnits,
): MeasurementResult {
  const issues: { path: string; message: string }[] = [];
  const failures: Failure[] = [];
  const values: SiValues = {};
  for (const field of step.fields as FieldSpec[]) {
    const raw = input[field.key];
    switch (field.type) {
      case "text": {
        const text = typeof raw === "string" ? raw.trim() : typeof raw === "number" ? String(raw) : "";
        if (!text) issues.push({ path: field.key, message: `${field.label}: required` });
        else if (text.length > 200)
          issues.push({ path: field.key, message: `${field.label}: at most 200 characters` });
        else values[field.key] = text;
        break;
      }
      case "number": {
        const n = toNumber(raw);
        if (n == null) {
          issues.push({ path: field.key, message: `${field.label}: must be a number` });
          break;
        }
        const si = toSi(field.quantity, units, n);
        values[field.key] = si;
        if (field.limit && !withinLimit(si, field.limit)) {
          failures.push({
            key: field.key,
            label: field.label,
            value: si,
            limit: field.limit,
            message: `${field.label} ${formatQuantity(field.quantity, units, si)} is outside the limit ${describeLimit(field.quantity, units, field.limit)} — ${field.limit.source}`,
          });
        }
        break;
      }
      case "confirm": {
        const b = toBoolean(raw);
        if (b == null) {
          issues.push({ path: field.key, message: `${field.label}: answer yes or no` });
          break;
        }
        values[field.key] = b;
        if (!b) {
          const reason = field.reasonKey ? input[field.reasonKey] : undefined;
          const why = typeof reason === "string" && reason.trim() ? ` — ${reason.trim().slice(0, 200)}` : "";
          failures.push({
            key: field.key,
            label: field.label,
            value: null,
            limit: null,
            message: `${field.label}: no${why}`,
          });
        }
        break;
      }
      case "weights": {
        const w = parseWeights(raw, units);
        if (typeof w === "string") issues.push({ path: field.key, message: `${field.label}: ${w}` });
        else values[field.key] = w;
        break;
      }
    }
  }
  if (issues.length) return { outcome: "invalid", issues };
  if (failures.length) return { outcome: "hold", values, failures };
  return { outcome: "pass", values };
}

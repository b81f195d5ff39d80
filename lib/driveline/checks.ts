/**
 * Rule results. Each check states the value, the limit and the limit's source in its message,
 * and the screens show the same text.
 */
import type { Limit } from "./settings";

export type CheckStatus = "pass" | "warn" | "fail";

export interface Check {
  readonly id: string;
  readonly status: CheckStatus;
  readonly message: string;
  readonly value?: number;
  readonly limit?: number;
  readonly source: string;
}

const POW10 = [1, 10, 100, 1e3, 1e4, 1e5, 1e6];
const ZEROS = ["", "0", "00", "000", "0000", "00000", "000000"];

/**
 * Fixed-point text for a message (rounded, no trailing noise): exactly `x.toFixed(digits)`.
 * toFixed is a slow runtime call and every check message has two or three of these, so the
 * common case rounds |x|·10^digits itself; a product within 1e-6 of a half (where the float
 * product may round the other way than toFixed's exact decimal) or out of range falls back to toFixed.
 */
export function fmt(x: number, digits = 2): string {
  if (!Number.isFinite(x)) return String(x);
  const p = POW10[digits];
  if (p === undefined) return x.toFixed(digits);
  const y = (x < 0 ? -x : x) * p;
  if (!(y < 1e9)) return x.toFixed(digits);
  const fl = Math.floor(y);
  const frac = y - fl;
  if (frac > 0.499999 && frac < 0.500001) return x.toFixed(digits);
  const n = frac > 0.5 ? fl + 1 : fl;
  let s = String(n);
  if (digits > 0) {
    if (s.length <= digits) s = ZEROS[digits + 1 - s.length] + s;
    s = `${s.slice(0, s.length - digits)}.${s.slice(s.length - digits)}`;
  }
  return x < 0 ? `-${s}` : s;
}

/** Worst of several statuses (fail > warn > pass). */
export function worstStatus(statuses: Iterable<CheckStatus>): CheckStatus {
  let worst: CheckStatus = "pass";
  for (const s of statuses) {
    if (s === "fail") return "fail";
    if (s === "warn") worst = "warn";
  }
  return worst;
}

interface UpperBoundRule {
  readonly id: string;
  /** "Front working angle" */
  readonly what: string;
  readonly value: number;
  readonly unit: string;
  readonly limit: Limit;
  readonly digits?: number;
  /** Value above which it warns (below the limit); omit for pass/fail only. */
  readonly warnAbove?: number;
  readonly warnSource?: string;
  /** Status when over the limit (default fail). */
  readonly overStatus?: CheckStatus;
}

/** value ≤ limit passes; a warn band below the limit warns. */
export function checkAtMost(rule: UpperBoundRule): Check {
  const d = rule.digits ?? 2;
  const v = `${fmt(rule.value, d)}${rule.unit}`;
  const l = `${fmt(rule.limit.value, d)}${rule.unit}`;
  let status: CheckStatus;
  let message: string;
  if (rule.value > rule.limit.value) {
    status = rule.overStatus ?? "fail";
    message = `${rule.what} ${v} exceeds the limit ${l} — ${rule.limit.source}`;
  } else if (rule.warnAbove !== undefined && rule.value > rule.warnAbove) {
    status = "warn";
    message = `${rule.what} ${v} is within the limit ${l} but above ${fmt(rule.warnAbove, d)}${rule.unit} (${rule.warnSource ?? "warn band"}) — ${rule.limit.source}`;
  } else {
    status = "pass";
    message = `${rule.what} ${v} is within the limit ${l} — ${rule.limit.source}`;
  }
  return {
    id: rule.id,
    status,
    message,
    value: rule.value,
    limit: rule.limit.value,
    source: rule.limit.source,
  };
}

interface LowerBoundRule {
  readonly id: string;
  readonly what: string;
  readonly value: number;
  readonly unit: string;
  readonly limit: Limit;
  readonly digits?: number;
  /** Status when under the limit (default fail). */
  readonly underStatus?: CheckStatus;
}

/** value ≥ limit passes. */
export function checkAtLeast(rule: LowerBoundRule): Check {
  const d = rule.digits ?? 2;
  const v = `${fmt(rule.value, d)}${rule.unit}`;
  const l = `${fmt(rule.limit.value, d)}${rule.unit}`;
  const ok = rule.value >= rule.limit.value;
  return {
    id: rule.id,
    status: ok ? "pass" : (rule.underStatus ?? "fail"),
    message: ok
      ? `${rule.what} ${v} meets the minimum ${l} — ${rule.limit.source}`
      : `${rule.what} ${v} is below the minimum ${l} — ${rule.limit.source}`,
    value: rule.value,
    limit: rule.limit.value,
    source: rule.limit.source,
  };
}

/** A check with a hand-written message (the message must still name limit and source). */
export function checkOf(
  id: string,
  status: CheckStatus,
  message: string,
  source: string,
  value?: number,
  limit?: number,
): Check {
  const c: { -readonly [K in keyof Check]: Check[K] } = { id, status, message, source };
  if (value !== undefined) c.value = value;
  if (limit !== undefined) c.limit = limit;
  return c;
}

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

/** Fixed-point text for a message (rounded, no trailing noise). */
export const fmt = (x: number, digits = 2): string => (Number.isFinite(x) ? x.toFixed(digits) : String(x));

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

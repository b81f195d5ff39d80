import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import { AuditEvent, Customer, User } from "@/entities";
import type { OrderStatus } from "@/lib/orders/states";
import { getEm } from "@/lib/db/orm";
import type { Failure } from "@/lib/traveller/measure";
import type { FloorSettings } from "@/lib/traveller/settings";
import { getShopEngineering } from "./config";
import {
  emExec,
  OVERVIEW_QUERIES,
  type Exec,
  type OverviewQueryContext,
  type OverviewQueryName,
} from "./overview-queries";
import { shopIsoDate } from "@/lib/dates";
import { getShopLocale } from "./locale";

const HOUR_S = 3600;
const DAY_MS = 86_400_000;
/** Weeks the charts and the money table cover. */
export const CHART_WEEKS = 12;
/** Days of signed-off steps the measured step times are averaged over. */
export const AVERAGE_WINDOW_DAYS = 90;
/** Fewer measured sign-offs of a step than this and its default stands. */
export const MIN_SAMPLES = 5;
/**
 * Until a step has measured history: one working day (8 h) from the previous sign-off, a
 * Yokeline default (stated on the overview), replaced by the shop's own averages as it works.
 */
export const DEFAULT_STEP_HOURS = 8;

export const ORDER_STATE_ORDER: OrderStatus[] = [
  "awaiting_payment",
  "received",
  "in_shop",
  "ready",
  "shipped",
  "cancelled",
];

export interface StepAverage {
  code: string;
  name: string;
  hours: number;
  samples: number;
  /** True when the default stands (no or too few measured sign-offs). */
  isDefault: boolean;
}

export interface OrderListItem {
  id: string;
  number: string;
  customerName: string;
  status: string;
  promisedDate: string;
  totalCents: number;
}

export interface AtRiskItem extends OrderListItem {
  expectedDate: string;
  remainingHours: number;
  stepsLeft: number;
}

export interface HoldItem {
  workOrderId: string;
  serial: string;
  orderId: string;
  number: string;
  customerName: string;
  promisedDate: string;
  step: string;
  since: string | null;
  reasons: string[];
}

export interface WeekMoney {
  week: string;
  depositsCents: number;
  balancesCents: number;
  refundsCents: number;
}

export interface OverviewFigures {
  today: string;
  byState: { status: OrderStatus; count: number; valueCents: number }[];
  open: number;
  late: { count: number; valueCents: number; items: OrderListItem[] };
  atRisk: { count: number; items: AtRiskItem[] };
  onHold: { count: number; items: HoldItem[] };
  money: {
    /** Paid less refunded on orders neither shipped nor cancelled. */
    depositsHeldCents: number;
    /** Still owed on accepted orders (received onwards, shipped included), cancelled left out. */
    balancesDueCents: number;
    balancesDueOrders: number;
    /** The whole value of orders still awaiting their first payment. */
    awaitingCents: number;
    weeks: WeekMoney[];
    takenCents: number;
    refundsCents: number;
  };
  finishedByWeek: { week: string; shafts: number }[];
  orderToShip: {
    byWeek: { week: string; orders: number; medianDays: number | null }[];
    histogram: { days: string; orders: number }[];
    medianDays: number | null;
    orders: number;
  };
  stepAverages: StepAverage[];
}

export interface OverviewActivity {
  customers: number;
  staff: number;
  recent: { id: string; at: string; actor: string; action: string; subject: string }[];
}

/** Monday (UTC) of the week `at` falls in, as an ISO date. */
export function weekStart(at: Date): string {
  const d = new Date(Date.UTC(at.getUTCFullYear(), at.getUTCMonth(), at.getUTCDate()));
  const back = (d.getUTCDay() + 6) % 7;
  return new Date(d.getTime() - back * DAY_MS).toISOString().slice(0, 10);
}

/** The Mondays of the last `n` weeks, oldest first (this week last). */
export function lastWeeks(now: Date, n: number): string[] {
  const monday = new Date(`${weekStart(now)}T00:00:00Z`).getTime();
  return Array.from({ length: n }, (_, i) =>
    new Date(monday - (n - 1 - i) * 7 * DAY_MS).toISOString().slice(0, 10),
  );
}

/**
 * Measured hours per routing step (the shop's routing order and names), the default where a step
 * has fewer than MIN_SAMPLES sign-offs; codes no longer in the routing follow with their code.
 */
export function stepAveragesFrom(
  rows: { code: string; samples: number; seconds: number | null }[],
  routing: FloorSettings["routing"],
): StepAverage[] {
  const byCode = new Map(rows.map((r) => [r.code, r]));
  const out: StepAverage[] = routing.map((step) => {
    const r = byCode.get(step.code);
    const measured = r && r.samples >= MIN_SAMPLES && r.seconds != null;
    return {
      code: step.code,
      name: step.name,
      hours: measured ? r.seconds! / HOUR_S : DEFAULT_STEP_HOURS,
      samples: r?.samples ?? 0,
      isDefault: !measured,
    };
  });
  for (const r of rows) {
    if (routing.some((s) => s.code === r.code) || r.samples < MIN_SAMPLES || r.seconds == null) continue;
    out.push({ code: r.code, name: r.code, hours: r.seconds / HOUR_S, samples: r.samples, isDefault: false });
  }
  return out;
}

/** Whole-day median of a histogram of days (null when empty). */
export function medianOf(histogram: Map<number, number>): number | null {
  const total = [...histogram.values()].reduce((s, n) => s + n, 0);
  if (!total) return null;
  const keys = [...histogram.keys()].sort((a, b) => a - b);
  const lower = Math.floor((total - 1) / 2);
  const upper = Math.floor(total / 2);
  let seen = 0;
  let lo: number | null = null;
  for (const k of keys) {
    const n = histogram.get(k)!;
    if (lo == null && seen + n > lower) lo = k;
    if (seen + n > upper) return (lo! + k) / 2;
    seen += n;
  }
  return lo;
}

const HISTOGRAM_BINS: { label: string; max: number }[] = [
  { label: "0–3", max: 3 },
  { label: "4–7", max: 7 },
  { label: "8–10", max: 10 },
  { label: "11–14", max: 14 },
  { label: "15–21", max: 21 },
  { label: "22+", max: Infinity },
];

async function run<T>(exec: Exec, name: OverviewQueryName, ctx: OverviewQueryContext): Promise<T[]> {
  const q = OVERVIEW_QUERIES[name];
  return exec<T>(q.sql, q.params(ctx));
}

/**
 * The routing codes of final inspection and dispatch, and the context the queries run with. Today
 * and the expected finish days are the shop's (`timeZone`); the chart weeks stay Monday-to-Monday UTC.
 */
export function overviewContext(
  now: Date,
  floor: FloorSettings,
  averages: StepAverage[] = [],
  timeZone = "UTC",
): OverviewQueryContext {
  const codes = (kind: string) => floor.routing.filter((s) => s.kind === kind).map((s) => s.code);
  const routingHours = floor.routing.reduce(
    (s, step) => s + (averages.find((a) => a.code === step.code)?.hours ?? DEFAULT_STEP_HOURS),
    0,
  );
  return {
    now,
    today: shopIsoDate(now, timeZone),
    timeZone,
    chartsSince: new Date(`${lastWeeks(now, CHART_WEEKS)[0]}T00:00:00Z`),
    averagesSince: new Date(now.getTime() - AVERAGE_WINDOW_DAYS * DAY_MS),
    routingCodes: floor.routing.map((s) => s.code),
    inspectionCodes: codes("final-inspection"),
    stepSeconds: averages.map((a) => ({ code: a.code, seconds: a.hours * HOUR_S })),
    routingSeconds: routingHours * HOUR_S,
  };
}

/** The shop's measured time per routing step (from the last AVERAGE_WINDOW_DAYS of sign-offs). */
export async function measuredStepAverages(exec: Exec, floor: FloorSettings, now = new Date()) {
  const rows = await run<{ code: string; samples: number; seconds: number | null }>(
    exec,
    "stepAverages",
    overviewContext(now, floor),
  );
  return stepAveragesFrom(
    rows.map((r) => ({
      code: r.code,
      samples: Number(r.samples),
      seconds: r.seconds == null ? null : Number(r.seconds),
    })),
    floor.routing,
  );
}

const cents = (v: unknown) => Number(v ?? 0);

/**
 * What the owner sees first: orders by state with their value, late and at risk (the remaining
 * steps at the shop's measured step times against each promise), shafts on hold and why, money
 * (taken, deposits held, balances due, refunds by week), throughput, days to ship and time per
 * step. "Late" = promised date before the shop's today (its time zone) and neither shipped nor cancelled. `exec` runs
 * the SQL (default: the request's entity manager; tests pass their own connection).
 */
export async function overviewFigures(
  now = new Date(),
  execIn?: Exec,
  floorIn?: FloorSettings,
  timeZoneIn?: string,
): Promise<OverviewFigures> {
  const exec = execIn ?? emExec(await getEm());
  const floor = floorIn ?? (await getShopEngineering()).floor;
  const stepAverages = await measuredStepAverages(exec, floor, now);
  const ctx = overviewContext(now, floor, stepAverages, timeZoneIn ?? (await getShopLocale()).timeZone);
  type Row = Record<string, unknown>;
  const [byStatus, open, owed, atRisk, late, onHold, taken, refunds, finished, toShip] = await Promise.all([
    run<Row>(exec, "byStatus", ctx),
    run<Row>(exec, "open", ctx),
    run<Row>(exec, "owed", ctx),
    run<Row>(exec, "atRisk", ctx),
    run<Row>(exec, "late", ctx),
    run<Row>(exec, "onHold", ctx),
    run<Row>(exec, "takenByWeek", ctx),
    run<Row>(exec, "refundsByWeek", ctx),
    run<Row>(exec, "finishedByWeek", ctx),
    run<Row>(exec, "orderToShip", ctx),
  ]);

  const weeks = lastWeeks(now, CHART_WEEKS);
  const takenBy = new Map(taken.map((r) => [String(r.week), r]));
  const refundsBy = new Map(refunds.map((r) => [String(r.week), cents(r.refunds_cents)]));
  const moneyWeeks = weeks.map((week) => ({
    week,
    depositsCents: cents(takenBy.get(week)?.deposits_cents),
    balancesCents: cents(takenBy.get(week)?.balances_cents),
    refundsCents: refundsBy.get(week) ?? 0,
  }));
  const owedBy = new Map(owed.map((r) => [String(r.status), r]));
  const openRow = open[0] ?? {};
  const listItem = (r: Row): OrderListItem => ({
    id: String(r.id),
    number: String(r.number),
    customerName: String(r.customer_name),
    status: String(r.status),
    promisedDate: String(r.promised_date),
    totalCents: cents(r.total_cents),
  });

  // Days from order to ship: per week (whole-day median) and overall in bins.
  const perWeek = new Map<string, Map<number, number>>();
  const all = new Map<number, number>();
  for (const r of toShip) {
    const days = Number(r.days);
    const n = Number(r.orders);
    const h = perWeek.get(String(r.week)) ?? new Map<number, number>();
    h.set(days, (h.get(days) ?? 0) + n);
    perWeek.set(String(r.week), h);
    all.set(days, (all.get(days) ?? 0) + n);
  }
  const sum = (h?: Map<number, number>) => [...(h?.values() ?? [])].reduce((s, n) => s + n, 0);
  const finishedBy = new Map(finished.map((r) => [String(r.week), Number(r.shafts)]));

  return {
    today: ctx.today,
    byState: ORDER_STATE_ORDER.map((status) => {
      const r = byStatus.find((x) => x.status === status);
      return { status, count: Number(r?.count ?? 0), valueCents: cents(r?.value_cents) };
    }),
    open: Number(openRow.open ?? 0),
    late: {
      count: Number(openRow.late ?? 0),
      valueCents: cents(openRow.late_value_cents),
      items: late.map(listItem),
    },
    atRisk: {
      count: Number(atRisk[0]?.total ?? 0),
      items: atRisk.map((r) => ({
        ...listItem(r),
        expectedDate: String(r.expected_date),
        remainingHours: Number(r.remaining_seconds) / HOUR_S,
        stepsLeft: Number(r.steps_left),
      })),
    },
    onHold: {
      count: onHold.length,
      items: onHold.map((r) => ({
        workOrderId: String(r.work_order_id),
        serial: String(r.serial),
        orderId: String(r.order_id),
        number: String(r.number),
        customerName: String(r.customer_name),
        promisedDate: String(r.promised_date),
        step: String(r.step_name ?? r.code),
        since: r.at ? new Date(r.at as string).toISOString() : null,
        reasons: ((r.failures as Failure[] | null) ?? []).map((f) => f.message),
      })),
    },
    money: {
      depositsHeldCents: cents(openRow.held_cents),
      balancesDueCents: [...owedBy.entries()]
        .filter(([s]) => s !== "awaiting_payment")
        .reduce((s, [, r]) => s + cents(r.owed_cents), 0),
      balancesDueOrders: [...owedBy.entries()]
        .filter(([s]) => s !== "awaiting_payment")
        .reduce((s, [, r]) => s + Number(r.count), 0),
      awaitingCents: cents(owedBy.get("awaiting_payment")?.owed_cents),
      weeks: moneyWeeks,
      takenCents: moneyWeeks.reduce((s, w) => s + w.depositsCents + w.balancesCents, 0),
      refundsCents: moneyWeeks.reduce((s, w) => s + w.refundsCents, 0),
    },
    finishedByWeek: weeks.map((week) => ({ week, shafts: finishedBy.get(week) ?? 0 })),
    orderToShip: {
      byWeek: weeks.map((week) => ({
        week,
        orders: sum(perWeek.get(week)),
        medianDays: perWeek.get(week) ? medianOf(perWeek.get(week)!) : null,
      })),
      histogram: HISTOGRAM_BINS.map((bin, i) => {
        const min = i === 0 ? -Infinity : HISTOGRAM_BINS[i - 1]!.max;
        return {
          days: bin.label,
          orders: [...all.entries()].filter(([d]) => d > min && d <= bin.max).reduce((s, [, n]) => s + n, 0),
        };
      }),
      medianDays: medianOf(all),
      orders: sum(all),
    },
    stepAverages,
  };
}

/** Customers, staff and the latest audit entries. */
export async function overviewActivity(em?: EntityManager): Promise<OverviewActivity> {
  const e2 = em ?? (await getEm());
  const [customers, staff, events] = await Promise.all([
    e2.count(Customer, {}),
    e2.count(User, { role: { $ne: "customer" } }),
    e2.find(AuditEvent, {}, { orderBy: { at: "desc" }, limit: 10, populate: ["actor"] }),
  ]);
  return {
    customers,
    staff,
    recent: events.map((e) => ({
      id: e.id,
      at: e.at.toISOString(),
      actor: e.actor?.name ?? "system",
      action: e.action,
      subject:
        typeof e.details?.email === "string"
          ? `${e.subjectType} ${e.details.email}`
          : typeof e.details?.number === "string"
            ? `${e.subjectType} ${e.details.number}`
            : `${e.subjectType} ${e.subjectId.slice(0, 8)}`,
    })),
  };
}

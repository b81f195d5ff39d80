import "server-only";
/**
 * The owner's overview queries as plain SQL (knex `?` placeholders), one entry each, so the page,
 * the EXPLAIN test and the bench run exactly the same text. The indexes each one uses are made in
 * Migration20261204150200 and named beside the query.
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import type { ClientBase } from "pg";

/** What the queries are run for: today's date in the shop, the chart window and the routing's codes. */
export interface OverviewQueryContext {
  /** Today in the shop's time zone (ISO date): "late" is promised before it. */
  today: string;
  /** The shop's IANA time zone: the day an expected finish falls on. */
  timeZone: string;
  /** Start of the oldest week the charts show. */
  chartsSince: Date;
  /** Start of the window the step averages are measured over. */
  averagesSince: Date;
  /** Every code of the shop's routing, in order. */
  routingCodes: string[];
  /** Routing codes of final inspection (from the shop's floor settings). */
  inspectionCodes: string[];
  /** Measured (or default) seconds per step code, for the remaining-time estimate. */
  stepSeconds: { code: string; seconds: number }[];
  /** Seconds the whole routing takes (an order not yet released has all of it ahead). */
  routingSeconds: number;
  now: Date;
}

/** Runs one SQL text with its parameters (knex-style `?` placeholders) and returns the rows. */
export type Exec = <T>(sql: string, params: unknown[]) => Promise<T[]>;

/** Through an entity manager's connection (inside its transaction, if it has one). */
export function emExec(em: EntityManager): Exec {
  return <T>(sql: string, params: unknown[]) =>
    em.getConnection().execute<T[]>(sql, params, "all", em.getTransactionContext());
}

/** Through a plain pg client (the generator's connection in tests and the bench): `?` becomes `$n`. */
export function pgExec(db: ClientBase): Exec {
  // One client runs one query at a time: queue them.
  let queue: Promise<unknown> = Promise.resolve();
  return <T>(sql: string, params: unknown[]) => {
    let n = 0;
    const text = sql.replace(/\?/g, () => `$${++n}`);
    const next = queue.then(async () => (await db.query(text, params)).rows as T[]);
    queue = next.catch(() => undefined);
    return next;
  };
}

/** An array as a PostgreSQL array literal (knex would spread a JS array into a list). */
export function pgArray(values: readonly (string | number)[]): string {
  return `{${values.map((v) => (typeof v === "number" ? String(v) : JSON.stringify(v))).join(",")}}`;
}

export interface OverviewQuery {
  name: string;
  /** Index names EXPLAIN must show (the test asserts them). */
  indexes: string[];
  /** Why a sequential scan is also right for this query (when it reads the whole table). */
  seqScanIsRight?: string;
  sql: string;
  params: (ctx: OverviewQueryContext) => unknown[];
}

const OPEN = `status not in ('shipped', 'cancelled')`;
/** Sign-offs of each step the averages read at most (the latest ones in the window). */
export const STEP_SAMPLE = 500;

export const OVERVIEW_QUERIES = {
  /** Orders by state: count and value. */
  byStatus: {
    name: "orders by state",
    indexes: ["shop_order_status_money_index"],
    seqScanIsRight:
      "it counts every order: until VACUUM marks the pages all-visible a sequential scan is as cheap; after it the covering index gives an index-only scan",
    sql: `select status::text as status, count(*)::int as count, coalesce(sum(total_cents), 0)::bigint as value_cents
          from shop_order group by status`,
    params: () => [],
  },
  /** Open orders: late count, deposits held (paid less refunded on orders not yet shipped). */
  open: {
    name: "open orders: late, deposits held",
    indexes: ["shop_order_open_promised_index"],
    sql: `select count(*)::int as open,
            count(*) filter (where promised_date < ?::date)::int as late,
            coalesce(sum(total_cents) filter (where promised_date < ?::date), 0)::bigint as late_value_cents,
            coalesce(sum(paid_cents - refunded_cents), 0)::bigint as held_cents
          from shop_order where ${OPEN}`,
    params: (c) => [c.today, c.today],
  },
  /** Money owed by state (awaiting a deposit, or balances on accepted orders), cancelled left out. */
  owed: {
    name: "money owed by state",
    indexes: ["shop_order_owed_index"],
    sql: `select status::text as status, count(*)::int as count, coalesce(sum(total_cents - paid_cents), 0)::bigint as owed_cents
          from shop_order where paid_cents < total_cents and status <> 'cancelled' group by status`,
    params: () => [],
  },
  /** Open orders not yet late whose remaining steps, at the measured step times, end after the promise. */
  atRisk: {
    name: "at risk (remaining steps against the promise)",
    indexes: [
      "shop_order_open_promised_index",
      "work_order_order_id_index",
      "work_order_step_work_order_id_revision_position_unique",
    ],
    sql: `with avg_step as (
            select code, seconds from unnest(?::text[], ?::float8[]) as a(code, seconds)
          ), open_order as (
            select o.id, o.number, o.status::text as status, o.promised_date, o.customer_id, o.total_cents
            from shop_order o where o.${OPEN} and o.promised_date >= ?::date
          ), remaining as (
            select oo.id,
              coalesce(max(w.seconds), ?::float8) as seconds,
              coalesce(max(w.steps_left), 0)::int as steps_left
            from open_order oo
            left join lateral (
              select wo.id, sum(coalesce(a.seconds, 0)) as seconds, count(*) as steps_left
              from work_order wo
              join work_order_step s on s.work_order_id = wo.id and s.revision = wo.revision and s.position >= wo.current_position
              left join avg_step a on a.code = s.code
              where wo.order_id = oo.id
              group by wo.id
            ) w on true
            group by oo.id
          )
          select oo.id, oo.number, oo.status, to_char(oo.promised_date, 'YYYY-MM-DD') as promised_date, c.name as customer_name,
            oo.total_cents, r.seconds::float8 as remaining_seconds, r.steps_left,
            to_char((?::timestamptz + make_interval(secs => r.seconds)) at time zone ?, 'YYYY-MM-DD') as expected_date,
            count(*) over ()::int as total
          from open_order oo join remaining r on r.id = oo.id join customer c on c.id = oo.customer_id
          where oo.promised_date < ((?::timestamptz + make_interval(secs => r.seconds)) at time zone ?)::date
          order by oo.promised_date, oo.number
          limit 50`,
    params: (c) => [
      pgArray(c.stepSeconds.map((s) => s.code)),
      pgArray(c.stepSeconds.map((s) => s.seconds)),
      c.today,
      c.routingSeconds,
      c.now.toISOString(),
      c.timeZone,
      c.now.toISOString(),
      c.timeZone,
    ],
  },
  /** Late orders, soonest promise first (the list beside the count). */
  late: {
    name: "late orders",
    indexes: ["shop_order_open_promised_index"],
    sql: `select o.id, o.number, o.status::text as status, to_char(o.promised_date, 'YYYY-MM-DD') as promised_date,
            c.name as customer_name, o.total_cents
          from shop_order o join customer c on c.id = o.customer_id
          where o.${OPEN} and o.promised_date < ?::date
          order by o.promised_date, o.number limit 50`,
    params: (c) => [c.today],
  },
  /** Shafts on hold and why: the held step and the failed values of its latest hold record. */
  onHold: {
    name: "on hold and why",
    indexes: ["work_order_state_index", "step_record_step_id_index"],
    sql: `select w.id as work_order_id, w.serial, o.id as order_id, o.number, c.name as customer_name,
            to_char(o.promised_date, 'YYYY-MM-DD') as promised_date, s.code, s.spec->>'name' as step_name,
            r.at, r.failures
          from work_order w
          join shop_order o on o.id = w.order_id
          join customer c on c.id = o.customer_id
          join work_order_step s on s.work_order_id = w.id and s.revision = w.revision and s.state = 'on_hold'
          left join lateral (
            select at, failures from step_record r where r.step_id = s.id and r.outcome = 'hold' order by at desc limit 1
          ) r on true
          where w.state = 'on_hold'
          order by r.at nulls last limit 100`,
    params: () => [],
  },
  /** Money taken by week (succeeded payments, by kind). */
  takenByWeek: {
    name: "money taken by week",
    indexes: ["payment_succeeded_paid_at_index"],
    sql: `select to_char(date_trunc('week', paid_at at time zone 'UTC'), 'YYYY-MM-DD') as week,
            coalesce(sum(amount_cents) filter (where kind = 'deposit'), 0)::bigint as deposits_cents,
            coalesce(sum(amount_cents) filter (where kind <> 'deposit'), 0)::bigint as balances_cents
          from payment where status = 'succeeded' and paid_at >= ? group by 1 order by 1`,
    params: (c) => [c.chartsSince.toISOString()],
  },
  /** Refunds by week. */
  refundsByWeek: {
    name: "refunds by week",
    indexes: ["refund_created_at_index"],
    seqScanIsRight:
      "refunds are a few in a hundred orders: while the table is a handful of pages a sequential scan is cheaper than the index",
    sql: `select to_char(date_trunc('week', created_at at time zone 'UTC'), 'YYYY-MM-DD') as week,
            coalesce(sum(amount_cents), 0)::bigint as refunds_cents
          from refund where created_at >= ? group by 1 order by 1`,
    params: (c) => [c.chartsSince.toISOString()],
  },
  /** Shafts that passed final inspection, by week. */
  finishedByWeek: {
    name: "shafts finished by week",
    indexes: ["work_order_step_done_code_index"],
    sql: `select to_char(date_trunc('week', completed_at at time zone 'UTC'), 'YYYY-MM-DD') as week, count(*)::int as shafts
          from work_order_step where state = 'done' and code = any(?::text[]) and completed_at >= ?
          group by 1 order by 1`,
    params: (c) => [pgArray(c.inspectionCodes), c.chartsSince.toISOString()],
  },
  /** Orders that left the shop, by week and whole days from order to the last shaft's dispatch. */
  orderToShip: {
    name: "days from order to ship",
    // shipped_at is set when the last shaft leaves (lib/floor/hooks.ts): one index range, no join.
    indexes: ["shop_order_shipped_at_index"],
    sql: `select to_char(date_trunc('week', shipped_at at time zone 'UTC'), 'YYYY-MM-DD') as week,
            floor(extract(epoch from (shipped_at - created_at)) / 86400)::int as days, count(*)::int as orders
          from shop_order
          where shipped_at is not null and shipped_at >= ?
          group by 1, 2 order by 1, 2`,
    params: (c) => [c.chartsSince.toISOString()],
  },
  /**
   * Measured time per routing step: from the previous sign-off (or the release, for the first
   * step) to this one, over the latest STEP_SAMPLE sign-offs of each step in the window (a bounded
   * read, however busy the shop).
   */
  stepAverages: {
    name: "average time per step",
    // Each sample's predecessor is found through the unique (work_order_id, revision, position)
    // index on a big shop, or by hashing a small table whole: the planner's choice either way.
    indexes: ["work_order_step_done_code_index"],
    sql: `select c.code, count(s.completed_at)::int as samples,
            avg(extract(epoch from (s.completed_at - coalesce(p.completed_at,
              (select w.created_at from work_order w where w.id = s.work_order_id)))))::float8 as seconds
          from unnest(?::text[]) as c(code)
          cross join lateral (
            select x.work_order_id, x.revision, x.position, x.completed_at from work_order_step x
            where x.state = 'done' and x.code = c.code and x.completed_at >= ?::timestamptz
            order by x.completed_at desc limit ${STEP_SAMPLE}
          ) s
          left join work_order_step p
            on s.position > 1 and p.work_order_id = s.work_order_id and p.revision = s.revision and p.position = s.position - 1
          group by c.code`,
    params: (c) => [pgArray(c.routingCodes), c.averagesSince.toISOString()],
  },
} satisfies Record<string, OverviewQuery>;

export type OverviewQueryName = keyof typeof OVERVIEW_QUERIES;

import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import { orderStatusLabel } from "@/lib/orders/labels";
import type { OrderStatus, PaymentState, Fulfilment, OrderChannel } from "@/lib/orders/states";
import type { ListOrdersQuery, OrderTableRow } from "./orders-spec";
import { containsPattern } from "./params";
import { shopToday } from "@/lib/shop/locale";
import { preparedRows } from "@/lib/db/prepared";
import { customerSearchText } from "@/lib/customers";
import type { Page } from "./sql";

/** The SQL each sort column orders by (never user text); the order's id breaks ties. */
const ORDER_BY: Record<ListOrdersQuery["sort"], string> = {
  number: "o.number",
  customer: "lower(c.name)",
  created: "o.created_at",
  promised: "o.promised_date",
  status: "o.status",
  payment: "o.payment_state",
  channel: "o.channel",
  total: "o.total_cents",
  balance: "(o.total_cents - o.paid_cents)",
};

const CLOSED: OrderStatus[] = ["shipped", "cancelled"];
/** "Still open", as SQL on `shop_order o`, from CLOSED (fixed words, never user text). */
const OPEN_SQL = `o.status not in (${CLOSED.map((s) => `'${s}'`).join(", ")})`;

/**
 * The filters of the query as one WHERE on `shop_order o` (never the customer: the search matches
 * customers apart, in the `m` CTE of the statement), with `?` placeholders and their values in order.
 * Only SQL from this function reaches the text; every value the user chose is bound.
 */
function orderFilters(q: ListOrdersQuery, today: string): { where: string; params: unknown[] } {
  const parts: string[] = [];
  const params: unknown[] = [];
  const add = (sql: string, ...values: unknown[]) => {
    parts.push(sql);
    params.push(...values);
  };
  if (q.status === "open") add(OPEN_SQL);
  else if (q.status) add("o.status = ?", q.status);
  if (q.payment) add("o.payment_state = ?", q.payment);
  if (q.channel) add("o.channel = ?", q.channel);
  // Late (the shared contract): promised before the shop's today and not shipped or cancelled.
  if (q.late) add(`${OPEN_SQL} and o.promised_date < ?::date`, today);
  if (q.hold) add("exists (select 1 from work_order hw where hw.order_id = o.id and hw.state = 'on_hold')");
  if (q.from) add("o.promised_date >= ?::date", q.from);
  if (q.to) add("o.promised_date <= ?::date", q.to);
  // The order's number, or its customer's name, e-mail, company or phone: the customers are matched
  // once (`m`, an array, through the customers' one search text and its trigram index), so both the
  // page and the count are index look-ups (the trigram index on the number, the customer_id index),
  // never an ILIKE per order joined to its customer.
  if (q.q)
    add("(o.number ilike ? or o.customer_id = any((select ids from m)::uuid[]))", containsPattern(q.q));
  return { where: parts.length ? `where ${parts.join(" and ")}` : "", params };
}

interface RawOrderRow {
  id: string;
  number: string;
  customer_id: string;
  customer_name: string;
  customer_email: string;
  customer_company: string | null;
  /** ISO 8601 in UTC, written by the statement (no Date made per row). */
  created_at: string;
  promised_date: string;
  status: OrderStatus;
  payment_state: PaymentState;
  channel: OrderChannel;
  fulfilment: Fulfilment;
  total_cents: number;
  paid_cents: number;
  currency: string;
  shafts: string | null;
  shaft_count: number;
  floor_k: number | null;
  floor_n: number | null;
  on_hold: boolean | null;
}

function toRow(r: RawOrderRow, today: string): OrderTableRow {
  const floor = r.floor_n != null ? { k: r.floor_k ?? 1, n: r.floor_n, onHold: Boolean(r.on_hold) } : null;
  return {
    id: r.id,
    number: r.number,
    customerId: r.customer_id,
    customerName: r.customer_name,
    customerEmail: r.customer_email,
    customerCompany: r.customer_company,
    createdAt: r.created_at,
    promisedDate: r.promised_date,
    status: r.status,
    statusLabel: orderStatusLabel(r.status, r.fulfilment, floor, true),
    paymentState: r.payment_state,
    channel: r.channel,
    fulfilment: r.fulfilment,
    totalCents: r.total_cents,
    paidCents: r.paid_cents,
    balanceCents: r.total_cents - r.paid_cents,
    currency: r.currency,
    shafts: r.shafts ?? "",
    shaftCount: r.shaft_count,
    late: !CLOSED.includes(r.status) && r.promised_date < today,
    onHold: Boolean(r.on_hold),
  };
}

/**
 * One page of orders (staff: every order) and how many match, in ONE statement: the
 * filtered, sorted, limited orders with their count beside them, then each page row's shafts and
 * floor progress (the least advanced shaft's step of its count, any shaft on hold) — at most a
 * page's worth of index look-ups, never a query per row, and no entities (a read-only view).
 */
export async function orderTablePage(
  em: EntityManager,
  q: ListOrdersQuery,
  options: { limit?: number; offset?: number; today?: string } = {},
): Promise<Page<OrderTableRow>> {
  const today = options.today ?? (await shopToday());
  const limit = options.limit ?? q.size;
  const offset = options.offset ?? (q.page - 1) * q.size;
  const { where, params } = orderFilters(q, today);
  const sortKey = ORDER_BY[q.sort];
  const dir = q.dir === "asc" ? "asc" : "desc";
  // The customers the search matches, once for both the page and the count.
  const match = q.q
    ? `m as (select array(select cs.id from customer cs where ${customerSearchText("cs.")} like lower(?)) as ids), `
    : "";
  const like = q.q ? containsPattern(q.q) : null;
  // The page is cut from the orders alone; only its rows meet their customer (unless the sort is the
  // customer's name), so a sort or filter never joins every order to its customer. The limit is one
  // of a few page sizes and the first page has no offset, both part of the text so the plan knows
  // them (PostgreSQL keeps planning a statement whose offset it cannot see); a later page's offset
  // is bound.
  const byCustomer = q.sort === "customer";
  const sql = `with ${match}n as (select count(*)::int as n from shop_order o ${where}),
    p as (
      select o.id, o.number, o.customer_id,
             to_char(o.created_at at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"') as created_at,
             o.promised_date::text as promised_date, o.status,
             o.payment_state, o.channel, o.fulfilment, o.total_cents, o.paid_cents, o.currency, ${sortKey} as _s
      from shop_order o${byCustomer ? " join customer c on c.id = o.customer_id" : ""}
      ${where}
      order by ${sortKey} ${dir}, o.id ${dir}
      limit ${Math.trunc(limit)}${offset > 0 ? " offset ?" : ""}
    )
    select p.id, p.number, p.customer_id, p.created_at, p.promised_date, p.status, p.payment_state,
           p.channel, p.fulfilment, p.total_cents, p.paid_cents, p.currency, c.name as customer_name, c.email as customer_email, c.company as customer_company,
           n.n as total, s.shafts, coalesce(s.shaft_count, 0) as shaft_count, w.floor_k, w.floor_n, w.on_hold
    from n left join p on true
    left join customer c on c.id = p.customer_id
    left join lateral (
      select string_agg(s.name, ', ' order by s.position) as shafts, count(*)::int as shaft_count
      from order_shaft s where s.order_id = p.id
    ) s on true
    left join lateral (
      select (array_agg(least(w.current_position, w.step_count) order by w.current_position))[1]::int as floor_k,
             (array_agg(w.step_count order by w.current_position))[1]::int as floor_n,
             bool_or(w.state = 'on_hold') as on_hold
      from work_order w where w.order_id = p.id
    ) w on true
    order by p._s ${dir}, p.id ${dir}`;
  const bindings = [...(like ? [like] : []), ...params, ...params, ...(offset > 0 ? [offset] : [])];
  // Prepared: planned once per connection. A search too — its generic plan (once PostgreSQL finds it
  // no dearer than planning each text) reads the same indexes, and saves about 1 ms a search.
  const rows = await preparedRows<RawOrderRow & { id: string | null; total: number }>(
    em,
    sql,
    bindings,
    "tables_orders",
  );
  return {
    rows: rows.filter((r) => r.id != null).map((r) => toRow(r, today)),
    total: rows[0]?.total ?? 0,
  };
}

import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { Knex } from "@mikro-orm/knex";
import { orderStatusLabel } from "@/lib/orders/labels";
import type { OrderStatus, PaymentState } from "@/lib/orders/states";
import type { ListOrdersQuery, OrderTableRow } from "./orders-spec";
import { containsPattern } from "./params";
import { shopToday } from "@/lib/shop/locale";
import { pagedSelect, type Page } from "./sql";

/** The SQL each sort column orders by (never user text); the order's id breaks ties. */
const ORDER_BY: Record<ListOrdersQuery["sort"], string[]> = {
  number: ["o.number"],
  customer: ["lower(c.name)"],
  created: ["o.created_at"],
  promised: ["o.promised_date"],
  status: ["o.status"],
  payment: ["o.payment_state"],
  channel: ["o.channel"],
  total: ["o.total_cents"],
  balance: ["(o.total_cents - o.paid_cents)"],
};

const CLOSED: OrderStatus[] = ["shipped", "cancelled"];

/** The filters of the query as a WHERE on shop_order o join customer c. */
function applyFilters(qb: Knex.QueryBuilder, q: ListOrdersQuery, today: string): void {
  if (q.status === "open") qb.whereNotIn("o.status", CLOSED);
  else if (q.status) qb.where("o.status", q.status);
  if (q.payment) qb.where("o.payment_state", q.payment);
  if (q.channel) qb.where("o.channel", q.channel);
  // Late (the shared contract): promised before today and not shipped or cancelled.
  if (q.late) qb.whereNotIn("o.status", CLOSED).where("o.promised_date", "<", today);
  if (q.hold)
    qb.whereExists((sub) =>
      sub.select(1).from("work_order as hw").whereRaw("hw.order_id = o.id").where("hw.state", "on_hold"),
    );
  if (q.from) qb.where("o.promised_date", ">=", q.from);
  if (q.to) qb.where("o.promised_date", "<=", q.to);
  if (q.q) {
    // The order's number, or its customer's name, e-mail or company. The customers are matched
    // first (an array, so both sides are index look-ups: the trigram index on the number, the
    // customer_id index), never an ILIKE per order joined to its customer.
    const like = containsPattern(q.q);
    qb.where((w) =>
      w
        .whereRaw("o.number ilike ?", [like])
        .orWhereRaw(
          "o.customer_id = any(array(select cs.id from customer cs where cs.name ilike ? or cs.email ilike ? or cs.company ilike ?))",
          [like, like, like],
        ),
    );
  }
}

interface RawOrderRow {
  id: string;
  number: string;
  customer_id: string;
  customer_name: string;
  customer_email: string;
  customer_company: string | null;
  created_at: Date;
  promised_date: string;
  status: OrderStatus;
  payment_state: PaymentState;
  channel: "online" | "counter";
  fulfilment: "pickup" | "ship";
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
    createdAt: new Date(r.created_at).toISOString(),
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
 * One page of orders (staff: every order) and how many match, in one statement: the filtered,
 * sorted, limited orders with their count (a window), then each page row's shafts and floor
 * progress (the least advanced shaft's step of its count, any shaft on hold) — at most a page's
 * worth of index lookups, never one query per row.
 */
export async function orderTablePage(
  em: EntityManager,
  q: ListOrdersQuery,
  options: { limit?: number; offset?: number; today?: string } = {},
): Promise<Page<OrderTableRow>> {
  const today = options.today ?? (await shopToday());
  const knex = em.getKnex();
  const base = knex
    .select(
      "o.id",
      "o.number",
      "o.customer_id",
      "c.name as customer_name",
      "c.email as customer_email",
      "c.company as customer_company",
      "o.created_at",
      knex.raw("o.promised_date::text as promised_date"),
      "o.status",
      "o.payment_state",
      "o.channel",
      "o.fulfilment",
      "o.total_cents",
      "o.paid_cents",
      "o.currency",
    )
    .from("shop_order as o")
    .join("customer as c", "c.id", "o.customer_id");
  applyFilters(base, q, today);
  // Every order has its customer (a required key), and the search matches customers apart: the count never joins them.
  const countBase = knex.from("shop_order as o");
  applyFilters(countBase, q, today);

  const page = await pagedSelect<RawOrderRow>(em, {
    base,
    countBase,
    idColumn: "o.id",
    sortKeys: ORDER_BY[q.sort],
    dir: q.dir,
    limit: options.limit ?? q.size,
    offset: options.offset ?? (q.page - 1) * q.size,
    // Per page row: its shafts and its floor progress.
    enrich: `
      left join lateral (
        select string_agg(s.name, ', ' order by s.position) as shafts, count(*)::int as shaft_count
        from order_shaft s where s.order_id = p.id
      ) s on true
      left join lateral (
        select (array_agg(least(w.current_position, w.step_count) order by w.current_position))[1]::int as floor_k,
               (array_agg(w.step_count order by w.current_position))[1]::int as floor_n,
               bool_or(w.state = 'on_hold') as on_hold
        from work_order w where w.order_id = p.id
      ) w on true`,
    enrichColumns: "s.shafts, coalesce(s.shaft_count, 0) as shaft_count, w.floor_k, w.floor_n, w.on_hold",
  });
  return { rows: page.rows.map((r) => toRow(r, today)), total: page.total };
}

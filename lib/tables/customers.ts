import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { CustomerTableRow, ListCustomersQuery } from "./customers-spec";
import { customerMatch } from "@/lib/customers";
import { pagedSelect, type Page } from "./sql";

const ORDER_BY: Record<ListCustomersQuery["sort"], string[]> = {
  name: ["lower(c.name)"],
  company: ["lower(c.company)"],
  email: ["c.email"],
  created: ["c.created_at"],
  orders: ["coalesce(oc.order_count, 0)"],
  last: ["oc.last_order_on"],
};

interface RawCustomerRow {
  id: string;
  name: string;
  company: string | null;
  email: string;
  phone: string | null;
  has_account: boolean;
  created_at: Date;
  order_count: number;
  open_order_count: number;
  last_order_on: string | null;
}

/**
 * One page of customers and how many match, in one statement. The search finds a name, e-mail,
 * company or phone containing the text; a phone is also found by its digits alone ("5550177" finds
 * "555-0177"). Order counts come from one grouped pass over the orders (index on customer_id).
 */
export async function customerTablePage(
  em: EntityManager,
  q: ListCustomersQuery,
  options: { limit?: number; offset?: number } = {},
): Promise<Page<CustomerTableRow>> {
  const knex = em.getKnex();
  const base = knex
    .select(
      "c.id",
      "c.name",
      "c.company",
      "c.email",
      "c.phone",
      knex.raw("(c.user_id is not null) as has_account"),
      "c.created_at",
      knex.raw("coalesce(oc.order_count, 0)::int as order_count"),
      knex.raw("coalesce(oc.open_order_count, 0)::int as open_order_count"),
      knex.raw("oc.last_order_on::text as last_order_on"),
    )
    .from("customer as c")
    .leftJoin(
      knex.raw(`(select customer_id, count(*) as order_count,
        count(*) filter (where status not in ('shipped', 'cancelled')) as open_order_count,
        max(created_at)::date as last_order_on
        from shop_order group by customer_id) as oc`),
      "oc.customer_id",
      "c.id",
    );
  if (q.account === "yes") base.whereNotNull("c.user_id");
  if (q.account === "no") base.whereNull("c.user_id");
  // The same match as the counter's search (lib/customers.ts), served by its trigram indexes.
  const match = q.q ? customerMatch(q.q, "c") : null;
  if (match) base.whereRaw(match.sql, match.params);
  const page = await pagedSelect<RawCustomerRow>(em, {
    base,
    idColumn: "c.id",
    sortKeys: ORDER_BY[q.sort],
    dir: q.dir,
    nullsLast: true,
    limit: options.limit ?? q.size,
    offset: options.offset ?? (q.page - 1) * q.size,
  });
  return {
    total: page.total,
    rows: page.rows.map((r) => ({
      id: r.id,
      name: r.name,
      company: r.company,
      email: r.email,
      phone: r.phone,
      hasAccount: r.has_account,
      createdAt: new Date(r.created_at).toISOString(),
      orderCount: r.order_count,
      openOrderCount: r.open_order_count,
      lastOrderOn: r.last_order_on,
    })),
  };
}

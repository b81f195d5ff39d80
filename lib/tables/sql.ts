import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { Knex } from "@mikro-orm/knex";

/** One page of a table and how many rows match its filters. */
export interface Page<R> {
  rows: R[];
  total: number;
}

/** The shop's dates are ISO yyyy-mm-dd (UTC), as elsewhere (lib/orders/queries.ts). */
export const todayIso = () => new Date().toISOString().slice(0, 10);

/**
 * Runs a table's filtered `base` select as one statement: sorted, counted (a window over every
 * matching row), cut to `limit`/`offset`, and only then joined to `enrich` (lateral look-ups per
 * page row, aliased against the page as `p`). Past the last page a plain count tells the total.
 * `orderBy` is SQL from a fixed map of the table's sort columns, never user text.
 */
export async function pagedSelect<R extends { total: number }>(
  em: EntityManager,
  spec: {
    base: Knex.QueryBuilder;
    orderBy: string;
    limit: number;
    offset: number;
    enrich?: string;
    enrichColumns?: string;
  },
): Promise<Page<R>> {
  const knex = em.getKnex();
  const countOnly = spec.base.clone().clearSelect().clearOrder().count({ n: "*" });
  spec.base
    .select(
      knex.raw("count(*) over ()::int as total"),
      knex.raw(`row_number() over (order by ${spec.orderBy}) as rn`),
    )
    .orderBy("rn")
    .limit(spec.limit)
    .offset(spec.offset);
  const columns = spec.enrichColumns ? `p.*, ${spec.enrichColumns}` : "p.*";
  const rows = await em.execute<R[]>(
    knex.raw(`with p as (?) select ${columns} from p ${spec.enrich ?? ""} order by p.rn`, [spec.base]),
  );
  if (rows.length || spec.offset === 0) return { rows, total: rows[0]?.total ?? 0 };
  const [count] = await em.execute<{ n: string }[]>(countOnly);
  return { rows, total: Number(count?.n ?? 0) };
}

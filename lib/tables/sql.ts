import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { Knex } from "@mikro-orm/knex";

/** One page of a table and how many rows match its filters. */
export interface Page<R> {
  rows: R[];
  total: number;
}

/**
 * Runs a table's filtered `base` select as ONE statement: the page (sorted by `sortKeys` then the
 * row's id, cut to `limit`/`offset`, so an index on the sort column serves it), the count of every
 * matching row beside it, and only then `enrich` (lateral look-ups per page row, aliased against
 * the page as `p`) — never a query per row. The sort keys are SQL from a fixed map of the table's
 * columns, never user text; they are selected as `_s0…` so the page keeps its order after the joins.
 */
export async function pagedSelect<R>(
  em: EntityManager,
  spec: {
    base: Knex.QueryBuilder;
    /** The same filters without the joins only the page needs (the count is then cheaper). */
    countBase?: Knex.QueryBuilder;
    /** The row's id column, e.g. "o.id" (selected as `id`): the last tie-breaker. */
    idColumn: string;
    sortKeys: string[];
    dir: "asc" | "desc";
    /** Rows without a value last, whichever the direction. */
    nullsLast?: boolean;
    limit: number;
    offset: number;
    enrich?: string;
    enrichColumns?: string;
  },
): Promise<Page<R>> {
  const knex = em.getKnex();
  const nulls = spec.nullsLast ? " nulls last" : "";
  const count = (spec.countBase ?? spec.base.clone().clearSelect().clearOrder()).select(
    knex.raw("count(*)::int as n"),
  );
  const page = spec.base
    .clone()
    .select(spec.sortKeys.map((k, i) => knex.raw(`${k} as _s${i}`)))
    .orderByRaw(
      [...spec.sortKeys.map((k) => `${k} ${spec.dir}${nulls}`), `${spec.idColumn} ${spec.dir}`].join(", "),
    )
    .limit(spec.limit)
    .offset(spec.offset);
  const outerOrder = [
    ...spec.sortKeys.map((_, i) => `p._s${i} ${spec.dir}${nulls}`),
    `p.id ${spec.dir}`,
  ].join(", ");
  const columns = ["p.*", "n.n as total", spec.enrichColumns].filter(Boolean).join(", ");
  const rows = await em.execute<(R & { id: string | null; total: number })[]>(
    knex.raw(
      `with p as (?), n as (?) select ${columns} from n left join p on true ${spec.enrich ?? ""} order by ${outerOrder}`,
      [page, count],
    ),
  );
  return { rows: rows.filter((r) => r.id != null), total: rows[0]?.total ?? 0 };
}

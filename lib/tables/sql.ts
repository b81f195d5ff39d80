import "server-only";
import { createHash } from "node:crypto";
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

/** At most this many statement texts are kept prepared; any further ones run unprepared. */
const MAX_PREPARED = 200;
const preparedNames = new Map<string, string>();

/**
 * The prepared statement's name for a text: derived from the text alone. Next bundles this module
 * once per route (a page and a handler each have their own copy, with their own map) while they
 * share one connection pool, so a counter would give two texts one name on one connection.
 */
export function preparedName(prefix: string, sql: string): string {
  return `${prefix}_${createHash("sha256").update(sql).digest("hex").slice(0, 24)}`;
}

/**
 * Runs one read-only statement (`?` placeholders; the values are bound, never spliced into the
 * text) in one round trip, in the entity manager's transaction when it has one. With `prepareAs`
 * it is a named prepared statement: each pooled connection parses and plans a given text once and
 * then reuses the plan (PostgreSQL's plan cache: custom plans for the first five runs, then a
 * generic one only if its estimated cost is no higher than theirs). Only for texts from a fixed set
 * (the filters and sort chosen; user text is always a bound value). The name is derived from the
 * text alone (preparedName), so one name is always one text, in every copy of this module.
 */
export async function tableRows<R>(
  em: EntityManager,
  sql: string,
  bindings: readonly unknown[],
  prepareAs?: string,
): Promise<R[]> {
  let name = prepareAs ? preparedNames.get(sql) : undefined;
  if (prepareAs && name === undefined && preparedNames.size < MAX_PREPARED) {
    name = preparedName(prepareAs, sql);
    preparedNames.set(sql, name);
  }
  const query = em.getKnex().raw(sql, bindings as Knex.RawBinding[]);
  if (name) query.options({ name });
  const ctx = em.getTransactionContext<Knex.Transaction>();
  if (ctx) query.transacting(ctx);
  const result = (await query) as unknown as { rows: R[] };
  return result.rows;
}

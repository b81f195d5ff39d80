import "server-only";
import { createHash } from "node:crypto";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { Knex } from "@mikro-orm/knex";

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
 * (a table's filters and sort, the scan's lookup; user text is always a bound value). The name is derived from the
 * text alone (preparedName), so one name is always one text, in every copy of this module.
 */
export async function preparedRows<R>(
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

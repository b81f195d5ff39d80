/**
 * Field-by-field differences between two configurations, for the audit log and the history.
 * Rows of a list are matched by their id (a routing step by its code), so removing one row does
 * not read as every later row changing. Pure.
 */

/** One changed field: where (path segments), what it was, what it became (null: added / removed). */
export interface ConfigChange {
  /** Dotted path, rows named by id: `catalogue.tubes.YL-T-DOM-3000-083.pricePerMetreCents`. */
  path: string;
  /** The same path as segments (an id may itself hold a dot). */
  at: string[];
  before: unknown;
  after: unknown;
}

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

const isObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === "object" && v !== null && !Array.isArray(v);

/** The key a list row is known by, if every row of both lists has one. */
function rowKey(list: unknown[]): ((row: unknown) => string) | null {
  for (const field of ["id", "code"]) {
    if (list.length > 0 && list.every((r) => isObject(r) && typeof r[field] === "string"))
      return (row) => (row as Record<string, string>)[field]!;
  }
  return null;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

function walk(before: unknown, after: unknown, at: string[], out: ConfigChange[]): void {
  if (same(before, after)) return;
  const push = (b: unknown, a: unknown) =>
    out.push({ path: at.join("."), at, before: (b ?? null) as Json, after: (a ?? null) as Json });
  if (isObject(before) && isObject(after)) {
    const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])];
    for (const k of keys) walk(before[k], after[k], [...at, k], out);
    return;
  }
  if (Array.isArray(before) && Array.isArray(after)) {
    const key = rowKey([...before, ...after]);
    const unique = (list: unknown[]) => key && new Set(list.map(key)).size === list.length;
    if (key && unique(before) && unique(after)) {
      const old = new Map(before.map((r) => [key(r), r]));
      const now = new Map(after.map((r) => [key(r), r]));
      for (const [k, row] of old) walk(row, now.get(k), [...at, k], out);
      for (const [k, row] of now) if (!old.has(k)) walk(undefined, row, [...at, k], out);
      return;
    }
  }
  push(before, after);
}

/** Every changed field from `before` to `after`, in document order. */
export function diffConfig(before: unknown, after: unknown): ConfigChange[] {
  const out: ConfigChange[] = [];
  walk(before, after, [], out);
  return out;
}

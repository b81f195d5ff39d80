/**
 * The URL of a table is its state: sort, direction, page, page size, filters and hidden columns
 * live in the query string. One zod schema per table reads it; the page reads it leniently (a bad
 * value falls back to its default and is named in a notice), the CSV export strictly (422 naming
 * the field), so both run the very same query. Pure: imported by server and browser code.
 */
import { z } from "zod";
import { hasNoNul } from "@/lib/validation";

/** Next's `searchParams` or a URLSearchParams, as one string per key. */
export type RawParams = URLSearchParams | Record<string, string | string[] | undefined>;

export interface ParamProblem {
  field: string;
  message: string;
}

export const PAGE_SIZES = [25, 50, 100] as const;
export const DEFAULT_PAGE_SIZE = 50;
/** No page past this: a link that asks for more is refused to its default, never a slow scan. */
export const MAX_PAGE = 10_000;

/** The first value of each key; empty values are "not set" (an empty filter box submits `q=`). */
export function firstValues(raw: RawParams): Record<string, string> {
  const out: Record<string, string> = {};
  const entries: [string, string | string[] | undefined][] =
    raw instanceof URLSearchParams ? [...raw.entries()] : Object.entries(raw);
  for (const [key, value] of entries) {
    const v = Array.isArray(value) ? value[0] : value;
    if (v != null && v.trim() !== "" && !(key in out)) out[key] = v;
  }
  return out;
}

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

/** A calendar date as the shop writes it (yyyy-mm-dd), and a real one. */
export const isoDateParam = z
  .string()
  .regex(ISO_DATE, "must be a date written yyyy-mm-dd")
  .refine(
    (s) =>
      !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s),
    {
      message: "is not a real date",
    },
  );

/** A "1" flag (`?late=1`); anything else is a mistake the notice names. */
export const flagParam = z.literal("1", { message: 'must be "1" or left out' });

/** Free text to search for, trimmed, at most 100 characters. */
export const searchParam = z
  .string()
  .trim()
  .max(100, "must be at most 100 characters")
  .refine(hasNoNul, "must not contain a NUL character");

/** A sort column from a fixed list (anything else is named in the notice). */
export function sortParam<const S extends readonly [string, ...string[]]>(sorts: S, fallback: S[number]) {
  return z.enum(sorts, { message: `must be one of ${sorts.join(", ")}` }).default(fallback as never);
}

/** Direction, page and page size: the part every table shares. */
export function pagingShape(dir: "asc" | "desc") {
  return {
    dir: z.enum(["asc", "desc"], { message: 'must be "asc" or "desc"' }).default(dir),
    page: z.coerce
      .number({ message: "must be a whole number" })
      .int("must be a whole number")
      .min(1, "must be 1 or more")
      .max(MAX_PAGE, `must be at most ${MAX_PAGE}`)
      .default(1),
    size: z.coerce
      .number({ message: "must be a number" })
      .refine((n) => (PAGE_SIZES as readonly number[]).includes(n), {
        message: `must be one of ${PAGE_SIZES.join(", ")}`,
      })
      .default(DEFAULT_PAGE_SIZE),
  };
}

/** `hide=a,b`: columns the user switched off (only those that may be hidden). */
export function hideParam<C extends readonly [string, ...string[]]>(hideable: C) {
  return z
    .string()
    .transform((s) => s.split(",").filter(Boolean))
    .pipe(z.array(z.enum(hideable, { message: `names a column that is not one of ${hideable.join(", ")}` })))
    .default([]);
}

/** `from`–`to` the right way round; the issue is on `to`. */
export function dateRangeRefine(value: { from?: string; to?: string }, ctx: z.RefinementCtx): void {
  if (value.from && value.to && value.from > value.to)
    ctx.addIssue({ code: "custom", path: ["to"], message: "must not be before the start date" });
}

function issuesByField(error: z.ZodError): ParamProblem[] {
  const seen = new Set<string>();
  const out: ParamProblem[] = [];
  for (const issue of error.issues) {
    const field = String(issue.path[0] ?? "query");
    if (seen.has(field)) continue;
    seen.add(field);
    out.push({ field, message: issue.message });
  }
  return out;
}

/**
 * Reads a table's query leniently: each field that does not parse is dropped (its default applies)
 * and reported once, so an old or hand-typed link still shows a table. Unknown keys are ignored.
 */
export function parseTableQuery<T>(
  schema: z.ZodType<T>,
  raw: RawParams,
): { query: T; problems: ParamProblem[] } {
  const input: Record<string, string> = firstValues(raw);
  const problems: ParamProblem[] = [];
  for (let attempt = 0; attempt < 5; attempt++) {
    const result = schema.safeParse(input);
    if (result.success) return { query: result.data, problems };
    for (const p of issuesByField(result.error)) {
      problems.push(p);
      delete input[p.field];
    }
  }
  return { query: schema.parse({}), problems };
}

/** The same parse, strictly (for exports and JSON): any problem is a `{ field: message }` map. */
export function parseTableQueryStrict<T>(
  schema: z.ZodType<T>,
  raw: RawParams,
): { ok: true; query: T } | { ok: false; fields: Record<string, string> } {
  const { query, problems } = parseTableQuery(schema, raw);
  if (!problems.length) return { ok: true, query };
  return { ok: false, fields: Object.fromEntries(problems.map((p) => [p.field, p.message])) };
}

/** A LIKE pattern that finds `text` anywhere, its own % _ and \ taken literally. */
export function containsPattern(text: string): string {
  return `%${likeEscape(text)}%`;
}

/** Text for LIKE with its wildcards (`%`, `_`) and the escape character matched literally. */
export function likeEscape(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

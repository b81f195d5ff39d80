import "server-only";
import { stringify } from "csv-stringify/sync";
import { logger } from "@/lib/logger";
import type { CellContext, ColumnSpec } from "./columns";
import type { Page } from "./sql";

/** Rows fetched per statement while a file streams. */
export const EXPORT_BATCH = 2000;
/** A file never holds more than this many rows (the table's count says how many match). */
export const EXPORT_MAX_ROWS = 200_000;

/**
 * A cell a spreadsheet will not run: text starting with = + - @ (or a tab or carriage return, which
 * some programs skip before reading a formula) gets a leading apostrophe (OWASP "CSV injection").
 */
export function safeCell(value: string | number | null): string | number {
  if (value == null) return "";
  if (typeof value === "number") return value;
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/** Every row of a query, one page-sized statement at a time, in the table's order. */
export async function* allRows<R>(
  fetchPage: (limit: number, offset: number) => Promise<Page<R>>,
  first?: Page<R>,
): AsyncGenerator<R[]> {
  let offset = 0;
  let page = first ?? (await fetchPage(EXPORT_BATCH, 0));
  while (page.rows.length) {
    yield page.rows;
    offset += page.rows.length;
    if (page.rows.length < EXPORT_BATCH || offset >= EXPORT_MAX_ROWS) return;
    page = await fetchPage(EXPORT_BATCH, offset);
  }
}

/**
 * A CSV download streamed batch by batch (csv-stringify writes each batch; the next batch is read
 * only when the client has taken the last one, and a client that goes away stops the reading):
 * a header row of the columns' labels, then each row's cells. The first batch is read before the
 * answer starts, so a database that is down is a 503, not a cut-off file.
 */
export async function csvResponse<R>(
  filename: string,
  columns: readonly ColumnSpec<R>[],
  fetchPage: (limit: number, offset: number) => Promise<Page<R>>,
  ctx: CellContext,
): Promise<Response> {
  const first = await fetchPage(EXPORT_BATCH, 0);
  const batches = allRows(fetchPage, first);
  const encoder = new TextEncoder();
  let header = true;
  const body = new ReadableStream<Uint8Array>({
    async pull(controller) {
      try {
        const next = await batches.next();
        const records = next.done
          ? []
          : next.value.map((row) => columns.map((c) => safeCell(c.csv(row, ctx))));
        if (records.length || header)
          controller.enqueue(
            encoder.encode(stringify(records, { header, columns: columns.map((c) => c.label) })),
          );
        header = false;
        if (next.done) controller.close();
      } catch (err) {
        logger.error({ err }, "CSV export failed while streaming");
        controller.error(err);
      }
    },
    async cancel() {
      await batches.return(undefined);
    },
  });
  return new Response(body, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${filename}"`,
      "cache-control": "no-store",
      "x-total-count": String(first.total),
    },
  });
}

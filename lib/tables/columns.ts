import { centsToDecimal } from "../money";
import { formatTimestamp } from "../dates";

/** What a CSV cell needs beyond its row: the shop's time zone (lib/shop/locale.ts). */
export interface CellContext {
  timeZone: string;
}

/** What a table's column is, for the screen (label, sorting, hiding) and for its CSV file. Pure. */
export interface ColumnSpec<R> {
  id: string;
  label: string;
  /** Sorted by the server under the same name (`?sort=<id>`). */
  sortable: boolean;
  /** May be switched off in the column menu (the row's name never is). */
  hideable: boolean;
  align?: "right";
  /** The cell as it is written to the CSV file (plain text or a number, never markup). */
  csv: (row: R, ctx: CellContext) => string | number | null;
}

/** Money in a file: a plain decimal a spreadsheet sums (e.g. 1234.50). */
export const csvMoney = centsToDecimal;

/** A timestamp in a file and on screen: "2026-12-04 08:03", in the shop's time zone. */
export const shortTimestamp = (iso: string, timeZone: string) =>
  formatTimestamp(iso, timeZone, { zone: false });

/** The ids of the columns that may be hidden, as zod wants them (a non-empty tuple). */
export function hideableIds<R>(columns: readonly ColumnSpec<R>[]): [string, ...string[]] {
  const ids = columns.filter((c) => c.hideable).map((c) => c.id);
  return ids as [string, ...string[]];
}

/** The columns a file gets: the ones shown on screen (the same `hide` list). */
export function visibleColumns<R>(
  columns: readonly ColumnSpec<R>[],
  hide: readonly string[],
): ColumnSpec<R>[] {
  return columns.filter((c) => !c.hideable || !hide.includes(c.id));
}

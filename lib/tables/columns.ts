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
  csv: (row: R) => string | number | null;
}

/** Money in a file: a plain decimal a spreadsheet sums (e.g. 1234.50). */
export const csvMoney = (cents: number) => (cents / 100).toFixed(2);

/** A timestamp in a file and on screen: "2026-12-04 14:03" (UTC, as the floor screens show it). */
export const shortTimestamp = (iso: string) => iso.slice(0, 16).replace("T", " ");

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

"use client";
import { useMemo, useState } from "react";
import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
  type VisibilityState,
} from "@tanstack/react-table";
import { ArrowDown, ArrowUp, ArrowUpDown, Download, SearchX } from "lucide-react";
import { PAGE_SIZES } from "@/lib/tables/params";
import type { ColumnMeta } from "./columns";
import { ColumnMenu } from "./column-menu";
import { useTableUrl } from "./use-table-url";

export interface TableQueryState {
  sort: string;
  dir: "asc" | "desc";
  page: number;
  size: number;
  hide: string[];
}

const count = (n: number) => n.toLocaleString("en-US");

/** What a table page hands its table: this page's rows, how many match, the query, whether a filter is on. */
export interface TablePage<R> {
  rows: R[];
  total: number;
  query: TableQueryState;
  filtered: boolean;
}

/** What an empty table says: when nothing exists yet, and when the filters match nothing. */
export interface EmptyWords {
  none: { title: string; text: string };
  noMatch: { title: string; text?: string };
}

/**
 * A server-driven table: the server sorts, filters and pages (manual mode), this draws the page it
 * was given and turns clicks into new URLs. Headers sort (a button per sortable column, with
 * aria-sort), the column menu hides columns, the pager moves through pages; the export link asks
 * for every matching row as CSV with the same query.
 */
export function DataTable<R>({
  caption,
  columns,
  page: { rows, total, query, filtered },
  defaults,
  getRowId,
  exportHref,
  empty,
  rowClassName,
}: {
  caption: string;
  columns: ColumnDef<R>[];
  page: TablePage<R>;
  defaults: { sort: string; dir: "asc" | "desc" };
  getRowId: (row: R) => string;
  /** e.g. "/api/exports/orders": the current query is added. */
  exportHref?: string;
  empty: EmptyWords;
  rowClassName?: (row: R) => string | undefined;
}) {
  const { navigate, pending, searchParams } = useTableUrl();
  const words = filtered
    ? {
        title: empty.noMatch.title,
        text: empty.noMatch.text ?? "Loosen a filter or clear them all to see more.",
      }
    : empty.none;
  const sorting: SortingState = useMemo(() => [{ id: query.sort, desc: query.dir === "desc" }], [query]);
  // A column switched off disappears at once; the URL (replaced, not pushed) catches up.
  const urlHide = query.hide.join(",");
  const [chosen, setChosen] = useState<{ base: string; hide: string[] } | null>(null);
  // Once the URL has moved on, it alone says which columns are hidden (back and forward included).
  if (chosen && chosen.base !== urlHide) setChosen(null);
  const hide = chosen && chosen.base === urlHide ? chosen.hide : query.hide;
  const columnVisibility: VisibilityState = useMemo(
    () => Object.fromEntries(hide.map((id) => [id, false])),
    [hide],
  );
  const pageCount = Math.max(1, Math.ceil(total / query.size));

  // TanStack Table 8 hands back a mutable table object; the React Compiler leaves this component alone.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns,
    getRowId,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualFiltering: true,
    manualPagination: true,
    rowCount: total,
    enableSortingRemoval: false,
    state: { sorting, columnVisibility, pagination: { pageIndex: query.page - 1, pageSize: query.size } },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const s = next[0];
      if (!s) return;
      const dir = s.desc ? "desc" : "asc";
      const isDefault = s.id === defaults.sort && dir === defaults.dir;
      navigate({ sort: isDefault ? null : s.id, dir: isDefault ? null : dir });
    },
    onColumnVisibilityChange: (updater) => {
      const next = typeof updater === "function" ? updater(columnVisibility) : updater;
      const hidden = Object.entries(next)
        .filter(([, visible]) => !visible)
        .map(([id]) => id);
      setChosen({ base: urlHide, hide: hidden });
      navigate({ hide: hidden.length ? hidden.join(",") : null }, { replace: true, keepPage: true });
    },
  });

  const exportQuery = new URLSearchParams(searchParams.toString());
  exportQuery.delete("page");
  exportQuery.delete("size");
  const from = total === 0 ? 0 : (query.page - 1) * query.size + 1;
  const to = Math.min(total, query.page * query.size);
  const visible = table.getVisibleLeafColumns();

  return (
    <section
      aria-label={caption}
      aria-busy={pending}
      className={pending ? "opacity-70 transition-opacity" : ""}
    >
      <div className="no-print mb-2 flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm text-ink-muted" aria-live="polite">
          {total === 0 ? "No rows" : `${count(from)}–${count(to)} of ${count(total)}`}
          {pending && " · loading…"}
        </p>
        <div className="flex flex-wrap gap-2">
          <ColumnMenu table={table} />
          {exportHref && (
            <a
              href={`${exportHref}${exportQuery.size ? `?${exportQuery}` : ""}`}
              download
              className="btn-quiet py-1.5 no-underline"
            >
              <Download className="size-4" aria-hidden="true" /> Export CSV ({count(total)} rows)
            </a>
          )}
        </div>
      </div>
      <p className="mb-2 hidden text-sm print:block">
        {caption}: {total === 0 ? "no rows" : `rows ${count(from)}–${count(to)} of ${count(total)}`}
      </p>

      {rows.length === 0 ? (
        <div className="flex flex-col items-center card px-6 py-12 text-center">
          <SearchX className="size-10 text-steel-500" aria-hidden="true" />
          <h2 className="mt-3 text-lg font-semibold">{words.title}</h2>
          <p className="mt-1 max-w-md text-sm text-ink-muted">
            {total > 0 ? `There are only ${pageCount} page${pageCount === 1 ? "" : "s"}.` : words.text}
          </p>
          {total > 0 && (
            <button type="button" className="mt-4 btn-quiet" onClick={() => navigate({ page: null })}>
              Go to the first page
            </button>
          )}
        </div>
      ) : (
        <div className="relative overflow-x-auto card print:overflow-visible">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">{caption}</caption>
            <thead className="border-b border-line bg-paper-sunk text-xs tracking-wide text-ink-muted uppercase">
              {table.getHeaderGroups().map((group) => (
                <tr key={group.id}>
                  {group.headers.map((header, i) => {
                    const meta = header.column.columnDef.meta as ColumnMeta | undefined;
                    const sorted = header.column.getIsSorted();
                    const Icon = sorted === "asc" ? ArrowUp : sorted === "desc" ? ArrowDown : ArrowUpDown;
                    return (
                      <th
                        key={header.id}
                        scope="col"
                        aria-sort={
                          sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined
                        }
                        className={`px-4 py-2 whitespace-nowrap ${meta?.align === "right" ? "text-right" : ""} ${i === 0 ? "sticky left-0 z-10 bg-paper-sunk" : ""}`}
                      >
                        {header.column.getCanSort() ? (
                          <button
                            type="button"
                            className="inline-flex items-center gap-1 uppercase hover:text-ink"
                            onClick={() =>
                              header.column.toggleSorting(sorted ? sorted === "asc" : false, false)
                            }
                            title={`Sort by ${meta?.label ?? header.id}`}
                          >
                            {flexRender(header.column.columnDef.header, header.getContext())}
                            <Icon
                              className={`no-print size-3.5 ${sorted ? "text-ink" : "text-ink-muted/60"}`}
                              aria-hidden="true"
                            />
                          </button>
                        ) : (
                          flexRender(header.column.columnDef.header, header.getContext())
                        )}
                      </th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody className="divide-y divide-line">
              {table.getRowModel().rows.map((row) => (
                <tr key={row.id} className={rowClassName?.(row.original)}>
                  {row.getVisibleCells().map((cell, i) => {
                    const meta = cell.column.columnDef.meta as ColumnMeta | undefined;
                    return (
                      <td
                        key={cell.id}
                        className={`px-4 py-2 ${meta?.align === "right" ? "text-right tabular-nums" : ""} ${i === 0 ? "sticky left-0 bg-paper-raised font-medium" : ""}`}
                      >
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    );
                  })}
                </tr>
              ))}
            </tbody>
          </table>
          {visible.length === 0 && <p className="p-4 text-sm">Every column is hidden.</p>}
        </div>
      )}

      <nav
        aria-label={`${caption}: pages`}
        className="no-print mt-3 flex flex-wrap items-center justify-between gap-3 text-sm"
      >
        <div className="flex items-center gap-2">
          <button
            type="button"
            className="btn-quiet py-1.5"
            disabled={query.page <= 1 || pending}
            onClick={() => navigate({ page: query.page - 1 > 1 ? String(query.page - 1) : null })}
          >
            Previous
          </button>
          <span>
            Page {count(query.page)} of {count(pageCount)}
          </span>
          <button
            type="button"
            className="btn-quiet py-1.5"
            disabled={query.page >= pageCount || pending}
            onClick={() => navigate({ page: String(query.page + 1) })}
          >
            Next
          </button>
        </div>
        <label className="flex items-center gap-2">
          Rows per page
          <select
            className="field-input w-auto py-1 text-sm"
            value={query.size}
            onChange={(e) => navigate({ size: e.target.value === "50" ? null : e.target.value })}
          >
            {PAGE_SIZES.map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
        </label>
      </nav>
    </section>
  );
}

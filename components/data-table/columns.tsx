"use client";
import type { ColumnDef } from "@tanstack/react-table";
import type { ColumnSpec } from "@/lib/tables/columns";
import { useShopLocale } from "@/components/shop-locale";

export interface ColumnMeta {
  align?: "right";
  label: string;
}

/**
 * TanStack column definitions from a table's column specs (lib/tables/*-spec.ts): the label, whether
 * the server sorts it, whether it may be hidden; a cell shows `cells[id]` or else the file's text.
 */
export function tableColumns<R>(
  specs: readonly ColumnSpec<R>[],
  cells: Partial<Record<string, (row: R) => React.ReactNode>> = {},
): ColumnDef<R>[] {
  return specs.map((spec) => ({
    id: spec.id,
    // The file's text: TanStack sorts only columns with an accessor (the server does the sorting).
    // (A sort key only, never shown: UTC keeps it stable.)
    accessorFn: (row: R) => spec.csv(row, { timeZone: "UTC" }),
    header: spec.label,
    enableSorting: spec.sortable,
    enableHiding: spec.hideable,
    meta: { align: spec.align, label: spec.label } satisfies ColumnMeta,
    cell: ({ row }) => {
      const custom = cells[spec.id];
      if (custom) return custom(row.original);
      return <FileText spec={spec} row={row.original} />;
    },
  }));
}

/** A cell with the file's text, in the shop's time zone. */
function FileText<R>({ spec, row }: { spec: ColumnSpec<R>; row: R }) {
  const { timeZone } = useShopLocale();
  const v = spec.csv(row, { timeZone });
  return v == null || v === "" ? <span className="text-ink-muted">—</span> : v;
}

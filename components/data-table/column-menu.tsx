"use client";
import type { Table } from "@tanstack/react-table";
import { Columns3 } from "lucide-react";
import type { ColumnMeta } from "./columns";

/** "Columns": a disclosure (keyboard: Enter/Space opens it, Tab moves through the ticks). */
export function ColumnMenu<R>({ table }: { table: Table<R> }) {
  const hideable = table.getAllLeafColumns().filter((c) => c.getCanHide());
  const hidden = hideable.filter((c) => !c.getIsVisible()).length;
  return (
    <details className="relative">
      <summary className="btn-quiet cursor-pointer list-none py-1.5">
        <Columns3 className="size-4" aria-hidden="true" /> Columns{hidden ? ` (${hidden} hidden)` : ""}
      </summary>
      <fieldset className="absolute right-0 z-20 mt-1 w-56 card p-3 shadow-lg">
        <legend className="sr-only">Columns to show</legend>
        {hideable.map((c) => (
          <label key={c.id} className="flex items-center gap-2 py-1 text-sm">
            <input
              type="checkbox"
              className="size-4 accent-steel-700"
              checked={c.getIsVisible()}
              onChange={c.getToggleVisibilityHandler()}
            />
            {(c.columnDef.meta as ColumnMeta | undefined)?.label ?? c.id}
          </label>
        ))}
        {hidden > 0 && (
          <button
            type="button"
            className="mt-2 text-sm underline"
            onClick={() => table.resetColumnVisibility()}
          >
            Show every column
          </button>
        )}
      </fieldset>
    </details>
  );
}

"use client";
import { Search } from "lucide-react";
import { filterKeys as names, filterNames, type FilterSpec } from "@/lib/tables/filters";
import { useTableUrl } from "./use-table-url";

/**
 * The filters above a table, in one form: a choice in a list or a tick applies at once; typed
 * text and dates apply with Enter or "Apply". Re-drawn from the URL on every navigation, so the
 * back button shows the filters of the page it returns to.
 */
export function FilterBar({ filters, idPrefix }: { filters: FilterSpec[]; idPrefix: string }) {
  const { navigate, searchParams } = useTableUrl();
  const current = (name: string) => searchParams.get(name) ?? "";

  function apply(form: HTMLFormElement) {
    const data = new FormData(form);
    const changes: Record<string, string | null> = {};
    for (const f of filters)
      for (const name of names(f)) {
        const v = data.get(name);
        changes[name] =
          f.kind === "flag" ? (v ? "1" : null) : typeof v === "string" && v.trim() ? v.trim() : null;
      }
    navigate(changes);
  }

  const active = filterNames(filters).some((n) => searchParams.has(n));
  return (
    <form
      key={searchParams.toString()}
      role="search"
      aria-label="Filters"
      className="no-print mb-4 flex flex-wrap items-end gap-3 card p-3"
      onSubmit={(e) => {
        e.preventDefault();
        apply(e.currentTarget);
      }}
    >
      {filters.map((f) => {
        const id = `${idPrefix}-${names(f).join("-")}`;
        switch (f.kind) {
          case "search":
            return (
              <div key={id} className="min-w-80 flex-1">
                <div className="mb-1 flex flex-wrap items-baseline gap-x-2">
                  <label htmlFor={id} className="field-label mb-0">
                    {f.label}
                  </label>
                  {f.hint && (
                    <span id={`${id}-hint`} className="text-sm text-ink-muted">
                      {f.hint}
                    </span>
                  )}
                </div>
                <div className="relative">
                  <Search
                    className="pointer-events-none absolute top-2.5 left-2.5 size-4 text-ink-muted"
                    aria-hidden="true"
                  />
                  <input
                    id={id}
                    name={f.name}
                    type="search"
                    defaultValue={current(f.name)}
                    placeholder={f.placeholder}
                    aria-describedby={f.hint ? `${id}-hint` : undefined}
                    maxLength={100}
                    className="field-input py-1.5 pl-8 text-sm"
                  />
                </div>
              </div>
            );
          case "select":
            return (
              <div key={id}>
                <label htmlFor={id} className="field-label">
                  {f.label}
                </label>
                <select
                  id={id}
                  name={f.name}
                  defaultValue={current(f.name)}
                  className="field-input py-1.5 text-sm"
                  onChange={(e) => apply(e.currentTarget.form!)}
                >
                  <option value="">{f.allLabel}</option>
                  {f.options.map((o) => (
                    <option key={o.value} value={o.value}>
                      {o.label}
                    </option>
                  ))}
                </select>
              </div>
            );
          case "flag":
            return (
              <label key={id} htmlFor={id} className="flex items-center gap-2 py-2 text-sm font-medium">
                <input
                  id={id}
                  name={f.name}
                  type="checkbox"
                  value="1"
                  defaultChecked={current(f.name) === "1"}
                  className="size-4 accent-steel-700"
                  onChange={(e) => apply(e.currentTarget.form!)}
                />
                {f.label}
              </label>
            );
          case "date-range":
            return (
              <fieldset key={id} className="flex items-end gap-2">
                <legend className="field-label">{f.label}</legend>
                <label className="sr-only" htmlFor={`${id}-from`}>
                  {f.label}: from
                </label>
                <input
                  id={`${id}-from`}
                  name={f.from}
                  type="date"
                  defaultValue={current(f.from)}
                  className="field-input py-1.5 text-sm"
                />
                <span aria-hidden="true" className="pb-2 text-ink-muted">
                  –
                </span>
                <label className="sr-only" htmlFor={`${id}-to`}>
                  {f.label}: to
                </label>
                <input
                  id={`${id}-to`}
                  name={f.to}
                  type="date"
                  defaultValue={current(f.to)}
                  className="field-input py-1.5 text-sm"
                />
              </fieldset>
            );
        }
      })}
      <div className="flex gap-2">
        <button type="submit" className="btn-primary py-1.5">
          Apply
        </button>
        {active && (
          <button
            type="button"
            className="btn-quiet py-1.5"
            onClick={() => navigate(Object.fromEntries(filterNames(filters).map((n) => [n, null])))}
          >
            Clear filters
          </button>
        )}
      </div>
    </form>
  );
}

/** A table's filters, as plain data: the server page describes them, the filter bar draws them. Pure. */
export type FilterSpec =
  | {
      kind: "search";
      name: string;
      label: string;
      placeholder?: string;
      /** What the search looks in, shown under the label (a placeholder is cut off on a phone). */
      hint?: string;
    }
  | {
      kind: "select";
      name: string;
      label: string;
      allLabel: string;
      options: { value: string; label: string }[];
    }
  | { kind: "flag"; name: string; label: string }
  | { kind: "date-range"; label: string; from: string; to: string };

/** The query keys one filter owns. */
export const filterKeys = (f: FilterSpec) => (f.kind === "date-range" ? [f.from, f.to] : [f.name]);

/** Every query key the filters own (cleared by "Clear filters"). */
export function filterNames(filters: FilterSpec[]): string[] {
  return filters.flatMap(filterKeys);
}

import { describeChange } from "@/lib/catalogue/describe";
import type { ConfigChange } from "@/lib/catalogue/diff";

/**
 * Changes of the configuration as a table: what changed, before → after ("(new)", "(removed)").
 * The save dialog shows the pending ones, the history each version's.
 */
export function ChangesTable({
  changes,
  currency,
  caption,
  sticky = false,
}: {
  changes: readonly ConfigChange[];
  currency: string;
  caption: string;
  /** Headings stay in view while the list scrolls (the dialog's box). */
  sticky?: boolean;
}) {
  const cell = "px-3 py-1.5";
  return (
    <table className="w-full text-left text-sm">
      <caption className="sr-only">{caption}</caption>
      <thead className={`text-xs text-ink-muted uppercase ${sticky ? "sticky top-0 bg-paper-sunk" : ""}`}>
        <tr>
          {["Changed", "Before", "After"].map((h) => (
            <th key={h} scope="col" className={cell}>
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody className="divide-y divide-line">
        {changes.map((c) => {
          const w = describeChange(c, currency);
          return (
            <tr key={c.path}>
              <td className={cell}>{w.where}</td>
              <td className={`${cell} text-ink-muted`}>{w.kind === "added" ? "(new)" : w.before}</td>
              <td className={`${cell} font-medium`}>{w.kind === "removed" ? "(removed)" : w.after}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

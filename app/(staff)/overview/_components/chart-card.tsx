import type { ReactNode } from "react";

/**
 * A chart with its title and a one-line summary; the same figures as a table for screen readers
 * and for print (the drawing itself is hidden from both), or an empty state when there is nothing.
 */
export function ChartCard({
  id,
  title,
  summary,
  empty,
  chart,
  table,
}: {
  id: string;
  title: string;
  summary: string;
  /** Shown instead of the chart when there is no data yet. */
  empty: string | null;
  chart: ReactNode;
  table: { caption: string; headings: string[]; rows: (string | number)[][] };
}) {
  return (
    <section aria-labelledby={id} className="break-inside-avoid card p-4">
      <h3 id={id} className="font-semibold">
        {title}
      </h3>
      <p className="mt-1 text-sm text-ink-muted">{summary}</p>
      {empty ? (
        <p className="mt-4 rounded-md bg-paper-sunk px-4 py-8 text-center text-sm text-ink-muted">{empty}</p>
      ) : (
        <>
          <div className="mt-3 print:hidden" aria-hidden="true">
            {chart}
          </div>
          {/* The box is what hides: a table ignores sr-only's 1px width and lays out as wide as its
              rows, widening the page beyond the screen. */}
          <div className="sr-only print:not-sr-only">
            <table className="mt-3 w-full text-left text-sm">
              <caption className="sr-only">{table.caption}</caption>
              <thead>
                <tr>
                  {table.headings.map((h) => (
                    <th key={h} scope="col" className="px-2 py-1">
                      {h}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {table.rows.map((r, i) => (
                  <tr key={i}>
                    {r.map((c, j) => (
                      <td key={j} className="px-2 py-1 tabular-nums">
                        {c}
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
    </section>
  );
}

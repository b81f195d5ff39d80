export type Heading = string | { label: string; align?: "left" | "right"; srOnly?: boolean };

/** Padding of a body cell in a TableCard. */
export const CELL = "px-4 py-2";

/**
 * A data table in a card that scrolls sideways on narrow screens. `children` are the body rows;
 * the caption is for screen readers. `dense`: narrower columns with headings on one line (tables
 * of inputs, such as the catalogue editor's).
 */
export function TableCard({
  caption,
  headings,
  dense = false,
  children,
}: {
  caption: string;
  headings: Heading[];
  dense?: boolean;
  children: React.ReactNode;
}) {
  const th = dense ? "px-2 py-2 font-semibold whitespace-nowrap" : CELL;
  return (
    <div className="relative overflow-x-auto card">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-line bg-paper-sunk text-xs tracking-wide text-ink-muted uppercase">
          <tr>
            {headings.map((h) => {
              const { label, align, srOnly } =
                typeof h === "string" ? { label: h, align: "left", srOnly: false } : h;
              return (
                <th key={label} scope="col" className={`${th} ${align === "right" ? "text-right" : ""}`}>
                  {srOnly ? <span className="sr-only">{label}</span> : label}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody className="divide-y divide-line">{children}</tbody>
      </table>
    </div>
  );
}

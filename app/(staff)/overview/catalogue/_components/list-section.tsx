"use client";
import { useFieldArray, type ArrayPath } from "react-hook-form";
import { TableCard } from "@/components/ui/table-card";
import type { ShopConfigDocumentInput } from "@/lib/catalogue/schemas";
import { NumberInput, SelectInput, TextInput, type Path } from "./editor-inputs";
import { AddButton, RemoveButton, Section, TD, useRowName } from "./editor-sections";

export type Option = { value: string; label: string };

/**
 * One column of a catalogue list: its heading, the field it edits and how. An input is labelled
 * "<label> of <row>" (or by `rowLabel`), so every box in the table has its own accessible name.
 */
export type Column = {
  key: string;
  heading: string;
  label?: string;
  rowLabel?: (row: string) => string;
  className?: string;
} & (
  | { kind: "text"; mono?: boolean }
  /** `optional`: an empty box is no figure (shown as —). `hint`: the inches under a millimetre box. */
  | { kind: "number"; money?: boolean; optional?: boolean; hint?: (value: number) => string }
  | { kind: "select"; options: readonly Option[] }
);

type List = Extract<
  ArrayPath<ShopConfigDocumentInput>,
  `catalogue.${"materials" | "tubes" | "endFittings" | "jointSeries" | "slipYokes" | "centreBearings"}`
>;

function Cell({ base, row, column }: { base: string; row: string; column: Column }) {
  const name = `${base}.${column.key}` as Path;
  const label = column.rowLabel?.(row) ?? `${column.label ?? column.heading} of ${row}`;
  const common = { name, label, className: column.className };
  switch (column.kind) {
    case "text":
      return <TextInput {...common} mono={column.mono} />;
    case "select":
      return <SelectInput {...common} options={column.options} />;
    case "number":
      return (
        <NumberInput
          {...common}
          money={column.money}
          hint={column.hint}
          placeholder={column.optional ? "—" : undefined}
        />
      );
  }
}

function Row({
  list,
  index,
  noun,
  columns,
  onRemove,
}: {
  list: List;
  index: number;
  noun: string;
  columns: readonly Column[];
  onRemove: () => void;
}) {
  const base = `${list}.${index}`;
  const row = useRowName(`${base}.id` as Path, noun, index);
  return (
    <tr>
      {columns.map((c) => (
        <td key={c.key} className={TD}>
          <Cell base={base} row={row} column={c} />
        </td>
      ))}
      <td className={TD}>
        <RemoveButton label={`Remove ${row}`} onClick={onRemove} />
      </td>
    </tr>
  );
}

/**
 * A catalogue list (materials, tubes, fittings…) as one editable table: a row per item, a box per
 * column, "Add" appends a blank row and puts the cursor in its id, each row can be removed.
 */
export function ListSection({
  list,
  id,
  title,
  description,
  caption,
  noun,
  addLabel,
  blank,
  columns,
  empty,
}: {
  list: List;
  id: string;
  title: string;
  description: string;
  caption: string;
  /** What one row is called in labels ("tube YL-T-…", "new tube, row 4"). */
  noun: string;
  addLabel: string;
  /** A new row's starting values. */
  blank: () => Record<string, unknown>;
  columns: readonly Column[];
  /** Shown instead of an empty table. */
  empty?: React.ReactNode;
}) {
  const { fields, append, remove } = useFieldArray<ShopConfigDocumentInput, List>({ name: list });
  return (
    <Section
      id={id}
      title={`${title} (${fields.length})`}
      description={description}
      action={
        <AddButton
          label={addLabel}
          onClick={() => append(blank() as never, { focusName: `${list}.${fields.length}.id` })}
        />
      }
    >
      {fields.length === 0 && empty ? (
        <p className="card p-5 text-sm text-ink-muted">{empty}</p>
      ) : (
        <TableCard
          dense
          caption={caption}
          headings={[
            ...columns.map((c) => ({
              label: c.heading,
              align: c.kind === "number" ? ("right" as const) : undefined,
            })),
            { label: "Remove", srOnly: true },
          ]}
        >
          {fields.map((f, i) => (
            <Row key={f.id} list={list} index={i} noun={noun} columns={columns} onRemove={() => remove(i)} />
          ))}
        </TableCard>
      )}
    </Section>
  );
}

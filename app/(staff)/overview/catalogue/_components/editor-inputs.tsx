"use client";
import { useId, useState } from "react";
import { useController, type FieldPath } from "react-hook-form";
import type { ShopConfigDocumentInput } from "@/lib/catalogue/schemas";

export type Path = FieldPath<ShopConfigDocumentInput>;

const CELL_INPUT =
  "block w-full min-w-0 rounded-md border border-line-strong bg-white px-2 py-1.5 text-sm text-ink tabular-nums focus:border-steel-600 focus:outline-2 focus:outline-offset-0 focus:outline-brass-400 aria-[invalid=true]:border-fail aria-[invalid=true]:bg-fail-soft";

/** The message under a field, tied to it for screen readers. */
function FieldMessage({ id, error, hint }: { id: string; error?: string; hint?: string }) {
  return (
    <>
      {hint && !error && (
        <span id={`${id}-hint`} className="mt-0.5 block text-xs whitespace-nowrap text-ink-muted">
          {hint}
        </span>
      )}
      {error && (
        <span id={`${id}-error`} className="mt-0.5 block min-w-40 text-xs text-fail">
          {error}
        </span>
      )}
    </>
  );
}

/**
 * A form field's controller with what its box needs: an id, the accessible name (when the label is
 * not shown), invalid state and the message it is described by.
 */
function useBox(name: Path, label: string, visibleLabel?: boolean, hint?: string) {
  const { field, fieldState } = useController<ShopConfigDocumentInput>({ name });
  const id = useId();
  const error = fieldState.error?.message;
  const box = {
    id,
    ref: field.ref,
    name: field.name,
    onBlur: field.onBlur,
    "aria-label": visibleLabel ? undefined : label,
    "aria-invalid": error ? true : undefined,
    "aria-describedby": error ? `${id}-error` : hint ? `${id}-hint` : undefined,
  } as const;
  return { field, fieldState, id, error, box };
}

/** A box with its visible label (when asked) above and its message below. */
function Labelled({
  id,
  label,
  visibleLabel,
  className,
  error,
  hint,
  children,
}: {
  id: string;
  label: string;
  visibleLabel?: boolean;
  className?: string;
  error?: string;
  hint?: string;
  children: React.ReactNode;
}) {
  return (
    <div className={className}>
      {visibleLabel && (
        <label htmlFor={id} className="field-label">
          {label}
        </label>
      )}
      {children}
      <FieldMessage id={id} error={error} hint={hint} />
    </div>
  );
}

/** Up to 10 significant digits: 3 × 25.4 shows as 76.2, not 76.19999999999999. */
const tidy = (n: number) => String(Number(n.toPrecision(10)));

function format(value: unknown, money: boolean): string {
  if (typeof value !== "number" || !Number.isFinite(value)) return "";
  return money ? (value / 100).toFixed(2) : tidy(value);
}

/** Text → number as typed; empty → `empty`; what is not a number stays NaN (the schema names it). */
function parse(text: string, money: boolean, empty: undefined | null): number | undefined | null {
  const t = text.trim().replace(/[,$\s]/g, "");
  if (t === "") return empty;
  const n = Number(t);
  if (!money || !Number.isFinite(n)) return n;
  const cents = n * 100;
  // Keep a true fraction of a cent visible to the schema ("a whole number of cents").
  return Math.abs(cents - Math.round(cents)) < 1e-6 ? Math.round(cents) : cents;
}

interface NumberInputProps {
  name: Path;
  label: string;
  /** Dollars on screen, cents in the form. */
  money?: boolean;
  /** What an empty box means: undefined (optional figure) or null (use the default). */
  empty?: undefined | null;
  hint?: (value: number) => string;
  className?: string;
  visibleLabel?: boolean;
  placeholder?: string;
}

/**
 * A number box. Shows the value tidily and keeps what the person types until it is a different
 * number, so untouched values are saved exactly as they were.
 */
export function NumberInput({
  name,
  label,
  money = false,
  empty,
  hint,
  className,
  visibleLabel,
  placeholder,
}: NumberInputProps) {
  const { field, error, box, id } = useBox(name, label, visibleLabel);
  const fieldValue = field.value;
  const [text, setText] = useState(() => format(fieldValue, money));
  const [seen, setSeen] = useState<unknown>(fieldValue);
  if (!Object.is(seen, fieldValue)) {
    // Follows a value set from outside (a reset, "back to the reference"), not one being typed.
    setSeen(fieldValue);
    if (!Object.is(parse(text, money, empty), fieldValue)) setText(format(fieldValue, money));
  }
  const hintText =
    hint && typeof fieldValue === "number" && Number.isFinite(fieldValue) ? hint(fieldValue) : undefined;
  return (
    <Labelled {...{ id, label, visibleLabel, className, error }} hint={hintText}>
      <div className="relative">
        {money && (
          <span className="pointer-events-none absolute top-1/2 left-2 -translate-y-1/2 text-sm text-ink-muted">
            $
          </span>
        )}
        <input
          {...box}
          aria-describedby={error ? `${id}-error` : hintText ? `${id}-hint` : undefined}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          className={`${CELL_INPUT} text-right ${money ? "pl-5" : ""}`}
          value={text}
          placeholder={placeholder}
          onChange={(e) => {
            setText(e.target.value);
            field.onChange(parse(e.target.value, money, empty));
          }}
        />
      </div>
    </Labelled>
  );
}

export function TextInput({
  name,
  label,
  className,
  visibleLabel,
  mono,
  placeholder,
}: {
  name: Path;
  label: string;
  className?: string;
  visibleLabel?: boolean;
  mono?: boolean;
  placeholder?: string;
}) {
  const { field, error, box, id } = useBox(name, label, visibleLabel);
  return (
    <Labelled {...{ id, label, visibleLabel, className, error }}>
      <input
        {...box}
        type="text"
        autoComplete="off"
        className={`${CELL_INPUT} ${mono ? "font-mono text-xs" : ""}`}
        value={typeof field.value === "string" ? field.value : ""}
        placeholder={placeholder}
        onChange={(e) => field.onChange(e.target.value)}
      />
    </Labelled>
  );
}

export function SelectInput({
  name,
  label,
  options,
  className,
  visibleLabel,
}: {
  name: Path;
  label: string;
  options: readonly { value: string; label: string }[];
  className?: string;
  visibleLabel?: boolean;
}) {
  const { field, error, box, id } = useBox(name, label, visibleLabel);
  const value = typeof field.value === "string" ? field.value : "";
  const known = options.some((o) => o.value === value);
  return (
    <Labelled {...{ id, label, visibleLabel, className, error }}>
      <select {...box} className={CELL_INPUT} value={value} onChange={(e) => field.onChange(e.target.value)}>
        {!known && <option value={value}>{value ? `${value} (not in this catalogue)` : "Choose…"}</option>}
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </Labelled>
  );
}

/** A routing step's instructions: one per line in the box, a list in the form. */
export function LinesInput({ name, label }: { name: Path; label: string }) {
  const { field, fieldState, box, id } = useBox(name, label);
  const lines = Array.isArray(field.value) ? (field.value as string[]) : [];
  const [text, setText] = useState(() => lines.join("\n"));
  // zod names a line by its index (instructions.2): show the first such message.
  const error =
    fieldState.error?.message ??
    (fieldState.error
      ? Object.values(fieldState.error as Record<string, { message?: string }>).find((e) => e?.message)
          ?.message
      : undefined);
  return (
    <Labelled id={id} label={label} error={error}>
      <textarea
        {...box}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        rows={Math.min(5, Math.max(2, lines.length + 1))}
        className={`${CELL_INPUT} min-w-64 text-left`}
        value={text}
        onChange={(e) => {
          setText(e.target.value);
          field.onChange(
            e.target.value
              .split("\n")
              .map((l) => l.trim())
              .filter(Boolean),
          );
        }}
      />
    </Labelled>
  );
}

export function CheckboxInput({ name, label }: { name: Path; label: string }) {
  const {
    field: { ref, value: fieldValue, onChange, onBlur },
  } = useController<ShopConfigDocumentInput>({ name });
  const id = useId();
  return (
    <div className="flex items-center gap-2">
      <input
        id={id}
        ref={ref}
        type="checkbox"
        className="size-4"
        checked={fieldValue === true}
        onChange={(e) => onChange(e.target.checked)}
        onBlur={onBlur}
      />
      <label htmlFor={id} className="text-sm">
        {label}
      </label>
    </div>
  );
}

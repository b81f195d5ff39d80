"use client";

import { useId, useState } from "react";
import { formatInUnits, parseInUnits, type DisplayQuantity, type SiNumber, type UnitSystem } from "./model";
import { DISPLAY_UNITS } from "./model";

interface NumberFieldProps {
  label: string;
  /** SI value held by the form. */
  value: SiNumber;
  onChange: (si: SiNumber) => void;
  onBlur?: () => void;
  /** Converted for display in `system`; null for unit-free numbers (angles in °, ratios, rpm). */
  quantity: DisplayQuantity | null;
  system: UnitSystem;
  /** Unit shown for unit-free numbers ("°", "rpm", ": 1"). */
  unit?: string;
  error?: string;
  hint?: string;
  name: string;
  children?: React.ReactNode;
}

const plain = (v: SiNumber) => (v == null || Number.isNaN(v) ? "" : String(Number(v.toFixed(4))));

/**
 * A number input that shows the SI value in the chosen units, rounded for display, and
 * converts only what the user types (leaving, or switching units, never rewrites the value).
 */
export function NumberField({
  label,
  value,
  onChange,
  onBlur,
  quantity,
  system,
  unit,
  error,
  hint,
  name,
  children,
}: NumberFieldProps) {
  const id = useId();
  const [text, setText] = useState<string | null>(null);
  const shown = text ?? (quantity ? formatInUnits(value, quantity, system) : plain(value));
  const unitText = quantity ? DISPLAY_UNITS[quantity][system].unit : unit;
  const describedBy = [
    unitText ? `${id}-unit` : null,
    hint ? `${id}-hint` : null,
    error ? `${id}-error` : null,
  ]
    .filter(Boolean)
    .join(" ");
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <div className="flex items-stretch">
        <input
          id={id}
          name={name}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          className={`field-input tabular-nums ${unitText ? "rounded-r-none" : ""}`}
          value={shown}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy || undefined}
          onFocus={() => setText(shown)}
          onChange={(e) => {
            setText(e.target.value);
            onChange(parseInUnits(e.target.value, quantity, system));
          }}
          onBlur={() => {
            // Keep text the user must correct; otherwise show the value in display form again.
            if (!(value != null && Number.isNaN(value))) setText(null);
            onBlur?.();
          }}
        />
        {unitText && (
          <span
            id={`${id}-unit`}
            className="inline-flex min-w-12 items-center justify-center rounded-r-md border border-l-0 border-line-strong bg-paper-sunk px-2 text-sm text-ink-soft"
          >
            {unitText}
          </span>
        )}
      </div>
      {hint && (
        <p id={`${id}-hint`} className="field-hint">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="field-error [overflow-wrap:anywhere]">
          {error}
        </p>
      )}
      {children}
    </div>
  );
}

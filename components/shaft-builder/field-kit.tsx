"use client";

import { useId, useState } from "react";
import { ChevronRight } from "lucide-react";
import type { Control, Path, UseFormRegister, UseFormSetValue } from "react-hook-form";
import type { Catalogue } from "@/lib/driveline";
import type { GuideTopic } from "./measuring-guide";
import type { BuilderForm, DisplayQuantity, UnitSystem } from "./model";

export interface NumberOptions {
  unit?: string;
  hint?: string;
  guide?: GuideTopic;
  error?: string;
}

/**
 * What the builder hands its field groups (the groups live in files beside shaft-builder.tsx):
 * the form's helpers, its current values, the core's field errors and the shop's catalogue.
 */
export interface FieldKit {
  num: (
    name: Path<BuilderForm>,
    label: string,
    quantity: DisplayQuantity | null,
    opts?: NumberOptions,
  ) => React.ReactNode;
  values: BuilderForm;
  /** Form path → the core's message. */
  errs: Record<string, string>;
  register: UseFormRegister<BuilderForm>;
  setValue: UseFormSetValue<BuilderForm>;
  control: Control<BuilderForm>;
  /** A measuring guide (nothing in the counter's compact layout). */
  guide: (topic: GuideTopic) => React.ReactNode;
  markChanged: () => void;
  catalogue: Catalogue;
  system: UnitSystem;
  compact: boolean;
}

/** A labelled select bound to the form, with its hint and the core's error naming the field. */
export function SelectField({
  kit,
  name,
  label,
  options,
  hint,
  error,
}: {
  kit: FieldKit;
  name: Path<BuilderForm>;
  label: string;
  options: readonly (readonly [value: string, text: string])[];
  hint?: string;
  error?: string;
}) {
  const id = useId();
  const message = error ?? kit.errs[name];
  const describedBy = [hint ? `${id}-hint` : null, message ? `${id}-error` : null].filter(Boolean).join(" ");
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <select
        id={id}
        className="field-input"
        aria-invalid={message ? true : undefined}
        aria-describedby={describedBy || undefined}
        {...kit.register(name, { onChange: kit.markChanged })}
      >
        {options.map(([value, text]) => (
          <option key={value} value={value}>
            {text}
          </option>
        ))}
      </select>
      {hint && (
        <p id={`${id}-hint`} className="field-hint">
          {hint}
        </p>
      )}
      {message && (
        <p id={`${id}-error`} className="field-error [overflow-wrap:anywhere]">
          {message}
        </p>
      )}
    </div>
  );
}

/** Radio choices registered on a form field that always holds one of them (one per line). */
export function RadioChoices({
  kit,
  name,
  choices,
}: {
  kit: FieldKit;
  name: "speedMode" | "tubeMode";
  choices: readonly (readonly [value: string, text: string])[];
}) {
  return choices.map(([value, text]) => (
    <label key={value} className="flex items-center gap-2 text-sm">
      <input
        type="radio"
        value={value}
        className="size-4 accent-steel-700"
        {...kit.register(name, { onChange: kit.markChanged })}
      />
      {text}
    </label>
  ));
}

/** Two or more radio choices bound to a form field that may be "" (shown as the first choice). */
export function ChoiceField<V extends string>({
  kit,
  legend,
  value,
  choices,
  onChoose,
  hint,
}: {
  kit: FieldKit;
  legend: string;
  value: V | "";
  choices: readonly (readonly [value: V, text: string])[];
  onChoose: (v: V) => void;
  hint?: string;
}) {
  const name = useId();
  const current = value || choices[0]?.[0];
  return (
    <fieldset className="space-y-1">
      <legend className="field-label">{legend}</legend>
      <div className={kit.compact ? "flex flex-wrap gap-x-4 gap-y-1" : "space-y-1"}>
        {choices.map(([v, text]) => (
          <label key={v} className="flex items-center gap-2 text-sm">
            <input
              type="radio"
              name={name}
              value={v}
              checked={current === v}
              onChange={() => {
                onChoose(v);
                kit.markChanged();
              }}
              className="size-4 accent-steel-700"
            />
            {text}
          </label>
        ))}
      </div>
      {hint && <p className="field-hint">{hint}</p>}
    </fieldset>
  );
}

/**
 * An optional group folded away so the simple case stays simple. It opens by itself when it
 * holds values (a loaded file, a draft) and stays open while one of its fields is in error.
 */
export function FieldGroup({
  title,
  summary,
  filled,
  hasError,
  children,
  testId,
}: {
  title: string;
  /** A short line beside the title ("optional: lets the shop match the slip yoke"). */
  summary?: string;
  filled: boolean;
  hasError: boolean;
  children: React.ReactNode;
  testId?: string;
}) {
  const [open, setOpen] = useState(filled || hasError);
  const shown = open || hasError;
  return (
    <details
      className="group/fg rounded-md border border-line"
      open={shown}
      onToggle={(e) => setOpen(e.currentTarget.open)}
      data-testid={testId}
    >
      <summary className="flex cursor-pointer items-center gap-2 px-3 py-2 text-sm font-semibold marker:content-none">
        <ChevronRight
          className="size-4 shrink-0 transition-transform group-open/fg:rotate-90"
          aria-hidden="true"
        />
        <span>
          {title}
          {summary && <span className="ml-1 font-normal text-ink-muted">— {summary}</span>}
          {filled && !shown && <span className="ml-1 font-normal text-steel-700">(filled in)</span>}
        </span>
      </summary>
      <div className="space-y-4 border-t border-line px-3 pt-3 pb-3">{children}</div>
    </details>
  );
}

/** True when any of the form paths has an error. */
export const anyError = (errs: Record<string, string>, prefix: string) =>
  Object.keys(errs).some((k) => k === prefix || k.startsWith(`${prefix}.`));

"use client";

import { Controller, type Path, type UseFormReturn } from "react-hook-form";
import type { Catalogue } from "@/lib/driveline";
import type { FieldKit, NumberOptions } from "./field-kit";
import { MeasuringGuide, type GuideTopic } from "./measuring-guide";
import { NumberField } from "./number-field";
import type { BuilderForm, DisplayQuantity, SiNumber, UnitSystem } from "./model";

/**
 * The helpers every field group gets: a number field bound to the form (SI inside, shown in the
 * chosen units, the core's message beside it), a measuring guide (none at the counter, where the
 * staff know how to measure and the guides stay out of the tab order), and the form's own tools.
 */
export function useFieldKit({
  methods,
  values,
  errs,
  catalogue,
  system,
  compact,
  markChanged,
}: {
  methods: UseFormReturn<BuilderForm>;
  values: BuilderForm;
  errs: Record<string, string>;
  catalogue: Catalogue;
  system: UnitSystem;
  compact: boolean;
  markChanged: () => void;
}): FieldKit {
  const { control, register, setValue } = methods;
  const guide = (topic: GuideTopic) => (compact ? null : <MeasuringGuide topic={topic} />);
  const num = (
    name: Path<BuilderForm>,
    label: string,
    quantity: DisplayQuantity | null,
    opts: NumberOptions = {},
  ) => (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <NumberField
          name={field.name}
          label={label}
          value={field.value as SiNumber}
          onChange={(v) => {
            field.onChange(v);
            markChanged();
          }}
          onBlur={field.onBlur}
          quantity={quantity}
          system={system}
          unit={opts.unit}
          hint={opts.hint}
          error={opts.error ?? errs[name]}
        >
          {opts.guide && guide(opts.guide)}
        </NumberField>
      )}
    />
  );
  return { num, values, errs, register, setValue, control, guide, markChanged, catalogue, system, compact };
}

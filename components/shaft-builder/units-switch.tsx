"use client";

import type { UnitSystem } from "./model";

const SYSTEMS = [
  ["imperial", "Inches, lb·ft, mph"],
  ["metric", "Millimetres, N·m, km/h"],
] as const;

/** Inches or millimetres: changes only how numbers are shown (the form keeps SI). */
export function UnitsSwitch({
  system,
  onChange,
}: {
  system: UnitSystem;
  onChange: (system: UnitSystem) => void;
}) {
  return (
    <fieldset>
      <legend className="field-label">Units</legend>
      <div className="flex flex-wrap gap-2" role="radiogroup" aria-label="Units">
        {SYSTEMS.map(([value, label]) => (
          <label
            key={value}
            className={`inline-flex cursor-pointer items-center gap-2 rounded-md border px-3 py-1.5 text-sm ${system === value ? "border-steel-700 bg-steel-700 text-white" : "border-line-strong bg-paper-raised"}`}
          >
            <input
              type="radio"
              name="units"
              value={value}
              checked={system === value}
              onChange={() => onChange(value)}
              className="size-4 accent-brass-500"
            />
            {label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

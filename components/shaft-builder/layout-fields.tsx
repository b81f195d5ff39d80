"use client";

import { Info } from "lucide-react";
import { ChoiceField, SelectField, type FieldKit } from "./field-kit";

/**
 * The front joint: a single cross or a double-Cardan (constant-velocity) joint. With the
 * double-Cardan, the builder says how the axle end must be set and shows what it runs now.
 */
export function FrontJointField({
  kit,
  rearWorkingAngleDeg,
}: {
  kit: FieldKit;
  rearWorkingAngleDeg?: number;
}) {
  const value = kit.values.frontJointType ?? "";
  return (
    <div className="space-y-2">
      <ChoiceField
        kit={kit}
        legend="Front joint"
        value={value}
        choices={[
          ["cross", "A single cross (usual)"],
          ["double-cardan", "A double-Cardan (CV) joint — steep lifted 4×4 shafts"],
        ]}
        onChoose={(v) => kit.setValue("frontJointType", v, { shouldDirty: true })}
      />
      {value === "double-cardan" && (
        <p
          className="flex gap-2 rounded-md border border-steel-100 bg-steel-50 p-3 text-sm text-steel-900"
          data-testid="double-cardan-note"
        >
          <Info className="mt-0.5 size-4 shrink-0" aria-hidden="true" />
          <span>
            The double-Cardan&rsquo;s two crosses share the front angle between them. The single joint at the
            axle end should then run near zero: point the pinion straight at the shaft (enter the pinion angle
            equal to the driveshaft angle).
            {rearWorkingAngleDeg != null && (
              <>
                {" "}
                The axle-end joint now runs <strong>{rearWorkingAngleDeg.toFixed(2)}°</strong>.
              </>
            )}
          </span>
        </p>
      )}
    </div>
  );
}

/** One piece, or two with a centre support bearing from the shop's catalogue. */
export function LayoutFields({ kit }: { kit: FieldKit }) {
  const layout = kit.values.layout ?? "";
  const bearings = kit.catalogue.centreBearings ?? [];
  const chosen = kit.values.centreBearing?.bearingId ?? "";
  const options: [string, string][] = [
    ["", bearings.length ? "Choose a centre bearing" : "No centre bearings in the shop's catalogue yet"],
    ...bearings.map((b) => [b.id, b.name] as [string, string]),
  ];
  if (chosen && !bearings.some((b) => b.id === chosen)) options.push([chosen, `${chosen} (from file)`]);
  return (
    <div className="space-y-3">
      <ChoiceField
        kit={kit}
        legend="Shaft"
        value={layout}
        choices={[
          ["one-piece", "One piece"],
          ["two-piece", "Two pieces with a centre support bearing"],
        ]}
        onChoose={(v) => kit.setValue("layout", v, { shouldDirty: true })}
      />
      {layout === "two-piece" && (
        <div className="space-y-4 border-l-2 border-brass-400 pl-3">
          <SelectField
            kit={kit}
            name="centreBearing.bearingId"
            label="Centre bearing"
            options={options}
            hint="Its stub and yoke take the centre joint."
          />
          <div className="grid gap-4 sm:grid-cols-2">
            {kit.num("centreBearing.fromFrontMm", "Centre joint from the front joint", "length", {
              hint: "Along the shaft. Empty: half way.",
            })}
            {kit.num("centreBearing.dropMm", "Centre joint drop", "length", {
              hint: "Below the straight front-to-rear line. Empty: the shop's centre-joint angle.",
            })}
          </div>
        </div>
      )}
    </div>
  );
}

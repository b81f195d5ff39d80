"use client";

import { FieldGroup, SelectField, anyError, type FieldKit } from "./field-kit";
import { withUnit } from "./model";

/** Slip-joint data: collapsed length, travel, droop, bump, the slip yoke and its seal. */
export function SlipFields({ kit }: { kit: FieldKit }) {
  const s = kit.values.slip;
  const filled =
    s != null &&
    ([
      s.collapsedLengthMm,
      s.travelMm,
      s.droopExtensionMm,
      s.bumpCompressionMm,
      s.sealOutsideCollapsedMm,
    ].some((v) => v != null) ||
      !!s.slipYokeId);
  const yokes = kit.catalogue.slipYokes ?? [];
  const options: [string, string][] = [
    [
      "",
      yokes.length ? "Let the shop match one to the output spline" : "The shop's standard minimum engagement",
    ],
    ...yokes.map(
      (y) =>
        [
          y.id,
          `${y.name} — ${y.splineCount} splines, ${withUnit(y.majorDiameterMm, "diameter", kit.system)}`,
        ] as [string, string],
    ),
  ];
  if (s?.slipYokeId && !yokes.some((y) => y.id === s.slipYokeId))
    options.push([s.slipYokeId, `${s.slipYokeId} (from file)`]);
  return (
    <FieldGroup
      title="Slip joint"
      summary="optional: check the spline at full droop and full bump"
      filled={filled}
      hasError={anyError(kit.errs, "slip")}
      testId="group-slip"
    >
      <p className="text-sm text-ink-soft">
        Lengths joint centre to joint centre. Droop and bump are measured from the loaded ride height.
      </p>
      <div className="grid gap-4 sm:grid-cols-2">
        {kit.num("slip.collapsedLengthMm", "Collapsed length", "length", {
          hint: "Slip pushed fully in.",
        })}
        {kit.num("slip.travelMm", "Slip travel", "length", { hint: "Fully in to fully out." })}
        {kit.num("slip.droopExtensionMm", "Droop extension", "length", {
          hint: "How much longer at full droop (wheels hanging).",
        })}
        {kit.num("slip.bumpCompressionMm", "Bump compression", "length", {
          hint: "How much shorter at full bump (on the stops).",
        })}
      </div>
      {kit.guide("slip")}
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          kit={kit}
          name="slip.slipYokeId"
          label="Slip yoke"
          options={options}
          hint="Its maker's minimum engagement and seal surface then apply."
        />
        {kit.num("slip.sealOutsideCollapsedMm", "Seal surface outside, collapsed", "length", {
          hint: "Ground seal surface already out of the tail bushing when fully in (usually 0).",
        })}
      </div>
      {kit.guide("ride-height")}
    </FieldGroup>
  );
}

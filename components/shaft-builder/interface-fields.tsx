"use client";

import { FieldGroup, SelectField, anyError, type FieldKit } from "./field-kit";
import type { VehicleEndModel } from "./model";

const RETENTION: [string, string][] = [
  ["", "Not known"],
  ["strap", "Straps"],
  ["u-bolt", "U-bolts"],
  ["round", "Round caps (clamped in bores)"],
];

/** One vehicle end: nothing, a yoke (series, or measured caps and their retention) or a companion flange. */
function VehicleEnd({ kit, end, title }: { kit: FieldKit; end: "front" | "pinion"; title: string }) {
  const e: VehicleEndModel | undefined = kit.values.interface?.[end];
  const series = kit.catalogue.jointSeries.filter((j) => j.kind !== "double-cardan");
  const p = `interface.${end}` as const;
  const seriesOptions: [string, string][] = [
    ["", "Not known — measured below"],
    ...series.map((j) => [j.id, j.name] as [string, string]),
  ];
  if (e?.jointSeriesId && !series.some((j) => j.id === e.jointSeriesId))
    seriesOptions.push([e.jointSeriesId, `${e.jointSeriesId} (from file)`]);
  return (
    <fieldset className="space-y-3 rounded-md border border-line p-3">
      <legend className="px-1 text-sm font-semibold">{title}</legend>
      <SelectField
        kit={kit}
        name={`${p}.kind`}
        label={`${title}: what the shaft bolts to`}
        options={[
          ["", "Not given"],
          ["yoke", "A yoke (the joint's caps sit in it)"],
          ["flange", "A companion flange (bolted)"],
        ]}
      />
      {e?.kind === "yoke" && (
        <>
          <SelectField
            kit={kit}
            name={`${p}.jointSeriesId`}
            label={`${title}: yoke series`}
            options={seriesOptions}
            hint="If you know it; otherwise measure the caps."
          />
          <div className="grid gap-4 sm:grid-cols-2">
            {kit.num(`${p}.capDiameterMm`, `${title}: cap diameter`, "diameter")}
            {kit.num(`${p}.capSpanMm`, `${title}: span across the caps`, "diameter")}
          </div>
          <SelectField
            kit={kit}
            name={`${p}.retention`}
            label={`${title}: caps held by`}
            options={RETENTION}
          />
          {kit.guide("caps")}
        </>
      )}
      {e?.kind === "flange" && (
        <div className="grid gap-4 sm:grid-cols-3">
          {kit.num(`${p}.flange.boltCount`, `${title}: bolts`, null, {
            unit: "bolts",
          })}
          {kit.num(`${p}.flange.boltCircleMm`, `${title}: bolt circle`, "diameter", {
            hint: "Diameter through the bolt centres.",
          })}
          {kit.num(`${p}.flange.pilotMm`, `${title}: pilot`, "diameter", {
            hint: "The centring spigot or bore.",
          })}
        </div>
      )}
      {e?.kind === "flange" && kit.guide("flange")}
    </fieldset>
  );
}

/** Interface data so the shop need not phone: the output spline, each vehicle end, grease or sealed. */
export function InterfaceFields({ kit }: { kit: FieldKit }) {
  const i = kit.values.interface;
  const filled =
    i != null &&
    (i.transmissionOutput.splineCount != null ||
      i.transmissionOutput.majorDiameterMm != null ||
      !!i.front.kind ||
      !!i.pinion.kind ||
      !!i.lubrication);
  return (
    <FieldGroup
      title="Output spline, pinion yoke or flange"
      summary="optional: the shop matches the slip yoke, joints and flanges to these"
      filled={filled}
      hasError={anyError(kit.errs, "interface")}
      testId="group-interface"
    >
      <fieldset className="space-y-3 rounded-md border border-line p-3">
        <legend className="px-1 text-sm font-semibold">Transmission output spline</legend>
        <div className="grid gap-4 sm:grid-cols-2">
          {kit.num("interface.transmissionOutput.splineCount", "Output spline count", null, {
            unit: "teeth",
            hint: "For a slip yoke on the transmission or transfer case.",
          })}
          {kit.num("interface.transmissionOutput.majorDiameterMm", "Spline major diameter", "diameter", {
            hint: "Across the tops of the teeth.",
          })}
        </div>
        {kit.guide("spline")}
      </fieldset>
      <VehicleEnd kit={kit} end="pinion" title="Pinion end" />
      <VehicleEnd kit={kit} end="front" title="Front end" />
      <p className="-mt-2 text-xs text-ink-muted">
        Front end: only when the front is not a slip yoke on the output spline (a transfer-case flange or
        yoke).
      </p>
      <SelectField
        kit={kit}
        name="interface.lubrication"
        label="Joints"
        options={[
          ["", "Either (the shop chooses)"],
          ["greaseable", "Greaseable (with fittings)"],
          ["sealed", "Sealed (no fittings)"],
        ]}
      />
    </FieldGroup>
  );
}

import type { Catalogue } from "@/lib/driveline";
import { shaftUseLabel } from "@/lib/driveline/uses";
import { tubeLabel } from "./results-panel";
import {
  formatNumber,
  withUnit,
  type BuilderForm,
  type DisplayQuantity,
  type SiNumber,
  type UnitSystem,
} from "./model";

/** On paper only: the inputs the results were computed from. */
export function PrintedInputs({
  form,
  system,
  catalogue,
}: {
  form: BuilderForm;
  system: UnitSystem;
  catalogue: Catalogue;
}) {
  const g = form.geometry;
  const n = (v: SiNumber, q: DisplayQuantity) =>
    v == null || Number.isNaN(v) ? "—" : withUnit(v, q, system);
  const d = (v: SiNumber) => (v == null || Number.isNaN(v) ? "—" : `${formatNumber(v, 1)}°`);
  const rows: [string, string][] = [
    ["Design", form.name],
    [
      "Use",
      `${shaftUseLabel(form.application.use)}${form.application.description ? ` — ${form.application.description}` : ""}`,
    ],
    ["Installed length", n(form.lengthMm, "length")],
    [
      "Angles (side view)",
      `transmission ${d(g.transmission.verticalDeg)}, driveshaft ${d(g.driveshaft.verticalDeg)}, pinion ${d(g.pinion.verticalDeg)}`,
    ],
    ...(form.offset
      ? ([
          [
            "Angles (top view)",
            `transmission ${d(g.transmission.horizontalDeg)}, driveshaft ${d(g.driveshaft.horizontalDeg)}, pinion ${d(g.pinion.horizontalDeg)}`,
          ],
        ] as [string, string][])
      : []),
    ["Engine torque", n(form.torque.engineTorqueNm, "torque")],
    [
      "Speed",
      form.speedMode === "rpm"
        ? `${form.speed.maxShaftRpm ?? "—"} rpm`
        : `${n(form.speed.topSpeedKmh, "speed")}, tire ${n(form.speed.tireDiameterMm, "length")}, axle ${form.speed.axleRatio ?? "—"}`,
    ],
    ...printedOptionalRows(form, n),
    [
      "Tube",
      form.tubeMode === "auto"
        ? "picked by Yokeline"
        : form.tube.odMm != null && form.tube.wallMm != null
          ? tubeLabel(
              catalogue,
              { materialId: form.tube.materialId, odMm: form.tube.odMm, wallMm: form.tube.wallMm },
              system,
            )
          : "—",
    ],
  ];
  return (
    <dl className="hidden grid-cols-[10rem_1fr] gap-x-3 gap-y-1 text-sm print:grid">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-ink-muted">{k}</dt>
          <dd>{v}</dd>
        </div>
      ))}
    </dl>
  );
}

/** On paper: the optional groups, each only when filled in. */
function printedOptionalRows(
  form: BuilderForm,
  n: (v: SiNumber, q: DisplayQuantity) => string,
): [string, string][] {
  const rows: [string, string][] = [];
  const x = (v: SiNumber) => (v == null || Number.isNaN(v) ? "—" : String(v));
  const s = form.speed;
  const topGear = form.torque.topGearRatio ?? s.topGearRatio;
  if (s.maxEngineRpm != null || topGear != null)
    rows.push(["Engine path", `${x(s.maxEngineRpm)} rpm, top gear ${x(topGear)}`]);
  if (form.torque.ratedShaftTorqueNm != null)
    rows.push(["Rated shaft torque", n(form.torque.ratedShaftTorqueNm, "torque")]);
  const t = form.traction;
  if ([t.drivenAxleLoadKg, t.tireLoadedRadiusMm, t.adhesion].some((v) => v != null))
    rows.push([
      "Traction",
      `axle load ${n(t.drivenAxleLoadKg, "mass")}, loaded radius ${n(t.tireLoadedRadiusMm, "length")}, adhesion ${x(t.adhesion)}`,
    ]);
  const sl = form.slip;
  if ([sl.collapsedLengthMm, sl.travelMm, sl.droopExtensionMm, sl.bumpCompressionMm].some((v) => v != null))
    rows.push([
      "Slip",
      `collapsed ${n(sl.collapsedLengthMm, "length")}, travel ${n(sl.travelMm, "length")}, droop ${n(sl.droopExtensionMm, "length")}, bump ${n(sl.bumpCompressionMm, "length")}${sl.slipYokeId ? `, slip yoke ${sl.slipYokeId}` : ""}`,
    ]);
  const i = form.interface;
  const o = i.transmissionOutput;
  if (o.splineCount != null || o.majorDiameterMm != null)
    rows.push(["Output spline", `${x(o.splineCount)} teeth, ${n(o.majorDiameterMm, "diameter")}`]);
  for (const [key, label] of [
    ["pinion", "Pinion end"],
    ["front", "Front end"],
  ] as const) {
    const e = i[key];
    if (e.kind === "yoke")
      rows.push([
        label,
        `yoke${e.jointSeriesId ? ` ${e.jointSeriesId}` : ""}, caps ${n(e.capDiameterMm, "diameter")} × span ${n(e.capSpanMm, "diameter")}${e.retention ? `, ${e.retention}` : ""}`,
      ]);
    if (e.kind === "flange")
      rows.push([
        label,
        `flange, ${x(e.flange.boltCount)} bolts on ${n(e.flange.boltCircleMm, "diameter")}, pilot ${n(e.flange.pilotMm, "diameter")}`,
      ]);
  }
  if (i.lubrication) rows.push(["Joints", i.lubrication]);
  if (form.frontJointType === "double-cardan") rows.push(["Front joint", "double-Cardan"]);
  if (form.layout === "two-piece")
    rows.push(["Layout", `two-piece, centre bearing ${form.centreBearing.bearingId || "—"}`]);
  return rows;
}

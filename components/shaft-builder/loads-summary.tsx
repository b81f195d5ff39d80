"use client";

import type { Catalogue, DesignFile, EvaluationReport } from "@/lib/driveline";
import { shaftUseLabel } from "@/lib/driveline/uses";
import { formatNumber, withUnit, type UnitSystem } from "./model";
import { interfaceLines, reportAdditions, speedPathText, torqueText } from "./report-additions";

/** The use in running text ("towing", "off-road"). */
const wordForUse = (use: string) => shaftUseLabel(use).toLowerCase();

/**
 * Loads, speeds and limits behind the checks: service factor and use, engine-based against
 * wheel-slip torque, running torque, which speed path governs, the weld zone, the critical-speed
 * length and limit, the slip, the interface matches and the layout. Each line appears only when the
 * report (or the design) has it; the checks themselves stay in the checks list.
 */
export function LoadsSummary({
  report,
  design,
  system,
  catalogue,
}: {
  report: EvaluationReport;
  design: DesignFile;
  system: UnitSystem;
  catalogue: Catalogue;
}) {
  const a = reportAdditions(report);
  const s = a.service ?? {};
  const lines: { key: string; label: string; text: string }[] = [];
  const add = (key: string, label: string, text: string) => lines.push({ key, label, text });

  const use = s.use ?? design.use ?? "street";
  add(
    "use",
    "Use",
    s.serviceFactor != null
      ? `${shaftUseLabel(use)}: service factor ${s.serviceFactor.toFixed(2)} (the shop's figure for this use)`
      : `${shaftUseLabel(use)}`,
  );
  if (s.engineTorqueAtShaftNm != null) {
    const slip = s.wheelSlipTorqueNm;
    const governs =
      slip != null && slip < s.engineTorqueAtShaftNm
        ? "the tires slip first, so the wheel-slip torque governs"
        : slip != null
          ? "the engine-based torque is the lesser and governs"
          : "no axle load and tire radius given, so the engine-based torque governs";
    add(
      "torque",
      "Torque at the shaft",
      `engine-based ${torqueText(s.engineTorqueAtShaftNm, system)}${slip != null ? `, wheel-slip ${torqueText(slip, system)}` : ""}: ${governs}${s.serviceFactor != null ? `; × ${s.serviceFactor.toFixed(2)} = design torque ${torqueText(report.service.peakShaftTorqueNm, system)}` : ""}.`,
    );
  }
  if (s.runningTorqueNm != null)
    add(
      "running",
      "Running torque",
      `${torqueText(s.runningTorqueNm, system)} (${design.torque.ratedShaftTorqueNm != null ? "the machine's rated torque" : "engine torque through the top gear"}), against each joint's continuous rating.`,
    );
  add("speed", "Shaft speed", speedPathText(report.service, system));
  const t = a.torsion ?? {};
  if (t.weldZoneSafetyFactor != null)
    add(
      "weld",
      "Weld zone",
      `safety factor ${t.weldZoneSafetyFactor.toFixed(2)}${t.weldZoneShearYieldMPa != null ? ` on the weld-affected zone's shear yield of ${formatNumber(t.weldZoneShearYieldMPa, 0)} MPa` : ""} (parent metal ${report.torsion.safetyFactor.toFixed(2)}).`,
    );
  if (a.criticalSpeedLengthMm != null || a.criticalSpeedRatioLimit != null) {
    const longer = a.criticalSpeedLengthMm != null && a.criticalSpeedLengthMm > report.lengthMm + 0.05;
    add(
      "critical",
      "Critical speed",
      `${a.criticalSpeedLengthMm != null ? `checked at ${withUnit(a.criticalSpeedLengthMm, "length", system)}${longer ? " (the slip at full droop, the longest the shaft gets)" : ""}` : ""}${a.criticalSpeedLengthMm != null && a.criticalSpeedRatioLimit != null ? "; " : ""}${a.criticalSpeedRatioLimit != null ? `ratio limit ${a.criticalSpeedRatioLimit.toFixed(2)} for ${wordForUse(use)} use (now ${report.criticalSpeedRatio.toFixed(3)})` : ""}.`,
    );
  }
  if (report.slip) {
    const r = report.slip;
    const yoke = a.slip?.slipYoke;
    add(
      "slip",
      "Slip",
      `${withUnit(r.outAtRideHeightMm, "length", system)} out at ride height, ${withUnit(r.outAtFullDroopMm, "length", system)} at full droop, ${withUnit(r.outAtFullBumpMm, "length", system)} at full bump; ${withUnit(r.reserveAtFullDroopMm, "length", system)} of spline left engaged at full droop${yoke?.name ? ` (${yoke.name}${yoke.minEngagementMm != null ? `, its maker's minimum ${withUnit(yoke.minEngagementMm, "length", system)}` : ""})` : ""}.`,
    );
  }
  for (const [i, line] of interfaceLines(a.interface).entries())
    add(`if-${i}`, i === 0 ? "Interface" : "", line);
  const frontType = a.frontJointType ?? design.frontJointType;
  if (frontType === "double-cardan")
    add(
      "front-joint",
      "Front joint",
      "double-Cardan: its two crosses share the front angle; the axle-end joint should run near zero.",
    );
  if (design.layout === "two-piece") {
    const bearing = (catalogue.centreBearings ?? []).find((b) => b.id === design.centreBearing?.bearingId);
    add(
      "layout",
      "Layout",
      `two pieces with a centre support bearing${bearing ? ` (${bearing.name})` : design.centreBearing ? ` (${design.centreBearing.bearingId})` : ""}${report.twoPiece ? `; see the two-piece figures below` : ""}.`,
    );
  }

  return (
    <section aria-labelledby="loads-h" className="card p-4" data-testid="loads-summary">
      <h3 id="loads-h" className="font-semibold">
        Loads, speeds and limits
      </h3>
      <dl className="mt-2 grid gap-x-3 gap-y-1.5 text-sm sm:grid-cols-[9rem_1fr]">
        {lines.map((l) => (
          <div key={l.key} className="contents" data-testid={`loads-${l.key}`}>
            <dt className="text-ink-muted">{l.label}</dt>
            <dd className="text-ink-soft">{l.text}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}

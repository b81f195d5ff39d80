/**
 * Each routing step's record sheet: which values it records and their limits, derived from the
 * frozen evaluation report (its `shopFloor` tolerances and ISO 21940-11 per-plane unbalance), the
 * order's fulfilment and the floor settings. Pure: the same inputs always give the same specs,
 * which are frozen with each traveller revision.
 */
import type { EvaluationReport } from "@/lib/driveline/report";
import type { FloorSettings, RoutingStep, StepKind } from "./settings";
import type { FloorQuantity } from "./units";
import { retubeCutLengthMm, type RepairIntake } from "@/lib/retube/intake";
import { inspectionFields, teardownFields, withRetubeSteps } from "@/lib/retube/steps";
import { assemblyFields, deriveTwoPieceSteps } from "./two-piece-steps";
import type { Fulfilment } from "@/lib/orders/states";

/** A numeric limit in SI. `min`/`max` bound the value; for a `nominal` the tolerance is ±. */
export interface NumericLimit {
  min: number | null;
  max: number | null;
  nominal: number | null;
  /** Compare modulo 180° (a yoke index: the joint planes repeat every half turn). */
  angular?: boolean;
  source: string;
}

export type FieldSpec =
  | { key: string; label: string; type: "text" }
  | {
      key: string;
      label: string;
      type: "number";
      quantity: FloorQuantity;
      limit: NumericLimit | null;
      /** Runout only: where to read it, mm from the front weld. */
      stationMm?: number;
    }
  /** Must be confirmed (yes); "no" holds the step (with the text field `reasonKey` names as the reason). */
  | { key: string; label: string; type: "confirm"; reasonKey?: string }
  /** Balance weights added: a list of { plane, mass (g), angleDeg }. */
  | { key: string; label: string; type: "weights" };

export interface RunoutStation {
  key: string;
  label: string;
  /** Distance from the front weld along the tube, mm. */
  fromFrontWeldMm: number;
  limitMm: number;
  source: string;
}

export interface StepSpec {
  /** 1-based place in the routing. */
  position: number;
  code: string;
  kind: StepKind;
  name: string;
  /** Two-piece shafts: the piece this step is for ("A" front, "B" rear); absent for the whole shaft. */
  piece?: "A" | "B";
  instructions: string[];
  fields: FieldSpec[];
}

export interface StepContext {
  report: EvaluationReport;
  fulfilment: Fulfilment;
  floor: FloorSettings;
  /** A re-tube's intake (lib/retube/intake.ts); absent or null for a new shaft. */
  repair?: Pick<RepairIntake, "weldToWeldMm" | "parts"> | null;
}

const tol = (nominal: number, plusMinus: number, source: string): NumericLimit => ({
  min: nominal - plusMinus,
  max: nominal + plusMinus,
  nominal,
  source,
});

/** The rear-yoke index to build: the design's own when it gives one, else the best index. */
export function phaseTarget(ctx: StepContext): { indexDeg: number; toleranceDeg: number; source: string } {
  const { phasing, shopFloor } = ctx.report;
  const indexDeg = phasing.asSpecified?.phaseIndexDeg ?? phasing.phaseIndexDeg;
  if (ctx.floor.phasingToleranceDeg != null) {
    return { indexDeg, toleranceDeg: ctx.floor.phasingToleranceDeg, source: "shop setting (floor)" };
  }
  return {
    indexDeg,
    toleranceDeg: shopFloor.phasingToleranceDeg,
    source: shopFloor.sources[3] ?? "shop setting",
  };
}

/** Tube length as cut (weld seat to weld seat), mm. */
export function tubeCutLengthMm(report: EvaluationReport): number {
  return report.cutLengthMm ?? report.tube.tubeLengthMm;
}

/** The cut length for this shaft: the design's, or a re-tube's weld-to-weld (lib/retube/intake.ts). */
export function cutLengthFor(ctx: StepContext): number {
  return ctx.repair ? retubeCutLengthMm(ctx.repair) : tubeCutLengthMm(ctx.report);
}

/**
 * Runout stations: near each weld (the inset in from it, at most a quarter of the tube) and
 * mid-span. Shafts at or above the fast-shaft speed get the tighter of the two sets of limits.
 */
export function runoutStations(ctx: StepContext): { stations: RunoutStation[]; fast: boolean } {
  const { report, floor } = ctx;
  const length = cutLengthFor(ctx);
  const inset = Math.min(floor.limits.runoutStationInsetMm.value, length / 4);
  const fast = report.service.maxShaftRpm >= floor.limits.fastShaftRpm.value;
  const ends = fast
    ? Math.min(report.shopFloor.runoutEndsMm, floor.limits.fastShaftRunoutEndsMm.value)
    : report.shopFloor.runoutEndsMm;
  const centre = fast
    ? Math.min(report.shopFloor.runoutCentreMm, floor.limits.fastShaftRunoutCentreMm.value)
    : report.shopFloor.runoutCentreMm;
  const speedNote = `service speed ${Math.round(report.service.maxShaftRpm)} rpm ≥ ${floor.limits.fastShaftRpm.value} rpm`;
  const endsSource = fast
    ? `${floor.limits.fastShaftRunoutEndsMm.source}; ${speedNote}`
    : (report.shopFloor.sources[1] ?? "shop setting");
  const centreSource = fast
    ? `${floor.limits.fastShaftRunoutCentreMm.source}; ${speedNote}`
    : (report.shopFloor.sources[2] ?? "shop setting");
  const near = (key: string, label: string, at: number): RunoutStation => ({
    key,
    label,
    fromFrontWeldMm: at,
    limitMm: ends,
    source: endsSource,
  });
  return {
    fast,
    stations: [
      near("runoutFrontMm", "Runout near the front weld", inset),
      {
        key: "runoutMidMm",
        label: "Runout at mid-span",
        fromFrontWeldMm: length / 2,
        limitMm: centre,
        source: centreSource,
      },
      near("runoutRearMm", "Runout near the rear weld", length - inset),
    ],
  };
}

export function balanceLimit(report: EvaluationReport): { perPlaneGmm: number; source: string } {
  const b = report.balance;
  return {
    perPlaneGmm: b.perPlaneGmm,
    source: `ISO 21940-11:2016, G ${b.gradeMmS} at ${Math.round(b.speedRpm)} rpm, ${b.rotorMassKg.toFixed(2)} kg, half of ${b.permissibleUnbalanceGmm.toFixed(0)} g·mm per plane`,
  };
}

export function fieldsFor(step: RoutingStep, ctx: StepContext): FieldSpec[] {
  const { report, floor } = ctx;
  const lengthTol = report.shopFloor.lengthToleranceMm;
  const lengthSource = report.shopFloor.sources[0] ?? "shop setting";
  const phase = phaseTarget(ctx);
  const phaseField = (key: string, label: string): FieldSpec => ({
    key,
    label,
    type: "number",
    quantity: "angle",
    limit: { ...tol(phase.indexDeg, phase.toleranceDeg, phase.source), angular: true },
  });
  switch (step.kind) {
    case "cut":
      return [
        { key: "tubeHeatLot", label: "Tube heat / lot number", type: "text" },
        {
          key: "cutLengthMm",
          label: "Cut length",
          type: "number",
          quantity: "length",
          limit: tol(
            cutLengthFor(ctx),
            floor.limits.cutLengthToleranceMm.value,
            ctx.repair
              ? `re-tube: the customer's weld-to-weld; ${floor.limits.cutLengthToleranceMm.source}`
              : floor.limits.cutLengthToleranceMm.source,
          ),
        },
      ];
    case "weld-phase":
      return [
        { key: "frontYokeLot", label: "Front yoke lot", type: "text" },
        { key: "rearYokeLot", label: "Rear yoke lot", type: "text" },
        { key: "frontJointLot", label: "Front joint lot", type: "text" },
        { key: "rearJointLot", label: "Rear joint lot", type: "text" },
        {
          key: "weldedLengthMm",
          label: "As-welded length (joint centres)",
          type: "number",
          quantity: "length",
          limit: tol(report.lengthMm, lengthTol, lengthSource),
        },
        phaseField("phaseIndexDeg", "Rear yoke phase index"),
      ];
    case "runout": {
      const { stations } = runoutStations(ctx);
      return stations.map((s) => ({
        key: s.key,
        label: s.label,
        type: "number" as const,
        quantity: "runout" as const,
        limit: { min: 0, max: s.limitMm, nominal: null, source: s.source },
        stationMm: s.fromFrontWeldMm,
      }));
    }
    case "balance": {
      const limit = balanceLimit(report);
      const residual = (key: string, label: string): FieldSpec => ({
        key,
        label,
        type: "number",
        quantity: "unbalance",
        limit: { min: 0, max: limit.perPlaneGmm, nominal: null, source: limit.source },
      });
      return [
        {
          key: "balanceSpeedRpm",
          label: "Balancing speed",
          type: "number",
          quantity: "speed",
          limit: { min: 1, max: null, nominal: null, source: "the balancing machine's speed" },
        },
        residual("residualFrontGmm", "Residual, front plane"),
        residual("residualRearGmm", "Residual, rear plane"),
        { key: "weights", label: "Weights added", type: "weights" },
      ];
    }
    case "final-inspection":
      return [
        {
          key: "overallLengthMm",
          label: "Overall length (joint centres)",
          type: "number",
          quantity: "length",
          limit: tol(report.lengthMm, lengthTol, lengthSource),
        },
        { key: "jointsFree", label: "Joints turn freely", type: "confirm" },
        phaseField("phaseIndexDeg", "Rear yoke phase index"),
        { key: "paintMarking", label: "Paint and serial marking done", type: "confirm" },
      ];
    case "dispatch":
      return ctx.fulfilment === "ship"
        ? [
            { key: "carrier", label: "Carrier", type: "text" },
            { key: "trackingNumber", label: "Tracking number", type: "text" },
          ]
        : [{ key: "pickedUpBy", label: "Picked up by", type: "text" }];
    case "sign-off":
      return [];
    case "teardown":
      return teardownFields(ctx);
    case "inspection":
      return inspectionFields(ctx);
    case "assembly":
      return assemblyFields(ctx);
  }
}

/**
 * What a stored evaluation report lacks that the routing reads (deriveSteps), as paths such as
 * "shopFloor" or "shopFloor.lengthToleranceMm"; empty when the routing can be derived. A frozen
 * report is JSON from the database, so its shape is checked here rather than trusted.
 */
export function missingForRouting(report: unknown): string[] {
  if (report == null || typeof report !== "object") return ["the evaluation report"];
  const r = report as Record<string, unknown>;
  const isObject = (v: unknown): v is Record<string, unknown> => v != null && typeof v === "object";
  const missing: string[] = [];
  if (!isObject(r.shopFloor)) missing.push("shopFloor");
  else
    for (const key of ["lengthToleranceMm", "runoutEndsMm", "runoutCentreMm", "phasingToleranceDeg"])
      if (typeof r.shopFloor[key] !== "number") missing.push(`shopFloor.${key}`);
  if (typeof r.lengthMm !== "number") missing.push("lengthMm");
  if (!isObject(r.phasing)) missing.push("phasing");
  if (r.layout === "two-piece") {
    if (!Array.isArray(r.pieces)) missing.push("pieces");
  } else {
    if (!isObject(r.service)) missing.push("service");
    if (!isObject(r.balance)) missing.push("balance");
  }
  return missing;
}

/** The record sheet of every step of the routing, in order. */
export function deriveSteps(ctx: StepContext): StepSpec[] {
  if (ctx.report.layout === "two-piece") return deriveTwoPieceSteps(ctx);
  const routing = ctx.repair ? withRetubeSteps(ctx.floor.routing) : ctx.floor.routing;
  return oneShaftRouting(routing).map((step, i) => ({
    position: i + 1,
    code: step.code,
    kind: step.kind,
    name:
      step.kind === "dispatch" && step.name === "Pack and ship / pickup"
        ? ctx.fulfilment === "ship"
          ? "Pack and ship"
          : "Pickup"
        : step.name,
    instructions: [...step.instructions],
    fields: fieldsFor(step, ctx),
  }));
}

/** An assembly step joins the pieces of a two-piece shaft; a one-piece shaft has none. */
const oneShaftRouting = (routing: readonly RoutingStep[]) => routing.filter((s) => s.kind !== "assembly");

/**
 * The vibration triage's view model: what the triage core needs from one shaft's as-built record
 * (the frozen evaluation and design, each step's accepted measurements and frozen limits) and the
 * shop's limits. Plain data, made on the server and handed to the staff page's panel.
 */
import { z } from "zod";
import type { EvaluationReport } from "@/lib/driveline/report";
import type { ShopSettings } from "@/lib/driveline/settings";
import type { Complaint, MeasuredValue, TriageShaft } from "@/lib/driveline/triage";
import { mphToKmh } from "@/lib/driveline/units";
import type { FloorUnits } from "@/lib/traveller/units";
import type { FieldSpec } from "@/lib/traveller/steps";
import type { AsBuiltRecord } from "./queries";

type Step = AsBuiltRecord["steps"][number];
type Rec = Step["records"][number];

export interface TriageView {
  /** Null when nothing that bears on vibration is measured yet (see `missing`). */
  shaft: TriageShaft | null;
  /** Steps whose measurements the triage uses and that have no accepted record yet. */
  missing: { position: number; name: string; what: string }[];
  /** Road speed can be used (the design gives an axle ratio and a tire diameter). */
  roadSpeed: boolean;
}

const num = (v: unknown): number | null => (typeof v === "number" && Number.isFinite(v) ? v : null);

/**
 * The value a step left the shop with: the newest accepted record's (pass, rework or concession);
 * a concession without the value takes it from the hold it accepted.
 */
function acceptedValue(step: Step, key: string): { value: number; concession: boolean } | null {
  const newestFirst = [...step.records].reverse();
  const accepted = newestFirst.find((r: Rec) => r.outcome !== "hold");
  if (!accepted) return null;
  const own = num(accepted.values[key]);
  if (own != null) return { value: own, concession: accepted.outcome === "concession" };
  if (accepted.outcome !== "concession") return null;
  const held = newestFirst.find((r) => r.outcome === "hold" && num(r.values[key]) != null);
  return held ? { value: num(held.values[key])!, concession: true } : null;
}

function measured(step: Step, quantity: "runout" | "unbalance"): MeasuredValue[] | null {
  const out: MeasuredValue[] = [];
  for (const f of step.spec.fields as FieldSpec[]) {
    if (f.type !== "number" || f.quantity !== quantity || f.limit?.max == null) continue;
    const v = acceptedValue(step, f.key);
    if (v)
      out.push({
        label: f.label,
        value: v.value,
        limit: f.limit.max,
        source: f.limit.source,
        concession: v.concession,
      });
  }
  return out.length ? out : null;
}

const WHAT: Record<string, string> = {
  "weld-phase": "the rear-yoke phase index",
  runout: "the runout readings",
  balance: "the residual unbalance per plane",
  "final-inspection": "the final phase index",
};

/** The triage's input for one shaft, or why it cannot be made yet. */
export function triageViewFor(record: AsBuiltRecord, settings: ShopSettings): TriageView {
  const report = record.evaluation as unknown as EvaluationReport & { criticalSpeedRatioLimit?: number };
  const speed = (record.design as { speed?: { axleRatio?: unknown; tireDiameterMm?: unknown } }).speed;
  const axleRatio = num(speed?.axleRatio);
  const tireDiameterMm = num(speed?.tireDiameterMm);
  const roadSpeed = axleRatio != null && tireDiameterMm != null;

  const missing: TriageView["missing"] = [];
  let runout: MeasuredValue[] | null = null;
  let residuals: MeasuredValue[] | null = null;
  let phase: { value: number; concession: boolean; field: FieldSpec & { type: "number" } } | null = null;
  for (const step of record.steps) {
    const kind = step.spec.kind;
    if (!(kind in WHAT)) continue;
    let found = false;
    if (kind === "runout") found = (runout = measured(step, "runout") ?? runout) !== null;
    if (kind === "balance") found = (residuals = measured(step, "unbalance") ?? residuals) !== null;
    if (kind === "weld-phase" || kind === "final-inspection") {
      const field = (step.spec.fields as FieldSpec[]).find(
        (f): f is FieldSpec & { type: "number" } => f.type === "number" && f.limit?.angular === true,
      );
      const v = field ? acceptedValue(step, field.key) : null;
      // The final inspection's reading, when there is one, is the shaft as it left.
      if (v && field && (kind === "final-inspection" || !phase)) phase = { ...v, field };
      found = v != null;
    }
    if (!found) missing.push({ position: step.position, name: step.spec.name, what: WHAT[kind]! });
  }

  const hasReport =
    Array.isArray(report?.joints) && report.joints.length >= 2 && report.balance && report.phasing;
  if (!hasReport || (!runout && !residuals && !phase)) return { shaft: null, missing, roadSpeed };

  const limit = phase?.field.limit;
  const targetDeg =
    limit?.nominal ?? report.phasing.asSpecified?.phaseIndexDeg ?? report.phasing.phaseIndexDeg;
  const toleranceDeg =
    limit?.nominal != null && limit.max != null ? limit.max - limit.nominal : report.phasing.toleranceDeg;
  const ratioLimit =
    typeof report.criticalSpeedRatioLimit === "number"
      ? { value: report.criticalSpeedRatioLimit, source: "frozen report (the limit for this use)" }
      : settings.maxCriticalSpeedRatio;
  const shaft: TriageShaft = {
    serviceRpm: report.service.maxShaftRpm,
    axleRatio,
    tireDiameterMm,
    joints: report.joints.map((j) => ({ position: j.position, workingAngleDeg: j.workingAngleDeg })),
    jointPlaneAngleDeg: report.phasing.jointPlaneAngleDeg,
    phase: {
      targetDeg,
      toleranceDeg,
      source: limit?.source ?? "frozen report",
      measuredDeg: phase?.value ?? null,
      concession: phase?.concession ?? false,
    },
    balance: {
      gradeMmS: report.balance.gradeMmS,
      speedRpm: report.balance.speedRpm,
      rotorMassKg: report.balance.rotorMassKg,
      perPlaneGmm: report.balance.perPlaneGmm,
    },
    residuals,
    runout,
    criticalSpeedRpm: report.criticalSpeedRpm,
    criticalSpeedRatioLimit: { value: ratioLimit.value, source: ratioLimit.source },
    accelerationLimit: {
      value: settings.maxJointAngularAccelerationRadS2.value,
      source: settings.maxJointAngularAccelerationRadS2.source,
    },
  };
  return { shaft, missing, roadSpeed };
}

/** Bounds of the complaint form's numbers (beyond any road vehicle; they catch typing slips). */
const BOUNDS = {
  roadSpeed: { label: "Road speed", min: 1, max: 400 },
  engineRpm: { label: "Engine speed", min: 100, max: 20_000 },
  gearRatio: { label: "Gear ratio", min: 0.2, max: 10 },
  shaftRpm: { label: "Shaft speed", min: 10, max: 30_000 },
} as const;
type NumberField = keyof typeof BOUNDS;

const NEEDS: Record<"road" | "engine" | "shaft", NumberField[]> = {
  road: ["roadSpeed"],
  engine: ["engineRpm", "gearRatio"],
  shaft: ["shaftRpm"],
};

/** The triage form: where it shakes (one of three ways) and when. Numbers as typed (strings). */
export const runTriageSchema = z
  .object({
    basis: z.enum(["road", "engine", "shaft"], { error: "Choose how you give the speed" }),
    roadSpeed: z.string().optional(),
    engineRpm: z.string().optional(),
    gearRatio: z.string().optional(),
    shaftRpm: z.string().optional(),
    load: z.enum(["load", "coast", "both"], { error: "Choose when it shakes" }),
  })
  .superRefine((v, ctx) => {
    for (const field of NEEDS[v.basis]) {
      const { label, min, max } = BOUNDS[field];
      const raw = (v[field] ?? "").trim();
      const n = Number(raw);
      if (raw === "") ctx.addIssue({ code: "custom", path: [field], message: `${label}: enter a number` });
      else if (!Number.isFinite(n) || n < min || n > max)
        ctx.addIssue({
          code: "custom",
          path: [field],
          message: `${label}: enter a number from ${min} to ${max}`,
        });
    }
  });
export type RunTriageInput = z.infer<typeof runTriageSchema>;

/** The form's values as the core's complaint (road speed in the shop's units: mph for inches). */
export function complaintFrom(values: RunTriageInput, units: FloorUnits): Complaint {
  const n = (s: string | undefined) => Number((s ?? "").trim());
  switch (values.basis) {
    case "road": {
      const shown = n(values.roadSpeed);
      return {
        speed: { kind: "road", speedKmh: units === "in" ? mphToKmh(shown) : shown },
        load: values.load,
      };
    }
    case "engine":
      return {
        speed: { kind: "engine", engineRpm: n(values.engineRpm), gearRatio: n(values.gearRatio) },
        load: values.load,
      };
    case "shaft":
      return { speed: { kind: "shaft", shaftRpm: n(values.shaftRpm) }, load: values.load };
  }
}

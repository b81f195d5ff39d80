/**
 * Vibration triage: from a shaft's frozen evaluation, its as-built measurements and a complaint
 * (where it shakes), the shaft speed there and the likely causes side by side, ranked.
 * Pure: no I/O, no framework. SI inside (mm, g·mm, rpm, rad/s², N).
 *
 * Scoring (one number per cause, "how far toward or past its limit at the complaint speed";
 * 1 = at the limit):
 * - unbalance (1× shaft order): the largest residual per plane ÷ the ISO 21940-11 permissible per
 *   plane at the complaint speed. At a fixed grade G the permissible unbalance is 9549·G·m/n, so
 *   permissible(n) = permissible(service) × n_service / n; the score is also G_effective / G.
 * - runout (1×): the largest reading ÷ its limit (TIR does not change with speed).
 * - angles and phasing (2×): the largest of each joint's peak angular acceleration at the
 *   complaint speed ÷ the shop's limit (engineering reference §1, §4), the net output's (through
 *   the equivalent angle with the as-built phase, §3) ÷ the same limit, and — only when it is out
 *   of tolerance — the measured phase error ÷ its tolerance.
 * - critical speed (1× resonance): (complaint rpm ÷ critical speed) ÷ the allowed ratio.
 * Ranking: by score × 1.1 when the load condition fits the cause, × 0.9 when it argues against it
 * (which fits is common shop practice; the 10 % weight is Yokeline's own). Bands: below 0.5
 * "well within", 0.5–1 "toward the limit", from 1 "at or past the limit" (Yokeline's own).
 */
import { cardanPeakAngularAccelerationRadS2, equivalentAngleRad } from "./cardan";
import { normalise, type Vec3 } from "./geometry";
import { chainResponse, makeChain } from "./phasing";
import { DISCLAIMER } from "./report";
import { shaftRpmAtRoadSpeed } from "./speed";

const RAD = Math.PI / 180;
const DEG = 180 / Math.PI;
const rpmToRadS = (rpm: number): number => (rpm * Math.PI) / 30;

/** A limit with where it comes from. */
export interface TriageLimit {
  readonly value: number;
  readonly source: string;
}

/** One measured value from the as-built record and the limit it was checked against. */
export interface MeasuredValue {
  /** "Runout at mid-span", "Residual, front plane". */
  readonly label: string;
  /** SI: mm for runout, g·mm for unbalance. */
  readonly value: number;
  readonly limit: number;
  readonly source: string;
  /** Accepted by concession (out of limit but signed off). */
  readonly concession?: boolean;
}

/** Everything the triage needs about one shaft (plain data: the frozen report and the as-built record). */
export interface TriageShaft {
  /** Highest service speed the shaft was evaluated at, rpm (report `service.maxShaftRpm`). */
  readonly serviceRpm: number;
  /** From the design's speed data; null when the design gives a shaft rpm only. */
  readonly axleRatio: number | null;
  readonly tireDiameterMm: number | null;
  /** Frozen report: each joint's true working angle, front to rear. */
  readonly joints: readonly { readonly position: string; readonly workingAngleDeg: number }[];
  /** Frozen report `phasing.jointPlaneAngleDeg`: angle between the joints' planes about the tube. */
  readonly jointPlaneAngleDeg: number;
  /** The rear-yoke index: target (± tolerance) and the as-built measurement (null: not measured yet). */
  readonly phase: {
    readonly targetDeg: number;
    readonly toleranceDeg: number;
    readonly source: string;
    readonly measuredDeg: number | null;
    readonly concession?: boolean;
  };
  /** Frozen report `balance`: the ISO 21940-11 figures at the service speed. */
  readonly balance: {
    readonly gradeMmS: number;
    readonly speedRpm: number;
    readonly rotorMassKg: number;
    readonly perPlaneGmm: number;
  };
  /** As-built residual unbalance per plane (null: balance not recorded yet). */
  readonly residuals: readonly MeasuredValue[] | null;
  /** As-built runout readings (null: runout not recorded yet). */
  readonly runout: readonly MeasuredValue[] | null;
  readonly criticalSpeedRpm: number;
  readonly criticalSpeedRatioLimit: TriageLimit;
  readonly accelerationLimit: TriageLimit;
}

export type ComplaintSpeed =
  | { readonly kind: "road"; readonly speedKmh: number }
  | { readonly kind: "engine"; readonly engineRpm: number; readonly gearRatio: number }
  | { readonly kind: "shaft"; readonly shaftRpm: number };

export type ComplaintLoad = "load" | "coast" | "both";

export interface Complaint {
  readonly speed: ComplaintSpeed;
  readonly load: ComplaintLoad;
}

export type TriageCauseId = "unbalance" | "runout" | "angles" | "critical-speed";
export type TriageBand = "well-within" | "toward-limit" | "past-limit" | "not-measured";
export type LoadFit = "fits" | "neutral" | "against";

/** A figure shown as evidence. `quantity` tells the screen how to convert it. */
export interface TriageFigure {
  readonly label: string;
  readonly value: number;
  readonly quantity:
    "rpm" | "hz" | "unbalance" | "runout" | "angle" | "acceleration" | "force" | "ratio" | "pct" | "grade";
  readonly limit?: number;
  readonly source?: string;
}

export interface TriageCause {
  readonly id: TriageCauseId;
  readonly title: string;
  /** Order of shaft speed (1 = once per turn). */
  readonly order: number;
  readonly frequencyHz: number;
  /** How far toward (≤ 1) or past (> 1) its limit; null when not measured yet. */
  readonly score: number | null;
  readonly band: TriageBand;
  /** The score weighted by the load condition; what the list is sorted by. */
  readonly rankKey: number;
  /** One plain sentence: what the numbers say. */
  readonly summary: string;
  readonly figures: readonly TriageFigure[];
  readonly loadFit: LoadFit;
  readonly loadNote: string;
  readonly whatToCheck: readonly string[];
}

export interface OtherSource {
  readonly label: string;
  readonly frequencyHz: number;
  /** Its order relative to the shaft's turn (wheels: 1 ÷ axle ratio). */
  readonly shaftOrder: number;
  readonly note: string;
}

export interface TriageResult {
  readonly shaftRpm: number;
  readonly shaftHz: number;
  /** How the shaft speed was found, in words. */
  readonly speedBasis: string;
  /** Ranked, most likely first. */
  readonly causes: readonly TriageCause[];
  /** Said plainly when no shaft cause reaches half its limit; null otherwise. */
  readonly notTheShaft: string | null;
  /** Other things that turn at this speed, for comparison with a measured frequency. */
  readonly otherSources: readonly OtherSource[];
  readonly notes: readonly string[];
  readonly cautions: readonly string[];
}

/** Shown with every triage. */
export const TRIAGE_CAUTION =
  "A shaft that shakes should not be driven at speed until it has been checked: a shaft that fails or whirls can cause loss of vehicle control, injury and death. This triage ranks likely causes from the shaft's record and does not replace a qualified engineer.";

export const TRIAGE_SCORING =
  "Each cause is scored by how far its measured or computed figure is toward (below 1) or past (1 and above) its limit at the complaint speed: unbalance = largest residual per plane ÷ the ISO 21940-11 permissible per plane at that speed; runout = largest reading ÷ its limit; angles = largest peak angular acceleration (each joint, and the net output with the as-built phase) ÷ the shop's limit, or the phase error ÷ its tolerance when out of tolerance; critical speed = (complaint rpm ÷ critical speed) ÷ the allowed ratio. Under 0.5 is well within, 0.5–1 toward the limit, 1 and above at or past it (Yokeline's own bands). A load condition that fits a cause moves it up by 10 %, one that argues against it down by 10 % (which fits is common shop practice; the weight is Yokeline's own).";

/** Shaft rpm at the complaint, and how it was found. Throws RangeError when the design lacks the data. */
export function complaintShaftRpm(
  shaft: Pick<TriageShaft, "axleRatio" | "tireDiameterMm">,
  speed: ComplaintSpeed,
): { rpm: number; basis: string } {
  switch (speed.kind) {
    case "road": {
      if (shaft.axleRatio == null || shaft.tireDiameterMm == null) {
        throw new RangeError(
          "the design gives no axle ratio and tire diameter, so road speed cannot be used",
        );
      }
      const rpm = shaftRpmAtRoadSpeed(speed.speedKmh, shaft.tireDiameterMm, shaft.axleRatio);
      return {
        rpm,
        basis: `road speed on ${shaft.tireDiameterMm.toFixed(0)} mm tires, axle ratio ${shaft.axleRatio} (engineering reference §7)`,
      };
    }
    case "engine":
      return {
        rpm: speed.engineRpm / speed.gearRatio,
        basis: `engine ${Math.round(speed.engineRpm)} rpm ÷ gear ratio ${speed.gearRatio} (a transfer case in high range, 1:1, assumed)`,
      };
    case "shaft":
      return { rpm: speed.shaftRpm, basis: "shaft rpm as given" };
  }
}

/**
 * Shaft directions for a two-joint chain with the report's working angles and joint-plane angle:
 * the tube on x, the transmission tilted in one plane and the pinion in a plane turned so that
 * the chain's best phase index equals `jointPlaneAngleDeg` (the report's convention).
 */
export function chainFromReport(workingAnglesDeg: readonly number[], jointPlaneAngleDeg: number): Vec3[] {
  const b1 = (workingAnglesDeg[0] ?? 0) * RAD;
  const b2 = (workingAnglesDeg[1] ?? 0) * RAD;
  const psi = -jointPlaneAngleDeg * RAD;
  return [
    normalise({ x: Math.cos(b1), y: 0, z: Math.sin(b1) }),
    { x: 1, y: 0, z: 0 },
    normalise({ x: Math.cos(b2), y: Math.sin(b2) * Math.sin(psi), z: Math.sin(b2) * Math.cos(psi) }),
  ];
}

/** Smallest signed difference of two yoke indices, mod 180° (the planes repeat every half turn). */
export function phaseErrorDeg(measuredDeg: number, targetDeg: number): number {
  const d = (((measuredDeg - targetDeg) % 180) + 180) % 180;
  return d > 90 ? d - 180 : d;
}

const band = (score: number | null): TriageBand =>
  score == null ? "not-measured" : score >= 1 ? "past-limit" : score >= 0.5 ? "toward-limit" : "well-within";

const LOAD_WEIGHT: Record<LoadFit, number> = { fits: 1.1, neutral: 1, against: 0.9 };

const f1 = (x: number): string => x.toFixed(1);
const f2 = (x: number): string => x.toFixed(2);
const rpmText = (rpm: number): string => `${Math.round(rpm)} rpm`;

/** Speed-only causes (once per turn, resonance) follow road speed, not the throttle (common shop practice). */
function speedOnlyFit(load: ComplaintLoad): { fit: LoadFit; note: string } {
  return load === "both"
    ? {
        fit: "fits",
        note: "Fits: a once-per-turn shake follows speed and is there under load and coasting alike (common shop practice).",
      }
    : {
        fit: "against",
        note: `Less likely: a once-per-turn shake usually follows speed, not the throttle; this one is felt ${load === "load" ? "under load only" : "coasting only"} (common shop practice).`,
      };
}

function anglesFit(load: ComplaintLoad): { fit: LoadFit; note: string } {
  switch (load) {
    case "load":
      return {
        fit: "fits",
        note: "Fits: angle-related shake is typically worse under load and on acceleration; leaf-sprung axles also wind up and change the pinion angle under torque (common shop practice).",
      };
    case "both":
      return {
        fit: "neutral",
        note: "Possible: angle-related shake is typically worse under load; one that is the same coasting points more to balance or runout (common shop practice).",
      };
    case "coast":
      return {
        fit: "against",
        note: "Less likely but possible: angle-related shake is typically worse under load; on a coast the pinion angle moves the other way, which can uncover a pinion set for the loaded angle only (common shop practice).",
      };
  }
}

function unbalanceCause(shaft: TriageShaft, rpm: number, load: ComplaintLoad): TriageCause {
  const { balance } = shaft;
  const omega = rpmToRadS(rpm);
  // ISO 21940-11: U_per = 9549·G·m/n, so at the same grade it scales with 1/n.
  const permissibleHere = (balance.perPlaneGmm * balance.speedRpm) / rpm;
  const fit = speedOnlyFit(load);
  const base = {
    id: "unbalance" as const,
    title: "Unbalance (once per turn)",
    order: 1,
    frequencyHz: rpm / 60,
    loadFit: fit.fit,
    loadNote: fit.note,
  };
  const residuals = shaft.residuals;
  const figuresBase: TriageFigure[] = [
    {
      label: `Permissible per plane at the service speed ${rpmText(balance.speedRpm)} (G ${balance.gradeMmS}, ${f2(balance.rotorMassKg)} kg)`,
      value: balance.perPlaneGmm,
      quantity: "unbalance",
      source: "ISO 21940-11, frozen report",
    },
    {
      label: `Permissible per plane at ${rpmText(rpm)} (same grade)`,
      value: permissibleHere,
      quantity: "unbalance",
      source: "ISO 21940-11: U_per = 9549·G·m/n",
    },
  ];
  if (!residuals || residuals.length === 0) {
    return {
      ...base,
      score: null,
      band: "not-measured",
      rankKey: -1,
      summary: "Balance is not recorded yet: the residual unbalance per plane is unknown.",
      figures: figuresBase,
      whatToCheck: ["Balance the shaft and record the residual in each plane."],
    };
  }
  const worst = residuals.reduce((a, b) => (b.value / b.limit > a.value / a.limit ? b : a));
  // The worst plane against its own limit, moved to the complaint speed the same way.
  const score = worst.value / ((worst.limit * balance.speedRpm) / rpm);
  // Force of a residual U (kg·m) at ω: F = U·ω². g·mm → kg·m is 1e-6.
  const forceHere = worst.value * 1e-6 * omega * omega;
  const forceService = worst.value * 1e-6 * rpmToRadS(shaft.serviceRpm) ** 2;
  const effectiveGrade = balance.gradeMmS * score;
  const figures: TriageFigure[] = [
    ...residuals.map<TriageFigure>((r) => ({
      label: `${r.label} (as built${r.concession ? ", accepted by concession" : ""})`,
      value: r.value,
      quantity: "unbalance",
      limit: r.limit,
      source: r.source,
    })),
    ...figuresBase,
    {
      label: `Balance quality the residual gives at ${rpmText(rpm)}`,
      value: effectiveGrade,
      quantity: "grade",
      limit: balance.gradeMmS,
      source: "ISO 21940-11: G = e·Ω, e = U/m",
    },
    {
      label: `Force of that residual at ${rpmText(rpm)}`,
      value: forceHere,
      quantity: "force",
      source: "F = U·ω² (grows with speed²)",
    },
    {
      label: `The same at the service speed ${rpmText(shaft.serviceRpm)}`,
      value: forceService,
      quantity: "force",
      source: "F = U·ω²",
    },
  ];
  const growth = (shaft.serviceRpm / rpm) ** 2;
  const summary = `${worst.label} (the worst plane) is ${f2(score)}× the permissible per plane at ${rpmText(rpm)}: at this speed it gives balance quality G ${f1(effectiveGrade)} against the G ${balance.gradeMmS} the shaft was built to. Its force grows with speed²${rpm < shaft.serviceRpm ? `: ${f1(growth)}× this at the service speed ${rpmText(shaft.serviceRpm)}` : ""}.`;
  return {
    ...base,
    score,
    band: band(score),
    rankKey: score * LOAD_WEIGHT[fit.fit],
    summary,
    figures,
    whatToCheck: [
      "Look for a lost balance weight, mud, undercoating or a dent on the tube.",
      "Spin the shaft on the balancing machine again and compare each plane's residual with the record.",
      "Check the companion flange or pinion yoke and the slip yoke for wear or play, which show as unbalance on the car.",
      `Measure the vibration frequency: at about ${f1(rpm / 60)} Hz it is once per shaft turn.`,
    ],
  };
}

function runoutCause(shaft: TriageShaft, rpm: number, load: ComplaintLoad): TriageCause {
  const fit = speedOnlyFit(load);
  const base = {
    id: "runout" as const,
    title: "Runout (once per turn)",
    order: 1,
    frequencyHz: rpm / 60,
    loadFit: fit.fit,
    loadNote: fit.note,
  };
  const readings = shaft.runout;
  if (!readings || readings.length === 0) {
    return {
      ...base,
      score: null,
      band: "not-measured",
      rankKey: -1,
      summary: "Runout is not recorded yet: the tube's straightness is unknown.",
      figures: [],
      whatToCheck: ["Straighten the shaft and record the runout (TIR) at each station."],
    };
  }
  const worst = readings.reduce((a, b) => (b.value / b.limit > a.value / a.limit ? b : a));
  const score = worst.value / worst.limit;
  return {
    ...base,
    score,
    band: band(score),
    rankKey: score * LOAD_WEIGHT[fit.fit],
    summary: `${worst.label} (the worst reading) is ${f2(score)}× its limit as built. Runout does not change with speed, but the bent tube's once-per-turn force does, and it grows nearer the critical speed.`,
    figures: readings.map((r) => ({
      label: `${r.label} (as built${r.concession ? ", accepted by concession" : ""})`,
      value: r.value,
      quantity: "runout",
      limit: r.limit,
      source: r.source,
    })),
    whatToCheck: [
      "Read the runout again on the vehicle near each end and at mid-span (the shaft may have been bent in handling or fitting).",
      "Check the pilot and the yoke or flange seating at each end: a flange that is not seated square shows as runout at that end.",
      "A tube over its limit is straightened and re-balanced, or re-tubed.",
    ],
  };
}

function anglesCause(shaft: TriageShaft, rpm: number, load: ComplaintLoad): TriageCause {
  const omega = rpmToRadS(rpm);
  const limit = shaft.accelerationLimit;
  const fit = anglesFit(load);
  const angles = shaft.joints.map((j) => j.workingAngleDeg);
  const perJoint = shaft.joints.map((j) => ({
    position: j.position,
    angleDeg: j.workingAngleDeg,
    accel: cardanPeakAngularAccelerationRadS2(j.workingAngleDeg * RAD, omega),
  }));
  const { phase } = shaft;
  const measured = phase.measuredDeg;
  const indexUsed = measured ?? phase.targetDeg;
  // Net output with the as-built index (two joints; a longer chain is left to the report's figures).
  let outputVariation: number | null = null;
  let outputAccel: number | null = null;
  let equivalentDeg: number | null = null;
  if (angles.length === 2) {
    const chain = makeChain(chainFromReport(angles, shaft.jointPlaneAngleDeg), [indexUsed * RAD]);
    const response = chainResponse(chain);
    outputVariation = response.outputPeakToPeak;
    const eq = equivalentAngleRad(response.outputPeakToPeak);
    equivalentDeg = eq * DEG;
    outputAccel = cardanPeakAngularAccelerationRadS2(eq, omega);
  }
  const errorDeg = measured == null ? null : phaseErrorDeg(measured, phase.targetDeg);
  const phaseRatio = errorDeg == null ? 0 : Math.abs(errorDeg) / phase.toleranceDeg;
  const ratios = [
    ...perJoint.map((j) => j.accel / limit.value),
    ...(outputAccel != null ? [outputAccel / limit.value] : []),
    ...(phaseRatio > 1 ? [phaseRatio] : []),
  ];
  const score = ratios.length ? Math.max(...ratios) : 0;
  const worstJoint = perJoint.reduce((a, b) => (b.accel > a.accel ? b : a), perJoint[0]!);
  const figures: TriageFigure[] = [
    ...perJoint.map<TriageFigure>((j) => ({
      label: `${j.position.charAt(0).toUpperCase()}${j.position.slice(1)} joint: working angle ${f2(j.angleDeg)}° (frozen report), peak angular acceleration at ${rpmText(rpm)}`,
      value: j.accel,
      quantity: "acceleration",
      limit: limit.value,
      source: `${limit.source}; α = ω²·sin²β·cos β·sin 2θ/(1 − sin²β·cos²θ)², engineering reference §1`,
    })),
  ];
  if (measured != null && errorDeg != null) {
    figures.push({
      label: `Rear-yoke phase index as built ${f1(measured)}° against ${f1(phase.targetDeg)}° (error ${f1(errorDeg)}°)${phase.concession ? ", accepted by concession" : ""}`,
      value: Math.abs(errorDeg),
      quantity: "angle",
      limit: phase.toleranceDeg,
      source: phase.source,
    });
  }
  if (outputVariation != null && outputAccel != null && equivalentDeg != null) {
    figures.push(
      {
        label: `Output speed variation with the ${measured != null ? "as-built" : "target"} index ${f1(indexUsed)}°`,
        value: outputVariation * 100,
        quantity: "pct",
        source: "exact two-joint chain, engineering reference §3",
      },
      {
        label: `Net output peak angular acceleration at ${rpmText(rpm)} (equivalent angle ${f2(equivalentDeg)}°)`,
        value: outputAccel,
        quantity: "acceleration",
        limit: limit.value,
        source: limit.source,
      },
    );
  }
  const phaseWords =
    measured == null
      ? "The phase index is not measured yet; the target index is used."
      : phaseRatio > 1
        ? `The rear yoke is ${f1(Math.abs(errorDeg!))}° off its index, outside ±${f1(phase.toleranceDeg)}°.`
        : `The rear yoke is within ±${f1(phase.toleranceDeg)}° of its index (${f1(errorDeg!)}°).`;
  const summary = `Cardan joints excite the second order: at ${rpmText(rpm)} the ${worstJoint.position} joint's ${f2(worstJoint.angleDeg)}° gives a peak angular acceleration of ${Math.round(worstJoint.accel)} rad/s² (${f2(worstJoint.accel / limit.value)}× the ${Math.round(limit.value)} rad/s² limit)${outputVariation != null ? `; the output speed varies ${(outputVariation * 100).toFixed(3)}% per turn` : ""}. ${phaseWords}`;
  return {
    id: "angles",
    title: "Working angles and phasing (twice per turn)",
    order: 2,
    frequencyHz: (2 * rpm) / 60,
    score,
    band: band(score),
    rankKey: score * LOAD_WEIGHT[fit.fit],
    summary,
    figures,
    loadFit: fit.fit,
    loadNote: fit.note,
    whatToCheck: [
      "Measure the transmission, shaft and pinion angles on the vehicle at loaded ride height and compare the working angles with the frozen report.",
      "Look for worn or collapsed transmission mounts, a shifted axle, worn leaf-spring bushings or a lift kit added since measuring.",
      "Check the rear yoke's phase mark against the as-built index.",
      `Measure the vibration frequency: at about ${f1((2 * rpm) / 60)} Hz it is twice per shaft turn.`,
    ],
  };
}

function criticalCause(shaft: TriageShaft, rpm: number, load: ComplaintLoad): TriageCause {
  const r = rpm / shaft.criticalSpeedRpm;
  const limit = shaft.criticalSpeedRatioLimit;
  const score = r / limit.value;
  const fit = speedOnlyFit(load);
  const figures: TriageFigure[] = [
    { label: "Critical (whirling) speed, frozen report", value: shaft.criticalSpeedRpm, quantity: "rpm" },
    {
      label: `Complaint speed ÷ critical speed`,
      value: r,
      quantity: "ratio",
      limit: limit.value,
      source: limit.source,
    },
  ];
  if (r < 1) {
    figures.push({
      label: "How much a once-per-turn force is magnified here, 1/(1 − r²) (undamped; real shafts less)",
      value: 1 / (1 - r * r),
      quantity: "ratio",
      source: "single-mass (Jeffcott) rotor, e.g. Vance, Rotordynamics of Turbomachinery",
    });
  }
  const summary =
    r >= 1
      ? `At ${rpmText(rpm)} the shaft is at or past its critical speed ${rpmText(shaft.criticalSpeedRpm)} (ratio ${f2(r)}): stop driving it at this speed.`
      : `At ${rpmText(rpm)} the shaft runs at ${f2(r)} of its critical speed ${rpmText(shaft.criticalSpeedRpm)} (allowed ${f2(limit.value)}); a once-per-turn force is magnified about ${f2(1 / (1 - r * r))}× here.`;
  return {
    id: "critical-speed",
    title: "Margin to the critical speed",
    order: 1,
    frequencyHz: rpm / 60,
    score,
    band: band(score),
    rankKey: score * LOAD_WEIGHT[fit.fit],
    summary,
    figures,
    loadFit: fit.fit,
    loadNote: fit.note,
    whatToCheck: [
      "Confirm the vehicle's real top speed, axle ratio and tire size against the design: a change raises the shaft speed.",
      "Measure the installed length at full droop: a longer shaft has a lower critical speed.",
      "If the shaft runs near its critical speed, a stiffer or larger tube, a lighter material or a two-piece shaft is the fix, not balancing.",
    ],
  };
}

/** The triage: shaft speed at the complaint and the causes, most likely first. */
export function triageVibration(shaft: TriageShaft, complaint: Complaint): TriageResult {
  const { rpm, basis } = complaintShaftRpm(shaft, complaint.speed);
  if (!(rpm > 0) || !Number.isFinite(rpm)) throw new RangeError("the shaft speed must be a positive number");
  const causes = [
    unbalanceCause(shaft, rpm, complaint.load),
    runoutCause(shaft, rpm, complaint.load),
    anglesCause(shaft, rpm, complaint.load),
    criticalCause(shaft, rpm, complaint.load),
  ].sort((a, b) => b.rankKey - a.rankKey);
  const measuredScores = causes.map((c) => c.score).filter((s): s is number => s != null);
  const topScore = measuredScores.length ? Math.max(...measuredScores) : 0;
  const otherSources: OtherSource[] = [];
  if (shaft.axleRatio != null && shaft.axleRatio > 0) {
    otherSources.push({
      label: "Tires and wheels (once per wheel turn)",
      frequencyHz: rpm / shaft.axleRatio / 60,
      shaftOrder: 1 / shaft.axleRatio,
      note: `Wheel rpm = shaft rpm ÷ axle ratio ${shaft.axleRatio} = ${Math.round(rpm / shaft.axleRatio)} rpm.`,
    });
  }
  if (complaint.speed.kind === "engine") {
    otherSources.push({
      label: "Engine and torque converter (once per engine turn)",
      frequencyHz: complaint.speed.engineRpm / 60,
      shaftOrder: complaint.speed.gearRatio,
      note: `Engine ${Math.round(complaint.speed.engineRpm)} rpm.`,
    });
  }
  const wheel = otherSources[0];
  const notTheShaft =
    topScore < 0.5
      ? `Nothing in this shaft's record points to the shaft at ${rpmText(rpm)}: every figure is below half its limit.${wheel ? ` Look first at what else turns at this speed, such as the tires and wheels (about ${f1(wheel.frequencyHz)} Hz).` : ""}`
      : null;
  const notes: string[] = [];
  if (rpm > shaft.serviceRpm) {
    notes.push(
      `${rpmText(rpm)} is above the service speed the shaft was evaluated for (${rpmText(shaft.serviceRpm)}).`,
    );
  }
  return {
    shaftRpm: rpm,
    shaftHz: rpm / 60,
    speedBasis: basis,
    causes,
    notTheShaft,
    otherSources,
    notes,
    cautions: [TRIAGE_CAUTION, DISCLAIMER],
  };
}

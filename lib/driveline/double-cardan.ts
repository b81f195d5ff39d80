/**
 * A double-Cardan (constant-velocity) front joint, for steep lifted 4×4 shafts. Two crosses with
 * a short centre yoke between them; the centring device holds the centre yoke on the bisector of
 * the two shafts, so each cross runs at half the joint's angle, both in one plane and in phase —
 * the arrangement that cancels exactly (engineering reference §3: equal angles in one plane, in
 * phase; Fischer & Paul 1991). The shaft then turns at constant speed, and the single joint at the
 * axle is left uncancelled: it should run near zero with the pinion pointed at the shaft (common
 * shop practice: about 0.5–1°; not below the 0.5° the needles need to roll).
 *
 * The chain is modelled exactly with the core's chain (phasing.ts): shafts transmission →
 * centre yoke → tube → pinion, three crosses, the centre yoke's index 0 (made in phase), the
 * tube's index the best (or the design's).
 */
import { equivalentAngleRad } from "./cardan";
import { sameCaps, type CatalogueIndex } from "./catalogue/lookup";
import type { Catalogue, JointSeries } from "./catalogue/types";
import { checkAtMost, checkOf, fmt, worstStatus, type Check } from "./checks";
import { sampleChainCurves } from "./curves";
import { designDirections } from "./design-geometry";
import { add, angleBetweenRad, normalise, phaseIndexRad, type Vec3 } from "./geometry";
import {
  chainOutputPeakToPeak,
  chainResponse,
  makeChain,
  smallAngleEquivalentRad,
  type Chain,
} from "./phasing";
import { SAFETY_CAUTION, type EndReport, type EvaluationReport, type JointReport } from "./report";
import type { DesignFile } from "./schema";
import type { ShopSettings } from "./settings";

const DEG = 180 / Math.PI;
const RAD = Math.PI / 180;

/** The double-Cardan front joint as the report gives it. */
export interface DoubleCardanReport {
  readonly seriesId: string | null;
  readonly name: string | null;
  /** Why this joint (or why none). */
  readonly reason: string;
  /** The joint's whole angle (transmission or transfer-case output to the tube), deg. */
  readonly totalAngleDeg: number;
  /** The two crosses' working angles, deg (each half the whole for a centred joint). */
  readonly crossAnglesDeg: readonly [number, number];
  /** The catalogue joint's largest angle, deg (null without a joint). */
  readonly maxWorkingAngleDeg: number | null;
  /** ω(tube)/ω(output) variation of the joint alone, % (0 for a centred joint). */
  readonly speedVariationPct: number;
  /** Peak angular acceleration of the centre yoke at service speed (its first cross at half angle), rad/s². */
  readonly centreYokePeakAngularAccelerationRadS2: number;
  /** The axle-end joint, left uncancelled, and the most it should run, deg. */
  readonly rearAngleDeg: number;
  readonly rearMaxAngleDeg: number;
}

/** The centre yoke's axis of a centred double-Cardan joint: the bisector of the two shafts. */
export function doubleCardanCentreAxis(input: Vec3, output: Vec3): Vec3 {
  return normalise(add(input, output));
}

/**
 * The chain of a one-piece shaft with a double-Cardan front joint: [transmission, centre yoke,
 * tube, pinion], three crosses. The centre yoke is in phase (index 0); the tube's index is
 * `tubePhaseIndexRad`, else the best (the angle between the joint planes, §3).
 */
export function makeDoubleCardanChain(
  shafts: readonly [Vec3, Vec3, Vec3],
  tubePhaseIndexRad?: number,
): Chain {
  const [t, d, p] = shafts;
  const m = doubleCardanCentreAxis(t, d);
  return makeChain([t, m, d, p], [0, tubePhaseIndexRad ?? phaseIndexRad(m, d, p)]);
}

/**
 * The catalogue's double-Cardan joint for a front fitting: one whose crosses take the fitting's
 * caps (when the catalogue gives caps), that carries the torque and takes the angle, cheapest.
 */
export function chooseDoubleCardan(
  catalogue: Catalogue,
  frontSeries: JointSeries | null,
  torqueNm: number,
  angleDeg: number,
): { series: JointSeries | null; reason: string } {
  const all = catalogue.jointSeries.filter((s) => s.kind === "double-cardan");
  if (all.length === 0)
    return {
      series: null,
      reason: 'the shop catalogue has no double-Cardan joint (a joint series of kind "double-cardan")',
    };
  const capsKnown = frontSeries?.capDiameterMm != null && frontSeries.capSpanMm != null;
  const fits = capsKnown
    ? all.filter((s) => s.id === frontSeries!.id || sameCaps(s, { ...frontSeries!, retention: null }))
    : all;
  if (fits.length === 0)
    return {
      series: null,
      reason: `no double-Cardan joint in the catalogue takes the front fitting's ${frontSeries!.id} caps`,
    };
  const ranked = [...fits].sort(
    (a, b) =>
      Number(a.torqueRatingNm < torqueNm) - Number(b.torqueRatingNm < torqueNm) ||
      Number(a.maxWorkingAngleDeg < angleDeg) - Number(b.maxWorkingAngleDeg < angleDeg) ||
      a.priceCents - b.priceCents ||
      a.id.localeCompare(b.id),
  );
  const best = ranked[0]!;
  return {
    series: best,
    reason: `double-Cardan joint ${best.id}${capsKnown ? ` takes the front fitting's ${frontSeries!.id} caps` : ""}, rated ${Math.round(best.torqueRatingNm)} N·m and ${fmt(best.maxWorkingAngleDeg, 1)}° (the lowest price among those that carry ${Math.round(torqueNm)} N·m at ${fmt(angleDeg, 1)}°)`,
  };
}

/** chooseDoubleCardan for a design's front end (its angle from the design's geometry). */
export function doubleCardanFor(
  design: DesignFile,
  front: EndReport,
  index: CatalogueIndex,
  catalogue: Catalogue,
  torqueNm: number,
): { series: JointSeries | null; reason: string } {
  const named = design.interface?.front?.jointSeriesId;
  const namedSeries = named != null ? index.series.get(named) : undefined;
  if (namedSeries?.kind === "double-cardan")
    return {
      series: namedSeries,
      reason: `double-Cardan joint ${namedSeries.id} named by interface.front.jointSeriesId`,
    };
  const u = designDirections(design);
  const angleDeg = angleBetweenRad(u.transmission, u.driveshaft) * DEG;
  return chooseDoubleCardan(catalogue, index.series.get(front.jointSeriesId) ?? null, torqueNm, angleDeg);
}

/** Check ids the single-cross front joint gave that a double-Cardan joint replaces. */
const REPLACED = new Set([
  "angle-difference",
  "joint-max-angle.front",
  "joint-acceleration.front",
  "equivalent-angle",
  "phase-index",
]);

export interface DoubleCardanContext {
  readonly design: DesignFile;
  readonly settings: ShopSettings;
  readonly catalogue: Catalogue;
  readonly index: CatalogueIndex;
}

/**
 * The report of a one-piece shaft with a double-Cardan front joint, from the single-cross
 * evaluation: the front joint, the phasing and the tube's acceleration from the three-cross
 * chain, and the `double-cardan.*` checks in place of the front/rear angle difference (which a
 * double-Cardan shaft does not aim for) and the single cross's angle and acceleration.
 */
export function applyDoubleCardan(report: EvaluationReport, ctx: DoubleCardanContext): EvaluationReport {
  const { design, settings, catalogue, index } = ctx;
  const u = designDirections(design);
  const shafts = [u.transmission, u.driveshaft, u.pinion] as const;
  const rpm = report.service.maxShaftRpm;
  const omega = (rpm * Math.PI) / 30;
  const chain = makeDoubleCardanChain(shafts);
  const response = chainResponse(chain);
  const cvAlone = chainResponse(makeChain([shafts[0], chain.shafts[1]!, shafts[1]], [0]));
  const inPhasePeakToPeak = chainOutputPeakToPeak(makeDoubleCardanChain(shafts, 0));
  const specifiedPeakToPeak =
    design.phaseIndexDeg != null
      ? chainOutputPeakToPeak(makeDoubleCardanChain(shafts, design.phaseIndexDeg * RAD))
      : null;

  const front = report.joints[0]!;
  const rear = report.joints[report.joints.length - 1]!;
  const crossId = report.ends.front?.crossSeriesId;
  const crossSeries = crossId ? index.series.get(crossId) : undefined;
  const series = crossSeries?.kind === "double-cardan" ? crossSeries : null;
  const reason = report.ends.front
    ? doubleCardanFor(design, report.ends.front, index, catalogue, report.service.peakShaftTorqueNm).reason
    : "no front end fitting, so no double-Cardan joint could be chosen";

  const [beta1, beta2] = chain.workingAngleRad as [number, number, number];
  const centreYokeAcc = omega * omega * (response.tubePeakRatioDerivative[0] ?? 0);
  const tubeAcc = omega * omega * (response.tubePeakRatioDerivative[1] ?? 0);
  const cvVariation = cvAlone.outputPeakToPeak;
  const cvJoint: JointReport = {
    ...front,
    maxSpeedRatio: cvAlone.outputMaxRatio,
    minSpeedRatio: cvAlone.outputMinRatio,
    speedVariationPct: cvVariation * 100,
    maxLeadLagDeg: 0,
    // The tube behind a centred double-Cardan joint turns at the output's speed.
    peakAngularAccelerationRadS2: omega * omega * (cvAlone.tubePeakRatioDerivative[1] ?? 0),
    // Each cross sees half the joint's angle.
    maxAngleAtServiceRpmDeg: 2 * front.maxAngleAtServiceRpmDeg,
    jointSeriesId: series?.id ?? front.jointSeriesId,
  };
  const joints = [cvJoint, ...report.joints.slice(1)];

  const best = (chain.phaseIndexRad[1] ?? 0) * DEG;
  const eqDeg = equivalentAngleRad(response.outputPeakToPeak) * DEG;
  const asSpecified =
    specifiedPeakToPeak !== null
      ? {
          phaseIndexDeg: design.phaseIndexDeg!,
          outputSpeedVariationPct: specifiedPeakToPeak * 100,
          equivalentAngleDeg: equivalentAngleRad(specifiedPeakToPeak) * DEG,
        }
      : undefined;
  const phasing: EvaluationReport["phasing"] = {
    phaseIndexDeg: best,
    outputSpeedVariationPct: response.outputPeakToPeak * 100,
    equivalentAngleDeg: eqDeg,
    equivalentAngleSmallAngleDeg: smallAngleEquivalentRad(chain.workingAngleRad) * DEG,
    jointPlaneAngleDeg: best,
    inPhaseOutputSpeedVariationPct: inPhasePeakToPeak * 100,
    toleranceDeg: settings.phasingToleranceDeg.value,
    ...(asSpecified ? { asSpecified } : {}),
  };

  const dc: Check[] = [];
  const src = "shop catalogue (maker's rating)";
  if (!series) {
    dc.push(
      checkOf(
        "double-cardan.series",
        "fail",
        `Double-Cardan front joint asked (frontJointType), but ${reason}: add one to the catalogue (Universal joints, kind double-Cardan) or use a single cross — ${src}`,
        src,
      ),
    );
  } else {
    dc.push(
      checkAtMost({
        id: "double-cardan.max-angle",
        what: `Double-Cardan joint ${series.id} angle (two crosses at ${fmt(beta1 * DEG)}° and ${fmt(beta2 * DEG)}°)`,
        value: front.workingAngleDeg,
        unit: "°",
        limit: {
          value: series.maxWorkingAngleDeg,
          source: "double-Cardan joint rating in the shop catalogue",
        },
      }),
    );
  }
  const accLimit = settings.maxJointAngularAccelerationRadS2;
  dc.push(
    checkAtMost({
      id: "double-cardan.acceleration",
      // The centre yoke is light and the tube is not accelerated: over the per-joint limit it warns
      // (the crosses and the centring ball wear faster) rather than fails.
      what: `Double-Cardan centre yoke peak angular acceleration at ${Math.round(rpm)} rpm (first cross at ${fmt(beta1 * DEG)}°, half the joint's ${fmt(front.workingAngleDeg)}°; the tube behind it turns evenly)`,
      value: centreYokeAcc,
      unit: " rad/s²",
      limit: accLimit,
      digits: 0,
      overStatus: "warn",
      warnAbove: accLimit.value * settings.accelerationWarnFraction.value,
      warnSource: settings.accelerationWarnFraction.source,
    }),
  );
  const rearMax = settings.doubleCardanMaxRearAngleDeg;
  dc.push(
    checkAtMost({
      id: "double-cardan.rear-angle",
      what: `Axle-end working angle behind the double-Cardan joint (uncancelled: point the pinion at the shaft; keep it at least ${fmt(settings.minWorkingAngleDeg.value, 1)}° so the needles roll)`,
      value: rear.workingAngleDeg,
      unit: "°",
      limit: rearMax,
      overStatus: "warn",
    }),
  );
  dc.push(
    checkAtMost({
      id: "equivalent-angle",
      what: `Equivalent angle with the double-Cardan front joint (output speed variation ${fmt(asSpecified?.outputSpeedVariationPct ?? phasing.outputSpeedVariationPct, 3)}% at tube index ${fmt(asSpecified?.phaseIndexDeg ?? best, 1)}°)`,
      value: asSpecified?.equivalentAngleDeg ?? eqDeg,
      unit: "°",
      limit: settings.maxEquivalentAngleDeg,
      overStatus: "warn",
    }),
  );
  const checks = [...report.checks];
  const at = checks.findIndex((c) => REPLACED.has(c.id));
  const kept = checks.filter((c) => !REPLACED.has(c.id));
  const insertAt = at < 0 ? kept.length : checks.slice(0, at).filter((c) => !REPLACED.has(c.id)).length;
  kept.splice(insertAt, 0, ...dc);

  const overall = worstStatus(kept.map((c) => c.status));
  const cautions = report.cautions.filter((c) => c !== SAFETY_CAUTION);
  if (overall !== "pass") cautions.unshift(SAFETY_CAUTION);

  const doubleCardan: DoubleCardanReport = {
    seriesId: series?.id ?? null,
    name: series?.name ?? null,
    reason,
    totalAngleDeg: front.workingAngleDeg,
    crossAnglesDeg: [beta1 * DEG, beta2 * DEG],
    maxWorkingAngleDeg: series?.maxWorkingAngleDeg ?? null,
    speedVariationPct: cvVariation * 100,
    centreYokePeakAngularAccelerationRadS2: centreYokeAcc,
    rearAngleDeg: rear.workingAngleDeg,
    rearMaxAngleDeg: rearMax.value,
  };
  const out: EvaluationReport = {
    ...report,
    overall,
    joints,
    phasing,
    peakAngularAccelerationRadS2: tubeAcc,
    checks: kept,
    cautions,
    frontJointType: "double-cardan",
    doubleCardan,
  };
  if (report.curves) {
    const curves = sampleChainCurves(
      makeDoubleCardanChain(shafts, design.phaseIndexDeg != null ? design.phaseIndexDeg * RAD : undefined),
      report.curves.angleDeg.length,
    );
    const names = ["front", "front (second cross)", "rear"];
    return {
      ...out,
      curves: {
        ...curves,
        joints: curves.joints.map((j, i) => ({ ...j, position: names[i] ?? j.position })),
      },
    };
  }
  return out;
}

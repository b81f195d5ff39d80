/**
 * evaluateDesign: one design file in, one evaluation report out. Pure and synchronous; the
 * parse (schema.ts) is separate so this hot path does no validation work.
 */
import { permissibleUnbalanceGmm } from "./balance";
import {
  cardanMaxAngularDeviationRad,
  cardanPeakAngularAccelerationRadS2,
  cardanSpeedRatioExtremes,
  equivalentAngleRad,
} from "./cardan";
import { defaultCatalogue } from "./catalogue/default";
import { findCatalogueTube } from "./catalogue/tube-match";
import {
  endReport,
  fittingFitsTube,
  indexCatalogue,
  suggestFitting,
  type CatalogueIndex,
} from "./catalogue/lookup";
import type { Catalogue, EndFitting, Material } from "./catalogue/types";
import { checkAtLeast, checkAtMost, checkOf, fmt, worstStatus, type Check } from "./checks";
import { criticalSpeedRpm } from "./critical-speed";
import { sampleChainCurves } from "./curves";
import { designDirections } from "./design-geometry";
import { applyDoubleCardan } from "./double-cardan";
import { fitInterface } from "./interface";
import { chainOutputPeakToPeak, chainResponse, makeChain, phasingResult } from "./phasing";
import {
  DEMO_CATALOGUE_NOTE,
  DISCLAIMER,
  SAFETY_CAUTION,
  type EndReport,
  type EvaluationReport,
  type JointReport,
  type TubeReport,
  type TwoPieceProposal,
} from "./report";
import { parseDesign, type DesignFile, type FieldIssue } from "./schema";
import { tubeMassKg } from "./section";
import { slipChecks, slipReport } from "./slip";
import {
  criticalSpeedCheck,
  jointContinuousChecks,
  outputAccelerationCheck,
  serviceChecks,
  speedBasisInWords,
  limitsForUse,
  weldZoneCheck,
  weldZoneTorsion,
} from "./load-checks";
import { defaultSettings, type ShaftUse, type ShopSettings } from "./settings";
import { serviceLoads, serviceSpeed } from "./speed";
import { torsionShearStressMPa } from "./torsion";
import { evaluateTwoPiece, proposeTwoPiece } from "./two-piece";
import { rankTubes, type TubeCandidate, type TubeSelection } from "./tube-selection";

export interface EvaluateOptions {
  readonly catalogue?: Catalogue;
  readonly settings?: ShopSettings;
  /** Include `curves` (181 points) in the report. */
  readonly curves?: boolean | { readonly points: number };
  /** Rank the catalogue even when the design gives its tube. */
  readonly alternatives?: boolean;
  /** How a tube is picked when the design leaves it to Yokeline (default: the lightest that passes). */
  readonly tubePreference?: TubePreference;
  /** The use when the design file gives none (e.g. the saved design's application); default street. */
  readonly use?: ShaftUse;
}

/** Among the tubes that pass: the lightest (engineering's usual preference) or the cheapest (a shop's quote). */
export type TubePreference = "lightest" | "cheapest";

/** Thrown by evaluateDesign when a design that skipped parseDesign refers to unknown parts. */
export class DesignInputError extends Error {
  constructor(readonly issues: readonly FieldIssue[]) {
    super(issues.map((i) => i.message).join("\n"));
    this.name = "DesignInputError";
  }
}

const DEG = 180 / Math.PI;
const RAD = Math.PI / 180;
export const rpmToRadS = (rpm: number): number => (rpm * Math.PI) / 30;
const POSITIONS2 = ["front", "rear"] as const;

/**
 * Largest working angle (rad) whose exact peak output acceleration at ω equals the limit.
 * α grows about as β², so β ← β·√(limit/α(β)) converges in a few steps.
 */
export function maxAngleForAccelerationRad(limitRadS2: number, omegaRadS: number): number {
  let beta = Math.min(1.4, Math.sqrt(limitRadS2) / omegaRadS);
  for (let i = 0; i < 6; i++) {
    const a = cardanPeakAngularAccelerationRadS2(beta, omegaRadS);
    if (a <= 0) break;
    beta = Math.min(1.4, beta * Math.sqrt(limitRadS2 / a));
  }
  return beta;
}

export function jointReport(
  position: JointReport["position"],
  betaRad: number,
  omegaRadS: number,
  maxAngleDeg: number,
  jointSeriesId: string | null,
): JointReport {
  const ext = cardanSpeedRatioExtremes(betaRad);
  return {
    position,
    workingAngleDeg: betaRad * DEG,
    maxSpeedRatio: ext.max,
    minSpeedRatio: ext.min,
    speedVariationPct: ext.peakToPeak * 100,
    maxLeadLagDeg: cardanMaxAngularDeviationRad(betaRad) * DEG,
    peakAngularAccelerationRadS2: cardanPeakAngularAccelerationRadS2(betaRad, omegaRadS),
    maxAngleAtServiceRpmDeg: maxAngleDeg,
    jointSeriesId,
  };
}

const label = (p: string): string => p.charAt(0).toUpperCase() + p.slice(1);

/** The per-joint angle rules: minimum, acceleration limit, the cross series' maximum. */
export function jointChecks(
  joints: readonly JointReport[],
  settings: ShopSettings,
  rpm: number,
  index: CatalogueIndex,
  prefix = "",
): Check[] {
  const out: Check[] = [];
  const accLimit = settings.maxJointAngularAccelerationRadS2;
  for (const j of joints) {
    const name = `${prefix}${label(j.position)} working angle`;
    out.push(
      checkAtLeast({
        id: `${prefix ? "two-piece." : ""}working-angle-min.${j.position}`,
        what: name,
        value: j.workingAngleDeg,
        unit: "°",
        limit: settings.minWorkingAngleDeg,
        underStatus: "warn",
      }),
    );
    const acc = checkAtMost({
      id: `${prefix ? "two-piece." : ""}joint-acceleration.${j.position}`,
      what: `${prefix}${label(j.position)} joint peak angular acceleration at ${Math.round(rpm)} rpm (working angle ${fmt(j.workingAngleDeg)}°, largest angle for the limit ${fmt(j.maxAngleAtServiceRpmDeg)}°)`,
      value: j.peakAngularAccelerationRadS2,
      unit: " rad/s²",
      limit: accLimit,
      digits: 0,
      warnAbove: accLimit.value * settings.accelerationWarnFraction.value,
      warnSource: settings.accelerationWarnFraction.source,
    });
    out.push(acc);
    const series = j.jointSeriesId ? index.series.get(j.jointSeriesId) : undefined;
    if (series) {
      out.push(
        checkAtMost({
          id: `${prefix ? "two-piece." : ""}joint-max-angle.${j.position}`,
          what: `${name} for cross ${series.id}`,
          value: j.workingAngleDeg,
          unit: "°",
          limit: { value: series.maxWorkingAngleDeg, source: "joint series rating in the shop catalogue" },
        }),
      );
    }
  }
  return out;
}

interface ResolvedTube {
  report: TubeReport;
  material: Pick<
    Material,
    | "elasticModulusGPa"
    | "densityKgM3"
    | "shearYieldMPa"
    | "weldFamily"
    | "weldZoneTensileYieldMPa"
    | "weldZoneSource"
  >;
  maxLengthMm: number | null;
}

function resolveMaterial(
  design: DesignFile,
  materialId: string,
  index: CatalogueIndex,
): ResolvedTube["material"] {
  const base = index.materials.get(materialId);
  const m = design.material;
  const elasticModulusGPa = m?.elasticModulusGPa ?? base?.elasticModulusGPa;
  const densityKgM3 = m?.densityKgM3 ?? base?.densityKgM3;
  const shearYieldMPa = m?.shearYieldMPa ?? base?.shearYieldMPa;
  if (elasticModulusGPa == null || densityKgM3 == null || shearYieldMPa == null) {
    throw new DesignInputError([
      {
        path: "tube.materialId",
        message: `tube.materialId: must be a catalogue material unless material gives elasticModulusGPa, densityKgM3 and shearYieldMPa (unknown "${materialId}")`,
      },
    ]);
  }
  // A one-off material welds like steel unless the catalogue knows better; its weld zone is unknown.
  return {
    elasticModulusGPa,
    densityKgM3,
    shearYieldMPa,
    weldFamily: base?.weldFamily ?? "steel",
    ...(base?.weldZoneTensileYieldMPa != null
      ? { weldZoneTensileYieldMPa: base.weldZoneTensileYieldMPa, weldZoneSource: base.weldZoneSource ?? "" }
      : {}),
  };
}

export { endReport } from "./catalogue/lookup";

/** Pick from a ranking: the first clean pass, else the first that warns, else the stiffest. */
export function pickTube(
  selection: TubeSelection,
  choice: TubePreference = "lightest",
): TubeCandidate | null {
  const ranked = choice === "cheapest" ? selection.byCost : selection.byMass;
  return ranked.find((c) => c.status === "pass") ?? ranked[0] ?? selection.stiffest;
}

/**
 * Evaluate a parsed design against the catalogue and shop settings (defaults: the built-in
 * ones). Never presents a failed check as a pass: `overall` is the worst check status.
 * @throws DesignInputError only if the design names parts the catalogue lacks (parseDesign
 * with the same catalogue rejects those first).
 */
export function evaluateDesign(design: DesignFile, options?: EvaluateOptions): EvaluationReport {
  if (design.layout === "two-piece") return evaluateTwoPiece(design, options);
  const catalogue = options?.catalogue ?? defaultCatalogue;
  const settings = options?.settings ?? defaultSettings;
  const index = indexCatalogue(catalogue);

  const service = serviceSpeed(design.speed);
  if (!service) {
    throw new DesignInputError([
      {
        path: "speed.maxShaftRpm",
        message:
          "speed.maxShaftRpm: must be a positive number unless topSpeedKmh, axleRatio and tireDiameterMm are all given",
      },
    ]);
  }
  const rpm = service.maxShaftRpm;
  const omega = rpmToRadS(rpm);
  const lengthMm = design.lengthMm;
  const use = limitsForUse(design, settings, options?.use);
  const loads = serviceLoads(design, use.factors);
  const torqueNm = loads.peakShaftTorqueNm;

  // Ends named by the design (fixed before the tube is picked: the tube must fit them).
  const namedEnds: (EndFitting | null)[] = POSITIONS2.map((p) => {
    const fittingId = design.ends?.[p]?.fittingId;
    if (fittingId == null) return null;
    const f = index.fittings.get(fittingId);
    if (!f) {
      throw new DesignInputError([
        {
          path: `ends.${p}.fittingId`,
          message: `ends.${p}.fittingId: must be an end fitting in the catalogue (unknown "${fittingId}")`,
        },
      ]);
    }
    return f;
  });
  const seatAllowanceMm =
    (namedEnds[0]?.jointCentreToWeldSeatMm ?? 0) + (namedEnds[1]?.jointCentreToWeldSeatMm ?? 0);

  // Tube: given, or the lightest catalogue tube that passes.
  let selection: TubeSelection | null = null;
  const rankInput = {
    spanMm: use.criticalSpeedLengthMm,
    tubeLengthMm: lengthMm - seatAllowanceMm,
    maxShaftRpm: rpm,
    peakShaftTorqueNm: torqueNm,
    fittings: namedEnds,
    catalogue,
    settings,
    criticalSpeedRatioLimit: use.criticalSpeedRatioLimit,
    warnCriticalSpeedRatio: use.criticalSpeedWarn.value,
  };
  let tubeSpec: {
    id: string | null;
    materialId: string;
    odMm: number;
    wallMm: number;
    origin: TubeReport["origin"];
  };
  if (design.tube) {
    tubeSpec = { id: null, ...design.tube, origin: "design" };
    tubeSpec.id = findCatalogueTube(catalogue, design.tube)?.id ?? null;
    if (options?.alternatives) selection = rankTubes(rankInput);
  } else {
    selection = rankTubes(rankInput);
    const pick = pickTube(selection, options?.tubePreference);
    const fallback = catalogue.tubes[0];
    if (pick)
      tubeSpec = {
        id: pick.tubeId,
        materialId: pick.materialId,
        odMm: pick.odMm,
        wallMm: pick.wallMm,
        origin: "catalogue",
      };
    else if (fallback)
      tubeSpec = {
        id: fallback.id,
        materialId: fallback.materialId,
        odMm: fallback.odMm,
        wallMm: fallback.wallMm,
        origin: "catalogue",
      };
    else
      throw new DesignInputError([
        { path: "tube", message: "tube: is required (the catalogue has no tubes to choose from)" },
      ]);
  }
  const material = resolveMaterial(design, tubeSpec.materialId, index);
  const catalogueTube = tubeSpec.id ? index.tubes.get(tubeSpec.id) : undefined;

  // Ends: named, or suggested for this tube; then matched to the vehicle's interface data.
  const chosenEnds = namedEnds.map((f) => {
    if (f) return endReport(f, "design", index);
    const s = suggestFitting(catalogue, index, tubeSpec.odMm, material.weldFamily, torqueNm);
    return s ? endReport(s, "suggested", index) : null;
  });
  const fit = fitInterface({
    design,
    catalogue,
    index,
    ends: chosenEnds,
    namedEnds,
    tubeOdMm: tubeSpec.odMm,
    weldFamily: material.weldFamily,
    torqueNm,
  });
  const ends = fit.ends;
  const front = ends[0] ?? null;
  const rear = ends[1] ?? null;
  const cutLengthMm =
    front && rear ? lengthMm - front.jointCentreToWeldSeatMm - rear.jointCentreToWeldSeatMm : null;
  const tubeLengthMm = cutLengthMm !== null && cutLengthMm > 0 ? cutLengthMm : lengthMm;
  const massKg = tubeMassKg(tubeSpec, tubeLengthMm, material.densityKgM3);
  const tube: TubeReport = {
    tubeId: tubeSpec.id,
    materialId: tubeSpec.materialId,
    odMm: tubeSpec.odMm,
    wallMm: tubeSpec.wallMm,
    massKg,
    tubeLengthMm,
    origin: tubeSpec.origin,
    elasticModulusGPa: material.elasticModulusGPa,
    densityKgM3: material.densityKgM3,
    shearYieldMPa: material.shearYieldMPa,
    priceCents: catalogueTube ? Math.round((catalogueTube.pricePerMetreCents * tubeLengthMm) / 1000) : null,
  };

  // Geometry and phasing.
  const u = designDirections(design);
  const shafts = [u.transmission, u.driveshaft, u.pinion];
  const chain = makeChain(shafts);
  const response = chainResponse(chain);
  const phasing0 = phasingResult(chain, response);
  const inPhasePeakToPeak =
    chain.phaseIndexRad[0] === 0 ? response.outputPeakToPeak : chainOutputPeakToPeak(makeChain(shafts, [0]));
  let asSpecified: EvaluationReport["phasing"]["asSpecified"];
  let outputResponse = response;
  if (design.phaseIndexDeg != null) {
    const r = chainResponse(makeChain(shafts, [design.phaseIndexDeg * RAD]));
    outputResponse = r;
    asSpecified = {
      phaseIndexDeg: design.phaseIndexDeg,
      outputSpeedVariationPct: r.outputPeakToPeak * 100,
      equivalentAngleDeg: equivalentAngleRad(r.outputPeakToPeak) * DEG,
    };
  }
  const maxAngleDeg =
    maxAngleForAccelerationRad(settings.maxJointAngularAccelerationRadS2.value, omega) * DEG;
  const joints = chain.workingAngleRad.map((b, i) =>
    jointReport(
      POSITIONS2[i]!,
      b,
      omega,
      maxAngleDeg,
      ends[i]?.crossSeriesId ?? ends[i]?.jointSeriesId ?? null,
    ),
  );
  // The tube is driven by the front joint alone, so its acceleration does not depend on the index.
  const peakAngularAccelerationRadS2 = omega * omega * (response.tubePeakRatioDerivative[0] ?? 0);

  // Strength, stiffness, balance.
  const nc = criticalSpeedRpm({
    odMm: tube.odMm,
    wallMm: tube.wallMm,
    spanMm: use.criticalSpeedLengthMm,
    elasticModulusGPa: tube.elasticModulusGPa,
    densityKgM3: tube.densityKgM3,
  });
  const criticalSpeedRatio = rpm / nc;
  const shearStressMPa = torsionShearStressMPa(tube, torqueNm);
  const safetyFactor = tube.shearYieldMPa / shearStressMPa;
  const weldZone = weldZoneTorsion(material, shearStressMPa);
  const outputPeakAngularAccelerationRadS2 = omega * omega * outputResponse.outputPeakRatioDerivative;
  const grade = design.balanceGradeMmS ?? settings.balanceGradeMmS.value;
  const gradeSource = design.balanceGradeMmS != null ? "design file" : settings.balanceGradeMmS.source;
  const rotorMassKg = massKg + (front?.massKg ?? 0) + (rear?.massKg ?? 0);
  const uPer = permissibleUnbalanceGmm(grade, rotorMassKg, rpm);

  const checks: Check[] = [];
  checks.push(...serviceChecks(service, loads, use.use, design));
  checks.push(...jointChecks(joints, settings, rpm, index));
  const diff = Math.abs(joints[0]!.workingAngleDeg - joints[1]!.workingAngleDeg);
  checks.push(
    checkAtMost({
      id: "angle-difference",
      what: "Front/rear working-angle difference",
      value: diff,
      unit: "°",
      limit: settings.maxAngleDifferenceDeg,
      overStatus: "warn",
    }),
  );
  const eqAngle = asSpecified?.equivalentAngleDeg ?? phasing0.equivalentAngleDeg;
  const variationPct = asSpecified?.outputSpeedVariationPct ?? phasing0.outputSpeedVariationPct;
  checks.push(
    checkAtMost({
      id: "equivalent-angle",
      what: `Equivalent angle (output speed variation ${fmt(variationPct, 3)}% at index ${fmt(asSpecified?.phaseIndexDeg ?? phasing0.phaseIndexDeg, 1)}°)`,
      value: eqAngle,
      unit: "°",
      limit: settings.maxEquivalentAngleDeg,
      overStatus: "warn",
    }),
  );
  checks.push(outputAccelerationCheck(outputPeakAngularAccelerationRadS2, eqAngle, rpm, settings));
  if (asSpecified) {
    const off = Math.abs(((asSpecified.phaseIndexDeg - phasing0.phaseIndexDeg + 270) % 180) - 90);
    checks.push(
      checkAtMost({
        id: "phase-index",
        what: `Specified rear-yoke index ${fmt(asSpecified.phaseIndexDeg, 1)}° differs from the best ${fmt(phasing0.phaseIndexDeg, 1)}° by`,
        value: off,
        unit: "°",
        limit: settings.phasingToleranceDeg,
        overStatus: "warn",
      }),
    );
  }
  checks.push(criticalSpeedCheck(criticalSpeedRatio, rpm, nc, lengthMm, use));
  checks.push(
    checkAtLeast({
      id: "torsion",
      what: `Torsion safety factor (shear ${fmt(shearStressMPa, 1)} MPa at ${Math.round(torqueNm)} N·m, shear yield ${fmt(tube.shearYieldMPa, 1)} MPa)`,
      value: safetyFactor,
      unit: "",
      limit: settings.minTorsionSafetyFactor,
    }),
  );
  checks.push(weldZoneCheck(weldZone, safetyFactor, shearStressMPa, torqueNm, tube, settings));
  checks.push(...endChecks(ends, namedEnds, tube, material.weldFamily, torqueNm, index));
  checks.push(...fit.checks);
  checks.push(...jointContinuousChecks(ends, loads, index));
  checks.push(...lengthChecks(lengthMm, cutLengthMm, tubeLengthMm, catalogueTube?.maxLengthMm ?? null, tube));
  const slip = design.slip ? slipReport(design, settings, fit.slipYoke) : null;
  if (slip) checks.push(...slipChecks(slip, settings));
  checks.push(
    checkOf(
      "balance",
      "pass",
      `Balance to G ${fmt(grade, 1)} at ${Math.round(rpm)} rpm: ${fmt(rotorMassKg, 2)} kg rotor, permissible residual unbalance ${fmt(uPer, 1)} g·mm (${fmt(uPer / 2, 1)} g·mm per plane) — ISO 21940-11; grade from ${gradeSource}`,
      `ISO 21940-11; grade from ${gradeSource}`,
      uPer,
    ),
  );

  // Two-piece proposal when no single tube passes critical speed at this length.
  let twoPiece: TwoPieceProposal | null = null;
  if (criticalSpeedRatio > use.criticalSpeedRatioLimit.value) {
    selection ??= rankTubes(rankInput);
    if (!selection.anyPassesCriticalSpeed) {
      twoPiece = proposeTwoPiece(u, lengthMm, rpm, torqueNm, catalogue, settings, index);
    }
  }

  const overall = worstStatus(checks.map((c) => c.status));
  const cautions: string[] = [];
  if (overall !== "pass") cautions.push(SAFETY_CAUTION);
  if (catalogue.demo) cautions.push(DEMO_CATALOGUE_NOTE);
  cautions.push(DISCLAIMER);

  const report: EvaluationReport = {
    overall,
    designName: design.name ?? null,
    service: {
      maxShaftRpm: rpm,
      peakShaftTorqueNm: torqueNm,
      governedBy: service.governedBy,
      vehicleRpm: service.vehicleRpm,
      engineRpm: service.engineRpm,
      speedBasis: speedBasisInWords(service, design),
      use: use.use,
      engineTorqueAtShaftNm: loads.engineTorqueAtShaftNm,
      wheelSlipTorqueNm: loads.wheelSlipTorqueNm,
      adhesion: loads.adhesion,
      adhesionSource: loads.adhesionSource,
      torqueGovernedBy: loads.torqueGovernedBy,
      serviceFactor: loads.serviceFactor,
      serviceFactorSource: loads.serviceFactorSource,
      runningTorqueNm: loads.runningTorqueNm,
      runningTorqueBasis: loads.runningTorqueBasis,
    },
    lengthMm,
    joints,
    phasing: {
      phaseIndexDeg: phasing0.phaseIndexDeg,
      outputSpeedVariationPct: phasing0.outputSpeedVariationPct,
      equivalentAngleDeg: phasing0.equivalentAngleDeg,
      equivalentAngleSmallAngleDeg: phasing0.equivalentAngleSmallAngleDeg,
      jointPlaneAngleDeg: phasing0.phaseIndexDeg,
      inPhaseOutputSpeedVariationPct: inPhasePeakToPeak * 100,
      toleranceDeg: settings.phasingToleranceDeg.value,
      ...(asSpecified ? { asSpecified } : {}),
    },
    peakAngularAccelerationRadS2,
    outputPeakAngularAccelerationRadS2,
    tube,
    criticalSpeedRpm: nc,
    criticalSpeedRatio,
    criticalSpeedLengthMm: use.criticalSpeedLengthMm,
    criticalSpeedRatioLimit: use.criticalSpeedRatioLimit.value,
    torsion: {
      shearStressMPa,
      shearYieldMPa: tube.shearYieldMPa,
      safetyFactor,
      weldZoneShearYieldMPa: weldZone.shearYieldMPa,
      weldZoneSafetyFactor: weldZone.safetyFactor,
      weldZoneSource: weldZone.source,
    },
    balance: {
      gradeMmS: grade,
      speedRpm: rpm,
      rotorMassKg,
      permissibleUnbalanceGmm: uPer,
      perPlaneGmm: uPer / 2,
    },
    ends: { front, rear },
    cutLengthMm,
    slip,
    interface: fit.report,
    frontJointType: design.frontJointType ?? "cross",
    shopFloor: {
      lengthToleranceMm: settings.lengthToleranceMm.value,
      runoutEndsMm: settings.runoutEndsMm.value,
      runoutCentreMm: settings.runoutCentreMm.value,
      phasingToleranceDeg: settings.phasingToleranceDeg.value,
      sources: [
        settings.lengthToleranceMm.source,
        settings.runoutEndsMm.source,
        settings.runoutCentreMm.source,
        settings.phasingToleranceDeg.source,
      ],
    },
    tubeSelection: selection,
    twoPiece,
    checks,
    cautions,
  };
  let out = report;
  if (options?.curves) {
    const points = typeof options.curves === "object" ? options.curves.points : 181;
    out = {
      ...report,
      curves: sampleChainCurves(
        design.phaseIndexDeg != null ? makeChain(shafts, [design.phaseIndexDeg * RAD]) : chain,
        points,
      ),
    };
  }
  return design.frontJointType === "double-cardan"
    ? applyDoubleCardan(out, { design, settings, catalogue, index })
    : out;
}

const CATALOGUE_SOURCE = "shop catalogue (maker's rating)";

function endChecks(
  ends: readonly (EndReport | null)[],
  namedEnds: readonly (EndFitting | null)[],
  tube: TubeReport,
  weldFamily: string,
  torqueNm: number,
  index: CatalogueIndex,
): Check[] {
  const out: Check[] = [];
  POSITIONS2.forEach((p, i) => {
    const e = ends[i];
    if (!e) {
      out.push(
        checkOf(
          `end-fitting.${p}`,
          "fail",
          `${label(p)}: no end fitting in the catalogue takes a ${fmt(tube.odMm, 1)} mm ${weldFamily} tube at ${Math.round(torqueNm)} N·m; joint torque rating not checked — ${CATALOGUE_SOURCE}`,
          CATALOGUE_SOURCE,
        ),
      );
      return;
    }
    const named = namedEnds[i];
    if (named && !fittingFitsTube(named, tube.odMm, weldFamily)) {
      out.push(
        checkOf(
          `end-fit.${p}`,
          "fail",
          `${label(p)} fitting ${e.fittingId} takes a ${fmt(named.tubeOdMm, 1)} mm ${named.weldFamily} tube, the tube is ${fmt(tube.odMm, 1)} mm ${weldFamily} — ${CATALOGUE_SOURCE}`,
          CATALOGUE_SOURCE,
        ),
      );
    }
    const series = index.series.get(e.jointSeriesId);
    out.push(
      checkAtMost({
        id: `joint-torque.${p}`,
        what: `${label(p)} peak shaft torque on ${e.fittingId}${series ? ` / ${series.id}` : ""}`,
        value: torqueNm,
        unit: " N·m",
        digits: 0,
        limit: {
          value: e.torqueRatingNm,
          source: `${CATALOGUE_SOURCE}${e.origin === "suggested" ? "; fitting suggested by Yokeline" : ""}`,
        },
      }),
    );
  });
  return out;
}

function lengthChecks(
  lengthMm: number,
  cutLengthMm: number | null,
  tubeLengthMm: number,
  maxLengthMm: number | null,
  tube: TubeReport,
): Check[] {
  const out: Check[] = [];
  if (cutLengthMm !== null && cutLengthMm <= 0) {
    out.push(
      checkOf(
        "cut-length",
        "fail",
        `Cut length ${fmt(cutLengthMm, 1)} mm: the end fittings are longer than the ${fmt(lengthMm, 1)} mm installed length — ${CATALOGUE_SOURCE} (joint centre to weld seat)`,
        CATALOGUE_SOURCE,
        cutLengthMm,
        0,
      ),
    );
  }
  if (maxLengthMm !== null) {
    out.push(
      checkAtMost({
        id: "tube-length",
        what: `Tube length for ${tube.tubeId}`,
        value: tubeLengthMm,
        unit: " mm",
        digits: 1,
        limit: { value: maxLengthMm, source: "shop catalogue (stock length)" },
      }),
    );
  }
  return out;
}

/** Parse untrusted input, then evaluate: `{ ok: true, report }` or the field issues. */
export function parseAndEvaluate(
  input: unknown,
  options?: EvaluateOptions,
): { ok: true; report: EvaluationReport } | { ok: false; issues: FieldIssue[] } {
  const parsed = parseDesign(input, { catalogue: options?.catalogue ?? defaultCatalogue });
  if (!parsed.ok) return parsed;
  try {
    return { ok: true, report: evaluateDesign(parsed.design, options) };
  } catch (error) {
    if (error instanceof DesignInputError) return { ok: false, issues: [...error.issues] };
    throw error;
  }
}

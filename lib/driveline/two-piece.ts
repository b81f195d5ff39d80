/**
 * Two-piece shafts with a centre support bearing: the proposal made when no single tube passes
 * critical speed over the whole length, the design it becomes (`twoPieceDesignFrom`), and the
 * evaluation of a design with `layout: "two-piece"` — three joints phased as one chain, each piece
 * checked on its own span (engineering reference §5: "each piece is checked on its own span").
 *
 * The evaluation starts from the one-piece evaluation of the same design with the chosen tube (so
 * the service loads, torsion and the front and rear joint and fitting checks are the one-piece
 * ones), then replaces what differs for two pieces: the joints and their phasing, critical speed,
 * the ends and cut length of each piece, balance per piece and the centre bearing's own checks.
 */
import { equivalentAngleRad } from "./cardan";
import { defaultCatalogue } from "./catalogue/default";
import {
  fittingFitsTube,
  fittingRatingNm,
  indexCatalogue,
  suggestFitting,
  type CatalogueIndex,
} from "./catalogue/lookup";
import type { Catalogue, CentreBearing, EndFitting } from "./catalogue/types";
import { checkAtLeast, checkAtMost, checkOf, fmt, worstStatus, type Check } from "./checks";
import { permissibleUnbalanceGmm } from "./balance";
import { criticalSpeedRpm } from "./critical-speed";
import { sampleChainCurves } from "./curves";
import { designDirections } from "./design-geometry";
import { add, dot, normalise, scale, sub, type Vec3 } from "./geometry";
import { chainOutputPeakToPeak, chainResponse, makeChain } from "./phasing";
import {
  DesignInputError,
  endReport,
  evaluateDesign,
  jointChecks,
  jointReport,
  maxAngleForAccelerationRad,
  pickTube,
  rpmToRadS,
  type EvaluateOptions,
} from "./evaluate";
import {
  DEMO_CATALOGUE_NOTE,
  DISCLAIMER,
  SAFETY_CAUTION,
  type CentreBearingReport,
  type EndReport,
  type EvaluationReport,
  type JointReport,
  type PieceReport,
  type ShaftPieceReport,
  type TubeReport,
  type TwoPieceProposal,
} from "./report";
import type { DesignFile } from "./schema";
import { tubeMassKg } from "./section";
import { defaultSettings, type ShopSettings } from "./settings";
import { rankTubes, type TubeCandidate, type TubeSelection } from "./tube-selection";

const DEG = 180 / Math.PI;
const RAD = Math.PI / 180;
const CATALOGUE_SOURCE = "shop catalogue (maker's rating)";
const PIECES = [
  { piece: "A", position: "front", label: "Front piece (A)", suffix: "front-piece" },
  { piece: "B", position: "rear", label: "Rear piece (B)", suffix: "rear-piece" },
] as const;

/** Unit vector normal to u in the vertical plane through u, pointing down. */
function downNormal(u: Vec3): Vec3 {
  const down = { x: 0, y: 0, z: -1 };
  return normalise(sub(down, scale(u, dot(down, u))));
}

/** Where the centre joint sits and the two pieces' axes. */
export interface TwoPieceGeometry {
  /** Centre joint from the front joint centre along the straight joint-to-joint line, mm. */
  readonly fromFrontMm: number;
  /** Drop of the centre joint below that line, mm. */
  readonly dropMm: number;
  /** Joint centre to joint centre of each piece, mm. */
  readonly spansMm: readonly [number, number];
  /** Axes: transmission, front piece, rear piece, pinion. */
  readonly shafts: readonly [Vec3, Vec3, Vec3, Vec3];
}

/**
 * The centre joint at `fromFrontMm` (default half way), dropped below the straight line by
 * `dropMm` (default: just enough to give it the shop's centre-joint angle, so its needles roll —
 * the apex angle of the dropped triangle, atan(h/L₁) + atan(h/L₂) ≈ h·L/(L₁·L₂)).
 */
export function twoPieceGeometry(
  u: { transmission: Vec3; driveshaft: Vec3; pinion: Vec3 },
  lengthMm: number,
  settings: ShopSettings,
  fromFrontMm?: number | null,
  dropMm?: number | null,
): TwoPieceGeometry {
  const front = fromFrontMm ?? lengthMm / 2;
  const rear = lengthMm - front;
  const drop = dropMm ?? (Math.tan(settings.centreJointAngleDeg.value * RAD) * front * rear) / lengthMm;
  const bearing = add(scale(u.driveshaft, front), scale(downNormal(u.driveshaft), drop));
  const toRear = sub(scale(u.driveshaft, lengthMm), bearing);
  return {
    fromFrontMm: front,
    dropMm: drop,
    spansMm: [Math.hypot(front, drop), Math.hypot(rear, drop)],
    shafts: [u.transmission, normalise(bearing), normalise(toRear), u.pinion],
  };
}

/** Whether a centre bearing's stub takes this tube. */
function bearingFitsTube(b: CentreBearing, odMm: number, weldFamily: string): boolean {
  return fittingFitsTube(b as unknown as EndFitting, odMm, weldFamily);
}

/** The centre bearing's stub as a fitting (for tube ranking and the front piece's rear end). */
function stubFitting(b: CentreBearing, index: CatalogueIndex): EndFitting {
  return {
    id: b.id,
    name: b.name,
    kind: "weld-yoke",
    jointSeriesId: b.jointSeriesId,
    tubeOdMm: b.tubeOdMm,
    weldFamily: b.weldFamily,
    jointCentreToWeldSeatMm: b.jointCentreToWeldSeatMm,
    massKg: b.massKg,
    torqueRatingNm: index.series.get(b.jointSeriesId)?.torqueRatingNm ?? 0,
    priceCents: 0,
  };
}

/** The stub end of the front piece (priced with the centre bearing, not as a fitting). */
function stubEnd(b: CentreBearing, index: CatalogueIndex): EndReport {
  return {
    ...endReport(stubFitting(b, index), "design", index),
    name: `${b.name} (stub end)`,
    kind: "centre-bearing-stub",
    priceCents: 0,
  };
}

/** The cheapest weld yoke of the centre joint's series that takes the tube (the rear piece's front end). */
function centreYoke(
  catalogue: Catalogue,
  index: CatalogueIndex,
  bearing: CentreBearing,
  odMm: number,
  weldFamily: string,
): EndFitting | null {
  let best: EndFitting | null = null;
  for (const f of catalogue.endFittings) {
    if (f.kind !== "weld-yoke" || f.jointSeriesId !== bearing.jointSeriesId) continue;
    if (!fittingFitsTube(f, odMm, weldFamily)) continue;
    if (!best || f.priceCents < best.priceCents) best = f;
  }
  return best ?? null;
}

/** The cheapest centre bearing that takes the tube and whose joint series carries the torque. */
export function suggestCentreBearing(
  catalogue: Catalogue,
  odMm: number,
  weldFamily: string,
  torqueNm: number,
): CentreBearing | null {
  const index = indexCatalogue(catalogue);
  let best: CentreBearing | null = null;
  for (const b of catalogue.centreBearings ?? []) {
    const series = index.series.get(b.jointSeriesId);
    if (!series || series.torqueRatingNm < torqueNm || !bearingFitsTube(b, odMm, weldFamily)) continue;
    if (!best || b.priceCents < best.priceCents) best = b;
  }
  return best;
}

/**
 * Split the shaft with a centre support bearing. The bearing is dropped below the straight
 * joint-to-joint line just enough to give its joint the shop's centre-joint angle; both pieces use
 * the lightest tube that passes at the longer piece's span, and the cheapest catalogue centre
 * bearing that takes that tube and the torque.
 */
export function proposeTwoPiece(
  u: { transmission: Vec3; driveshaft: Vec3; pinion: Vec3 },
  lengthMm: number,
  rpm: number,
  torqueNm: number,
  catalogue: Catalogue,
  settings: ShopSettings,
  index: CatalogueIndex,
): TwoPieceProposal {
  const geo = twoPieceGeometry(u, lengthMm, settings);
  const [front, rear] = geo.spansMm;
  const chain = makeChain(geo.shafts);
  const response = chainResponse(chain);
  const omega = rpmToRadS(rpm);
  const selection = rankTubes({
    spanMm: Math.max(front, rear),
    maxShaftRpm: rpm,
    peakShaftTorqueNm: torqueNm,
    catalogue,
    settings,
  });
  // Prefer the lightest passing tube that a catalogue centre bearing takes.
  const withBearing = selection.byMass.find((c) => {
    const m = index.materials.get(c.materialId);
    return c.status === "pass" && m && suggestCentreBearing(catalogue, c.odMm, m.weldFamily, torqueNm);
  });
  const pick = withBearing ?? pickTube(selection);
  const maxAngleDeg =
    maxAngleForAccelerationRad(settings.maxJointAngularAccelerationRadS2.value, omega) * DEG;
  const positions = ["front", "centre", "rear"] as const;
  const joints = chain.workingAngleRad.map((b, i) => jointReport(positions[i]!, b, omega, maxAngleDeg, null));
  const checks: Check[] = jointChecks(joints, settings, rpm, index, "Two-piece: ");
  const pieces: PieceReport[] = [];
  const material = pick ? index.materials.get(pick.materialId) : undefined;
  const bearing =
    pick && material ? suggestCentreBearing(catalogue, pick.odMm, material.weldFamily, torqueNm) : null;
  if (pick && material) {
    const fitting = suggestFitting(catalogue, index, pick.odMm, material.weldFamily, torqueNm);
    const yoke = bearing ? centreYoke(catalogue, index, bearing, pick.odMm, material.weldFamily) : null;
    for (const [position, spanMm] of [
      ["front", front],
      ["rear", rear],
    ] as const) {
      const centreSeat =
        position === "front" ? bearing?.jointCentreToWeldSeatMm : yoke?.jointCentreToWeldSeatMm;
      const cut =
        fitting && centreSeat != null ? spanMm - fitting.jointCentreToWeldSeatMm - centreSeat : null;
      const tubeLengthMm = cut !== null && cut > 0 ? cut : spanMm;
      const nc = criticalSpeedRpm({
        ...pick,
        spanMm,
        elasticModulusGPa: material.elasticModulusGPa,
        densityKgM3: material.densityKgM3,
      });
      const tube: TubeCandidate = {
        ...pick,
        tubeLengthMm,
        massKg: tubeMassKg(pick, tubeLengthMm, material.densityKgM3),
        criticalSpeedRpm: nc,
        criticalSpeedRatio: rpm / nc,
        speedHeadroomPct: ((nc * settings.maxCriticalSpeedRatio.value) / rpm - 1) * 100,
        priceCents: Math.round(
          ((index.tubes.get(pick.tubeId)?.pricePerMetreCents ?? 0) * tubeLengthMm) / 1000,
        ),
      };
      pieces.push({ position, spanMm, tube, cutLengthMm: cut });
      checks.push(
        checkAtMost({
          id: `two-piece.critical-speed.${position}`,
          what: `Two-piece ${position} piece critical-speed ratio (${Math.round(rpm)} / ${Math.round(nc)} rpm, ${pick.tubeId})`,
          value: tube.criticalSpeedRatio,
          unit: "",
          digits: 3,
          limit: settings.maxCriticalSpeedRatio,
          warnAbove: settings.warnCriticalSpeedRatio.value,
          warnSource: settings.warnCriticalSpeedRatio.source,
        }),
      );
    }
    checks.push(
      checkAtLeast({
        id: "two-piece.torsion",
        what: `Two-piece torsion safety factor (${pick.tubeId})`,
        value: pick.torsionSafetyFactor,
        unit: "",
        limit: settings.minTorsionSafetyFactor,
      }),
    );
    if (!bearing) {
      checks.push(
        checkOf(
          "two-piece.centre-bearing",
          "fail",
          `No centre bearing in the catalogue takes a ${fmt(pick.odMm, 1)} mm ${material.weldFamily} tube at ${Math.round(torqueNm)} N·m — ${CATALOGUE_SOURCE}`,
          CATALOGUE_SOURCE,
        ),
      );
    }
  } else {
    checks.push(
      checkOf(
        "two-piece.critical-speed",
        "fail",
        `No catalogue tube passes the critical-speed ratio limit ${settings.maxCriticalSpeedRatio.value} even at ${fmt(Math.max(front, rear), 0)} mm span — ${settings.maxCriticalSpeedRatio.source}`,
        settings.maxCriticalSpeedRatio.source,
      ),
    );
  }
  const eq = equivalentAngleRad(response.outputPeakToPeak) * DEG;
  checks.push(
    checkAtMost({
      id: "two-piece.equivalent-angle",
      what: "Two-piece equivalent angle",
      value: eq,
      unit: "°",
      limit: settings.maxEquivalentAngleDeg,
      overStatus: "warn",
    }),
  );
  const overall = worstStatus(checks.map((c) => c.status));
  return {
    reason: `No single catalogue tube keeps the critical-speed ratio within ${settings.maxCriticalSpeedRatio.value} over ${fmt(lengthMm, 0)} mm; split with a centre support bearing, three joints.`,
    feasible: pieces.length === 2 && bearing !== null && overall !== "fail",
    centreBearingId: bearing?.id ?? null,
    centreBearingFromFrontMm: geo.fromFrontMm,
    centreBearingDropMm: geo.dropMm,
    pieces,
    joints,
    phasing: {
      phaseIndicesDeg: chain.phaseIndexRad.map((r) => r * DEG),
      outputSpeedVariationPct: response.outputPeakToPeak * 100,
      equivalentAngleDeg: eq,
    },
    peakAngularAccelerationRadS2: omega * omega * Math.max(...response.tubePeakRatioDerivative),
    checks,
    overall,
  };
}

/**
 * The design a two-piece proposal becomes, for the builder's one click: the same design with
 * `layout: "two-piece"`, the proposed centre bearing where the proposal put it, and the tube the
 * proposal checked. Null when the report has no proposal or the proposal names no centre bearing.
 * Pure; the builder re-evaluates the result as usual.
 */
export function twoPieceDesignFrom(design: DesignFile, report: EvaluationReport): DesignFile | null {
  const p = report.twoPiece;
  if (!p || !p.centreBearingId) return null;
  const tube = p.pieces[0]?.tube;
  return {
    ...design,
    layout: "two-piece",
    centreBearing: {
      bearingId: p.centreBearingId,
      fromFrontMm: round1(p.centreBearingFromFrontMm),
      dropMm: round1(p.centreBearingDropMm),
    },
    ...(tube ? { tube: { materialId: tube.materialId, odMm: tube.odMm, wallMm: tube.wallMm } } : {}),
    // The one-piece index does not apply to three joints.
    phaseIndexDeg: null,
  };
}

const round1 = (x: number): number => Math.round(x * 10) / 10;

/** One-piece checks that a two-piece evaluation replaces with its own (three joints, two spans). */
const REPLACED_EXACT = new Set([
  "critical-speed",
  "angle-difference",
  "equivalent-angle",
  "phase-index",
  "cut-length",
  "tube-length",
  "balance",
  "output-acceleration",
]);
const REPLACED_PREFIX = ["working-angle-min.", "joint-acceleration.", "joint-max-angle."];
const replaced = (id: string) => REPLACED_EXACT.has(id) || REPLACED_PREFIX.some((p) => id.startsWith(p));

function bearingError(design: DesignFile, message: string): DesignInputError {
  const path = "centreBearing.bearingId";
  return new DesignInputError([
    { path, message: `${path}: ${message} (unknown "${design.centreBearing?.bearingId}")` },
  ]);
}

/**
 * Evaluate a design with `layout: "two-piece"`: three joints (front, centre, rear) phased as one
 * chain, each piece's tube, cut length, critical speed on its own span and balance, the centre
 * bearing's fit and its joint's torque. `overall` is the worst of every check.
 * @throws DesignInputError when the centre bearing or a named part is not in the catalogue.
 */
export function evaluateTwoPiece(design: DesignFile, options?: EvaluateOptions): EvaluationReport {
  const catalogue = options?.catalogue ?? defaultCatalogue;
  const settings = options?.settings ?? defaultSettings;
  const index = indexCatalogue(catalogue);
  const bearing = (catalogue.centreBearings ?? []).find((b) => b.id === design.centreBearing?.bearingId);
  if (!bearing) throw bearingError(design, "must be a centre bearing in the catalogue");
  const lengthMm = design.lengthMm;
  const from = design.centreBearing?.fromFrontMm;
  if (from != null && from >= lengthMm) {
    throw new DesignInputError([
      {
        path: "centreBearing.fromFrontMm",
        message:
          "centreBearing.fromFrontMm: must be less than lengthMm (the centre joint lies between the ends)",
      },
    ]);
  }
  const geo = twoPieceGeometry(
    designDirections(design),
    lengthMm,
    settings,
    from,
    design.centreBearing?.dropMm,
  );
  const [spanA, spanB] = geo.spansMm;
  const namedEnds = (["front", "rear"] as const).map((p) => {
    const id = design.ends?.[p]?.fittingId;
    return id != null ? (index.fittings.get(id) ?? null) : null;
  });

  // The tube: given, or the lightest (or cheapest) that passes at the longer piece's span and fits the bearing.
  const oneShaft = { ...design, layout: null, centreBearing: null, phaseIndexDeg: null };
  const first = evaluateDesign({ ...oneShaft, tube: design.tube ?? null }, { ...options, curves: false });
  let selection: TubeSelection | null = null;
  let tubeGiven = design.tube ?? null;
  if (!tubeGiven || options?.alternatives) {
    selection = rankTubes({
      spanMm: Math.max(spanA, spanB),
      tubeLengthMm: Math.max(spanA, spanB) - bearing.jointCentreToWeldSeatMm,
      maxShaftRpm: first.service.maxShaftRpm,
      peakShaftTorqueNm: first.service.peakShaftTorqueNm,
      fittings: [...namedEnds, stubFitting(bearing, index)],
      catalogue,
      settings,
    });
  }
  if (!tubeGiven && selection) {
    const pick = pickTube(selection, options?.tubePreference);
    if (pick) tubeGiven = { materialId: pick.materialId, odMm: pick.odMm, wallMm: pick.wallMm };
  }
  const base =
    tubeGiven && !design.tube
      ? evaluateDesign({ ...oneShaft, tube: tubeGiven }, { ...options, curves: false, alternatives: false })
      : first;
  const rpm = base.service.maxShaftRpm;
  const torqueNm = base.service.peakShaftTorqueNm;
  const omega = rpmToRadS(rpm);
  const t = base.tube;
  const weldFamily = index.materials.get(t.materialId)?.weldFamily ?? "steel";
  const pricePerMetre = t.tubeId ? index.tubes.get(t.tubeId)?.pricePerMetreCents : undefined;

  // Joints and phasing: one chain of three.
  const chain = makeChain(geo.shafts);
  const response = chainResponse(chain);
  const inPhasePeakToPeak = chainOutputPeakToPeak(makeChain(geo.shafts, [0, 0]));
  const maxAngleDeg =
    maxAngleForAccelerationRad(settings.maxJointAngularAccelerationRadS2.value, omega) * DEG;
  const yoke = centreYoke(catalogue, index, bearing, t.odMm, weldFamily);
  const seriesOf = [
    base.ends.front?.jointSeriesId ?? null,
    bearing.jointSeriesId,
    base.ends.rear?.jointSeriesId ?? null,
  ];
  const positions = ["front", "centre", "rear"] as const;
  const joints: JointReport[] = chain.workingAngleRad.map((b, i) =>
    jointReport(positions[i]!, b, omega, maxAngleDeg, seriesOf[i] ?? null),
  );
  const indicesDeg = chain.phaseIndexRad.map((r) => r * DEG);
  const eqDeg = equivalentAngleRad(response.outputPeakToPeak) * DEG;

  // The pieces.
  const grade = base.balance.gradeMmS;
  const pieceEnds: { front: EndReport | null; rear: EndReport | null }[] = [
    { front: base.ends.front, rear: stubEnd(bearing, index) },
    { front: yoke ? endReport(yoke, "suggested", index) : null, rear: base.ends.rear },
  ];
  const pieces: ShaftPieceReport[] = PIECES.map((p, i) => {
    const spanMm = geo.spansMm[i]!;
    const ends = pieceEnds[i]!;
    const cut =
      ends.front && ends.rear
        ? spanMm - ends.front.jointCentreToWeldSeatMm - ends.rear.jointCentreToWeldSeatMm
        : null;
    const tubeLengthMm = cut !== null && cut > 0 ? cut : spanMm;
    const massKg = tubeMassKg(t, tubeLengthMm, t.densityKgM3);
    const nc = criticalSpeedRpm({ ...t, spanMm });
    const rotorMassKg = massKg + (ends.front?.massKg ?? 0) + (ends.rear?.massKg ?? 0);
    const uPer = permissibleUnbalanceGmm(grade, rotorMassKg, rpm);
    return {
      piece: p.piece,
      position: p.position,
      spanMm,
      tube: {
        ...t,
        massKg,
        tubeLengthMm,
        priceCents: pricePerMetre != null ? Math.round((pricePerMetre * tubeLengthMm) / 1000) : null,
      },
      ends,
      cutLengthMm: cut,
      criticalSpeedRpm: nc,
      criticalSpeedRatio: rpm / nc,
      phaseIndexDeg: indicesDeg[i] ?? 0,
      balance: {
        gradeMmS: grade,
        speedRpm: rpm,
        rotorMassKg,
        permissibleUnbalanceGmm: uPer,
        perPlaneGmm: uPer / 2,
      },
    };
  });
  const tubeLengthMm = pieces.reduce((s, p) => s + p.tube.tubeLengthMm, 0);
  const tube: TubeReport = {
    ...t,
    origin: design.tube ? "design" : "catalogue",
    tubeLengthMm,
    massKg: pieces.reduce((s, p) => s + p.tube.massKg, 0),
    priceCents: pricePerMetre != null ? pieces.reduce((s, p) => s + (p.tube.priceCents ?? 0), 0) : null,
  };
  const governing = pieces[0]!.criticalSpeedRatio >= pieces[1]!.criticalSpeedRatio ? pieces[0]! : pieces[1]!;
  const rotorMassKg = pieces.reduce((s, p) => s + p.balance.rotorMassKg, 0);
  const uPer = permissibleUnbalanceGmm(grade, rotorMassKg, rpm);

  const checks: Check[] = [
    ...jointChecks(joints, settings, rpm, index),
    checkAtMost({
      id: "equivalent-angle",
      what: `Equivalent angle of the three joints (output speed variation ${fmt(response.outputPeakToPeak * 100, 3)}% at indices ${indicesDeg.map((d) => fmt(d, 1)).join("° / ")}°)`,
      value: eqDeg,
      unit: "°",
      limit: settings.maxEquivalentAngleDeg,
      overStatus: "warn",
    }),
    ...base.checks.filter((c) => !replaced(c.id)),
    ...centreChecks(bearing, yoke, t, weldFamily, torqueNm, index),
  ];
  pieces.forEach((piece, i) => checks.push(...pieceChecks(piece, PIECES[i]!, rpm, settings, index)));

  const overall = worstStatus(checks.map((c) => c.status));
  const cautions: string[] = [];
  if (overall !== "pass") cautions.push(SAFETY_CAUTION);
  if (catalogue.demo) cautions.push(DEMO_CATALOGUE_NOTE);
  cautions.push(DISCLAIMER);
  const centreBearing: CentreBearingReport = {
    bearingId: bearing.id,
    name: bearing.name,
    jointSeriesId: bearing.jointSeriesId,
    jointCentreToWeldSeatMm: bearing.jointCentreToWeldSeatMm,
    massKg: bearing.massKg,
    priceCents: bearing.priceCents,
    fromFrontMm: geo.fromFrontMm,
    dropMm: geo.dropMm,
    centreJointAngleDeg: joints[1]!.workingAngleDeg,
    source: bearing.source,
  };
  const { asSpecified: _asSpecified, ...phasingBase } = base.phasing;
  const report: EvaluationReport = {
    ...base,
    // Loads' field (when present): the span used for the critical speed is the longer piece's.
    ...("criticalSpeedLengthMm" in base ? { criticalSpeedLengthMm: governing.spanMm } : {}),
    overall,
    joints,
    phasing: {
      ...phasingBase,
      phaseIndexDeg: indicesDeg[0] ?? 0,
      phaseIndicesDeg: indicesDeg,
      outputSpeedVariationPct: response.outputPeakToPeak * 100,
      equivalentAngleDeg: eqDeg,
      equivalentAngleSmallAngleDeg: eqDeg,
      jointPlaneAngleDeg: indicesDeg[0] ?? 0,
      inPhaseOutputSpeedVariationPct: inPhasePeakToPeak * 100,
    },
    peakAngularAccelerationRadS2: omega * omega * Math.max(...response.tubePeakRatioDerivative),
    tube,
    criticalSpeedRpm: governing.criticalSpeedRpm,
    criticalSpeedRatio: governing.criticalSpeedRatio,
    balance: {
      gradeMmS: grade,
      speedRpm: rpm,
      rotorMassKg,
      permissibleUnbalanceGmm: uPer,
      perPlaneGmm: uPer / 2,
    },
    ends: { front: pieces[0]!.ends.front, rear: pieces[1]!.ends.rear },
    cutLengthMm: null,
    tubeSelection: selection,
    twoPiece: null,
    layout: "two-piece",
    pieces,
    centreBearing,
    checks,
    cautions,
  };
  if (options?.curves) {
    const points = typeof options.curves === "object" ? options.curves.points : 181;
    return { ...report, curves: sampleChainCurves(chain, points) };
  }
  return report;
}

/** The centre bearing's stub and the rear piece's centre yoke must take the tube; the centre joint carries the torque. */
function centreChecks(
  bearing: CentreBearing,
  yoke: EndFitting | null,
  tube: TubeReport,
  weldFamily: string,
  torqueNm: number,
  index: CatalogueIndex,
): Check[] {
  const out: Check[] = [];
  if (!bearingFitsTube(bearing, tube.odMm, weldFamily)) {
    out.push(
      checkOf(
        "centre-bearing.fit",
        "fail",
        `Centre bearing ${bearing.id}'s stub takes a ${fmt(bearing.tubeOdMm, 1)} mm ${bearing.weldFamily} tube, the tube is ${fmt(tube.odMm, 1)} mm ${weldFamily} — ${CATALOGUE_SOURCE}`,
        CATALOGUE_SOURCE,
      ),
    );
  }
  if (!yoke) {
    out.push(
      checkOf(
        "end-fitting.centre",
        "fail",
        `Centre: no ${bearing.jointSeriesId} weld yoke in the catalogue takes a ${fmt(tube.odMm, 1)} mm ${weldFamily} tube for the rear piece — ${CATALOGUE_SOURCE}`,
        CATALOGUE_SOURCE,
      ),
    );
  }
  const series = index.series.get(bearing.jointSeriesId);
  const rating = Math.min(series?.torqueRatingNm ?? 0, yoke ? fittingRatingNm(yoke, index) : Infinity);
  out.push(
    checkAtMost({
      id: "joint-torque.centre",
      what: `Centre joint peak shaft torque on ${bearing.id} / ${bearing.jointSeriesId}${yoke ? ` and ${yoke.id}` : ""}`,
      value: torqueNm,
      unit: " N·m",
      digits: 0,
      limit: { value: rating, source: CATALOGUE_SOURCE },
    }),
  );
  return out;
}

/** Each piece: critical speed on its own span, cut length, stock length, balance. */
function pieceChecks(
  piece: ShaftPieceReport,
  meta: (typeof PIECES)[number],
  rpm: number,
  settings: ShopSettings,
  index: CatalogueIndex,
): Check[] {
  const out: Check[] = [
    checkAtMost({
      id: `critical-speed.${meta.suffix}`,
      what: `${meta.label} critical-speed ratio (${Math.round(rpm)} rpm service / ${Math.round(piece.criticalSpeedRpm)} rpm critical on its ${fmt(piece.spanMm, 0)} mm span)`,
      value: piece.criticalSpeedRatio,
      unit: "",
      limit: settings.maxCriticalSpeedRatio,
      digits: 3,
      warnAbove: settings.warnCriticalSpeedRatio.value,
      warnSource: settings.warnCriticalSpeedRatio.source,
    }),
  ];
  if (piece.cutLengthMm !== null && piece.cutLengthMm <= 0) {
    out.push(
      checkOf(
        `cut-length.${meta.suffix}`,
        "fail",
        `${meta.label} cut length ${fmt(piece.cutLengthMm, 1)} mm: its end fittings are longer than its ${fmt(piece.spanMm, 1)} mm span — ${CATALOGUE_SOURCE} (joint centre to weld seat)`,
        CATALOGUE_SOURCE,
        piece.cutLengthMm,
        0,
      ),
    );
  }
  const stock = piece.tube.tubeId ? index.tubes.get(piece.tube.tubeId)?.maxLengthMm : undefined;
  if (stock != null) {
    out.push(
      checkAtMost({
        id: `tube-length.${meta.suffix}`,
        what: `${meta.label} tube length for ${piece.tube.tubeId}`,
        value: piece.tube.tubeLengthMm,
        unit: " mm",
        digits: 1,
        limit: { value: stock, source: "shop catalogue (stock length)" },
      }),
    );
  }
  const b = piece.balance;
  out.push(
    checkOf(
      `balance.${meta.suffix}`,
      "pass",
      `${meta.label} balance to G ${fmt(b.gradeMmS, 1)} at ${Math.round(b.speedRpm)} rpm: ${fmt(b.rotorMassKg, 2)} kg rotor, permissible residual unbalance ${fmt(b.permissibleUnbalanceGmm, 1)} g·mm (${fmt(b.perPlaneGmm, 1)} g·mm per plane) — ISO 21940-11`,
      "ISO 21940-11",
      b.permissibleUnbalanceGmm,
    ),
  );
  return out;
}

/** Shape of the evaluation report (contract fields plus additions) and the standing texts. */
import type { SlipYoke } from "./catalogue/types";
import type { Check, CheckStatus } from "./checks";
import type { CurveSet } from "./curves";
import type { DoubleCardanReport } from "./double-cardan";
import type { InterfaceReport } from "./interface";
import type { TubeCandidate, TubeSelection } from "./tube-selection";

/** Shown whenever any check warns or fails (engineering reference, "Cautions shown to users"). */
export const SAFETY_CAUTION =
  "Results are engineering estimates for a shop's use. A driveshaft that fails or whirls can cause loss of vehicle control, injury and death: keep guards and safety loops where the application calls for them, follow the component makers' ratings, and defer to a qualified engineer and to the local codes and inspection rules that apply.";

/** Always shown. */
export const DISCLAIMER =
  "Yokeline results do not replace a qualified engineer or the local rules and inspections that apply to the vehicle.";

/** Shown when the built-in demonstration catalogue was used. */
export const DEMO_CATALOGUE_NOTE =
  "Parts, ratings and prices come from the built-in demonstration catalogue (invented parts); use the shop's own catalogue and the makers' ratings for a build.";

export interface JointReport {
  readonly position: "front" | "centre" | "rear";
  /** True 3-D working angle, deg. */
  readonly workingAngleDeg: number;
  /** Extremes of ω(out)/ω(in) over one turn for this joint alone. */
  readonly maxSpeedRatio: number;
  readonly minSpeedRatio: number;
  /** (max − min) × 100 for this joint alone, %. */
  readonly speedVariationPct: number;
  /** Largest lead/lag of the output over the input, deg. */
  readonly maxLeadLagDeg: number;
  /** Peak output angular acceleration of this joint alone, input constant at service rpm, rad/s². */
  readonly peakAngularAccelerationRadS2: number;
  /** Largest working angle keeping that acceleration within the shop limit at service rpm, deg. */
  readonly maxAngleAtServiceRpmDeg: number;
  readonly jointSeriesId: string | null;
}

export interface PhasingReport {
  /** Best rear-yoke index, deg in (−90, 90], + clockwise looking rearward. */
  readonly phaseIndexDeg: number;
  /** (max − min) of ω(pinion)/ω(transmission) × 100 at the best index. */
  readonly outputSpeedVariationPct: number;
  /** Single-joint angle with the same variation, exact, deg. */
  readonly equivalentAngleDeg: number;
  /** Small-angle estimate √|β₁² − β₂²| (SAE AE-7 form), deg. */
  readonly equivalentAngleSmallAngleDeg: number;
  /** Angle between the two joints' planes about the driveshaft axis, deg (= the index mod 180°). */
  readonly jointPlaneAngleDeg: number;
  /** Variation with the yokes in phase (index 0), for comparison, %. */
  readonly inPhaseOutputSpeedVariationPct: number;
  readonly toleranceDeg: number;
  /** Two-piece shafts: the index of each piece's rear yoke (front piece, rear piece), deg. */
  readonly phaseIndicesDeg?: readonly number[];
  /** Present when the design gives phaseIndexDeg. */
  readonly asSpecified?: {
    readonly phaseIndexDeg: number;
    readonly outputSpeedVariationPct: number;
    readonly equivalentAngleDeg: number;
  };
}

export interface EndReport {
  readonly fittingId: string;
  readonly name: string;
  readonly kind: string;
  readonly jointSeriesId: string;
  readonly jointCentreToWeldSeatMm: number;
  readonly massKg: number;
  readonly torqueRatingNm: number;
  readonly priceCents: number;
  /** "design" when the design names it, "suggested" when Yokeline picked it, "matched" to the vehicle's interface data. */
  readonly origin: "design" | "suggested" | "matched";
  /**
   * The joint fitted at this end when it is not a plain cross of `jointSeriesId`: a conversion
   * cross, a cross of the asked lubrication, or a double-Cardan joint. The quote prices this one.
   */
  readonly crossSeriesId?: string;
}

export interface TubeReport {
  readonly tubeId: string | null;
  readonly materialId: string;
  readonly odMm: number;
  readonly wallMm: number;
  readonly massKg: number;
  /** Tube length cut (cut length when known, else the installed length), mm. */
  readonly tubeLengthMm: number;
  readonly origin: "design" | "catalogue";
  readonly elasticModulusGPa: number;
  readonly densityKgM3: number;
  readonly shearYieldMPa: number;
  readonly priceCents: number | null;
}

export interface SlipReport {
  /** Out from fully collapsed at ride height, mm. */
  readonly outAtRideHeightMm: number;
  readonly outAtFullDroopMm: number;
  readonly outAtFullBumpMm: number;
  /** Spline left engaged at full droop, mm. */
  readonly reserveAtFullDroopMm: number;
  readonly recommendedOutMinMm: number;
  readonly recommendedOutMaxMm: number;
  /** The catalogue slip yoke (named, or matched to the output spline); null when none is known. */
  readonly slipYokeId?: string | null;
  readonly slipYoke?: SlipYokeSummary | null;
  /** Least spline engagement at full droop: the slip yoke's, else the shop's setting, mm. */
  readonly minEngagementMm?: number;
  readonly minEngagementSource?: string;
  /** Seal surface outside the tail bushing with the slip fully collapsed (design; default 0), mm. */
  readonly sealOutsideCollapsedMm?: number;
  /** Seal surface left inside the tail bushing at full droop, mm; null without a slip yoke. */
  readonly sealLeftInBushingMm?: number | null;
}

/** A catalogue slip yoke as the report gives it. */
export interface SlipYokeSummary extends SlipYoke {
  /** "design" when slip.slipYokeId names it, "matched" from interface.transmissionOutput. */
  readonly origin: "design" | "matched";
}

export interface PieceReport {
  readonly position: "front" | "rear";
  readonly spanMm: number;
  readonly tube: TubeCandidate;
  readonly cutLengthMm: number | null;
}

export interface TwoPieceProposal {
  readonly reason: string;
  readonly feasible: boolean;
  /** The catalogue centre bearing proposed (null when none takes the tube and the torque). */
  readonly centreBearingId: string | null;
  /** Centre-bearing joint centre from the front joint centre, along the shaft line, mm. */
  readonly centreBearingFromFrontMm: number;
  /** Drop of the centre-bearing joint below the straight joint-to-joint line, mm. */
  readonly centreBearingDropMm: number;
  readonly pieces: readonly PieceReport[];
  readonly joints: readonly JointReport[];
  readonly phasing: {
    /** Index of each piece's rear yoke from in phase, deg. */
    readonly phaseIndicesDeg: readonly number[];
    readonly outputSpeedVariationPct: number;
    readonly equivalentAngleDeg: number;
  };
  readonly peakAngularAccelerationRadS2: number;
  readonly checks: readonly Check[];
  readonly overall: CheckStatus;
}

/** One piece of a two-piece shaft: "A" the front piece, "B" the rear piece. */
export interface ShaftPieceReport {
  readonly piece: "A" | "B";
  readonly position: "front" | "rear";
  /** Joint centre to joint centre of this piece (its critical-speed span and as-welded length), mm. */
  readonly spanMm: number;
  /** This piece's tube: its cut length, mass and price. */
  readonly tube: TubeReport;
  /** Front piece: the front fitting and the centre bearing's stub; rear piece: the centre-side weld yoke and the rear fitting. */
  readonly ends: { readonly front: EndReport | null; readonly rear: EndReport | null };
  /** Span minus each end's joint centre to weld seat; null without both ends. */
  readonly cutLengthMm: number | null;
  readonly criticalSpeedRpm: number;
  readonly criticalSpeedRatio: number;
  /** Index of this piece's rear yoke from in phase with its front yoke, deg in (−90, 90], + clockwise looking rearward. */
  readonly phaseIndexDeg: number;
  /** ISO 21940-11 for this piece alone (its own rotor mass), two planes. */
  readonly balance: {
    readonly gradeMmS: number;
    readonly speedRpm: number;
    readonly rotorMassKg: number;
    readonly permissibleUnbalanceGmm: number;
    readonly perPlaneGmm: number;
  };
}

/** The centre support bearing of a two-piece shaft, where it sits, and the centre joint. */
export interface CentreBearingReport {
  readonly bearingId: string;
  readonly name: string;
  readonly jointSeriesId: string;
  readonly jointCentreToWeldSeatMm: number;
  readonly massKg: number;
  readonly priceCents: number;
  /** Centre joint centre from the front joint centre, along the straight joint-to-joint line, mm. */
  readonly fromFrontMm: number;
  /** Drop of the centre joint below that line, mm. */
  readonly dropMm: number;
  readonly centreJointAngleDeg: number;
  readonly source: string;
}

export interface EvaluationReport {
  readonly overall: CheckStatus;
  readonly designName: string | null;
  readonly service: {
    readonly maxShaftRpm: number;
    /** Design torque: min(engine-based, wheel-slip when known) × serviceFactor. Torsion and joint checks use it. */
    readonly peakShaftTorqueNm: number;
    readonly governedBy: "maxShaftRpm" | "vehicle" | "engine";
    readonly vehicleRpm: number | null;
    readonly engineRpm: number | null;
    /** Which speed path governs, in words (also the `service-speed` check's message). */
    readonly speedBasis: string;
    /** The design file's use (default street). */
    readonly use: "street" | "towing" | "off-road" | "race" | "industrial";
    /** engine × first gear × transfer-case low × converter stall. */
    readonly engineTorqueAtShaftNm: number;
    /** m·g·μ·r ÷ axle ratio; null without traction or an axle ratio. */
    readonly wheelSlipTorqueNm: number | null;
    /** Adhesion used for the wheel-slip torque and its source (null when not computed). */
    readonly adhesion: number | null;
    readonly adhesionSource: string | null;
    /** Which of the two set the design torque before the service factor. */
    readonly torqueGovernedBy: "engine" | "wheel-slip";
    readonly serviceFactor: number;
    readonly serviceFactorSource: string;
    /** Engine peak torque through top gear (transfer case high 1:1), or the machine's rated torque. */
    readonly runningTorqueNm: number;
    readonly runningTorqueBasis: "rated" | "top-gear" | "assumed-direct";
  };
  readonly lengthMm: number;
  readonly joints: readonly JointReport[];
  readonly phasing: PhasingReport;
  /** Largest angular acceleration of the tube over one turn, input constant at service rpm. */
  readonly peakAngularAccelerationRadS2: number;
  /** Largest angular acceleration of the net output (pinion) over one turn: what the residual angle leaves. */
  readonly outputPeakAngularAccelerationRadS2: number;
  readonly tube: TubeReport;
  readonly criticalSpeedRpm: number;
  readonly criticalSpeedRatio: number;
  /** The span used for `criticalSpeedRpm`: lengthMm + slip droop (the longest the shaft gets). */
  readonly criticalSpeedLengthMm: number;
  /** The largest service / critical ratio for the design's use. */
  readonly criticalSpeedRatioLimit: number;
  readonly torsion: {
    readonly shearStressMPa: number;
    readonly shearYieldMPa: number;
    readonly safetyFactor: number;
    /** Shear yield of the weld-affected zone (catalogue weld-zone yield / √3); null when the material gives none. */
    readonly weldZoneShearYieldMPa: number | null;
    readonly weldZoneSafetyFactor: number | null;
    /** Where the weld-zone figure comes from. */
    readonly weldZoneSource: string | null;
  };
  readonly balance: {
    readonly gradeMmS: number;
    readonly speedRpm: number;
    readonly rotorMassKg: number;
    readonly permissibleUnbalanceGmm: number;
    readonly perPlaneGmm: number;
  };
  readonly ends: { readonly front: EndReport | null; readonly rear: EndReport | null };
  /** Installed length minus each fitting's joint centre to weld seat; null without both fittings. */
  readonly cutLengthMm: number | null;
  readonly slip: SlipReport | null;
  /** What was matched to the vehicle's interface data and why (null when the design gives none). */
  readonly interface?: InterfaceReport | null;
  /** The front joint: a single cross, or a double-Cardan (constant-velocity) joint. */
  readonly frontJointType?: "cross" | "double-cardan";
  /** The double-Cardan front joint's figures (present with frontJointType "double-cardan"). */
  readonly doubleCardan?: DoubleCardanReport | null;
  readonly shopFloor: {
    readonly lengthToleranceMm: number;
    readonly runoutEndsMm: number;
    readonly runoutCentreMm: number;
    readonly phasingToleranceDeg: number;
    readonly sources: readonly string[];
  };
  readonly tubeSelection: TubeSelection | null;
  readonly twoPiece: TwoPieceProposal | null;
  /**
   * Two-piece shafts only (`layout: "two-piece"`): then `joints` are front, centre, rear; `tube` is the
   * section both pieces use (length, mass and price of both); `criticalSpeed*` the governing piece;
   * `balance` the whole rotor; `cutLengthMm` null (each piece has its own).
   */
  readonly layout?: "two-piece";
  readonly pieces?: readonly ShaftPieceReport[];
  readonly centreBearing?: CentreBearingReport;
  readonly checks: readonly Check[];
  readonly cautions: readonly string[];
  readonly curves?: CurveSet;
}

/**
 * Yokeline engineering core: pure, framework-free, no I/O. Imported by the browser, the
 * server and the CLI alike.
 */
export {
  evaluateDesign,
  parseAndEvaluate,
  DesignInputError,
  type EvaluateOptions,
  type TubePreference,
} from "./evaluate";
export {
  designFileSchema,
  parseDesign,
  shopSettingsSchema,
  catalogueSchema,
  limitSchema,
  PHYSICAL_MAX,
  MAX_PRICE_CENTS,
  SOURCE_REQUIRED,
  formatPath,
  type DesignFile,
  type FieldIssue,
  type ParseResult,
} from "./schema";
export type {
  EvaluationReport,
  JointReport,
  PhasingReport,
  TubeReport,
  EndReport,
  SlipReport,
  PieceReport,
  TwoPieceProposal,
  ShaftPieceReport,
  CentreBearingReport,
} from "./report";
export type { SlipYokeSummary } from "./report";
export { twoPieceDesignFrom, suggestCentreBearing } from "./two-piece";
export { SAFETY_CAUTION, DISCLAIMER, DEMO_CATALOGUE_NOTE } from "./report";
export { slipReport, slipChecks, resolveSlipYoke, minEngagementLimit } from "./slip";
export {
  fitInterface,
  INTERFACE_SOURCE,
  type InterfaceReport,
  type InterfaceEndMatch,
  type InterfacePart,
} from "./interface";
export {
  makeDoubleCardanChain,
  doubleCardanCentreAxis,
  chooseDoubleCardan,
  type DoubleCardanReport,
} from "./double-cardan";
export type { Check, CheckStatus } from "./checks";
export {
  rankTubes,
  type RankTubesInput,
  type TubeSelection,
  type TubeCandidate,
  type RejectedTube,
} from "./tube-selection";
export { sampleCurves, sampleChainCurves, type CurveSet } from "./curves";
export { defaultCatalogue } from "./catalogue/default";
export {
  TUBE_OD_MATCH_TOLERANCE_MM,
  TUBE_WALL_MATCH_TOLERANCE_MM,
  sameTube,
  sameTubeOd,
  sameTubeWall,
  findCatalogueTube,
  type TubeSpec,
} from "./catalogue/tube-match";
export { SHAFT_USE_LABEL, shaftUseLabel } from "./uses";
export type {
  Catalogue,
  Material,
  TubeSize,
  EndFitting,
  EndFittingKind,
  JointSeries,
  SlipYoke,
  CentreBearing,
  FlangePattern,
  CapRetention,
} from "./catalogue/types";
export {
  defaultSettings,
  resolveSettings,
  serviceFactorFor,
  adhesionFor,
  criticalSpeedRatioLimitFor,
  criticalSpeedWarnFor,
  type ShopSettings,
  type Limit,
  type SettingKey,
  type ShaftUse,
} from "./settings";
export * from "./units";
export { shaftDirection, angleBetweenRad, phaseIndexRad, type Vec3, type ShaftAngles } from "./geometry";
export {
  cardanOutputAngleRad,
  cardanSpeedRatio,
  cardanSpeedRatioExtremes,
  cardanAngularAccelerationRadS2,
  cardanPeakAngularAccelerationRadS2,
  cardanMaxAngularDeviationRad,
  equivalentAngleRad,
} from "./cardan";
export {
  makeChain,
  chainResponse,
  chainOutputPeakToPeak,
  chainSpeedRatiosAt,
  chainShaftAnglesRad,
  bestPhaseIndicesRad,
  type Chain,
} from "./phasing";
export {
  criticalSpeedRpm,
  criticalSpeedHandbookRpm,
  spanForCriticalSpeedMm,
  criticalSpeedLengthMm,
} from "./critical-speed";
export { torsionShearStressMPa, shearYieldFromTensileMPa, weldZoneShearYieldMPa } from "./torsion";
export {
  serviceSpeed,
  shaftRpmAtRoadSpeed,
  designShaftTorqueNm,
  wheelSlipTorqueNm,
  serviceLoads,
  STANDARD_GRAVITY,
  type ServiceLoads,
} from "./speed";
export { permissibleUnbalanceGmm, unbalancePerPlaneGmm } from "./balance";
export {
  triageVibration,
  complaintShaftRpm,
  chainFromReport,
  phaseErrorDeg,
  TRIAGE_CAUTION,
  TRIAGE_SCORING,
  type TriageShaft,
  type TriageResult,
  type TriageCause,
  type TriageFigure,
  type Complaint,
  type ComplaintSpeed,
  type ComplaintLoad,
  type MeasuredValue,
} from "./triage";

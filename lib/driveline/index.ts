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
export { twoPieceDesignFrom, suggestCentreBearing } from "./two-piece";
export { SAFETY_CAUTION, DISCLAIMER, DEMO_CATALOGUE_NOTE } from "./report";
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
export { defaultSettings, resolveSettings, type ShopSettings, type Limit, type SettingKey } from "./settings";
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
  chainSpeedRatiosAt,
  chainShaftAnglesRad,
  bestPhaseIndicesRad,
  type Chain,
} from "./phasing";
export { criticalSpeedRpm, criticalSpeedHandbookRpm, spanForCriticalSpeedMm } from "./critical-speed";
export { torsionShearStressMPa, shearYieldFromTensileMPa } from "./torsion";
export { serviceSpeed, shaftRpmAtRoadSpeed, designShaftTorqueNm } from "./speed";
export { permissibleUnbalanceGmm, unbalancePerPlaneGmm } from "./balance";

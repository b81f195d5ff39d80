/** Service speed and design torque at the shaft. */

export interface SpeedInput {
  readonly maxShaftRpm?: number | null;
  readonly topSpeedKmh?: number | null;
  readonly axleRatio?: number | null;
  readonly tireDiameterMm?: number | null;
  readonly maxEngineRpm?: number | null;
  readonly topGearRatio?: number | null;
}

export interface ServiceSpeed {
  readonly maxShaftRpm: number;
  /** Which input set the speed. */
  readonly governedBy: "maxShaftRpm" | "vehicle" | "engine";
  readonly vehicleRpm: number | null;
  readonly engineRpm: number | null;
}

/** Shaft rpm at road speed: n = v / (π·D_tire) × axle ratio, v in m/min, D in m. */
export function shaftRpmAtRoadSpeed(speedKmh: number, tireDiameterMm: number, axleRatio: number): number {
  const metresPerMinute = (speedKmh * 1000) / 60;
  return (metresPerMinute / (Math.PI * tireDiameterMm * 1e-3)) * axleRatio;
}

/**
 * Highest shaft speed in service: the largest of maxShaftRpm, the vehicle figure and the
 * engine figure (max engine rpm / top gear), each used only when fully given.
 * Returns null when none is given (the schema rejects such designs).
 */
export function serviceSpeed(speed: SpeedInput): ServiceSpeed | null {
  const vehicleRpm =
    speed.topSpeedKmh != null && speed.axleRatio != null && speed.tireDiameterMm != null
      ? shaftRpmAtRoadSpeed(speed.topSpeedKmh, speed.tireDiameterMm, speed.axleRatio)
      : null;
  const engineRpm =
    speed.maxEngineRpm != null && speed.topGearRatio != null ? speed.maxEngineRpm / speed.topGearRatio : null;
  // The first of equals wins: maxShaftRpm, then the vehicle, then the engine.
  let rpm: number | null = null;
  let governedBy: ServiceSpeed["governedBy"] = "maxShaftRpm";
  if (speed.maxShaftRpm != null) rpm = speed.maxShaftRpm;
  if (vehicleRpm !== null && (rpm === null || vehicleRpm > rpm)) {
    rpm = vehicleRpm;
    governedBy = "vehicle";
  }
  if (engineRpm !== null && (rpm === null || engineRpm > rpm)) {
    rpm = engineRpm;
    governedBy = "engine";
  }
  return rpm === null ? null : { maxShaftRpm: rpm, governedBy, vehicleRpm, engineRpm };
}

export interface TorqueInput {
  readonly engineTorqueNm: number;
  readonly firstGearRatio?: number | null;
  readonly transferCaseLowRatio?: number | null;
  readonly converterStallRatio?: number | null;
}

/** Design torque at the shaft = engine × first gear × transfer-case low × converter stall (each default 1). */
export function designShaftTorqueNm(t: TorqueInput): number {
  return (
    t.engineTorqueNm * (t.firstGearRatio ?? 1) * (t.transferCaseLowRatio ?? 1) * (t.converterStallRatio ?? 1)
  );
}

/** Standard gravity, m/s² (CGPM 1901; ISO 80000-3). */
export const STANDARD_GRAVITY = 9.80665;

/**
 * Wheel-slip torque at the shaft (design-file.md Additions): the most the tyres can pass before
 * they spin, back through the axle: m·g·μ·r ÷ axle ratio (N·m; r in m).
 */
export function wheelSlipTorqueNm(
  drivenAxleLoadKg: number,
  adhesion: number,
  tireLoadedRadiusMm: number,
  axleRatio: number,
): number {
  return (drivenAxleLoadKg * STANDARD_GRAVITY * adhesion * (tireLoadedRadiusMm / 1000)) / axleRatio;
}

/** What the shop's settings give for the design's use (see settings.ts). */
export interface UseFactors {
  readonly serviceFactor: number;
  readonly serviceFactorSource: string;
  readonly adhesion: number;
  readonly adhesionSource: string;
}

export interface ServiceLoadInput {
  readonly torque: TorqueInput & {
    readonly topGearRatio?: number | null;
    readonly ratedShaftTorqueNm?: number | null;
  };
  readonly speed: { readonly axleRatio?: number | null; readonly topGearRatio?: number | null };
  readonly traction?: {
    readonly drivenAxleLoadKg: number;
    readonly tireLoadedRadiusMm: number;
    readonly adhesion?: number | null;
  } | null;
}

export interface ServiceLoads {
  /** engine × first gear × transfer-case low × converter stall (each default 1). */
  readonly engineTorqueAtShaftNm: number;
  /** Null without `traction` or an axle ratio. */
  readonly wheelSlipTorqueNm: number | null;
  /** Adhesion used for the wheel-slip torque (null when not computed) and where it comes from. */
  readonly adhesion: number | null;
  readonly adhesionSource: string | null;
  readonly serviceFactor: number;
  readonly serviceFactorSource: string;
  /** min(engine-based, wheel-slip when known) × serviceFactor. */
  readonly peakShaftTorqueNm: number;
  /** Which of the two set the design torque before the factor. */
  readonly torqueGovernedBy: "engine" | "wheel-slip";
  /** Engine peak torque through top gear (transfer case in high, 1:1), or the machine's rated torque. */
  readonly runningTorqueNm: number;
  readonly runningTorqueBasis: "rated" | "top-gear" | "assumed-direct";
  /** The top-gear ratio used for the running torque (null for a rated torque). */
  readonly runningTopGearRatio: number | null;
}

/**
 * Design and running torque at the shaft. Design torque = min(engine-based, wheel-slip) × the
 * use's service factor; running torque = engine peak torque × top gear (torque.topGearRatio,
 * else speed.topGearRatio, else 1 — direct drive, said in the report) × transfer-case high (1),
 * or the machine's rated shaft torque when given.
 */
export function serviceLoads(input: ServiceLoadInput, factors: UseFactors): ServiceLoads {
  const engine = designShaftTorqueNm(input.torque);
  const t = input.traction;
  const axle = input.speed.axleRatio;
  const adhesion = t ? (t.adhesion ?? factors.adhesion) : null;
  const slip =
    t && axle != null && adhesion != null
      ? wheelSlipTorqueNm(t.drivenAxleLoadKg, adhesion, t.tireLoadedRadiusMm, axle)
      : null;
  const governed = slip !== null && slip < engine ? "wheel-slip" : "engine";
  const base = governed === "wheel-slip" ? slip! : engine;
  const rated = input.torque.ratedShaftTorqueNm;
  const top = input.torque.topGearRatio ?? input.speed.topGearRatio ?? null;
  return {
    engineTorqueAtShaftNm: engine,
    wheelSlipTorqueNm: slip,
    adhesion: slip !== null ? adhesion : null,
    adhesionSource: slip === null ? null : t?.adhesion != null ? "design file" : factors.adhesionSource,
    serviceFactor: factors.serviceFactor,
    serviceFactorSource: factors.serviceFactorSource,
    peakShaftTorqueNm: base * factors.serviceFactor,
    torqueGovernedBy: governed,
    runningTorqueNm: rated ?? input.torque.engineTorqueNm * (top ?? 1),
    runningTorqueBasis: rated != null ? "rated" : top != null ? "top-gear" : "assumed-direct",
    runningTopGearRatio: rated != null ? null : (top ?? 1),
  };
}

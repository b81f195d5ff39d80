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
  let best: ServiceSpeed | null = null;
  const consider = (rpm: number | null | undefined, governedBy: ServiceSpeed["governedBy"]): void => {
    if (rpm != null && (best === null || rpm > best.maxShaftRpm))
      best = { maxShaftRpm: rpm, governedBy, vehicleRpm, engineRpm };
  };
  consider(speed.maxShaftRpm, "maxShaftRpm");
  consider(vehicleRpm, "vehicle");
  consider(engineRpm, "engine");
  return best;
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

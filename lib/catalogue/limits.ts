/**
 * What people read for each engineering limit and floor tolerance, its unit, and the range the
 * editor accepts (a typo guard; the sources beside each value say where the value itself comes from).
 * Pure: used by the owner's editor in the browser and by the server's check of a save.
 */
import type { SettingKey } from "@/lib/driveline";
import type { FloorLimitKey } from "@/lib/traveller/settings";

export interface LimitMeta {
  /** What people read, without the unit. */
  label: string;
  /** Shown beside the value ("" for a plain ratio). */
  unit: string;
  /** Smallest accepted value; `minExclusive` when the value must be above it. */
  min: number;
  minExclusive?: boolean;
  max: number;
}

export const LIMIT_META: Record<SettingKey, LimitMeta> = {
  minWorkingAngleDeg: { label: "Smallest working angle", unit: "°", min: 0, max: 5 },
  maxAngleDifferenceDeg: {
    label: "Largest front/rear angle difference",
    unit: "°",
    min: 0,
    minExclusive: true,
    max: 10,
  },
  maxJointAngularAccelerationRadS2: {
    label: "Largest angular acceleration per joint",
    unit: "rad/s²",
    min: 0,
    minExclusive: true,
    max: 100_000,
  },
  accelerationWarnFraction: {
    label: "Warn from this share of the acceleration limit",
    unit: "",
    min: 0,
    minExclusive: true,
    max: 1,
  },
  maxEquivalentAngleDeg: {
    label: "Largest equivalent angle",
    unit: "°",
    min: 0,
    minExclusive: true,
    max: 20,
  },
  maxCriticalSpeedRatio: {
    label: "Largest service / critical speed, street",
    unit: "",
    min: 0,
    minExclusive: true,
    max: 1,
  },
  warnCriticalSpeedRatio: {
    label: "Warn from service / critical speed",
    unit: "",
    min: 0,
    minExclusive: true,
    max: 1,
  },
  minTorsionSafetyFactor: { label: "Smallest torsion safety factor", unit: "", min: 1, max: 10 },
  // ISO 21940-11 grades run from G 0.4 to G 4000.
  balanceGradeMmS: { label: "Balance grade G", unit: "mm/s", min: 0.4, max: 4_000 },
  slipOutMinMm: { label: "Slip yoke out at ride height, least", unit: "mm", min: 0, max: 500 },
  slipOutMaxMm: {
    label: "Slip yoke out at ride height, most",
    unit: "mm",
    min: 0,
    minExclusive: true,
    max: 500,
  },
  slipMinReserveMm: { label: "Spline engagement kept at full droop", unit: "mm", min: 0, max: 500 },
  slipSealMinInBushingMm: {
    label: "Slip yoke seal surface kept in the tail bushing at full droop",
    unit: "mm",
    min: 0,
    max: 500,
  },
  doubleCardanMaxRearAngleDeg: {
    label: "Largest axle-end angle behind a double-Cardan front joint",
    unit: "°",
    min: 0,
    minExclusive: true,
    max: 10,
  },
  lengthToleranceMm: {
    label: "Length tolerance after welding, ±",
    unit: "mm",
    min: 0,
    minExclusive: true,
    max: 50,
  },
  runoutEndsMm: { label: "Runout near each end, TIR", unit: "mm", min: 0, minExclusive: true, max: 10 },
  runoutCentreMm: { label: "Runout at the centre, TIR", unit: "mm", min: 0, minExclusive: true, max: 10 },
  phasingToleranceDeg: { label: "Phasing tolerance, ±", unit: "°", min: 0, minExclusive: true, max: 10 },
  centreJointAngleDeg: { label: "Centre-bearing joint angle", unit: "°", min: 0, max: 10 },
  // A service factor below 1 would lower the worst-case torque; 5 is a typo guard.
  serviceFactorStreet: { label: "Service factor, street", unit: "", min: 1, max: 5 },
  serviceFactorTowing: { label: "Service factor, towing", unit: "", min: 1, max: 5 },
  serviceFactorOffRoad: { label: "Service factor, off-road", unit: "", min: 1, max: 5 },
  serviceFactorRace: { label: "Service factor, race", unit: "", min: 1, max: 5 },
  serviceFactorIndustrial: { label: "Service factor, industrial", unit: "", min: 1, max: 5 },
  adhesionStreet: { label: "Tyre–road adhesion, street", unit: "", min: 0, minExclusive: true, max: 2 },
  adhesionTowing: { label: "Tyre–road adhesion, towing", unit: "", min: 0, minExclusive: true, max: 2 },
  adhesionOffRoad: { label: "Tyre–road adhesion, off-road", unit: "", min: 0, minExclusive: true, max: 2 },
  adhesionRace: { label: "Tyre–road adhesion, race", unit: "", min: 0, minExclusive: true, max: 2 },
  adhesionIndustrial: {
    label: "Tyre–road adhesion, industrial",
    unit: "",
    min: 0,
    minExclusive: true,
    max: 2,
  },
  maxCriticalSpeedRatioTowing: {
    label: "Largest service / critical speed, towing",
    unit: "",
    min: 0,
    minExclusive: true,
    max: 1,
  },
  maxCriticalSpeedRatioOffRoad: {
    label: "Largest service / critical speed, off-road",
    unit: "",
    min: 0,
    minExclusive: true,
    max: 1,
  },
  maxCriticalSpeedRatioRace: {
    label: "Largest service / critical speed, race",
    unit: "",
    min: 0,
    minExclusive: true,
    max: 1,
  },
  maxCriticalSpeedRatioIndustrial: {
    label: "Largest service / critical speed, industrial",
    unit: "",
    min: 0,
    minExclusive: true,
    max: 1,
  },
  minWeldZoneSafetyFactor: { label: "Smallest weld-zone torsion safety factor", unit: "", min: 1, max: 10 },
};

export const FLOOR_LIMIT_META: Record<FloorLimitKey, LimitMeta> = {
  cutLengthToleranceMm: { label: "Cut length tolerance, ±", unit: "mm", min: 0, minExclusive: true, max: 50 },
  runoutStationInsetMm: {
    label: "Near-end runout station, in from each weld",
    unit: "mm",
    min: 0,
    minExclusive: true,
    max: 1_000,
  },
  fastShaftRpm: {
    label: "Tighter runout from this service speed",
    unit: "rpm",
    min: 0,
    minExclusive: true,
    max: 50_000,
  },
  fastShaftRunoutEndsMm: {
    label: "Fast shafts: runout near each end, TIR",
    unit: "mm",
    min: 0,
    minExclusive: true,
    max: 10,
  },
  fastShaftRunoutCentreMm: {
    label: "Fast shafts: runout at the centre, TIR",
    unit: "mm",
    min: 0,
    minExclusive: true,
    max: 10,
  },
};

/** "must be more than 0 and at most 10 mm" */
export function rangeMessage(meta: LimitMeta): string {
  const unit = meta.unit ? ` ${meta.unit}` : "";
  return meta.minExclusive
    ? `must be more than ${meta.min} and at most ${meta.max}${unit}`
    : `must be between ${meta.min} and ${meta.max}${unit}`;
}

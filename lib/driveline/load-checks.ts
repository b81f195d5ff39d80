/**
 * The rules of the "Loads", "Strength where it fails" and "Speed limits where they apply"
 * additions (design-file.md Additions): the use's factors and limits, the design and running
 * torque in words, the weld-affected zone, the critical speed at the longest length, the joints'
 * continuous ratings and the net output's acceleration. Pure; called from evaluateDesign.
 */
import type { CatalogueIndex } from "./catalogue/lookup";
import type { Material } from "./catalogue/types";
import { checkAtLeast, checkAtMost, checkOf, fmt, type Check } from "./checks";
import { criticalSpeedLengthMm } from "./critical-speed";
import type { EndReport, TubeReport } from "./report";
import type { DesignFile } from "./schema";
import {
  adhesionFor,
  criticalSpeedRatioLimitFor,
  criticalSpeedWarnFor,
  serviceFactorFor,
  type Limit,
  type ShaftUse,
  type ShopSettings,
} from "./settings";
import type { ServiceLoads, ServiceSpeed, UseFactors } from "./speed";
import { weldZoneShearYieldMPa } from "./torsion";

const label = (p: string): string => p.charAt(0).toUpperCase() + p.slice(1);

/** What the design's use selects from the shop's settings. */
export interface UseLimits {
  readonly use: ShaftUse;
  readonly factors: UseFactors;
  readonly criticalSpeedRatioLimit: Limit;
  readonly criticalSpeedWarn: Limit;
  /** lengthMm + slip droop: the span checked for whirl. */
  readonly criticalSpeedLengthMm: number;
  readonly droopExtensionMm: number;
}

/** The use (the design's, else the caller's, else street) and the limits it selects. */
export function limitsForUse(design: DesignFile, settings: ShopSettings, fallback?: ShaftUse): UseLimits {
  const use: ShaftUse = design.use ?? fallback ?? "street";
  const factor = serviceFactorFor(use, settings);
  const adhesion = adhesionFor(use, settings);
  return {
    use,
    factors: {
      serviceFactor: factor.value,
      serviceFactorSource: factor.source,
      adhesion: adhesion.value,
      adhesionSource: adhesion.source,
    },
    criticalSpeedRatioLimit: criticalSpeedRatioLimitFor(use, settings),
    criticalSpeedWarn: criticalSpeedWarnFor(use, settings),
    criticalSpeedLengthMm: criticalSpeedLengthMm(design.lengthMm, design.slip),
    droopExtensionMm: design.slip?.droopExtensionMm ?? 0,
  };
}

const SPEED_SOURCE = "engineering reference §7: the highest of the speed paths given";

/** Which speed path sets the highest shaft speed, in words. */
export function speedBasisInWords(service: ServiceSpeed, design: DesignFile): string {
  const s = design.speed;
  const rpm = Math.round(service.maxShaftRpm);
  const road =
    service.vehicleRpm !== null
      ? `road speed ${fmt(s.topSpeedKmh!, 0)} km/h on ${fmt(s.tireDiameterMm!, 0)} mm tyres × axle ${fmt(s.axleRatio!, 2)} gives ${Math.round(service.vehicleRpm)} rpm`
      : null;
  const overdrive =
    s.topGearRatio != null && s.topGearRatio < 1
      ? " (an overdrive: the shaft turns faster than the engine)"
      : "";
  const engine =
    service.engineRpm !== null
      ? `engine ${fmt(s.maxEngineRpm!, 0)} rpm ÷ top gear ${fmt(s.topGearRatio!, 2)} gives ${Math.round(service.engineRpm)} rpm${overdrive}`
      : null;
  const given =
    s.maxShaftRpm != null ? `the given maximum shaft speed is ${Math.round(s.maxShaftRpm)} rpm` : null;
  const by =
    service.governedBy === "vehicle"
      ? "the road speed governs"
      : service.governedBy === "engine"
        ? "the engine speed governs"
        : "the given maximum shaft speed governs";
  const parts = [given, road, engine].filter((x): x is string => x !== null);
  const missing =
    service.engineRpm === null ? "; engine path not given (maximum engine rpm and top gear)" : "";
  return `Highest shaft speed ${rpm} rpm: ${by} — ${parts.join("; ")}${missing}`;
}

/** Informational lines: which speed path governs, and how the design torque was reached. */
export function serviceChecks(
  service: ServiceSpeed,
  loads: ServiceLoads,
  use: ShaftUse,
  design: DesignFile,
): Check[] {
  const speed = checkOf(
    "service-speed",
    "pass",
    `${speedBasisInWords(service, design)} — ${SPEED_SOURCE}`,
    SPEED_SOURCE,
    service.maxShaftRpm,
  );
  const engine = `engine-based ${Math.round(loads.engineTorqueAtShaftNm)} N·m (engine × first gear × transfer-case low × converter stall)`;
  const slip =
    loads.wheelSlipTorqueNm !== null
      ? `wheel-slip ${Math.round(loads.wheelSlipTorqueNm)} N·m (axle load × g × adhesion ${fmt(loads.adhesion!, 2)} × loaded tyre radius ÷ axle ratio; adhesion: ${loads.adhesionSource})`
      : null;
  const factor = `× service factor ${fmt(loads.serviceFactor, 2)} for ${use} use`;
  const basis =
    slip === null
      ? `${engine} ${factor}; wheel-slip torque not computed (give traction and the axle ratio)`
      : loads.torqueGovernedBy === "wheel-slip"
        ? `${slip} ${factor}; the tyres slip before the ${engine} is reached`
        : `${engine} ${factor}; the ${slip} is higher`;
  const source = `design-file.md Additions; service factor: ${loads.serviceFactorSource}`;
  const torque = checkOf(
    "design-torque",
    "pass",
    `Design torque ${Math.round(loads.peakShaftTorqueNm)} N·m = ${basis} — ${source}`,
    source,
    loads.peakShaftTorqueNm,
  );
  return [speed, torque];
}

/** The critical-speed rule at the longest length, with the use's limit. */
export function criticalSpeedCheck(
  ratio: number,
  rpm: number,
  nc: number,
  lengthMm: number,
  use: UseLimits,
): Check {
  const longer = use.criticalSpeedLengthMm > lengthMm;
  const span = longer
    ? ` over ${fmt(use.criticalSpeedLengthMm, 1)} mm, the length at full droop (${fmt(lengthMm, 1)} + ${fmt(use.droopExtensionMm, 1)} mm)`
    : "";
  const limit = use.criticalSpeedRatioLimit;
  return checkAtMost({
    id: "critical-speed",
    what: `Critical-speed ratio (${Math.round(rpm)} rpm service / ${Math.round(nc)} rpm critical${span})`,
    value: ratio,
    unit: "",
    limit: use.use === "street" ? limit : { ...limit, source: `${use.use} use: ${limit.source}` },
    digits: 3,
    warnAbove: use.criticalSpeedWarn.value,
    warnSource: use.criticalSpeedWarn.source,
  });
}

export interface WeldZoneTorsion {
  /** Weld-zone shear yield, MPa; null when the material gives no weld-zone figure. */
  readonly shearYieldMPa: number | null;
  readonly tensileYieldMPa: number | null;
  readonly safetyFactor: number | null;
  readonly source: string | null;
}

/** Torsion at the weld-affected zone: same section, the zone's own (softened) yield. */
export function weldZoneTorsion(
  material: Pick<Material, "weldZoneTensileYieldMPa" | "weldZoneSource">,
  shearStressMPa: number,
): WeldZoneTorsion {
  const yieldMPa = weldZoneShearYieldMPa(material);
  return {
    shearYieldMPa: yieldMPa,
    tensileYieldMPa: material.weldZoneTensileYieldMPa ?? null,
    safetyFactor: yieldMPa !== null ? yieldMPa / shearStressMPa : null,
    source: yieldMPa !== null ? (material.weldZoneSource ?? "shop catalogue") : null,
  };
}

/**
 * `torsion.weld-zone`: the weld-affected zone must carry the design torque too. A tube that passes
 * in the parent metal and fails here fails, and the message says so in words.
 */
export function weldZoneCheck(
  zone: WeldZoneTorsion,
  parentSafetyFactor: number,
  shearStressMPa: number,
  torqueNm: number,
  tube: TubeReport,
  settings: ShopSettings,
): Check {
  const limit = settings.minWeldZoneSafetyFactor;
  if (zone.safetyFactor === null || zone.shearYieldMPa === null) {
    return checkOf(
      "torsion.weld-zone",
      "warn",
      `Weld-zone torsion not checked: the catalogue gives no weld-zone yield for material ${tube.materialId}; welding softens the tube next to the weld, so enter the weld-affected zone's minimum yield with its source — limit ${fmt(limit.value, 2)}, ${limit.source}`,
      limit.source,
      undefined,
      limit.value,
    );
  }
  const base = checkAtLeast({
    id: "torsion.weld-zone",
    what: `Weld-zone torsion safety factor (shear ${fmt(shearStressMPa, 1)} MPa at ${Math.round(torqueNm)} N·m, weld-zone shear yield ${fmt(zone.shearYieldMPa, 1)} MPa from ${fmt(zone.tensileYieldMPa!, 0)} MPa tensile: ${zone.source})`,
    value: zone.safetyFactor,
    unit: "",
    limit,
  });
  if (base.status === "fail" && parentSafetyFactor >= settings.minTorsionSafetyFactor.value) {
    return {
      ...base,
      message: `The tube passes in the parent metal (torsion safety factor ${fmt(parentSafetyFactor, 2)}, minimum ${fmt(settings.minTorsionSafetyFactor.value, 2)}) but fails in the weld-affected zone: ${base.message}`,
    };
  }
  return base;
}

const CONTINUOUS_SOURCE = "shop catalogue (maker's continuous rating)";

/** `joint-continuous.front|rear`: the running torque against each joint series' continuous rating. */
export function jointContinuousChecks(
  ends: readonly (EndReport | null)[],
  loads: ServiceLoads,
  index: CatalogueIndex,
): Check[] {
  const out: Check[] = [];
  const running = loads.runningTorqueNm * loads.serviceFactor;
  const basis =
    loads.runningTorqueBasis === "rated"
      ? "the machine's rated shaft torque"
      : loads.runningTorqueBasis === "top-gear"
        ? "engine peak torque × top gear, transfer case in high (1:1)"
        : "engine peak torque × top gear taken as 1.00, direct drive — give the top-gear ratio";
  const factor = loads.serviceFactor !== 1 ? ` × service factor ${fmt(loads.serviceFactor, 2)}` : "";
  (["front", "rear"] as const).forEach((p, i) => {
    const e = ends[i];
    if (!e) return;
    const series = index.series.get(e.crossSeriesId ?? e.jointSeriesId);
    if (!series) return;
    const id = `joint-continuous.${p}`;
    if (series.continuousTorqueNm == null) {
      out.push(
        checkOf(
          id,
          "warn",
          `${label(p)} joint ${series.id}: the catalogue gives no continuous rating, so the running torque ${Math.round(running)} N·m (${basis}${factor}) is not checked — enter the joint maker's continuous rating`,
          CONTINUOUS_SOURCE,
          running,
        ),
      );
      return;
    }
    out.push(
      checkAtMost({
        id,
        what: `${label(p)} running torque on ${series.id} (${basis}${factor})`,
        value: running,
        unit: " N·m",
        digits: 0,
        limit: { value: series.continuousTorqueNm, source: CONTINUOUS_SOURCE },
      }),
    );
  });
  return out;
}

/**
 * `output-acceleration`: the net output's (pinion's) peak angular acceleration, what the residual
 * angle leaves after phasing, against the same shop limit as each joint's. Over the limit it
 * warns (a vibration, not a strength, limit — like the equivalent angle).
 */
export function outputAccelerationCheck(
  accelerationRadS2: number,
  equivalentAngleDeg: number,
  rpm: number,
  settings: ShopSettings,
): Check {
  const limit = settings.maxJointAngularAccelerationRadS2;
  return checkAtMost({
    id: "output-acceleration",
    what: `Net output (pinion) peak angular acceleration at ${Math.round(rpm)} rpm (residual equivalent angle ${fmt(equivalentAngleDeg)}°)`,
    value: accelerationRadS2,
    unit: " rad/s²",
    limit,
    digits: 0,
    warnAbove: limit.value * settings.accelerationWarnFraction.value,
    warnSource: settings.accelerationWarnFraction.source,
    overStatus: "warn",
  });
}

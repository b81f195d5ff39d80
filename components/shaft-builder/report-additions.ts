/**
 * The report figures the service-load, weld-zone, slip and interface rules add (design-file.md
 * "Additions"), read defensively: reports frozen on orders placed before those rules existed lack
 * them, so each is shown only when present.
 */
import type { EvaluationReport, SlipYokeSummary } from "@/lib/driveline";
import { formatNumber, withUnit, type UnitSystem } from "./model";

type Service = EvaluationReport["service"];
type Torsion = EvaluationReport["torsion"];

/**
 * A report as it may have been frozen on an older order: the core's own report type with every
 * figure the additions brought made optional (no shape of its own, so a renamed field fails to compile).
 */
type FrozenReport = Partial<Omit<EvaluationReport, "service" | "torsion" | "slip">> & {
  service?: Partial<Service>;
  torsion?: Partial<Torsion>;
  slip?: { slipYoke?: Partial<SlipYokeSummary> | null } | null;
};

/** The additions' figures, each present only when the report carries it. */
export interface ReportAdditions {
  service: Partial<
    Pick<Service, "engineTorqueAtShaftNm" | "wheelSlipTorqueNm" | "serviceFactor" | "use" | "runningTorqueNm">
  >;
  torsion: Partial<Pick<Torsion, "weldZoneShearYieldMPa" | "weldZoneSafetyFactor">>;
  criticalSpeedLengthMm?: EvaluationReport["criticalSpeedLengthMm"];
  criticalSpeedRatioLimit?: EvaluationReport["criticalSpeedRatioLimit"];
  /** The slip yoke as the report named it (older reports may lack some of its fields). */
  slip: { slipYoke: Partial<SlipYokeSummary> | null } | null;
  /** The fittings matched to the interface data (read loosely by `interfaceLines`). */
  interface?: EvaluationReport["interface"];
  frontJointType?: EvaluationReport["frontJointType"];
}

const isNum = (x: unknown): x is number => typeof x === "number" && Number.isFinite(x);
const num = (x: unknown) => (isNum(x) ? x : undefined);

/** The additions of a report, each kept only when it holds a finite number (or a known shape). */
export function reportAdditions(report: EvaluationReport): ReportAdditions {
  const r: FrozenReport = report;
  const s = r.service ?? {};
  const t = r.torsion ?? {};
  return {
    service: {
      engineTorqueAtShaftNm: num(s.engineTorqueAtShaftNm),
      wheelSlipTorqueNm: num(s.wheelSlipTorqueNm),
      serviceFactor: num(s.serviceFactor),
      use: typeof s.use === "string" ? s.use : undefined,
      runningTorqueNm: num(s.runningTorqueNm),
    },
    torsion: {
      weldZoneShearYieldMPa: num(t.weldZoneShearYieldMPa),
      weldZoneSafetyFactor: num(t.weldZoneSafetyFactor),
    },
    criticalSpeedLengthMm: num(r.criticalSpeedLengthMm),
    criticalSpeedRatioLimit: num(r.criticalSpeedRatioLimit),
    slip: r.slip && typeof r.slip === "object" ? { slipYoke: r.slip.slipYoke ?? null } : null,
    interface: r.interface,
    frontJointType: typeof r.frontJointType === "string" ? r.frontJointType : undefined,
  };
}

const words = (key: string) =>
  key
    .replace(/([a-z])([A-Z])/g, "$1 $2")
    .toLowerCase()
    .replace(/^./, (c) => c.toUpperCase());

/**
 * Lines for the report's interface block, whatever its exact shape: a text, a named part
 * ("Pinion: 1350-series conversion cross") or a message per entry.
 */
export function interfaceLines(block: unknown): string[] {
  if (!block || typeof block !== "object") return [];
  const lines: string[] = [];
  const one = (key: string, v: unknown) => {
    if (typeof v === "string") lines.push(`${words(key)}: ${v}`);
    else if (v && typeof v === "object") {
      const o = v as Record<string, unknown>;
      const text = [o.message, o.name, o.label].find((x) => typeof x === "string") as string | undefined;
      if (text) lines.push(key === "" ? text : `${words(key)}: ${text}`);
    }
  };
  if (Array.isArray(block)) block.forEach((v) => one("", v));
  else
    for (const [k, v] of Object.entries(block)) {
      if (Array.isArray(v)) v.forEach((x) => one("", x));
      else one(k, v);
    }
  return lines;
}

/** Which speed path governs, in words, with the others' figures beside it. */
export function speedPathText(service: EvaluationReport["service"], _system: UnitSystem): string {
  const rpm = (x: number) => `${formatNumber(x, 0)} rpm`;
  const road = service.vehicleRpm != null ? `the road speed gives ${rpm(service.vehicleRpm)}` : null;
  const engine =
    service.engineRpm != null
      ? `the engine speed through the top gear gives ${rpm(service.engineRpm)}`
      : null;
  if (service.governedBy === "engine")
    return `The engine path governs: ${rpm(service.maxShaftRpm)} at the shaft (an overdrive turns the shaft faster than the engine)${road ? `; ${road}` : ""}.`;
  if (service.governedBy === "vehicle")
    return `The road-speed path governs: ${rpm(service.maxShaftRpm)} at the shaft${engine ? `; ${engine}` : ""}.`;
  const others = [road, engine].filter(Boolean).join("; ");
  return `The maximum shaft speed you gave governs: ${rpm(service.maxShaftRpm)}${others ? `; ${others}` : ""}.`;
}

/** "1,234 N·m (910 lb·ft)"-style torque in the unit system. */
export const torqueText = (nm: number, system: UnitSystem) => withUnit(nm, "torque", system, 0);

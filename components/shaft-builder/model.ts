/**
 * The builder's form model and its conversions, pure (no React): form ↔ design file, and the
 * unit display. The form keeps every quantity in SI (the design file's own units); a unit
 * switch only changes how numbers are shown, so it can never lose precision.
 */
import { z } from "zod";
import {
  inToMm,
  kmhToMph,
  lbftToNm,
  mmToIn,
  mphToKmh,
  nmToLbft,
  parseDesign,
  type Catalogue,
  type DesignFile,
  type FieldIssue,
} from "@/lib/driveline";
import { designApplicationSchema, designNameSchema, type ShaftUse } from "@/lib/designs/schemas";

export type UnitSystem = "imperial" | "metric";

/** A number the form holds in SI; null when the field is empty, NaN when it is not a number. */
export type SiNumber = number | null;

export interface AnglesModel {
  verticalDeg: SiNumber;
  horizontalDeg: SiNumber;
}

/** Everything the builder edits. Shaped like the design file so field paths line up. */
export interface BuilderForm {
  name: string;
  application: { description: string; use: ShaftUse };
  lengthMm: SiNumber;
  /** Catalogue fitting id, or "" to let the shop choose. */
  ends: { front: string; rear: string };
  /** Show and use the top-view angles. */
  offset: boolean;
  geometry: { transmission: AnglesModel; driveshaft: AnglesModel; pinion: AnglesModel };
  torque: {
    engineTorqueNm: SiNumber;
    firstGearRatio: SiNumber;
    transferCaseLowRatio: SiNumber;
    converterStallRatio: SiNumber;
  };
  /** Shaft speed from the vehicle (top speed, tire, axle) or given directly. */
  speedMode: "vehicle" | "rpm";
  speed: { topSpeedKmh: SiNumber; tireDiameterMm: SiNumber; axleRatio: SiNumber; maxShaftRpm: SiNumber };
  /** "auto": let Yokeline pick from the catalogue; "chosen": the tube below. */
  tubeMode: "auto" | "chosen";
  tube: { materialId: string; odMm: SiNumber; wallMm: SiNumber };
  /**
   * Design-file fields the form does not edit (slip, balance grade, phase index, material
   * overrides, …), kept as they came so a downloaded file loses nothing an upload brought.
   */
  extras: Record<string, unknown>;
}

/** A typical street truck (the street-truck example, with the shop choosing fittings and tube). */
export function defaultBuilderForm(): BuilderForm {
  return {
    name: "My driveshaft",
    application: { description: "", use: "street" },
    lengthMm: 1320.8,
    ends: { front: "", rear: "" },
    offset: false,
    geometry: {
      transmission: { verticalDeg: 3, horizontalDeg: 0 },
      driveshaft: { verticalDeg: 5, horizontalDeg: 0 },
      pinion: { verticalDeg: 3, horizontalDeg: 0 },
    },
    torque: { engineTorqueNm: 550, firstGearRatio: 3.06, transferCaseLowRatio: 1, converterStallRatio: 2 },
    speedMode: "vehicle",
    speed: { topSpeedKmh: 200, tireDiameterMm: 711, axleRatio: 3.73, maxShaftRpm: null },
    tubeMode: "auto",
    tube: { materialId: "steel-dom", odMm: 88.9, wallMm: 2.108 },
    extras: {},
  };
}

const DESIGN_KEYS = new Set(["name", "lengthMm", "tube", "geometry", "torque", "speed", "ends"]);

const angles = (a: AnglesModel, offset: boolean) => ({
  verticalDeg: a.verticalDeg,
  horizontalDeg: offset ? a.horizontalDeg : 0,
});

/**
 * The design file (engineering contract, SI) the form describes. Not validated here: run
 * `parseDesign` on the result (see `validateBuilderForm`).
 */
export function formToDesignFile(form: BuilderForm): Record<string, unknown> {
  const { extras } = form;
  const extraGeometry = (extras.geometry ?? {}) as Record<string, unknown>;
  const extraSpeed = (extras.speed ?? {}) as Record<string, unknown>;
  const ends: Record<string, { fittingId: string }> = {};
  if (form.ends.front) ends.front = { fittingId: form.ends.front };
  if (form.ends.rear) ends.rear = { fittingId: form.ends.rear };
  const rest = Object.fromEntries(Object.entries(extras).filter(([k]) => !["geometry", "speed"].includes(k)));
  const design: Record<string, unknown> = {
    name: form.name.trim() || null,
    lengthMm: form.lengthMm,
    ...(form.tubeMode === "chosen"
      ? { tube: { materialId: form.tube.materialId, odMm: form.tube.odMm, wallMm: form.tube.wallMm } }
      : {}),
    geometry: {
      ...extraGeometry,
      transmission: angles(form.geometry.transmission, form.offset),
      driveshaft: angles(form.geometry.driveshaft, form.offset),
      pinion: angles(form.geometry.pinion, form.offset),
    },
    torque: {
      engineTorqueNm: form.torque.engineTorqueNm,
      firstGearRatio: form.torque.firstGearRatio,
      transferCaseLowRatio: form.torque.transferCaseLowRatio,
      converterStallRatio: form.torque.converterStallRatio,
    },
    speed:
      form.speedMode === "rpm"
        ? {
            ...extraSpeed,
            maxShaftRpm: form.speed.maxShaftRpm,
            topSpeedKmh: null,
            axleRatio: null,
            tireDiameterMm: null,
          }
        : {
            ...extraSpeed,
            maxShaftRpm: null,
            topSpeedKmh: form.speed.topSpeedKmh,
            axleRatio: form.speed.axleRatio,
            tireDiameterMm: form.speed.tireDiameterMm,
          },
    ...rest,
    ...(Object.keys(ends).length ? { ends } : {}),
  };
  return design;
}

const num = (v: unknown): SiNumber => (typeof v === "number" ? v : null);
const DEG = 180 / Math.PI;

/**
 * The form for a parsed design file. A design whose driveshaft angle is given only by the
 * joint centres gets the angles those centres imply; every field the form does not edit is
 * kept in `extras`.
 */
export function designFileToForm(
  design: DesignFile,
  base: Pick<BuilderForm, "application"> = defaultBuilderForm(),
): BuilderForm {
  const g = design.geometry;
  let driveshaft = g.driveshaft;
  if (!driveshaft && g.frontJointCentreMm && g.rearJointCentreMm) {
    const dx = g.rearJointCentreMm.x - g.frontJointCentreMm.x;
    const dy = g.rearJointCentreMm.y - g.frontJointCentreMm.y;
    const dz = g.rearJointCentreMm.z - g.frontJointCentreMm.z;
    driveshaft = { verticalDeg: Math.atan2(-dz, dx) * DEG, horizontalDeg: Math.atan2(dy, dx) * DEG };
  }
  const all = [g.transmission, driveshaft, g.pinion];
  const offset = all.some((a) => a != null && a.horizontalDeg !== 0);
  const extras: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(design)) if (!DESIGN_KEYS.has(k) && v != null) extras[k] = v;
  const { transmission: _t, driveshaft: _d, pinion: _p, ...geometryRest } = g;
  if (Object.values(geometryRest).some((v) => v != null)) extras.geometry = geometryRest;
  const s = design.speed;
  if (s.maxEngineRpm != null || s.topGearRatio != null)
    extras.speed = { maxEngineRpm: s.maxEngineRpm ?? null, topGearRatio: s.topGearRatio ?? null };
  const vehicle = s.topSpeedKmh != null && s.axleRatio != null && s.tireDiameterMm != null;
  const defaults = defaultBuilderForm();
  return {
    name: design.name ?? defaults.name,
    application: base.application,
    lengthMm: design.lengthMm,
    ends: { front: design.ends?.front?.fittingId ?? "", rear: design.ends?.rear?.fittingId ?? "" },
    offset,
    geometry: {
      transmission: { ...g.transmission },
      driveshaft: driveshaft ? { ...driveshaft } : { verticalDeg: null, horizontalDeg: 0 },
      pinion: { ...g.pinion },
    },
    torque: {
      engineTorqueNm: design.torque.engineTorqueNm,
      firstGearRatio: num(design.torque.firstGearRatio),
      transferCaseLowRatio: num(design.torque.transferCaseLowRatio),
      converterStallRatio: num(design.torque.converterStallRatio),
    },
    speedMode: s.maxShaftRpm != null && !vehicle ? "rpm" : "vehicle",
    speed: {
      topSpeedKmh: num(s.topSpeedKmh),
      tireDiameterMm: num(s.tireDiameterMm),
      axleRatio: num(s.axleRatio),
      maxShaftRpm: num(s.maxShaftRpm),
    },
    tubeMode: design.tube ? "chosen" : "auto",
    tube: design.tube ? { ...design.tube } : defaults.tube,
    extras,
  };
}

/** Where a design-file issue shows in the form ("ends.front.fittingId" → "ends.front"). */
export function formPathOf(designPath: string): string {
  if (designPath.startsWith("ends.front")) return "ends.front";
  if (designPath.startsWith("ends.rear")) return "ends.rear";
  if (designPath === "tube") return "tube.materialId";
  return designPath;
}

export interface FormValidation {
  design: DesignFile | null;
  /** Form path → the core's message ("lengthMm: must be a positive number"). */
  fieldErrors: Record<string, string>;
  issues: FieldIssue[];
}

/** Validates the form by parsing its design file with the core (the core's rules, not ours). */
export function validateBuilderForm(form: BuilderForm, catalogue: Catalogue): FormValidation {
  const parsed = parseDesign(formToDesignFile(form), { catalogue });
  if (parsed.ok) return { design: parsed.design, fieldErrors: {}, issues: [] };
  const fieldErrors: Record<string, string> = {};
  for (const issue of parsed.issues) fieldErrors[formPathOf(issue.path)] ??= issue.message;
  return { design: null, fieldErrors, issues: parsed.issues };
}

/**
 * The zod schema of the whole form for react-hook-form: the name and application by their own
 * schemas, the engineering fields by the core's parseDesign.
 */
export function builderFormSchema(catalogue: Catalogue) {
  return z
    .object({ name: designNameSchema, application: designApplicationSchema })
    .passthrough()
    .superRefine((value, ctx) => {
      const { issues } = validateBuilderForm(value as unknown as BuilderForm, catalogue);
      for (const issue of issues)
        ctx.addIssue({ code: "custom", path: formPathOf(issue.path).split("."), message: issue.message });
    });
}

// ————— Units —————

/** Quantities the builder shows in the chosen unit system. */
export type DisplayQuantity = "length" | "diameter" | "torque" | "speed";

interface DisplayUnit {
  unit: string;
  digits: number;
  fromSi: (x: number) => number;
  toSi: (x: number) => number;
}

const same = (x: number) => x;

export const DISPLAY_UNITS: Record<DisplayQuantity, Record<UnitSystem, DisplayUnit>> = {
  length: {
    imperial: { unit: "in", digits: 2, fromSi: mmToIn, toSi: inToMm },
    metric: { unit: "mm", digits: 1, fromSi: same, toSi: same },
  },
  diameter: {
    imperial: { unit: "in", digits: 3, fromSi: mmToIn, toSi: inToMm },
    metric: { unit: "mm", digits: 2, fromSi: same, toSi: same },
  },
  torque: {
    imperial: { unit: "lb·ft", digits: 1, fromSi: nmToLbft, toSi: lbftToNm },
    metric: { unit: "N·m", digits: 1, fromSi: same, toSi: same },
  },
  speed: {
    imperial: { unit: "mph", digits: 1, fromSi: kmhToMph, toSi: mphToKmh },
    metric: { unit: "km/h", digits: 1, fromSi: same, toSi: same },
  },
};

/** Text of an SI value in the unit system, rounded for display ("52.00"); "" for empty. */
export function formatInUnits(si: SiNumber, quantity: DisplayQuantity, system: UnitSystem): string {
  if (si == null || Number.isNaN(si)) return "";
  const u = DISPLAY_UNITS[quantity][system];
  return u.fromSi(si).toFixed(u.digits);
}

/** The SI value of what the user typed in the unit system: null when empty, NaN when not a number. */
export function parseInUnits(text: string, quantity: DisplayQuantity | null, system: UnitSystem): SiNumber {
  const t = text.trim().replace(/,/g, ".").replace(/^−/, "-");
  if (t === "") return null;
  const n = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t) ? Number(t) : NaN;
  if (!quantity || Number.isNaN(n)) return n;
  return DISPLAY_UNITS[quantity][system].toSi(n);
}

/** A short plain number for results ("1,234.5"). */
export function formatNumber(x: number, digits = 1): string {
  return x.toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

/** An SI value with its unit in the unit system, for results ("3.500 in"). */
export function withUnit(si: number, quantity: DisplayQuantity, system: UnitSystem, digits?: number): string {
  const u = DISPLAY_UNITS[quantity][system];
  return `${formatNumber(u.fromSi(si), digits ?? u.digits)} ${u.unit}`;
}

/** A file name for a downloaded design ("street-truck.json"). */
export function designFileName(name: string): string {
  const slug = name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60);
  return `${slug || "design"}.json`;
}

/** The design file as downloaded: JSON, SI, nulls left out. */
export function designFileJson(design: DesignFile | Record<string, unknown>): string {
  return `${JSON.stringify(design, (_k, v) => (v === null ? undefined : v), 2)}\n`;
}

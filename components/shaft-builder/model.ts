/**
 * The builder's form model and its conversions, pure (no React): form ↔ design file, and the
 * unit display. The form keeps every quantity in SI (the design file's own units); a unit
 * switch only changes how numbers are shown, so it can never lose precision.
 */
import type { DesignFile, EvaluationReport, FieldIssue } from "@/lib/driveline";
import {
  inToMm,
  kgToLb,
  kmhToMph,
  lbftToNm,
  lbToKg,
  mmToIn,
  mphToKmh,
  nmToLbft,
} from "@/lib/driveline/units";
import type { ShaftUse } from "@/lib/designs/schemas";

export type UnitSystem = "imperial" | "metric";

/** A number the form holds in SI; null when the field is empty, NaN when it is not a number. */
export type SiNumber = number | null;

export interface AnglesModel {
  verticalDeg: SiNumber;
  horizontalDeg: SiNumber;
}

/** Slip-joint data (design file `slip`), mm; the whole group is left out while every field is empty. */
export interface SlipModel {
  collapsedLengthMm: SiNumber;
  travelMm: SiNumber;
  droopExtensionMm: SiNumber;
  bumpCompressionMm: SiNumber;
  /** Catalogue slip yoke id, or "" to let the shop match one. */
  slipYokeId: string;
  sealOutsideCollapsedMm: SiNumber;
}

/** One end where it meets the vehicle: "" not given, a yoke (series or measured caps) or a companion flange. */
export interface VehicleEndModel {
  kind: "" | "yoke" | "flange";
  jointSeriesId: string;
  capDiameterMm: SiNumber;
  capSpanMm: SiNumber;
  retention: "" | "strap" | "u-bolt" | "round";
  flange: { boltCount: SiNumber; boltCircleMm: SiNumber; pilotMm: SiNumber };
}

/** Interface data (design file `interface`). */
export interface InterfaceModel {
  transmissionOutput: { splineCount: SiNumber; majorDiameterMm: SiNumber };
  front: VehicleEndModel;
  pinion: VehicleEndModel;
  lubrication: "" | "greaseable" | "sealed";
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
    /** Top gear, for the running torque (the core falls back to speed.topGearRatio). */
    topGearRatio: SiNumber;
    /** A machine's rated torque at the shaft (industrial). */
    ratedShaftTorqueNm: SiNumber;
  };
  /** Shaft speed from the vehicle (top speed, tire, axle) or given directly. */
  speedMode: "vehicle" | "rpm";
  speed: {
    topSpeedKmh: SiNumber;
    tireDiameterMm: SiNumber;
    axleRatio: SiNumber;
    maxShaftRpm: SiNumber;
    /** The engine-speed path beside the others: max engine rpm ÷ top gear. */
    maxEngineRpm: SiNumber;
    topGearRatio: SiNumber;
  };
  /** Wheel-slip torque inputs; left out while every field is empty. */
  traction: { drivenAxleLoadKg: SiNumber; tireLoadedRadiusMm: SiNumber; adhesion: SiNumber };
  slip: SlipModel;
  interface: InterfaceModel;
  /** "" = not given (a single cross). */
  frontJointType: "" | "cross" | "double-cardan";
  /** "" = not given (one piece). */
  layout: "" | "one-piece" | "two-piece";
  centreBearing: { bearingId: string; fromFrontMm: SiNumber; dropMm: SiNumber };
  /** "auto": let Yokeline pick from the catalogue; "chosen": the tube below. */
  tubeMode: "auto" | "chosen";
  tube: { materialId: string; odMm: SiNumber; wallMm: SiNumber };
  /**
   * Design-file fields the form does not edit (balance grade, phase index, material
   * overrides, …), kept as they came so a downloaded file loses nothing an upload brought.
   */
  extras: Record<string, unknown>;
}

const emptyEnd = (): VehicleEndModel => ({
  kind: "",
  jointSeriesId: "",
  capDiameterMm: null,
  capSpanMm: null,
  retention: "",
  flange: { boltCount: null, boltCircleMm: null, pilotMm: null },
});

/** The optional groups, all empty (so the design file leaves them out). */
export function emptyOptionalGroups(): Pick<
  BuilderForm,
  "traction" | "slip" | "interface" | "frontJointType" | "layout" | "centreBearing"
> {
  return {
    traction: { drivenAxleLoadKg: null, tireLoadedRadiusMm: null, adhesion: null },
    slip: {
      collapsedLengthMm: null,
      travelMm: null,
      droopExtensionMm: null,
      bumpCompressionMm: null,
      slipYokeId: "",
      sealOutsideCollapsedMm: null,
    },
    interface: {
      transmissionOutput: { splineCount: null, majorDiameterMm: null },
      front: emptyEnd(),
      pinion: emptyEnd(),
      lubrication: "",
    },
    frontJointType: "",
    layout: "",
    centreBearing: { bearingId: "", fromFrontMm: null, dropMm: null },
  };
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
    torque: {
      engineTorqueNm: 550,
      firstGearRatio: 3.06,
      transferCaseLowRatio: 1,
      converterStallRatio: 2,
      topGearRatio: null,
      ratedShaftTorqueNm: null,
    },
    speedMode: "vehicle",
    speed: {
      topSpeedKmh: 200,
      tireDiameterMm: 711,
      axleRatio: 3.73,
      maxShaftRpm: null,
      maxEngineRpm: null,
      topGearRatio: null,
    },
    ...emptyOptionalGroups(),
    tubeMode: "auto",
    tube: { materialId: "steel-dom", odMm: 88.9, wallMm: 2.108 },
    extras: {},
  };
}

const DESIGN_KEYS = new Set([
  "name",
  "lengthMm",
  "tube",
  "geometry",
  "torque",
  "speed",
  "ends",
  "use",
  "traction",
  "slip",
  "interface",
  "frontJointType",
  "layout",
  "centreBearing",
]);

/** A number field the user filled (NaN counts: the core must report it). */
const given = (v: SiNumber) => v != null;
const text = (v: string) => (v ? v : null);

function vehicleEndToFile(e: VehicleEndModel): Record<string, unknown> | null {
  if (!e.kind) return null;
  if (e.kind === "flange")
    return {
      kind: "flange",
      flange: {
        boltCount: e.flange.boltCount,
        boltCircleMm: e.flange.boltCircleMm,
        pilotMm: e.flange.pilotMm,
      },
    };
  return {
    kind: "yoke",
    jointSeriesId: text(e.jointSeriesId),
    capDiameterMm: e.capDiameterMm,
    capSpanMm: e.capSpanMm,
    retention: text(e.retention),
  };
}

/** The optional groups of the design file; each is left out while all its fields are empty. */
function optionalGroupsToFile(form: BuilderForm): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  const t = form.traction;
  if ([t.drivenAxleLoadKg, t.tireLoadedRadiusMm, t.adhesion].some(given)) out.traction = { ...t };
  const s = form.slip;
  if (
    [s.collapsedLengthMm, s.travelMm, s.droopExtensionMm, s.bumpCompressionMm, s.sealOutsideCollapsedMm].some(
      given,
    ) ||
    s.slipYokeId
  )
    out.slip = { ...s, slipYokeId: text(s.slipYokeId) };
  const i = form.interface;
  const output = [i.transmissionOutput.splineCount, i.transmissionOutput.majorDiameterMm].some(given)
    ? { ...i.transmissionOutput }
    : null;
  const front = vehicleEndToFile(i.front);
  const pinion = vehicleEndToFile(i.pinion);
  if (output || front || pinion || i.lubrication)
    out.interface = { transmissionOutput: output, front, pinion, lubrication: text(i.lubrication) };
  if (form.frontJointType) out.frontJointType = form.frontJointType;
  if (form.layout) out.layout = form.layout;
  if (form.layout === "two-piece" && form.centreBearing.bearingId)
    out.centreBearing = { ...form.centreBearing };
  return out;
}

const angles = (a: AnglesModel, offset: boolean) => ({
  verticalDeg: a.verticalDeg,
  horizontalDeg: offset ? a.horizontalDeg : 0,
});

/**
 * The design file (engineering contract, SI) the form describes. Not validated here: run
 * `parseDesign` on the result (see `validateBuilderForm` in builder-core.ts).
 */
export function formToDesignFile(form: BuilderForm): Record<string, unknown> {
  const { extras } = form;
  const extraGeometry = (extras.geometry ?? {}) as Record<string, unknown>;
  const extraSpeed = (extras.speed ?? {}) as Record<string, unknown>;
  const engine = { maxEngineRpm: form.speed.maxEngineRpm, topGearRatio: form.speed.topGearRatio };
  const ends: Record<string, { fittingId: string }> = {};
  if (form.ends.front) ends.front = { fittingId: form.ends.front };
  if (form.ends.rear) ends.rear = { fittingId: form.ends.rear };
  const rest = Object.fromEntries(Object.entries(extras).filter(([k]) => !["geometry", "speed"].includes(k)));
  const design: Record<string, unknown> = {
    name: form.name.trim() || null,
    // The customer's pick reaches the evaluation (street: the shop's base factor and limits).
    use: form.application.use,
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
      topGearRatio: form.torque.topGearRatio,
      ratedShaftTorqueNm: form.torque.ratedShaftTorqueNm,
    },
    speed:
      form.speedMode === "rpm"
        ? {
            ...extraSpeed,
            ...engine,
            maxShaftRpm: form.speed.maxShaftRpm,
            topSpeedKmh: null,
            axleRatio: null,
            tireDiameterMm: null,
          }
        : {
            ...extraSpeed,
            ...engine,
            maxShaftRpm: null,
            topSpeedKmh: form.speed.topSpeedKmh,
            axleRatio: form.speed.axleRatio,
            tireDiameterMm: form.speed.tireDiameterMm,
          },
    ...rest,
    ...optionalGroupsToFile(form),
    ...(Object.keys(ends).length ? { ends } : {}),
  };
  return design;
}

const num = (v: unknown): SiNumber => (typeof v === "number" ? v : null);
const DEG = 180 / Math.PI;

type FileEnd = NonNullable<NonNullable<DesignFile["interface"]>["pinion"]>;

function vehicleEndToForm(e: FileEnd | null | undefined): VehicleEndModel {
  if (!e) return emptyEnd();
  return {
    kind: e.kind,
    jointSeriesId: e.jointSeriesId ?? "",
    capDiameterMm: num(e.capDiameterMm),
    capSpanMm: num(e.capSpanMm),
    retention: e.retention ?? "",
    flange: {
      boltCount: num(e.flange?.boltCount),
      boltCircleMm: num(e.flange?.boltCircleMm),
      pilotMm: num(e.flange?.pilotMm),
    },
  };
}

function optionalGroupsToForm(design: DesignFile): ReturnType<typeof emptyOptionalGroups> {
  const empty = emptyOptionalGroups();
  const t = design.traction;
  const s = design.slip;
  const i = design.interface;
  const c = design.centreBearing;
  return {
    traction: t
      ? {
          drivenAxleLoadKg: t.drivenAxleLoadKg,
          tireLoadedRadiusMm: t.tireLoadedRadiusMm,
          adhesion: num(t.adhesion),
        }
      : empty.traction,
    slip: s
      ? {
          collapsedLengthMm: s.collapsedLengthMm,
          travelMm: s.travelMm,
          droopExtensionMm: num(s.droopExtensionMm),
          bumpCompressionMm: num(s.bumpCompressionMm),
          slipYokeId: s.slipYokeId ?? "",
          sealOutsideCollapsedMm: num(s.sealOutsideCollapsedMm),
        }
      : empty.slip,
    interface: i
      ? {
          transmissionOutput: {
            splineCount: num(i.transmissionOutput?.splineCount),
            majorDiameterMm: num(i.transmissionOutput?.majorDiameterMm),
          },
          front: vehicleEndToForm(i.front),
          pinion: vehicleEndToForm(i.pinion),
          lubrication: i.lubrication ?? "",
        }
      : empty.interface,
    frontJointType: design.frontJointType ?? "",
    layout: design.layout ?? "",
    centreBearing: c
      ? { bearingId: c.bearingId, fromFrontMm: num(c.fromFrontMm), dropMm: num(c.dropMm) }
      : empty.centreBearing,
  };
}

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
  const vehicle = s.topSpeedKmh != null && s.axleRatio != null && s.tireDiameterMm != null;
  const defaults = defaultBuilderForm();
  return {
    name: design.name ?? defaults.name,
    // The file's use wins; a file without one keeps the draft's (older drafts kept it beside the design).
    application: { ...base.application, use: design.use ?? base.application.use },
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
      topGearRatio: num(design.torque.topGearRatio),
      ratedShaftTorqueNm: num(design.torque.ratedShaftTorqueNm),
    },
    speedMode: s.maxShaftRpm != null && !vehicle ? "rpm" : "vehicle",
    speed: {
      topSpeedKmh: num(s.topSpeedKmh),
      tireDiameterMm: num(s.tireDiameterMm),
      axleRatio: num(s.axleRatio),
      maxShaftRpm: num(s.maxShaftRpm),
      maxEngineRpm: num(s.maxEngineRpm),
      topGearRatio: num(s.topGearRatio),
    },
    ...optionalGroupsToForm(design),
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
  if (designPath === "centreBearing") return "centreBearing.bearingId";
  return designPath;
}

/** A valid design and its evaluation report. */
export interface Evaluation {
  design: DesignFile;
  report: EvaluationReport;
}

export interface FormValidation {
  design: DesignFile | null;
  /** Form path → the core's message ("lengthMm: must be a positive number"). */
  fieldErrors: Record<string, string>;
  issues: FieldIssue[];
}

// ————— Units —————

/** Quantities the builder shows in the chosen unit system. */
export type DisplayQuantity = "length" | "diameter" | "torque" | "speed" | "mass";

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
  mass: {
    imperial: { unit: "lb", digits: 0, fromSi: kgToLb, toSi: lbToKg },
    metric: { unit: "kg", digits: 0, fromSi: same, toSi: same },
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

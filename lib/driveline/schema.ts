/**
 * zod schemas of the design file, shop settings and catalogue. Every message names what is
 * expected ("must be a positive number"); `parseDesign` prefixes the field path.
 */
import { z } from "zod";
import type { Catalogue } from "./catalogue/types";
import { defaultCatalogue } from "./catalogue/default";
import { defaultSettings, type SettingKey } from "./settings";

const POSITIVE = "must be a positive number";
const NUMBER = "must be a number";

const positive = () => z.number({ error: POSITIVE }).positive({ error: POSITIVE });

/**
 * Largest values the core accepts: well past any real driveshaft, so a typo or a hostile 1e308
 * is a field error rather than an Infinity in the results and prices. Each is named in its message.
 */
export const PHYSICAL_MAX = {
  lengthMm: 10_000,
  tubeOdMm: 1_000,
  tubeWallMm: 100,
  elasticModulusGPa: 1_500,
  densityKgM3: 25_000,
  shearYieldMPa: 10_000,
  jointCentreMm: 50_000,
  torqueNm: 100_000,
  ratio: 100,
  shaftRpm: 50_000,
  topSpeedKmh: 1_000,
  tireDiameterMm: 5_000,
  engineRpm: 50_000,
  /** The coarsest balance grade of ISO 1940-1 (G 4000). */
  balanceGradeMmS: 4_000,
  slipMm: 5_000,
  axleLoadKg: 50_000,
  tireLoadedRadiusMm: 2_500,
  adhesion: 2,
  splineCount: 100,
  splineDiameterMm: 500,
  flangeMm: 1_000,
  boltCount: 24,
} as const;

/** What the shaft is used for: selects the shop's service factor and the use-dependent limits. */
export const USES = ["street", "towing", "off-road", "race", "industrial"] as const;
export type Use = (typeof USES)[number];

/** A positive number at most `max` (`unit` is shown in the message, e.g. "mm"). */
const bounded = (max: number, unit: string) => {
  const tooBig = `must be at most ${max}${unit ? ` ${unit}` : ""}`;
  return positive().max(max, { error: tooBig });
};
const optionalBounded = (max: number, unit: string) => bounded(max, unit).nullish();
const angleDeg = (maxAbs: number) =>
  z
    .number({ error: `must be an angle in degrees between −${maxAbs} and ${maxAbs}` })
    .min(-maxAbs, { error: `must be an angle in degrees between −${maxAbs} and ${maxAbs}` })
    .max(maxAbs, { error: `must be an angle in degrees between −${maxAbs} and ${maxAbs}` });
const object = <T extends z.ZodRawShape>(shape: T) => z.object(shape, { error: "must be an object" });
const id = () =>
  z.string({ error: "must be a non-empty text id" }).min(1, { error: "must be a non-empty text id" });

/** Largest projected shaft angle accepted; beyond it the shop measurement is suspect. */
export const MAX_PROJECTED_ANGLE_DEG = 40;

const shaftAnglesSchema = object({
  verticalDeg: angleDeg(MAX_PROJECTED_ANGLE_DEG),
  horizontalDeg: angleDeg(MAX_PROJECTED_ANGLE_DEG),
});

const coordinate = () => {
  const m = `must be a number between −${PHYSICAL_MAX.jointCentreMm} and ${PHYSICAL_MAX.jointCentreMm} mm`;
  return z
    .number({ error: NUMBER })
    .min(-PHYSICAL_MAX.jointCentreMm, { error: m })
    .max(PHYSICAL_MAX.jointCentreMm, { error: m });
};
const pointSchema = object({ x: coordinate(), y: coordinate(), z: coordinate() });

/** A tube's wall must leave a bore: less than half its outside diameter (reported on `wallMm`). */
const wallLeavesABore =
  (message: string) =>
  <T extends { odMm: number; wallMm: number }>(ctx: z.core.ParsePayload<T>) => {
    const t = ctx.value;
    if (t.wallMm * 2 >= t.odMm)
      ctx.issues.push({ code: "custom", input: t.wallMm, path: ["wallMm"], message });
  };

const tubeSchema = object({
  materialId: id(),
  odMm: bounded(PHYSICAL_MAX.tubeOdMm, "mm"),
  wallMm: bounded(PHYSICAL_MAX.tubeWallMm, "mm"),
}).check(wallLeavesABore("must be less than half of odMm"));

const materialSchema = object({
  elasticModulusGPa: optionalBounded(PHYSICAL_MAX.elasticModulusGPa, "GPa"),
  densityKgM3: optionalBounded(PHYSICAL_MAX.densityKgM3, "kg/m³"),
  shearYieldMPa: optionalBounded(PHYSICAL_MAX.shearYieldMPa, "MPa"),
});

const endSchema = object({ fittingId: id() });

const nonNegativeMm = () =>
  z
    .number({ error: "must be a number ≥ 0" })
    .min(0, { error: "must be a number ≥ 0" })
    .max(PHYSICAL_MAX.slipMm, { error: `must be at most ${PHYSICAL_MAX.slipMm} mm` });

/** Slip-joint data: lengths joint centre to joint centre, mm. */
const slipSchema = object({
  /** Installed length with the slip fully collapsed. */
  collapsedLengthMm: bounded(PHYSICAL_MAX.lengthMm, "mm"),
  /** Total spline travel from fully collapsed to fully out. */
  travelMm: bounded(PHYSICAL_MAX.slipMm, "mm"),
  /** Lengthening from ride height at full suspension droop (default 0). */
  droopExtensionMm: nonNegativeMm().nullish(),
  /** Shortening from ride height at full bump (default 0). */
  bumpCompressionMm: nonNegativeMm().nullish(),
  /** The catalogue slip yoke (its minimum engagement and seal surface apply); absent: matched from `interface`, else the shop's fixed minimum. */
  slipYokeId: id().nullish(),
  /** Seal surface already outside the tail bushing with the slip fully collapsed, mm (default 0). */
  sealOutsideCollapsedMm: nonNegativeMm().nullish(),
});

const wholeCount = (max: number) =>
  z
    .number({ error: `must be a whole number from 1 to ${max}` })
    .int({ error: `must be a whole number from 1 to ${max}` })
    .min(1, { error: `must be a whole number from 1 to ${max}` })
    .max(max, { error: `must be a whole number from 1 to ${max}` });

/** A companion-flange bolt pattern. */
const flangeSchema = object({
  boltCount: wholeCount(PHYSICAL_MAX.boltCount),
  boltCircleMm: bounded(PHYSICAL_MAX.flangeMm, "mm"),
  pilotMm: bounded(PHYSICAL_MAX.flangeMm, "mm"),
});

/** How one end of the shaft meets the vehicle: a yoke that takes a joint's caps, or a companion flange. */
const vehicleEndSchema = object({
  kind: z.enum(["yoke", "flange"], { error: "must be yoke or flange" }),
  /** The vehicle yoke's joint series, when known. */
  jointSeriesId: id().nullish(),
  /** Or measured: bearing cap diameter and span across the caps, mm. */
  capDiameterMm: optionalBounded(200, "mm"),
  capSpanMm: optionalBounded(500, "mm"),
  retention: z.enum(["strap", "u-bolt", "round"], { error: "must be strap, u-bolt or round" }).nullish(),
  flange: flangeSchema.nullish(),
});

/** Interface data, so the shop need not phone: what the shaft's ends meet on the vehicle. */
const interfaceSchema = object({
  /** Transmission (or transfer-case) output spline, for a slip yoke. */
  transmissionOutput: object({
    splineCount: wholeCount(PHYSICAL_MAX.splineCount),
    majorDiameterMm: bounded(PHYSICAL_MAX.splineDiameterMm, "mm"),
  }).nullish(),
  /** The front end when it is not a slip yoke on an output spline (a yoke or a flange). */
  front: vehicleEndSchema.nullish(),
  /** The axle end: the pinion yoke or companion flange. */
  pinion: vehicleEndSchema.nullish(),
  lubrication: z.enum(["greaseable", "sealed"], { error: "must be greaseable or sealed" }).nullish(),
});

/** The design file (contract: /shared/spec/design-file.md). Unknown fields are ignored. */
export const designFileSchema = object({
  name: z.string({ error: "must be text" }).max(200, { error: "must be at most 200 characters" }).nullish(),
  lengthMm: bounded(PHYSICAL_MAX.lengthMm, "mm"),
  tube: tubeSchema.nullish(),
  material: materialSchema.nullish(),
  geometry: object({
    transmission: shaftAnglesSchema,
    driveshaft: shaftAnglesSchema.nullish(),
    pinion: shaftAnglesSchema,
    /** Joint centres in vehicle axes (mm); used for the driveshaft axis when it is not given. */
    frontJointCentreMm: pointSchema.nullish(),
    rearJointCentreMm: pointSchema.nullish(),
  }),
  torque: object({
    engineTorqueNm: bounded(PHYSICAL_MAX.torqueNm, "N·m"),
    firstGearRatio: optionalBounded(PHYSICAL_MAX.ratio, ""),
    transferCaseLowRatio: optionalBounded(PHYSICAL_MAX.ratio, ""),
    converterStallRatio: optionalBounded(PHYSICAL_MAX.ratio, ""),
    /** Top gear, for the running torque (engine torque through top gear); falls back to speed.topGearRatio. */
    topGearRatio: optionalBounded(PHYSICAL_MAX.ratio, ""),
    /** A machine's rated torque at the shaft (industrial): the running torque when given. */
    ratedShaftTorqueNm: optionalBounded(PHYSICAL_MAX.torqueNm, "N·m"),
  }),
  speed: object({
    maxShaftRpm: optionalBounded(PHYSICAL_MAX.shaftRpm, "rpm"),
    topSpeedKmh: optionalBounded(PHYSICAL_MAX.topSpeedKmh, "km/h"),
    axleRatio: optionalBounded(PHYSICAL_MAX.ratio, ""),
    tireDiameterMm: optionalBounded(PHYSICAL_MAX.tireDiameterMm, "mm"),
    maxEngineRpm: optionalBounded(PHYSICAL_MAX.engineRpm, "rpm"),
    topGearRatio: optionalBounded(PHYSICAL_MAX.ratio, ""),
  }),
  balanceGradeMmS: optionalBounded(PHYSICAL_MAX.balanceGradeMmS, "mm/s"),
  ends: object({ front: endSchema.nullish(), rear: endSchema.nullish() }).nullish(),
  slip: slipSchema.nullish(),
  /** Selects the shop's service factor and use-dependent limits; default street. */
  use: z.enum(USES, { error: `must be one of ${USES.join(", ")}` }).nullish(),
  /** Wheel-slip torque: axle load, loaded tire radius, adhesion (default from the shop per use). */
  traction: object({
    drivenAxleLoadKg: bounded(PHYSICAL_MAX.axleLoadKg, "kg"),
    tireLoadedRadiusMm: bounded(PHYSICAL_MAX.tireLoadedRadiusMm, "mm"),
    adhesion: optionalBounded(PHYSICAL_MAX.adhesion, ""),
  }).nullish(),
  interface: interfaceSchema.nullish(),
  /** The front joint: a single cross (default) or a double-Cardan (constant-velocity) joint. */
  frontJointType: z.enum(["cross", "double-cardan"], { error: "must be cross or double-cardan" }).nullish(),
  /** One tube (default), or two pieces with a centre support bearing. */
  layout: z.enum(["one-piece", "two-piece"], { error: "must be one-piece or two-piece" }).nullish(),
  /** For a two-piece layout: the catalogue centre bearing and (optionally) where it sits. */
  centreBearing: object({
    bearingId: id(),
    /** Centre joint from the front joint centre along the shaft line, mm (default: half way). */
    fromFrontMm: optionalBounded(PHYSICAL_MAX.lengthMm, "mm"),
    /** Drop below the straight joint-to-joint line, mm (default: the shop's centre-joint angle). */
    dropMm: z
      .number({ error: "must be a number of mm between −500 and 500" })
      .min(-500, { error: "must be a number of mm between −500 and 500" })
      .max(500, { error: "must be a number of mm between −500 and 500" })
      .nullish(),
  }).nullish(),
  /** As-built (or planned) index of the rear yoke, deg in (−90, 90]; absent: the best index. */
  phaseIndexDeg: z
    .number({ error: "must be an angle in degrees, more than −90 and at most 90" })
    .gt(-90, { error: "must be an angle in degrees, more than −90 and at most 90" })
    .lte(90, { error: "must be an angle in degrees, more than −90 and at most 90" })
    .nullish(),
}).check((ctx) => {
  const d = ctx.value;
  const add = (path: (string | number)[], message: string) =>
    ctx.issues.push({ code: "custom", input: d, path, message });
  const g = d.geometry;
  if (g && !g.driveshaft) {
    if (!g.frontJointCentreMm || !g.rearJointCentreMm) {
      add(
        ["geometry", "driveshaft"],
        "is required unless frontJointCentreMm and rearJointCentreMm are both given",
      );
    } else if (!(g.rearJointCentreMm.x > g.frontJointCentreMm.x)) {
      add(["geometry", "rearJointCentreMm", "x"], "must be rearward of frontJointCentreMm (larger x)");
    }
  }
  const s = d.speed;
  if (s) {
    const vehicle = s.topSpeedKmh != null && s.axleRatio != null && s.tireDiameterMm != null;
    const engine = s.maxEngineRpm != null && s.topGearRatio != null;
    if (s.maxShaftRpm == null && !vehicle && !engine) {
      add(
        ["speed", "maxShaftRpm"],
        `${POSITIVE} unless topSpeedKmh, axleRatio and tireDiameterMm are all given`,
      );
    }
  }
  if (d.layout === "two-piece" && !d.centreBearing) {
    add(["centreBearing"], "is required for a two-piece layout (the catalogue centre bearing)");
  }
  const from = d.centreBearing?.fromFrontMm;
  if (d.layout === "two-piece" && from != null && d.lengthMm != null && from >= d.lengthMm) {
    add(
      ["centreBearing", "fromFrontMm"],
      "must be less than lengthMm (the centre joint lies between the ends)",
    );
  }
  if (d.slip && d.lengthMm != null && d.slip.collapsedLengthMm > d.lengthMm) {
    add(
      ["slip", "collapsedLengthMm"],
      "must not exceed lengthMm (the slip cannot be shorter than collapsed)",
    );
  }
});

/** A design file after parsing (also the input type of `evaluateDesign`). */
export type DesignFile = z.infer<typeof designFileSchema>;

/** One bad field: `path` in dot form ("torque.engineTorqueNm"), `message` says what is expected. */
export interface FieldIssue {
  readonly path: string;
  readonly message: string;
}

export type ParseResult<T> = { ok: true; design: T } | { ok: false; issues: FieldIssue[] };

/** Dot path with [i] for array indices; "design" for the root. */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const key of path) {
    if (typeof key === "number") out += `[${key}]`;
    else out += out ? `.${String(key)}` : String(key);
  }
  return out || "design";
}

function toIssues(error: z.ZodError): FieldIssue[] {
  const seen = new Set<string>();
  const issues: FieldIssue[] = [];
  for (const issue of error.issues) {
    const path = formatPath(issue.path);
    const message = `${path}: ${issue.message}`;
    if (seen.has(message)) continue;
    seen.add(message);
    issues.push({ path, message });
  }
  return issues;
}

/** Checks that need the catalogue: known material (or a complete one-off) and known fittings. */
function catalogueIssues(design: DesignFile, catalogue: Catalogue): FieldIssue[] {
  const issues: FieldIssue[] = [];
  const m = design.material;
  const complete =
    m != null && m.elasticModulusGPa != null && m.densityKgM3 != null && m.shearYieldMPa != null;
  if (design.tube && !complete && !catalogue.materials.some((x) => x.id === design.tube!.materialId)) {
    const known = catalogue.materials.map((x) => x.id).join(", ");
    issues.push({
      path: "tube.materialId",
      message: `tube.materialId: must be a catalogue material (${known}) unless material gives elasticModulusGPa, densityKgM3 and shearYieldMPa`,
    });
  }
  for (const end of ["front", "rear"] as const) {
    const fittingId = design.ends?.[end]?.fittingId;
    if (fittingId != null && !catalogue.endFittings.some((f) => f.id === fittingId)) {
      issues.push(unknownReference(`ends.${end}.fittingId`, "an end fitting", fittingId));
    }
  }
  issues.push(...fittingReferenceIssues(design, catalogue));
  return issues;
}

/** A design names a catalogue part (`what`, e.g. "an end fitting") by an id the catalogue lacks. */
function unknownReference(path: string, what: string, id: string): FieldIssue {
  return { path, message: `${path}: must be ${what} in the catalogue (unknown "${id}")` };
}

/** The slip yoke and the vehicle-side joint series a design names must be in the catalogue. */
function fittingReferenceIssues(design: DesignFile, catalogue: Catalogue): FieldIssue[] {
  const issues: FieldIssue[] = [];
  const slipYokeId = design.slip?.slipYokeId;
  if (slipYokeId != null && !(catalogue.slipYokes ?? []).some((y) => y.id === slipYokeId)) {
    const known = (catalogue.slipYokes ?? []).map((y) => y.id).join(", ") || "none";
    issues.push({
      path: "slip.slipYokeId",
      message: `slip.slipYokeId: must be a slip yoke in the catalogue (unknown "${slipYokeId}"; known: ${known})`,
    });
  }
  for (const end of ["front", "pinion"] as const) {
    const seriesId = design.interface?.[end]?.jointSeriesId;
    if (seriesId != null && !catalogue.jointSeries.some((j) => j.id === seriesId)) {
      issues.push(unknownReference(`interface.${end}.jointSeriesId`, "a joint series", seriesId));
    }
  }
  const bearingId = design.centreBearing?.bearingId;
  if (
    design.layout === "two-piece" &&
    bearingId != null &&
    !(catalogue.centreBearings ?? []).some((b) => b.id === bearingId)
  ) {
    issues.push(unknownReference("centreBearing.bearingId", "a centre bearing", bearingId));
  }
  return issues;
}

/**
 * Validate an untrusted design (parsed JSON). Never throws; each issue's message reads
 * `torque.engineTorqueNm: must be a positive number`.
 */
export function parseDesign(input: unknown, options?: { catalogue?: Catalogue }): ParseResult<DesignFile> {
  const result = designFileSchema.safeParse(input);
  if (!result.success) return { ok: false, issues: toIssues(result.error) };
  const issues = catalogueIssues(result.data, options?.catalogue ?? defaultCatalogue);
  return issues.length ? { ok: false, issues } : { ok: true, design: result.data };
}

/** Text that must say something (not empty, not only spaces). */
const sourceText = (message: string) =>
  z.string({ error: message }).refine((t) => t.trim().length > 0, { error: message });

/** The message when a limit or a material's figures do not say where they come from. */
export const SOURCE_REQUIRED =
  "must name its source (a standard, a handbook, the maker's sheet or “common shop practice”)";

export const limitSchema = object({
  value: z.number({ error: NUMBER }),
  source: sourceText(SOURCE_REQUIRED),
});

/** A shop's settings file: any subset of the limits, each a number or { value, source }. */
export const shopSettingsSchema = z.partialRecord(
  z.enum(Object.keys(defaultSettings) as [SettingKey, ...SettingKey[]], { error: "must be a known setting" }),
  z.union([z.number({ error: NUMBER }), limitSchema], { error: "must be a number or { value, source }" }),
);

const name = () =>
  z
    .string({ error: "must be text" })
    .refine((t) => t.trim().length > 0, { error: "must not be empty" })
    .refine((t) => t.length <= 200, { error: "must be at most 200 characters" });

const materialEntrySchema = object({
  id: id(),
  name: name(),
  elasticModulusGPa: bounded(PHYSICAL_MAX.elasticModulusGPa, "GPa"),
  densityKgM3: bounded(PHYSICAL_MAX.densityKgM3, "kg/m³"),
  tensileYieldMPa: bounded(PHYSICAL_MAX.shearYieldMPa, "MPa"),
  shearYieldMPa: bounded(PHYSICAL_MAX.shearYieldMPa, "MPa"),
  weldFamily: z.enum(["steel", "aluminium", "composite"], { error: "must be steel, aluminium or composite" }),
  source: sourceText(SOURCE_REQUIRED),
  condition: z
    .string({ error: "must be text" })
    .max(200, { error: "must be at most 200 characters" })
    .optional(),
  weldZoneTensileYieldMPa: bounded(PHYSICAL_MAX.shearYieldMPa, "MPa").optional(),
  weldZoneSource: z.string({ error: "must be text" }).optional(),
}).check((ctx) => {
  const m = ctx.value;
  if (m.weldZoneTensileYieldMPa == null) return;
  if (!m.weldZoneSource?.trim())
    ctx.issues.push({ code: "custom", input: m, path: ["weldZoneSource"], message: SOURCE_REQUIRED });
  if (m.weldZoneTensileYieldMPa > m.tensileYieldMPa)
    ctx.issues.push({
      code: "custom",
      input: m,
      path: ["weldZoneTensileYieldMPa"],
      message: "must not be above the parent metal's yield (welding does not strengthen the tube)",
    });
});

/** Largest single price the catalogue takes: $1,000,000 in cents (a typo guard, not a policy). */
export const MAX_PRICE_CENTS = 100_000_000;

const cents = () =>
  z
    .number({ error: "must be an amount of money" })
    .min(0, { error: "must not be negative" })
    .int({ error: "must be a whole number of cents" })
    .max(MAX_PRICE_CENTS, { error: "must be at most 1,000,000.00" });

const fittingKinds = ["weld-yoke", "slip-yoke-assembly", "flange-yoke"] as const;

const tubeEntrySchema = object({
  id: id(),
  materialId: id(),
  odMm: bounded(PHYSICAL_MAX.tubeOdMm, "mm"),
  wallMm: bounded(PHYSICAL_MAX.tubeWallMm, "mm"),
  maxLengthMm: bounded(PHYSICAL_MAX.lengthMm, "mm"),
  pricePerMetreCents: cents(),
}).check(wallLeavesABore("must be less than half the outside diameter"));

/** Blank select in the editor → not given. */
const optionalChoice = <const T extends readonly [string, ...string[]]>(values: T, message: string) =>
  z
    .union([z.literal(""), z.enum(values)], { error: message })
    .optional()
    .transform((v) => (v === "" ? undefined : v) as T[number] | undefined);

/**
 * A flange yoke's bolt pattern: all three figures, or none (the editor's empty boxes give an
 * object of blanks, which means no pattern).
 */
const catalogueFlangeSchema = object({
  boltCount: wholeCount(PHYSICAL_MAX.boltCount).optional(),
  boltCircleMm: bounded(PHYSICAL_MAX.flangeMm, "mm").optional(),
  pilotMm: bounded(PHYSICAL_MAX.flangeMm, "mm").optional(),
})
  .check((ctx) => {
    const f = ctx.value;
    const given = [f.boltCount, f.boltCircleMm, f.pilotMm].filter((v) => v != null).length;
    if (given === 0 || given === 3) return;
    for (const key of ["boltCount", "boltCircleMm", "pilotMm"] as const)
      if (f[key] == null)
        ctx.issues.push({
          code: "custom",
          input: f,
          path: [key],
          message: "must be given with the rest of the bolt pattern (or leave all three empty)",
        });
  })
  .optional()
  .transform((f) =>
    f && f.boltCount != null && f.boltCircleMm != null && f.pilotMm != null
      ? { boltCount: f.boltCount, boltCircleMm: f.boltCircleMm, pilotMm: f.pilotMm }
      : undefined,
  );

const endFittingEntrySchema = object({
  id: id(),
  name: name(),
  kind: z.enum(fittingKinds, { error: "must be weld-yoke, slip-yoke-assembly or flange-yoke" }),
  jointSeriesId: id(),
  tubeOdMm: bounded(PHYSICAL_MAX.tubeOdMm, "mm"),
  weldFamily: z.enum(["steel", "aluminium", "composite"], {
    error: "must be steel, aluminium or composite",
  }),
  jointCentreToWeldSeatMm: bounded(PHYSICAL_MAX.slipMm, "mm"),
  massKg: bounded(1_000, "kg"),
  torqueRatingNm: bounded(PHYSICAL_MAX.torqueNm, "N·m"),
  priceCents: cents(),
  fastenerTorqueNm: bounded(PHYSICAL_MAX.torqueNm, "N·m").optional(),
  fastenerTorqueSource: z.string({ error: "must be text" }).optional(),
  flange: catalogueFlangeSchema,
}).check((ctx) => {
  const f = ctx.value;
  if (f.fastenerTorqueNm != null && !f.fastenerTorqueSource?.trim()) {
    ctx.issues.push({ code: "custom", input: f, path: ["fastenerTorqueSource"], message: SOURCE_REQUIRED });
  }
});

const jointSeriesEntrySchema = object({
  id: id(),
  name: name(),
  torqueRatingNm: bounded(PHYSICAL_MAX.torqueNm, "N·m"),
  continuousTorqueNm: bounded(PHYSICAL_MAX.torqueNm, "N·m").optional(),
  maxWorkingAngleDeg: bounded(90, "°"),
  massKg: bounded(1_000, "kg"),
  priceCents: cents(),
  strapTorqueNm: bounded(PHYSICAL_MAX.torqueNm, "N·m").optional(),
  strapTorqueSource: z.string({ error: "must be text" }).optional(),
  capDiameterMm: bounded(200, "mm").optional(),
  capSpanMm: bounded(500, "mm").optional(),
  retention: optionalChoice(["strap", "u-bolt", "round"], "must be strap, u-bolt or round"),
  lubrication: optionalChoice(["greaseable", "sealed"], "must be greaseable or sealed"),
  otherSeriesId: z
    .string({ error: "must be a joint series id" })
    .optional()
    .transform((v) => (v?.trim() ? v : undefined)),
  // "cross" is the default: kept as not given, so the editor's blank and a stored "cross" are one.
  kind: optionalChoice(["cross", "double-cardan"], "must be cross or double-cardan").transform((k) =>
    k === "double-cardan" ? k : undefined,
  ),
}).check((ctx) => {
  const j = ctx.value;
  if (j.strapTorqueNm != null && !j.strapTorqueSource?.trim()) {
    ctx.issues.push({ code: "custom", input: j, path: ["strapTorqueSource"], message: SOURCE_REQUIRED });
  }
  if (j.otherSeriesId != null) {
    if (j.kind === "double-cardan")
      ctx.issues.push({
        code: "custom",
        input: j,
        path: ["otherSeriesId"],
        message: "must be empty for a double-Cardan joint (a conversion is a single cross)",
      });
    for (const key of ["capDiameterMm", "capSpanMm"] as const)
      if (j[key] == null)
        ctx.issues.push({
          code: "custom",
          input: j,
          path: [key],
          message: "must be given for a conversion cross (the caps on its own side)",
        });
  }
  if (j.continuousTorqueNm != null && j.continuousTorqueNm > j.torqueRatingNm) {
    ctx.issues.push({
      code: "custom",
      input: j,
      path: ["continuousTorqueNm"],
      message: "must not be above the peak torque rating",
    });
  }
});

const slipYokeEntrySchema = object({
  id: id(),
  name: name(),
  splineCount: wholeCount(PHYSICAL_MAX.splineCount),
  majorDiameterMm: bounded(PHYSICAL_MAX.splineDiameterMm, "mm"),
  jointSeriesId: id(),
  sealSurfaceLengthMm: bounded(PHYSICAL_MAX.slipMm, "mm"),
  minEngagementMm: bounded(PHYSICAL_MAX.slipMm, "mm"),
  massKg: bounded(1_000, "kg"),
  priceCents: cents(),
  source: sourceText(SOURCE_REQUIRED),
});

/** A centre support bearing (two-piece shafts): its stub's weld seat, the centre joint's series, price. */
const centreBearingEntrySchema = object({
  id: id(),
  name: name(),
  jointSeriesId: id(),
  tubeOdMm: bounded(PHYSICAL_MAX.tubeOdMm, "mm"),
  weldFamily: z.enum(["steel", "aluminium", "composite"], {
    error: "must be steel, aluminium or composite",
  }),
  jointCentreToWeldSeatMm: bounded(PHYSICAL_MAX.slipMm, "mm"),
  massKg: bounded(1_000, "kg"),
  priceCents: cents(),
  source: sourceText(SOURCE_REQUIRED),
});

/** For each row whose id repeats an earlier row's: its index and that earlier row's index. */
function repeatedIds(list: readonly { id: string }[]): { index: number; first: number; id: string }[] {
  const first = new Map<string, number>();
  const out: { index: number; first: number; id: string }[] = [];
  list.forEach((row, index) => {
    const seen = first.get(row.id);
    if (seen === undefined) first.set(row.id, index);
    else out.push({ index, first: seen, id: row.id });
  });
  return out;
}

/** Repeated ids and unknown joint series among a catalogue's centre bearings (paths from the catalogue). */
function centreBearingIssues(c: {
  jointSeries: readonly { id: string }[];
  centreBearings?: readonly { id: string; jointSeriesId: string }[] | undefined;
}): { path: (string | number)[]; message: string }[] {
  const list = c.centreBearings ?? [];
  const out = repeatedIds(list).map((r) => ({
    path: ["centreBearings", r.index, "id"],
    message: `must be unique (row ${r.first + 1} already uses "${r.id}")`,
  }));
  const series = new Set(c.jointSeries.map((j) => j.id));
  list.forEach((b, i) => {
    if (!series.has(b.jointSeriesId))
      out.push({
        path: ["centreBearings", i, "jointSeriesId"],
        message: `must be a joint series in this catalogue (no series "${b.jointSeriesId}")`,
      });
  });
  return out;
}

/**
 * A shop catalogue (same shape as `defaultCatalogue`): every figure in range, a tube's wall less
 * than half its diameter, ids unique per list, and every reference to a material or joint series
 * pointing at one that exists.
 */
export const catalogueSchema = object({
  id: id(),
  name: name(),
  demo: z.boolean({ error: "must be true or false" }),
  materials: z
    .array(materialEntrySchema, { error: "must be a list" })
    .min(1, { error: "must hold at least one material" }),
  tubes: z.array(tubeEntrySchema, { error: "must be a list" }),
  endFittings: z.array(endFittingEntrySchema, { error: "must be a list" }),
  jointSeries: z.array(jointSeriesEntrySchema, { error: "must be a list" }),
  slipYokes: z.array(slipYokeEntrySchema, { error: "must be a list" }).optional(),
  centreBearings: z.array(centreBearingEntrySchema, { error: "must be a list" }).optional(),
}).check((ctx) => {
  const c = ctx.value;
  for (const r of repeatedIds(c.slipYokes ?? []))
    ctx.issues.push({
      code: "custom",
      input: c,
      path: ["slipYokes", r.index, "id"],
      message: `must be unique (row ${r.first + 1} already uses "${r.id}")`,
    });
  centreBearingIssues(c).forEach((issue) => ctx.issues.push({ code: "custom", input: c, ...issue }));
  for (const key of ["materials", "tubes", "endFittings", "jointSeries"] as const) {
    for (const r of repeatedIds(c[key]))
      ctx.issues.push({
        code: "custom",
        input: c,
        path: [key, r.index, "id"],
        message: `must be unique (row ${r.first + 1} already uses "${r.id}")`,
      });
  }
  const materials = new Set(c.materials.map((m) => m.id));
  c.tubes.forEach((t, i) => {
    if (!materials.has(t.materialId))
      ctx.issues.push({
        code: "custom",
        input: c,
        path: ["tubes", i, "materialId"],
        message: `must be a material in this catalogue (no material "${t.materialId}")`,
      });
  });
  const series = new Set(c.jointSeries.map((j) => j.id));
  c.endFittings.forEach((f, i) => {
    if (!series.has(f.jointSeriesId))
      ctx.issues.push({
        code: "custom",
        input: c,
        path: ["endFittings", i, "jointSeriesId"],
        message: `must be a joint series in this catalogue (no series "${f.jointSeriesId}")`,
      });
  });
  (c.slipYokes ?? []).forEach((y, i) => {
    if (!series.has(y.jointSeriesId))
      ctx.issues.push({
        code: "custom",
        input: c,
        path: ["slipYokes", i, "jointSeriesId"],
        message: `must be a joint series in this catalogue (no series "${y.jointSeriesId}")`,
      });
  });
  c.jointSeries.forEach((j, i) => {
    if (j.otherSeriesId == null) return;
    const other = c.jointSeries.find((o) => o.id === j.otherSeriesId);
    const message = !other
      ? `must be a joint series in this catalogue (no series "${j.otherSeriesId}")`
      : other.id === j.id
        ? "must be another series (the caps on the conversion's other side)"
        : other.otherSeriesId != null || other.kind === "double-cardan"
          ? "must be a plain single-cross series"
          : null;
    if (message)
      ctx.issues.push({ code: "custom", input: c, path: ["jointSeries", i, "otherSeriesId"], message });
  });
}) satisfies z.ZodType<Catalogue>;

/**
 * DEMO DATA — the built-in catalogue. Names, series and part numbers are invented by
 * Yokeline ("YL-" prefix) and belong to no maker; dimensions and ratings are typical of the
 * trade, prices are illustrative. A shop replaces this with its own catalogue.
 */
import { shearYieldFromTensileMPa } from "../torsion";
import { tubeMassKg } from "../section";
import type {
  Catalogue,
  CentreBearing,
  EndFitting,
  FlangePattern,
  JointSeries,
  Material,
  SlipYoke,
  TubeSize,
} from "./types";

const IN = 25.4;
/** E and density are typical values (engineering reference §10, from memory); yields are minimums. */
const TYPICAL = "E and density typical (engineering reference §10, from memory); shop catalogue overrides";

export const defaultMaterials: readonly Material[] = [
  {
    id: "steel-dom",
    name: "Carbon steel DOM tube (1020 class, ASTM A513 Type 5 min.)",
    elasticModulusGPa: 200,
    densityKgM3: 7870,
    // ASTM A513 Type 5, 1020 stress-relieved: min. yield 55 ksi (379 MPa), min. tensile 65 ksi.
    tensileYieldMPa: 379,
    shearYieldMPa: shearYieldFromTensileMPa(379),
    condition: "drawn over mandrel, stress-relieved (SR)",
    weldZoneTensileYieldMPa: 262,
    weldZoneSource:
      "assumed: welding heat removes the drawing's cold work next to the weld, leaving about the as-welded hot-rolled tube DOM is drawn from — ASTM A513 Type 1, 1020, min. yield 38 ksi (262 MPa), as steel distributors tabulate the standard (from memory; no standard gives a weld-zone figure for DOM)",
    weldFamily: "steel",
    source: `yield: ASTM A513 Type 5, 1020 stress-relieved, min. 55 ksi (379 MPa), as steel distributors tabulate the standard; ${TYPICAL}`,
  },
  {
    id: "chromoly-4130",
    name: "Chromoly 4130, normalised",
    elasticModulusGPa: 205,
    densityKgM3: 7850,
    tensileYieldMPa: 435,
    shearYieldMPa: shearYieldFromTensileMPa(435),
    condition: "normalised",
    // 435 × 90/95 ≈ 412 MPa.
    weldZoneTensileYieldMPa: 412,
    weldZoneSource:
      "from memory: about 90 ksi ultimate next to welds in normalised 4130 not heat-treated after welding, against 95 ksi in the parent tube (MIL-HDBK-5 welded-joint tables); the parent's 435 MPa scaled by 90/95",
    weldFamily: "steel",
    source: `yield: 435 MPa, the handbook's typical normalised 4130 (from memory), below the aircraft tube specifications' minimum for normalised tube (75 ksi / 517 MPa, MIL-T-6736 / AMS 6360, from memory), so it serves as a minimum; ${TYPICAL}`,
  },
  {
    id: "aluminium-6061-t6",
    name: "Aluminium 6061-T6",
    elasticModulusGPa: 68.9,
    densityKgM3: 2700,
    // Minimum, not the typical 276 MPa.
    tensileYieldMPa: 241,
    shearYieldMPa: shearYieldFromTensileMPa(241),
    condition: "T6, drawn tube",
    weldZoneTensileYieldMPa: 103,
    weldZoneSource:
      "welded 6061-T6: about 15 ksi (103 MPa) tensile yield, the aluminium design specification's welded values (Aluminum Design Manual, from memory)",
    weldFamily: "aluminium",
    source: `yield: ASTM B210 / B221, 6061-T6 tube min. 35 ksi (241 MPa) (from memory; the typical 276 MPa is not a minimum); ${TYPICAL}`,
  },
];

/** OD (in) → walls (in) stocked, per material. */
const TUBE_STOCK: Record<
  string,
  { code: string; centsPerKg: number; maxLengthMm: number; sizes: [number, number[]][] }
> = {
  "steel-dom": {
    code: "DOM",
    centsPerKg: 800,
    maxLengthMm: 96 * IN,
    sizes: [
      [2.0, [0.065, 0.083, 0.095]],
      [2.5, [0.065, 0.083, 0.095, 0.12]],
      [3.0, [0.065, 0.083, 0.095, 0.12, 0.134]],
      [3.25, [0.083, 0.095, 0.12]],
      [3.5, [0.065, 0.083, 0.095, 0.12, 0.134]],
      [4.0, [0.083, 0.095, 0.12, 0.134]],
      [4.5, [0.095, 0.12, 0.134]],
      [5.0, [0.12, 0.134]],
    ],
  },
  "chromoly-4130": {
    code: "CM",
    centsPerKg: 1700,
    maxLengthMm: 84 * IN,
    sizes: [
      [2.0, [0.065, 0.083]],
      [2.5, [0.065, 0.083, 0.095]],
      [3.0, [0.065, 0.083, 0.095, 0.12]],
      [3.5, [0.065, 0.083, 0.095, 0.12]],
      [4.0, [0.083, 0.095, 0.12]],
    ],
  },
  "aluminium-6061-t6": {
    code: "AL",
    centsPerKg: 2400,
    maxLengthMm: 96 * IN,
    sizes: [
      [3.0, [0.095, 0.125]],
      [3.5, [0.095, 0.125, 0.188]],
      [4.0, [0.125, 0.188, 0.25]],
      [4.5, [0.125, 0.188]],
      [5.0, [0.125, 0.188, 0.25]],
    ],
  },
};

function buildTubes(): TubeSize[] {
  const tubes: TubeSize[] = [];
  for (const [materialId, stock] of Object.entries(TUBE_STOCK)) {
    const material = defaultMaterials.find((m) => m.id === materialId)!;
    for (const [odIn, walls] of stock.sizes) {
      for (const wallIn of walls) {
        const section = { odMm: odIn * IN, wallMm: wallIn * IN };
        const kgPerMetre = tubeMassKg(section, 1000, material.densityKgM3);
        tubes.push({
          id: `YL-T-${stock.code}-${Math.round(odIn * 1000)}-${String(Math.round(wallIn * 1000)).padStart(3, "0")}`,
          materialId,
          odMm: section.odMm,
          wallMm: section.wallMm,
          // Small tubes come in shorter stock.
          maxLengthMm: odIn <= 2.5 ? 72 * IN : stock.maxLengthMm,
          pricePerMetreCents: Math.round(500 + kgPerMetre * stock.centsPerKg),
        });
      }
    }
  }
  return tubes;
}

/** The demo catalogue's fastener torques are invented: a real shop enters its parts makers' figures. */
const DEMO_TORQUE = "demo data (invented) — use the part maker's published figure";

/**
 * Demo data (invented): peak (static) and continuous ratings. A real shop enters its joint
 * maker's published ratings; continuous ratings here are about a third of the peak.
 */
export const defaultJointSeries: readonly JointSeries[] = [
  {
    id: "YL-X28",
    name: "YL-X28 cross, 28 mm caps",
    torqueRatingNm: 1100,
    continuousTorqueNm: 400,
    maxWorkingAngleDeg: 20,
    massKg: 0.55,
    priceCents: 4500,
    strapTorqueNm: 19,
    strapTorqueSource: DEMO_TORQUE,
  },
  {
    id: "YL-X30",
    name: "YL-X30 cross, 30 mm caps",
    torqueRatingNm: 1700,
    continuousTorqueNm: 600,
    maxWorkingAngleDeg: 20,
    massKg: 0.7,
    priceCents: 5900,
    strapTorqueNm: 20,
    strapTorqueSource: DEMO_TORQUE,
  },
  {
    id: "YL-X35",
    name: "YL-X35 cross, 35 mm caps",
    torqueRatingNm: 2700,
    continuousTorqueNm: 950,
    maxWorkingAngleDeg: 18,
    massKg: 1.0,
    priceCents: 8900,
    strapTorqueNm: 27,
    strapTorqueSource: DEMO_TORQUE,
  },
  {
    id: "YL-X41",
    name: "YL-X41 cross, 41 mm caps",
    torqueRatingNm: 4200,
    continuousTorqueNm: 1500,
    maxWorkingAngleDeg: 18,
    massKg: 1.5,
    priceCents: 14500,
    strapTorqueNm: 41,
    strapTorqueSource: DEMO_TORQUE,
  },
  {
    id: "YL-X48",
    name: "YL-X48 cross, 48 mm caps",
    torqueRatingNm: 6500,
    continuousTorqueNm: 2300,
    maxWorkingAngleDeg: 15,
    massKg: 2.3,
    priceCents: 24000,
    strapTorqueNm: 61,
    strapTorqueSource: DEMO_TORQUE,
  },
];

/**
 * Companion-flange bolt patterns of the demo flange yokes: demo data, sizes typical of the trade
 * (from memory) — a shop measures the vehicle's flange (bolt count, bolt circle, pilot).
 */
const FLANGE_PATTERNS: Record<string, FlangePattern> = {
  "YL-X35": { boltCount: 4, boltCircleMm: 3.75 * IN, pilotMm: 2.25 * IN },
  "YL-X41": { boltCount: 4, boltCircleMm: 4.25 * IN, pilotMm: 2.75 * IN },
  "YL-X48": { boltCount: 8, boltCircleMm: 6.125 * IN, pilotMm: 4.0 * IN },
};

/** Per series: joint centre to weld seat (mm), weld-yoke mass (kg), tube ODs (in) taken. */
const FITTING_SERIES: Record<
  string,
  { seatMm: number; massKg: number; priceCents: number; odsIn: number[] }
> = {
  "YL-X28": { seatMm: 46, massKg: 0.9, priceCents: 3900, odsIn: [2.0, 2.5, 3.0] },
  "YL-X30": { seatMm: 51, massKg: 1.1, priceCents: 4600, odsIn: [2.5, 3.0, 3.25, 3.5] },
  "YL-X35": { seatMm: 58, massKg: 1.5, priceCents: 6200, odsIn: [3.0, 3.25, 3.5, 4.0] },
  "YL-X41": { seatMm: 66, massKg: 2.2, priceCents: 8800, odsIn: [3.5, 4.0, 4.5] },
  "YL-X48": { seatMm: 76, massKg: 3.3, priceCents: 13500, odsIn: [4.0, 4.5, 5.0] },
};

function buildFittings(): EndFitting[] {
  const out: EndFitting[] = [];
  for (const series of defaultJointSeries) {
    const f = FITTING_SERIES[series.id]!;
    const code = series.id.slice(3); // "X28"
    for (const odIn of f.odsIn) {
      const od = Math.round(odIn * 1000);
      out.push({
        id: `YL-WY-${code}-${od}`,
        name: `Weld yoke ${series.id}, ${odIn} in tube`,
        kind: "weld-yoke",
        jointSeriesId: series.id,
        tubeOdMm: odIn * IN,
        weldFamily: "steel",
        jointCentreToWeldSeatMm: f.seatMm,
        massKg: f.massKg,
        torqueRatingNm: series.torqueRatingNm,
        priceCents: f.priceCents,
      });
      out.push({
        id: `YL-SA-${code}-${od}`,
        name: `Slip yoke and splined weld stub ${series.id}, ${odIn} in tube (seat at nominal ride-height slip)`,
        kind: "slip-yoke-assembly",
        jointSeriesId: series.id,
        tubeOdMm: odIn * IN,
        weldFamily: "steel",
        jointCentreToWeldSeatMm: Math.round(f.seatMm * 2.6),
        massKg: Math.round(f.massKg * 2.4 * 100) / 100,
        torqueRatingNm: Math.round(series.torqueRatingNm * 0.9),
        priceCents: Math.round(f.priceCents * 2.8),
      });
    }
    // Weld-on flange yokes for the three heavier series, largest tube of the series.
    if (series.torqueRatingNm >= 2700) {
      const odIn = f.odsIn[f.odsIn.length - 1]!;
      const flange = FLANGE_PATTERNS[series.id];
      out.push({
        ...(flange ? { flange } : {}),
        id: `YL-FY-${code}-${Math.round(odIn * 1000)}`,
        name: `Weld-on flange yoke ${series.id}, ${odIn} in tube`,
        kind: "flange-yoke",
        jointSeriesId: series.id,
        tubeOdMm: odIn * IN,
        weldFamily: "steel",
        jointCentreToWeldSeatMm: Math.round(f.seatMm * 1.3),
        massKg: Math.round(f.massKg * 1.6 * 100) / 100,
        torqueRatingNm: series.torqueRatingNm,
        priceCents: Math.round(f.priceCents * 1.9),
        // Demo data: grows with the series like the flange bolt size does.
        fastenerTorqueNm: Math.round(series.torqueRatingNm / 45),
        fastenerTorqueSource: DEMO_TORQUE,
      });
    }
  }
  // Aluminium weld yokes: rating cut for the softened weld zone (6061-T6 ≈ 100 MPa near the weld).
  for (const [seriesId, odsIn] of [
    ["YL-X35", [3.5, 4.0, 4.5]],
    ["YL-X41", [4.0, 4.5, 5.0]],
  ] as const) {
    const series = defaultJointSeries.find((s) => s.id === seriesId)!;
    const f = FITTING_SERIES[seriesId]!;
    for (const odIn of odsIn) {
      out.push({
        id: `YL-AWY-${seriesId.slice(3)}-${Math.round(odIn * 1000)}`,
        name: `Aluminium weld yoke ${seriesId}, ${odIn} in tube`,
        kind: "weld-yoke",
        jointSeriesId: seriesId,
        tubeOdMm: odIn * IN,
        weldFamily: "aluminium",
        jointCentreToWeldSeatMm: f.seatMm + 6,
        massKg: Math.round(f.massKg * 0.45 * 100) / 100,
        torqueRatingNm: Math.round(series.torqueRatingNm * 0.75),
        priceCents: Math.round(f.priceCents * 1.6),
      });
    }
  }
  return out;
}

/*
 * Interface data of the joint series (demo data): the caps' diameter follows each series' name,
 * the span across the caps and the retention are typical of the trade (from memory). A shop
 * enters its joint makers' figures.
 */
const JOINT_CAPS: Record<
  string,
  Pick<JointSeries, "capDiameterMm" | "capSpanMm" | "retention" | "lubrication">
> = {
  "YL-X28": { capDiameterMm: 28, capSpanMm: 81.8, retention: "strap", lubrication: "sealed" },
  "YL-X30": { capDiameterMm: 30, capSpanMm: 92.1, retention: "strap", lubrication: "sealed" },
  "YL-X35": { capDiameterMm: 35, capSpanMm: 106.4, retention: "strap", lubrication: "sealed" },
  "YL-X41": { capDiameterMm: 41, capSpanMm: 120.7, retention: "u-bolt", lubrication: "sealed" },
  "YL-X48": { capDiameterMm: 48, capSpanMm: 136.5, retention: "u-bolt", lubrication: "sealed" },
};

const seriesRow = (id: string): JointSeries => {
  const base = defaultJointSeries.find((s) => s.id === id)!;
  return { ...base, ...JOINT_CAPS[id] };
};

/** A derived row: the base series' figures (incl. its ratings) scaled, with its own id, name and price. */
const derived = (
  baseId: string,
  row: Pick<JointSeries, "id" | "name" | "priceCents" | "massKg"> & Partial<JointSeries>,
  ratingFactor = 1,
): JointSeries => {
  const base = seriesRow(baseId);
  return {
    ...base,
    torqueRatingNm: Math.round(base.torqueRatingNm * ratingFactor),
    ...(base.continuousTorqueNm != null
      ? { continuousTorqueNm: Math.round(base.continuousTorqueNm * ratingFactor) }
      : {}),
    ...row,
  };
};

/**
 * Greaseable crosses (a grease fitting in the cross): same caps as the sealed ones; rated 10 %
 * lower for the drilled grease passages (demo data; common shop practice says a greaseable cross
 * is somewhat weaker — from memory).
 */
export const defaultGreaseableCrosses: readonly JointSeries[] = (["YL-X30", "YL-X35", "YL-X41"] as const).map(
  (id) =>
    derived(
      id,
      {
        id: `${id}G`,
        name: `${id}G cross, greaseable, ${JOINT_CAPS[id]!.capDiameterMm} mm caps`,
        lubrication: "greaseable",
        massKg: seriesRow(id).massKg,
        priceCents: Math.round(seriesRow(id).priceCents * 1.1),
      },
      0.9,
    ),
);

/**
 * Conversion crosses: caps of the smaller series on one side, of `otherSeriesId` on the other;
 * rated as the smaller series (demo data).
 */
export const defaultConversionCrosses: readonly JointSeries[] = (
  [
    ["YL-X28", "YL-X30"],
    ["YL-X30", "YL-X35"],
    ["YL-X35", "YL-X41"],
    ["YL-X41", "YL-X48"],
  ] as const
).map(([small, large]) =>
  derived(small, {
    id: `YL-C${small.slice(4)}-${large.slice(4)}`,
    name: `Conversion cross, ${small} caps one side, ${large} caps the other`,
    otherSeriesId: large,
    maxWorkingAngleDeg: Math.min(seriesRow(small).maxWorkingAngleDeg, seriesRow(large).maxWorkingAngleDeg),
    massKg: Math.round(((seriesRow(small).massKg + seriesRow(large).massKg) / 2) * 100) / 100,
    priceCents: Math.round(seriesRow(large).priceCents * 1.35),
  }),
);

/**
 * Double-Cardan (constant-velocity) joints: two crosses of the series with their centre yoke and
 * centring ball; the largest angle is the whole joint's (demo data; a shop enters its maker's).
 */
export const defaultDoubleCardanJoints: readonly JointSeries[] = (
  [
    ["YL-X30", 32, 3.4, 29500],
    ["YL-X35", 30, 4.6, 38500],
    ["YL-X41", 28, 6.4, 52000],
  ] as const
).map(([id, maxDeg, massKg, priceCents]) =>
  derived(id, {
    id: `YL-DC${id.slice(4)}`,
    name: `YL-DC${id.slice(4)} double-Cardan joint, two ${id} crosses, centring ball`,
    kind: "double-cardan",
    lubrication: "greaseable",
    maxWorkingAngleDeg: maxDeg,
    massKg,
    priceCents,
  }),
);

const SLIP_YOKE_SOURCE =
  "demo data (invented part); spline count and major diameter typical of common outputs (from memory) — count and measure the output";

/**
 * Slip yokes (demo data): output splines typical of the trade, from memory; ears for the series
 * named; seal surface and least engagement invented but of the usual size.
 */
export const defaultSlipYokes: readonly SlipYoke[] = (
  [
    [28, 1.2, "YL-X28", 105, 22, 1.6, 8900],
    [27, 1.25, "YL-X30", 118, 25, 1.9, 9800],
    [31, 1.375, "YL-X35", 127, 28, 2.4, 12400],
    [32, 1.5, "YL-X35", 140, 32, 2.8, 13900],
    [32, 1.5, "YL-X41", 140, 32, 3.3, 16500],
  ] as const
).map(([splineCount, diaIn, jointSeriesId, sealSurfaceLengthMm, minEngagementMm, massKg, priceCents]) => ({
  id: `YL-SY-${splineCount}-${Math.round(diaIn * 1000)}-${jointSeriesId.slice(3)}`,
  name: `Slip yoke, ${splineCount} splines ${diaIn} in, ${jointSeriesId} ears`,
  splineCount,
  majorDiameterMm: diaIn * IN,
  jointSeriesId,
  sealSurfaceLengthMm,
  minEngagementMm,
  massKg,
  priceCents,
  source: SLIP_YOKE_SOURCE,
}));
/**
 * Demo data: centre support bearings for two-piece shafts, one per joint series and steel tube OD the
 * series' weld yokes take. Each is a rubber-isolated ball bearing in a bracket, with the splined stub
 * that is welded to the front piece and the end yoke that slides on it (half of the centre joint).
 * Dimensions, masses and prices are invented, sized like the weld yokes of the same series.
 */
function buildCentreBearings(): CentreBearing[] {
  const out: CentreBearing[] = [];
  for (const series of defaultJointSeries) {
    const f = FITTING_SERIES[series.id]!;
    const code = series.id.slice(3);
    for (const odIn of f.odsIn) {
      out.push({
        id: `YL-CB-${code}-${Math.round(odIn * 1000)}`,
        name: `Centre bearing, stub and end yoke ${series.id}, ${odIn} in tube`,
        jointSeriesId: series.id,
        tubeOdMm: odIn * IN,
        weldFamily: "steel",
        jointCentreToWeldSeatMm: Math.round(f.seatMm * 2.2),
        massKg: Math.round((f.massKg * 2.1 + 0.9) * 100) / 100,
        priceCents: Math.round(f.priceCents * 3.4 + 4500),
        source: "demo data (invented part); use the bearing maker's sheet",
      });
    }
  }
  return out;
}

/** The built-in demonstration catalogue (demo: true). */
export const defaultCatalogue: Catalogue = {
  id: "yokeline-demo",
  name: "Yokeline demonstration catalogue (invented parts, typical dimensions)",
  demo: true,
  materials: defaultMaterials,
  tubes: buildTubes(),
  endFittings: buildFittings(),
  jointSeries: [
    ...defaultJointSeries.map((s) => seriesRow(s.id)),
    ...defaultGreaseableCrosses,
    ...defaultConversionCrosses,
    ...defaultDoubleCardanJoints,
  ],
  slipYokes: defaultSlipYokes,
  centreBearings: buildCentreBearings(),
};

/**
 * DEMO DATA — the built-in catalogue. Names, series and part numbers are invented by
 * Yokeline ("YL-" prefix) and belong to no maker; dimensions and ratings are typical of the
 * trade, prices are illustrative. A shop replaces this with its own catalogue.
 */
import { shearYieldFromTensileMPa } from "../torsion";
import { tubeMassKg } from "../section";
import type { Catalogue, CentreBearing, EndFitting, JointSeries, Material, TubeSize } from "./types";

const IN = 25.4;
const MATERIAL_SOURCE = "engineering reference §10, typical values (from memory); shop catalogue overrides";

export const defaultMaterials: readonly Material[] = [
  {
    id: "steel-dom",
    name: "Carbon steel DOM tube (1020 class, ASTM A513 Type 5 min.)",
    elasticModulusGPa: 200,
    densityKgM3: 7870,
    tensileYieldMPa: 379,
    shearYieldMPa: shearYieldFromTensileMPa(379),
    weldFamily: "steel",
    source: MATERIAL_SOURCE,
  },
  {
    id: "chromoly-4130",
    name: "Chromoly 4130, normalised",
    elasticModulusGPa: 205,
    densityKgM3: 7850,
    tensileYieldMPa: 435,
    shearYieldMPa: shearYieldFromTensileMPa(435),
    weldFamily: "steel",
    source: MATERIAL_SOURCE,
  },
  {
    id: "aluminium-6061-t6",
    name: "Aluminium 6061-T6",
    elasticModulusGPa: 68.9,
    densityKgM3: 2700,
    tensileYieldMPa: 276,
    shearYieldMPa: shearYieldFromTensileMPa(276),
    weldFamily: "aluminium",
    source: MATERIAL_SOURCE,
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

export const defaultJointSeries: readonly JointSeries[] = [
  {
    id: "YL-X28",
    name: "YL-X28 cross, 28 mm caps",
    torqueRatingNm: 1100,
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
    maxWorkingAngleDeg: 15,
    massKg: 2.3,
    priceCents: 24000,
    strapTorqueNm: 61,
    strapTorqueSource: DEMO_TORQUE,
  },
];

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
      out.push({
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
  jointSeries: defaultJointSeries,
  centreBearings: buildCentreBearings(),
};

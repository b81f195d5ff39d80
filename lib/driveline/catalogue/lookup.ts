/** Indexed access to a catalogue, cached per catalogue object (catalogues are immutable). */
import type { EndReport } from "../report";
import type {
  Catalogue,
  EndFitting,
  FlangePattern,
  JointSeries,
  Material,
  SlipYoke,
  TubeSize,
} from "./types";

export interface CatalogueIndex {
  readonly materials: ReadonlyMap<string, Material>;
  readonly tubes: ReadonlyMap<string, TubeSize>;
  readonly fittings: ReadonlyMap<string, EndFitting>;
  readonly series: ReadonlyMap<string, JointSeries>;
  readonly slipYokes: ReadonlyMap<string, SlipYoke>;
}

const cache = new WeakMap<Catalogue, CatalogueIndex>();

/** Maps by id for a catalogue; built once per catalogue object. */
export function indexCatalogue(catalogue: Catalogue): CatalogueIndex {
  let index = cache.get(catalogue);
  if (!index) {
    index = {
      materials: new Map(catalogue.materials.map((m) => [m.id, m])),
      tubes: new Map(catalogue.tubes.map((t) => [t.id, t])),
      fittings: new Map(catalogue.endFittings.map((f) => [f.id, f])),
      series: new Map(catalogue.jointSeries.map((s) => [s.id, s])),
      slipYokes: new Map((catalogue.slipYokes ?? []).map((y) => [y.id, y])),
    };
    cache.set(catalogue, index);
  }
  return index;
}

/** Weld seats take a tube within this of their nominal OD. */
export const OD_FIT_TOLERANCE_MM = 0.5;

/** Whether an end fitting's weld seat takes this tube. */
export function fittingFitsTube(f: EndFitting, odMm: number, weldFamily: string): boolean {
  return Math.abs(f.tubeOdMm - odMm) <= OD_FIT_TOLERANCE_MM && f.weldFamily === weldFamily;
}

/** Torque rating of the joint an end fitting carries: the lower of the fitting and its cross. */
export function fittingRatingNm(f: EndFitting, index: CatalogueIndex): number {
  const series = index.series.get(f.jointSeriesId);
  return series ? Math.min(series.torqueRatingNm, f.torqueRatingNm) : f.torqueRatingNm;
}

/**
 * The cheapest weld yoke (then any kind) that takes the tube and carries the torque, or
 * null when none does.
 */
export function suggestFitting(
  catalogue: Catalogue,
  index: CatalogueIndex,
  odMm: number,
  weldFamily: string,
  torqueNm: number,
): EndFitting | null {
  let best: EndFitting | null = null;
  for (const f of catalogue.endFittings) {
    if (!fittingFitsTube(f, odMm, weldFamily) || fittingRatingNm(f, index) < torqueNm) continue;
    const better =
      best === null ||
      (f.kind === "weld-yoke" && best.kind !== "weld-yoke") ||
      (f.kind === best.kind && f.priceCents < best.priceCents);
    if (better) best = f;
  }
  return best;
}

/*
 * Matching the vehicle's parts. The tolerances are Yokeline's defaults for figures a shop measures
 * with callipers (not published values): a measured size within them is taken as the catalogue size.
 */

/** A measured bearing-cap diameter within this of a series' caps is that size, mm. */
export const CAP_DIAMETER_TOLERANCE_MM = 0.3;
/** A measured span across the caps within this of a series' span is that span, mm. */
export const CAP_SPAN_TOLERANCE_MM = 0.8;
/** A measured spline major diameter within this of a slip yoke's is that spline, mm. */
export const SPLINE_DIAMETER_TOLERANCE_MM = 0.5;
/** Bolt circle and pilot within this of a flange yoke's pattern, mm. */
export const FLANGE_TOLERANCE_MM = 0.5;

/** The caps a vehicle's yoke takes: diameter, span across the caps and how they are held. */
export interface CapSize {
  readonly capDiameterMm?: number | null;
  readonly capSpanMm?: number | null;
  readonly retention?: JointSeries["retention"] | null;
}

/**
 * Whether two cap sizes are the same part: diameter and span within the measuring tolerances,
 * and a compatible retention when both say. False when either lacks the diameter or the span.
 */
export function sameCaps(a: CapSize, b: CapSize): boolean {
  if (a.capDiameterMm == null || b.capDiameterMm == null || a.capSpanMm == null || b.capSpanMm == null)
    return false;
  if (Math.abs(a.capDiameterMm - b.capDiameterMm) > CAP_DIAMETER_TOLERANCE_MM) return false;
  if (Math.abs(a.capSpanMm - b.capSpanMm) > CAP_SPAN_TOLERANCE_MM) return false;
  return retentionCompatible(a.retention, b.retention);
}

/**
 * Straps and U-bolts both clamp the caps into an open saddle and take the same caps; a round
 * bore takes caps held by snap rings (common shop practice). Unknown retention matches either.
 */
export function retentionCompatible(
  a: JointSeries["retention"] | null | undefined,
  b: JointSeries["retention"] | null | undefined,
): boolean {
  if (a == null || b == null || a === b) return true;
  return a !== "round" && b !== "round";
}

/** A single cross (not a double-Cardan joint). */
export const isCross = (s: JointSeries): boolean => (s.kind ?? "cross") === "cross";

/** Whether two series take the same caps (the same series, or rows with equal caps). */
export function seriesShareCaps(a: JointSeries, b: JointSeries): boolean {
  return a.id === b.id || sameCaps(a, b);
}

/**
 * The two sides of a cross: for a conversion cross its own caps and those of `otherSeriesId`;
 * for a plain cross its caps on both sides. Null when the other series is not in the catalogue.
 */
export function crossSides(s: JointSeries, index: CatalogueIndex): [JointSeries, JointSeries] | null {
  if (!s.otherSeriesId) return [s, s];
  const other = index.series.get(s.otherSeriesId);
  return other ? [s, other] : null;
}

/** Whether cross `c` joins a yoke taking `a`'s caps to one taking `b`'s (either way round). */
export function crossJoins(c: JointSeries, a: JointSeries, b: JointSeries, index: CatalogueIndex): boolean {
  if (!isCross(c)) return false;
  const sides = crossSides(c, index);
  if (!sides) return false;
  const [x, y] = sides;
  if (!c.otherSeriesId) return seriesShareCaps(c, a) && seriesShareCaps(c, b);
  // A conversion cross's own caps are `x`'s; `y` is the other series itself.
  const fits = (p: JointSeries, q: JointSeries) =>
    (p.id === x.id || sameCaps(x, p)) && (q.id === y.id || seriesShareCaps(y, q));
  return fits(a, b) || fits(b, a);
}

/** Single-cross series (not conversions) whose caps match what was measured on the vehicle. */
export function seriesByCaps(catalogue: Catalogue, caps: CapSize): JointSeries[] {
  return catalogue.jointSeries.filter((s) => isCross(s) && !s.otherSeriesId && sameCaps(s, caps));
}

/** Slip yokes for an output spline (count equal, major diameter within tolerance). */
export function slipYokesForSpline(
  catalogue: Catalogue,
  spline: { readonly splineCount: number; readonly majorDiameterMm: number },
): SlipYoke[] {
  return (catalogue.slipYokes ?? []).filter(
    (y) =>
      y.splineCount === spline.splineCount &&
      Math.abs(y.majorDiameterMm - spline.majorDiameterMm) <= SPLINE_DIAMETER_TOLERANCE_MM,
  );
}

/** Whether a flange yoke bolts to a companion flange: same bolt count, circle and pilot within tolerance. */
export function flangeMatches(a: FlangePattern | undefined | null, b: FlangePattern): boolean {
  return (
    a != null &&
    a.boltCount === b.boltCount &&
    Math.abs(a.boltCircleMm - b.boltCircleMm) <= FLANGE_TOLERANCE_MM &&
    Math.abs(a.pilotMm - b.pilotMm) <= FLANGE_TOLERANCE_MM
  );
}

/** An end fitting as the report lists it, with the joint rating its fitting and cross allow. */
export function endReport(f: EndFitting, origin: EndReport["origin"], index: CatalogueIndex): EndReport {
  return {
    fittingId: f.id,
    name: f.name,
    kind: f.kind,
    jointSeriesId: f.jointSeriesId,
    jointCentreToWeldSeatMm: f.jointCentreToWeldSeatMm,
    massKg: f.massKg,
    torqueRatingNm: fittingRatingNm(f, index),
    priceCents: f.priceCents,
    origin,
  };
}

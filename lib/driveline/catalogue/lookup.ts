/** Indexed access to a catalogue, cached per catalogue object (catalogues are immutable). */
import type { Catalogue, EndFitting, JointSeries, Material, TubeSize } from "./types";

export interface CatalogueIndex {
  readonly materials: ReadonlyMap<string, Material>;
  readonly tubes: ReadonlyMap<string, TubeSize>;
  readonly fittings: ReadonlyMap<string, EndFitting>;
  readonly series: ReadonlyMap<string, JointSeries>;
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

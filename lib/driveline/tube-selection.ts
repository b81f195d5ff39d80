/**
 * Rank the catalogue's tubes for a span, service speed and torque: every tube that passes
 * critical speed (at the longest span, with the use's limit), torsion in the parent metal and
 * in the weld-affected zone, and stock length, by mass and by cost; the rest with their reasons.
 */
import { defaultCatalogue } from "./catalogue/default";
import { fittingFitsTube, indexCatalogue, suggestFitting } from "./catalogue/lookup";
import type { Catalogue, EndFitting, TubeSize } from "./catalogue/types";
import { criticalSpeedRpm } from "./critical-speed";
import { tubeMassKg } from "./section";
import { defaultSettings, type Limit, type ShopSettings } from "./settings";
import { torsionShearStressMPa, weldZoneShearYieldMPa } from "./torsion";

export interface TubeCandidate {
  readonly tubeId: string;
  readonly materialId: string;
  readonly odMm: number;
  readonly wallMm: number;
  /** Length of tube bought and balanced (cut length when the end fittings are known), mm. */
  readonly tubeLengthMm: number;
  readonly massKg: number;
  readonly criticalSpeedRpm: number;
  readonly criticalSpeedRatio: number;
  /** How much faster the shaft could turn before reaching the critical-speed limit, %. */
  readonly speedHeadroomPct: number;
  readonly shearStressMPa: number;
  readonly torsionSafetyFactor: number;
  /** Weld-zone shear yield / shear stress; null when the material gives no weld-zone figure. */
  readonly weldZoneSafetyFactor: number | null;
  readonly priceCents: number;
  /** "warn" when the critical-speed ratio is in the warn band or the weld zone is not known. */
  readonly status: "pass" | "warn";
}

export interface RejectedTube {
  readonly tubeId: string;
  readonly materialId: string;
  readonly odMm: number;
  readonly wallMm: number;
  readonly criticalSpeedRatio: number;
  readonly torsionSafetyFactor: number;
  readonly weldZoneSafetyFactor: number | null;
  readonly reasons: readonly string[];
}

export interface TubeSelection {
  readonly spanMm: number;
  /** Passing tubes, lightest first. */
  readonly byMass: readonly TubeCandidate[];
  /** Passing tubes, cheapest first. */
  readonly byCost: readonly TubeCandidate[];
  readonly rejected: readonly RejectedTube[];
  /** True when at least one tube passes critical speed at this span (whatever else fails). */
  readonly anyPassesCriticalSpeed: boolean;
  /** The tube with the lowest critical-speed ratio among those that pass torsion (fallback pick). */
  readonly stiffest: TubeCandidate | null;
}

export interface RankTubesInput {
  /** The critical-speed span, mm: joint centre to joint centre at the longest (full droop for a slip shaft). */
  readonly spanMm: number;
  /** Tube length to buy; default spanMm minus the end allowance. */
  readonly tubeLengthMm?: number;
  readonly maxShaftRpm: number;
  readonly peakShaftTorqueNm: number;
  /** End fittings fixed by the design: a tube must fit both. */
  readonly fittings?: readonly (EndFitting | null)[];
  readonly catalogue?: Catalogue;
  readonly settings?: ShopSettings;
  /** The use's critical-speed ratio limit and warn threshold (default the street ones). */
  readonly criticalSpeedRatioLimit?: Limit;
  readonly warnCriticalSpeedRatio?: number;
}

const round1 = (x: number): string => x.toFixed(1);

/**
 * Rank every catalogue tube for the given duty. Pure; ~60 tubes take well under a
 * millisecond.
 */
export function rankTubes(input: RankTubesInput): TubeSelection {
  const catalogue = input.catalogue ?? defaultCatalogue;
  const settings = input.settings ?? defaultSettings;
  const index = indexCatalogue(catalogue);
  const ratioLimit = input.criticalSpeedRatioLimit ?? settings.maxCriticalSpeedRatio;
  const maxRatio = ratioLimit.value;
  const warnRatio = input.warnCriticalSpeedRatio ?? settings.warnCriticalSpeedRatio.value;
  const minSf = settings.minTorsionSafetyFactor.value;
  const minWeldSf = settings.minWeldZoneSafetyFactor.value;
  const fixedFittings = (input.fittings ?? []).filter((f): f is EndFitting => f != null);
  const passing: TubeCandidate[] = [];
  const rejected: RejectedTube[] = [];
  let anyPassesCriticalSpeed = false;
  let stiffest: TubeCandidate | null = null;

  for (const tube of catalogue.tubes) {
    const material = index.materials.get(tube.materialId);
    if (!material) {
      rejected.push(reject(tube, NaN, NaN, null, [`material "${tube.materialId}" is not in the catalogue`]));
      continue;
    }
    const tubeLengthMm = input.tubeLengthMm ?? input.spanMm;
    const nc = criticalSpeedRpm({
      ...tube,
      spanMm: input.spanMm,
      elasticModulusGPa: material.elasticModulusGPa,
      densityKgM3: material.densityKgM3,
    });
    const ratio = input.maxShaftRpm / nc;
    const shear = torsionShearStressMPa(tube, input.peakShaftTorqueNm);
    const sf = material.shearYieldMPa / shear;
    const weldYield = weldZoneShearYieldMPa(material);
    const weldSf = weldYield !== null ? weldYield / shear : null;
    const reasons: string[] = [];
    if (ratio > maxRatio) {
      reasons.push(`critical-speed ratio ${ratio.toFixed(3)} above ${maxRatio} (${ratioLimit.source})`);
    } else anyPassesCriticalSpeed = true;
    if (sf < minSf)
      reasons.push(
        `torsion safety factor ${sf.toFixed(2)} below ${minSf} (${settings.minTorsionSafetyFactor.source})`,
      );
    if (weldSf !== null && weldSf < minWeldSf)
      reasons.push(
        `weld-zone torsion safety factor ${weldSf.toFixed(2)} below ${minWeldSf} (${settings.minWeldZoneSafetyFactor.source})`,
      );
    if (tubeLengthMm > tube.maxLengthMm)
      reasons.push(`needs ${round1(tubeLengthMm)} mm, stock is ${round1(tube.maxLengthMm)} mm`);
    for (const f of fixedFittings) {
      if (!fittingFitsTube(f, tube.odMm, material.weldFamily)) {
        reasons.push(`does not fit end fitting ${f.id} (takes ${round1(f.tubeOdMm)} mm OD, ${f.weldFamily})`);
      }
    }
    if (
      fixedFittings.length === 0 &&
      !suggestFitting(catalogue, index, tube.odMm, material.weldFamily, input.peakShaftTorqueNm)
    ) {
      reasons.push(
        `no end fitting in the catalogue takes this tube at ${Math.round(input.peakShaftTorqueNm)} N·m`,
      );
    }
    const candidate: TubeCandidate = {
      tubeId: tube.id,
      materialId: tube.materialId,
      odMm: tube.odMm,
      wallMm: tube.wallMm,
      tubeLengthMm,
      massKg: tubeMassKg(tube, tubeLengthMm, material.densityKgM3),
      criticalSpeedRpm: nc,
      criticalSpeedRatio: ratio,
      speedHeadroomPct: ((nc * maxRatio) / input.maxShaftRpm - 1) * 100,
      shearStressMPa: shear,
      torsionSafetyFactor: sf,
      weldZoneSafetyFactor: weldSf,
      priceCents: Math.round((tube.pricePerMetreCents * tubeLengthMm) / 1000),
      status: ratio > warnRatio || weldSf === null ? "warn" : "pass",
    };
    const strongEnough = sf >= minSf && (weldSf === null || weldSf >= minWeldSf);
    if (strongEnough && (stiffest === null || ratio < stiffest.criticalSpeedRatio)) stiffest = candidate;
    if (reasons.length) rejected.push(reject(tube, ratio, sf, weldSf, reasons));
    else passing.push(candidate);
  }
  const byMass = [...passing].sort((a, b) => a.massKg - b.massKg || a.priceCents - b.priceCents);
  const byCost = [...passing].sort((a, b) => a.priceCents - b.priceCents || a.massKg - b.massKg);
  return { spanMm: input.spanMm, byMass, byCost, rejected, anyPassesCriticalSpeed, stiffest };
}

function reject(
  tube: TubeSize,
  ratio: number,
  sf: number,
  weldSf: number | null,
  reasons: string[],
): RejectedTube {
  return {
    tubeId: tube.id,
    materialId: tube.materialId,
    odMm: tube.odMm,
    wallMm: tube.wallMm,
    criticalSpeedRatio: ratio,
    torsionSafetyFactor: sf,
    weldZoneSafetyFactor: weldSf,
    reasons,
  };
}

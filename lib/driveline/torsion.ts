/**
 * Torsion of a hollow circular tube: τ = 16·T·D / (π·(D⁴ − d⁴)) at the outer fibre
 * (Roark, Formulas for Stress and Strain; Shigley, Mechanical Engineering Design).
 */
import type { TubeSection } from "./section";

/** Peak shear stress (MPa) for torque T (N·m). N·mm / mm³ = MPa. */
export function torsionShearStressMPa(tube: TubeSection, torqueNm: number): number {
  const d = tube.odMm - 2 * tube.wallMm;
  return (16 * torqueNm * 1000 * tube.odMm) / (Math.PI * (tube.odMm ** 4 - d ** 4));
}

/** Shear yield from tensile yield by von Mises: τ_y = S_y/√3 (Shigley). */
export const shearYieldFromTensileMPa = (tensileYieldMPa: number): number => tensileYieldMPa / Math.sqrt(3);

/** Torque (N·m) at which the outer fibre reaches the given shear stress (MPa). */
export function torqueAtShearStressNm(tube: TubeSection, shearMPa: number): number {
  return shearMPa / torsionShearStressMPa(tube, 1);
}

/**
 * Shear yield of a material's weld-affected zone (τ = S_y,weld/√3, von Mises), or null when the
 * catalogue gives no weld-zone figure for it.
 */
export function weldZoneShearYieldMPa(m: {
  readonly weldZoneTensileYieldMPa?: number | null;
}): number | null {
  return m.weldZoneTensileYieldMPa != null ? shearYieldFromTensileMPa(m.weldZoneTensileYieldMPa) : null;
}

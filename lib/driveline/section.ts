/** Hollow circular tube section properties (mm in, SI out where named). */

export interface TubeSection {
  readonly odMm: number;
  readonly wallMm: number;
}

/** Inside diameter d = D − 2t (mm). */
export const insideDiameterMm = (t: TubeSection): number => t.odMm - 2 * t.wallMm;

/** Cross-section area A = π(D² − d²)/4 (mm²). */
export function areaMm2(t: TubeSection): number {
  const d = insideDiameterMm(t);
  return (Math.PI * (t.odMm * t.odMm - d * d)) / 4;
}

/** Second moment of area I = π(D⁴ − d⁴)/64 (mm⁴). */
export function secondMomentMm4(t: TubeSection): number {
  const d = insideDiameterMm(t);
  return (Math.PI * (t.odMm ** 4 - d ** 4)) / 64;
}

/** Tube mass (kg) of a length (mm) at density ρ (kg/m³). */
export function tubeMassKg(t: TubeSection, lengthMm: number, densityKgM3: number): number {
  return areaMm2(t) * 1e-6 * (lengthMm * 1e-3) * densityKgM3;
}

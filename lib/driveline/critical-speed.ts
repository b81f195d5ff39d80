/**
 * First bending (whirling) critical speed of a uniform hollow tube, simply supported at the
 * joint centres (Euler–Bernoulli; Blevins, Formulas for Natural Frequency and Mode Shape,
 * λ₁ = π): ω₁ = (π/L)²·√(E·I/(ρ·A)), n_c = 30·ω₁/π.
 */
import type { TubeSection } from "./section";

export interface CriticalSpeedInput extends TubeSection {
  readonly spanMm: number;
  readonly elasticModulusGPa: number;
  readonly densityKgM3: number;
}

/** First critical speed (rpm). Uses I/A = (D² + d²)/16 so no large powers are formed. */
export function criticalSpeedRpm(input: CriticalSpeedInput): number {
  const dOut = input.odMm * 1e-3;
  const dIn = (input.odMm - 2 * input.wallMm) * 1e-3;
  const span = input.spanMm * 1e-3;
  const iOverA = (dOut * dOut + dIn * dIn) / 16; // m²
  const omega =
    (Math.PI / span) ** 2 * Math.sqrt((input.elasticModulusGPa * 1e9 * iOverA) / input.densityKgM3);
  return (30 * omega) / Math.PI;
}

/** Longest span (mm) whose critical speed equals `rpm` — n_c falls with L². */
export function spanForCriticalSpeedMm(input: Omit<CriticalSpeedInput, "spanMm">, rpm: number): number {
  const atOneMetre = criticalSpeedRpm({ ...input, spanMm: 1000 });
  return 1000 * Math.sqrt(atOneMetre / rpm);
}

/**
 * Machinery's Handbook cross-check form for steel tubes, inches:
 * n_c ≈ 4.76·10⁶·√(D² + d²)/L².
 */
export function criticalSpeedHandbookRpm(odIn: number, idIn: number, spanIn: number): number {
  return (4.76e6 * Math.sqrt(odIn * odIn + idIn * idIn)) / (spanIn * spanIn);
}

/**
 * The span checked for whirl: the longest the shaft gets. A slip shaft is longest at full droop
 * (lengthMm + slip.droopExtensionMm); otherwise the installed length.
 */
export function criticalSpeedLengthMm(
  lengthMm: number,
  slip?: { readonly droopExtensionMm?: number | null } | null,
): number {
  return lengthMm + (slip?.droopExtensionMm ?? 0);
}

/**
 * One Cardan (Hooke's) joint, exact. θ is the input rotation, zero when the input yoke's
 * cross-arm lies in the plane of the two shafts; β is the working angle. Radians throughout.
 * Sources: Shigley & Uicker, Theory of Machines and Mechanisms; Rattan, Theory of Machines.
 */

/** Output rotation φ for input θ: tan φ = tan θ / cos β, continuous across quadrants. */
export function cardanOutputAngleRad(inputRad: number, betaRad: number): number {
  // atan2 of (sin θ, cos θ·cos β) is tan φ = tan θ / cos β on the right branch; add whole
  // turns so φ tracks θ instead of wrapping.
  const principal = Math.atan2(Math.sin(inputRad), Math.cos(inputRad) * Math.cos(betaRad));
  const turns = Math.round((inputRad - principal) / (2 * Math.PI));
  return principal + turns * 2 * Math.PI;
}

/** ω_out/ω_in = cos β / (1 − sin²β·cos²θ). */
export function cardanSpeedRatio(inputRad: number, betaRad: number): number {
  const s = Math.sin(betaRad);
  const c = Math.cos(inputRad);
  return Math.cos(betaRad) / (1 - s * s * c * c);
}

/** d(ω_out/ω_in)/dθ; times ω² it is the output's angular acceleration at constant input speed. */
export function cardanSpeedRatioDerivative(inputRad: number, betaRad: number): number {
  const s2 = Math.sin(betaRad) ** 2;
  const c = Math.cos(inputRad);
  const den = 1 - s2 * c * c;
  return (-Math.cos(betaRad) * s2 * Math.sin(2 * inputRad)) / (den * den);
}

/** Output angular acceleration (rad/s²) at constant input speed ω (rad/s). */
export function cardanAngularAccelerationRadS2(inputRad: number, betaRad: number, omegaRadS: number): number {
  return omegaRadS * omegaRadS * cardanSpeedRatioDerivative(inputRad, betaRad);
}

/** Extremes over one turn: max 1/cos β at θ = 0°, 180°; min cos β at 90°, 270°. */
export function cardanSpeedRatioExtremes(betaRad: number): { max: number; min: number; peakToPeak: number } {
  const c = Math.cos(betaRad);
  return { max: 1 / c, min: c, peakToPeak: Math.tan(betaRad) * Math.sin(betaRad) };
}

/**
 * Input angle (rad, in [0, π/4]) where |dr/dθ| peaks. Setting the derivative of
 * sin2θ/(1 − s²cos²θ)² to zero gives, with c = cos 2θ: (s²/2)c² + (1 − s²/2)c − s² = 0.
 */
export function cardanPeakAccelerationInputRad(betaRad: number): number {
  const s2 = Math.sin(betaRad) ** 2;
  if (s2 < 1e-14) return Math.PI / 4;
  const b = 1 - s2 / 2;
  const c2 = (-b + Math.sqrt(b * b + 2 * s2 * s2)) / s2;
  return Math.acos(Math.min(1, c2)) / 2;
}

/** Exact peak |α| (rad/s²) of the output over one turn at constant input speed ω. */
export function cardanPeakAngularAccelerationRadS2(betaRad: number, omegaRadS: number): number {
  const theta = cardanPeakAccelerationInputRad(betaRad);
  return Math.abs(cardanAngularAccelerationRadS2(theta, betaRad, omegaRadS));
}

/** Largest lead or lag of the output over the input (rad): max |φ − θ| = atan((1 − cos β)/(2√cos β)). */
export function cardanMaxAngularDeviationRad(betaRad: number): number {
  // Deviation peaks where tan θ = √cos β; then tan(φ − θ) = (1 − cos β)/(2√cos β).
  const c = Math.cos(betaRad);
  return Math.atan((1 - c) / (2 * Math.sqrt(c)));
}

/**
 * The single-joint angle (rad) whose peak-to-peak speed variation tan β·sin β equals the given
 * variation (a fraction, not %). Exact: with c = cos β, (1 − c²)/c = V → c² + Vc − 1 = 0.
 */
export function equivalentAngleRad(peakToPeakVariation: number): number {
  const v = Math.max(0, peakToPeakVariation);
  // Rationalised root (no cancellation), then atan2(sin, cos) with sin² = V·c, exact near 0.
  const c = 2 / (v + Math.sqrt(v * v + 4));
  return Math.atan2(Math.sqrt(v * c), c);
}

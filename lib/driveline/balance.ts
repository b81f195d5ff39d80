/**
 * Permissible residual unbalance, ISO 21940-11 (formerly ISO 1940-1), rigid rotors:
 * U_per [g·mm] = 1000·G [mm/s]·m [kg] / Ω [rad/s].
 */

/** Total permissible residual unbalance (g·mm). */
export function permissibleUnbalanceGmm(gradeMmS: number, rotorMassKg: number, speedRpm: number): number {
  const omega = (speedRpm * Math.PI) / 30;
  return (1000 * gradeMmS * rotorMassKg) / omega;
}

/**
 * Split over two correction planes at distances aMm, bMm from the centre of mass:
 * U_A = U·L_B/L, U_B = U·L_A/L. A symmetric rotor (a = b) gets half each.
 */
export function unbalancePerPlaneGmm(totalGmm: number, aMm = 1, bMm = 1): { planeA: number; planeB: number } {
  const span = aMm + bMm;
  return { planeA: (totalGmm * bMm) / span, planeB: (totalGmm * aMm) / span };
}

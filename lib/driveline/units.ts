/**
 * Exact unit conversions for the edges of the engineering core (screens, CLI).
 * The core itself works in SI: mm, N·m, rpm, kg, MPa; radians inside, degrees in the contract.
 */

/** 1 in = 25.4 mm exactly (international inch, 1959). */
export const MM_PER_INCH = 25.4;
/** 1 lbf·ft in N·m: 0.45359237 kg × 9.80665 m/s² × 0.3048 m (exact by definition). */
export const NM_PER_LBFT = 1.3558179483314004;
/** 1 mile = 1.609344 km exactly. */
export const KMH_PER_MPH = 1.609344;
/** 1 psi in MPa: 1 lbf / in² = 4.4482216152605 N / 645.16 mm² (exact by definition). */
export const MPA_PER_PSI = 0.006894757293168361;
/** 1 lb = 0.45359237 kg exactly. */
export const KG_PER_LB = 0.45359237;
/** 1 lb/in³ in kg/m³. */
export const KGM3_PER_LBIN3 = KG_PER_LB / (0.0254 * 0.0254 * 0.0254);

const RAD_PER_DEG = Math.PI / 180;

export const inToMm = (inches: number): number => inches * MM_PER_INCH;
export const mmToIn = (mm: number): number => mm / MM_PER_INCH;
export const lbftToNm = (lbft: number): number => lbft * NM_PER_LBFT;
export const nmToLbft = (nm: number): number => nm / NM_PER_LBFT;
export const mphToKmh = (mph: number): number => mph * KMH_PER_MPH;
export const kmhToMph = (kmh: number): number => kmh / KMH_PER_MPH;
export const psiToMpa = (psi: number): number => psi * MPA_PER_PSI;
export const mpaToPsi = (mpa: number): number => mpa / MPA_PER_PSI;
export const lbToKg = (lb: number): number => lb * KG_PER_LB;
export const kgToLb = (kg: number): number => kg / KG_PER_LB;
export const degToRad = (deg: number): number => deg * RAD_PER_DEG;
export const radToDeg = (rad: number): number => rad / RAD_PER_DEG;

/** A pair of conversions between a customary unit and its SI counterpart. */
export interface UnitConversion {
  readonly customary: string;
  readonly si: string;
  readonly toSi: (value: number) => number;
  readonly fromSi: (value: number) => number;
}

/** The conversions the screens offer, keyed by quantity. */
export const UNIT_CONVERSIONS = {
  length: { customary: "in", si: "mm", toSi: inToMm, fromSi: mmToIn },
  torque: { customary: "lb·ft", si: "N·m", toSi: lbftToNm, fromSi: nmToLbft },
  speed: { customary: "mph", si: "km/h", toSi: mphToKmh, fromSi: kmhToMph },
  stress: { customary: "psi", si: "MPa", toSi: psiToMpa, fromSi: mpaToPsi },
  mass: { customary: "lb", si: "kg", toSi: lbToKg, fromSi: kgToLb },
  angle: { customary: "deg", si: "rad", toSi: degToRad, fromSi: radToDeg },
} as const satisfies Record<string, UnitConversion>;

export type Quantity = keyof typeof UNIT_CONVERSIONS;

/** Customary → SI → customary; returns the value after the round trip (for display checks). */
export function roundTripCustomary(quantity: Quantity, value: number): number {
  const c = UNIT_CONVERSIONS[quantity];
  return c.fromSi(c.toSi(value));
}

/** SI → customary → SI; returns the value after the round trip. */
export function roundTripSi(quantity: Quantity, value: number): number {
  const c = UNIT_CONVERSIONS[quantity];
  return c.toSi(c.fromSi(value));
}

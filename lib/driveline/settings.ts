/**
 * Shop settings: every limit the checks apply, with its default and where that default comes
 * from. A shop may tighten any of them; the report prints the limit used and its source.
 */

/** A limit and the source printed beside it. */
export interface Limit {
  readonly value: number;
  readonly source: string;
}

const SHOP = "common shop practice";

/** Default limits (see the engineering reference, sections 4–9). */
export const defaultSettings = {
  minWorkingAngleDeg: { value: 0.5, source: `${SHOP} (needle bearings brinell below it)` },
  maxAngleDifferenceDeg: { value: 1.0, source: `${SHOP} (road shafts)` },
  maxJointAngularAccelerationRadS2: {
    value: 1000,
    source: "commonly quoted passenger-car limit per joint (from memory; no public source found)",
  },
  /** Fraction of the acceleration limit above which the check warns. */
  accelerationWarnFraction: { value: 0.9, source: "Yokeline default warn band" },
  maxEquivalentAngleDeg: { value: 3.0, source: `${SHOP} (road shafts run 1°–3°)` },
  maxCriticalSpeedRatio: { value: 0.75, source: `${SHOP} (no standard gives a number)` },
  warnCriticalSpeedRatio: { value: 0.7, source: "Yokeline default warn band below the 0.75 limit" },
  minTorsionSafetyFactor: { value: 1.5, source: `${SHOP} (on shear yield, von Mises per Shigley)` },
  balanceGradeMmS: { value: 16, source: "ISO 21940-11:2016 Table 1, drive shafts G 16" },
  slipOutMinMm: { value: 19.05, source: `${SHOP} (3/4 in out from fully collapsed at ride height)` },
  slipOutMaxMm: { value: 25.4, source: `${SHOP} (1 in out from fully collapsed at ride height)` },
  slipMinReserveMm: { value: 12.7, source: `${SHOP} (1/2 in spline engagement kept at full droop)` },
  /** Ground seal surface of the slip yoke left inside the tail bushing at full droop (slip-seal). */
  slipSealMinInBushingMm: {
    value: 25.4,
    source: `${SHOP}, from memory (about 1 in of the slip yoke's seal surface kept in the tail bushing and seal at full droop)`,
  },
  /** Largest axle-end working angle behind a double-Cardan front joint (double-cardan.rear-angle). */
  doubleCardanMaxRearAngleDeg: {
    value: 1.0,
    source: `${SHOP} (with a double-Cardan front joint the pinion points at the shaft: about 0.5–1° at the axle joint)`,
  },
  lengthToleranceMm: { value: 1.6, source: `${SHOP} (±1/16 in joint centre to joint centre after welding)` },
  runoutEndsMm: { value: 0.25, source: `${SHOP} (0.010 in TIR near each end)` },
  runoutCentreMm: { value: 0.38, source: `${SHOP} (0.015 in TIR at the centre)` },
  phasingToleranceDeg: { value: 1.0, source: `${SHOP} (rear yoke within ±1° of the index)` },
  centreJointAngleDeg: { value: 1.0, source: `${SHOP} (centre-bearing joint kept off zero)` },
} as const satisfies Record<string, Limit>;

export type SettingKey = keyof typeof defaultSettings;
export type ShopSettings = { readonly [K in SettingKey]: Limit };

/**
 * Defaults overlaid with a shop's overrides. A bare number keeps the key but its source
 * becomes "shop setting"; an object may name its own source.
 */
export function resolveSettings(
  overrides?: Partial<Record<SettingKey, number | Limit>> | null,
): ShopSettings {
  if (!overrides) return defaultSettings;
  const out: Record<string, Limit> = { ...defaultSettings };
  for (const [key, v] of Object.entries(overrides)) {
    if (v == null || !(key in defaultSettings)) continue;
    out[key] = typeof v === "number" ? { value: v, source: "shop setting" } : v;
  }
  return out as ShopSettings;
}

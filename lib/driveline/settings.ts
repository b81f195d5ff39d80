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
  // Loads per use (design-file.md Additions): the design torque is multiplied by the use's factor.
  serviceFactorStreet: {
    value: 1.0,
    source: "Yokeline default: the design torque already is the worst-case launch",
  },
  serviceFactorTowing: {
    value: 1.25,
    source: "from memory (no published source found): sustained heavy pulls and trailer snatch",
  },
  serviceFactorOffRoad: {
    value: 1.5,
    source:
      "from memory (no published source found): wheel hop and wheels regaining grip after leaving the ground",
  },
  serviceFactorRace: {
    value: 2.0,
    source:
      "from memory (no published source found): a dropped clutch on a sticky tyre can about double the launch torque",
  },
  serviceFactorIndustrial: {
    value: 1.5,
    source:
      "from memory: industrial cardan-shaft makers' selection tables put moderate-shock machinery near 1.5; use the machine's own factor",
  },
  // Tyre–road adhesion for the wheel-slip torque when the design gives none.
  adhesionStreet: {
    value: 0.85,
    source:
      "from memory: peak tyre–road coefficient on dry asphalt 0.8–0.9 (vehicle dynamics texts, e.g. Gillespie)",
  },
  adhesionTowing: { value: 0.85, source: "from memory: road tyres on dry asphalt, as street" },
  adhesionOffRoad: {
    value: 1.0,
    source: "from memory (no published source found): soft off-road tyres on rock can reach 1.0 and more",
  },
  adhesionRace: {
    value: 1.5,
    source: "from memory (no published source found): racing slicks on a prepared surface, 1.3–1.8",
  },
  adhesionIndustrial: { value: 0.85, source: "from memory: road tyres on dry asphalt, as street" },
  // Critical-speed ratio per use; street is `maxCriticalSpeedRatio` above.
  maxCriticalSpeedRatioTowing: { value: 0.75, source: `${SHOP} (road shafts; no standard gives a number)` },
  maxCriticalSpeedRatioOffRoad: { value: 0.75, source: `${SHOP} (road shafts; no standard gives a number)` },
  maxCriticalSpeedRatioRace: {
    value: 0.7,
    source:
      "Yokeline default (from memory, no published source): sustained running at top speed, more margin",
  },
  maxCriticalSpeedRatioIndustrial: {
    value: 0.7,
    source:
      "from memory: machinery practice keeps running speeds 20–30 % clear of a critical speed (e.g. API 684 separation margins)",
  },
  /** Torsion at the weld-affected zone: the zone must not yield at the design torque. */
  minWeldZoneSafetyFactor: {
    value: 1.0,
    source:
      "Yokeline default: no yield at the design (limit) torque on the weld zone's minimum yield, as airworthiness rules ask of limit loads (14 CFR 25.305(a), from memory); the parent metal keeps its own factor",
  },
} as const satisfies Record<string, Limit>;

export type SettingKey = keyof typeof defaultSettings;
export type ShopSettings = { readonly [K in SettingKey]: Limit };

/** What the shaft is used for (the design file's `use`; default street). */
export type ShaftUse = "street" | "towing" | "off-road" | "race" | "industrial";

/** Each use's setting keys: service factor, default adhesion, critical-speed ratio limit. */
const USE_KEYS: Record<ShaftUse, { factor: SettingKey; adhesion: SettingKey; criticalRatio: SettingKey }> = {
  street: {
    factor: "serviceFactorStreet",
    adhesion: "adhesionStreet",
    criticalRatio: "maxCriticalSpeedRatio",
  },
  towing: {
    factor: "serviceFactorTowing",
    adhesion: "adhesionTowing",
    criticalRatio: "maxCriticalSpeedRatioTowing",
  },
  "off-road": {
    factor: "serviceFactorOffRoad",
    adhesion: "adhesionOffRoad",
    criticalRatio: "maxCriticalSpeedRatioOffRoad",
  },
  race: { factor: "serviceFactorRace", adhesion: "adhesionRace", criticalRatio: "maxCriticalSpeedRatioRace" },
  industrial: {
    factor: "serviceFactorIndustrial",
    adhesion: "adhesionIndustrial",
    criticalRatio: "maxCriticalSpeedRatioIndustrial",
  },
};

/** The shop's service factor for a use. */
export const serviceFactorFor = (use: ShaftUse, settings: ShopSettings): Limit =>
  settings[USE_KEYS[use].factor];

/** The shop's default tyre–road adhesion for a use. */
export const adhesionFor = (use: ShaftUse, settings: ShopSettings): Limit => settings[USE_KEYS[use].adhesion];

/** The largest service / critical speed ratio for a use (street: `maxCriticalSpeedRatio`). */
export const criticalSpeedRatioLimitFor = (use: ShaftUse, settings: ShopSettings): Limit =>
  settings[USE_KEYS[use].criticalRatio];

/**
 * The warn threshold below a use's critical-speed limit: the shop's warn band scaled with the
 * limit (street: `warnCriticalSpeedRatio` itself).
 */
export function criticalSpeedWarnFor(use: ShaftUse, settings: ShopSettings): Limit {
  const limit = criticalSpeedRatioLimitFor(use, settings);
  const w = settings.warnCriticalSpeedRatio;
  if (use === "street") return w;
  const value = (w.value / settings.maxCriticalSpeedRatio.value) * limit.value;
  return { value, source: `${w.source}, scaled to the ${use} limit` };
}

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

/**
 * The slip joint: where the slip yoke sits on the output spline at ride height, full droop and
 * full bump, the spline engagement left, and the seal surface left in the tail bushing.
 *
 * Geometry (lengths along the output shaft, mm; "out" = how far the yoke has slid rearward from
 * fully collapsed, i.e. installed length − collapsed length, plus the droop extension):
 * - Spline engagement left at full droop = slip travel − out at full droop. The least allowed is
 *   the slip yoke's `minEngagementMm` from the catalogue when the yoke is known, else the shop's
 *   `slipMinReserveMm`.
 * - The slip yoke's barrel carries a ground seal surface of length `sealSurfaceLengthMm`, which
 *   runs in the transmission's tail bushing and under its seal lip. Fully collapsed, a length
 *   `slip.sealOutsideCollapsedMm` of it already stands outside the seal (default 0); every mm the
 *   yoke slides out draws one more mm out. Seal surface left in the bushing at full droop =
 *   sealSurfaceLengthMm − sealOutsideCollapsedMm − out at full droop, at least the shop's
 *   `slipSealMinInBushingMm` (check `slip-seal`): below it the yoke leaves the seal (leaks) and
 *   loses the bushing's support (whips).
 */
import type { CatalogueIndex } from "./catalogue/lookup";
import { seriesShareCaps, slipYokesForSpline } from "./catalogue/lookup";
import type { Catalogue, JointSeries, SlipYoke } from "./catalogue/types";
import { checkAtLeast, checkOf, fmt, type Check } from "./checks";
import type { SlipReport, SlipYokeSummary } from "./report";
import type { DesignFile } from "./schema";
import type { Limit, ShopSettings } from "./settings";

function summary(y: SlipYoke, origin: SlipYokeSummary["origin"]): SlipYokeSummary {
  return {
    id: y.id,
    name: y.name,
    splineCount: y.splineCount,
    majorDiameterMm: y.majorDiameterMm,
    jointSeriesId: y.jointSeriesId,
    sealSurfaceLengthMm: y.sealSurfaceLengthMm,
    minEngagementMm: y.minEngagementMm,
    massKg: y.massKg,
    priceCents: y.priceCents,
    source: y.source,
    origin,
  };
}

/** The slip yoke a design uses, and why; `unknownId` when it names one the catalogue lacks. */
export interface SlipYokeChoice {
  readonly yoke: SlipYokeSummary | null;
  /** Every catalogue slip yoke that fits the output spline (when the design gives it). */
  readonly candidates: readonly string[];
  readonly unknownId: string | null;
}

/**
 * The named slip yoke (`slip.slipYokeId`), else one matched to `interface.transmissionOutput`:
 * among the yokes whose spline fits, one whose ears take the front fitting's caps (no conversion
 * cross needed), then one whose joint carries the torque, then the cheapest.
 */
export function resolveSlipYoke(
  design: DesignFile,
  catalogue: Catalogue,
  index: CatalogueIndex,
  frontSeries: JointSeries | null,
  torqueNm: number,
): SlipYokeChoice {
  const named = design.slip?.slipYokeId;
  const output = design.interface?.transmissionOutput;
  const candidates = output ? slipYokesForSpline(catalogue, output) : [];
  const ids = candidates.map((y) => y.id);
  if (named != null) {
    const y = index.slipYokes.get(named);
    return { yoke: y ? summary(y, "design") : null, candidates: ids, unknownId: y ? null : named };
  }
  if (candidates.length === 0) return { yoke: null, candidates: ids, unknownId: null };
  const score = (y: SlipYoke): number[] => {
    const series = index.series.get(y.jointSeriesId);
    return [
      frontSeries && series && seriesShareCaps(series, frontSeries) ? 0 : 1,
      series && series.torqueRatingNm >= torqueNm ? 0 : 1,
      y.priceCents,
    ];
  };
  const best = [...candidates].sort((a, b) => {
    const sa = score(a);
    const sb = score(b);
    for (let i = 0; i < sa.length; i++) if (sa[i] !== sb[i]) return sa[i]! - sb[i]!;
    return a.id.localeCompare(b.id);
  })[0]!;
  return { yoke: summary(best, "matched"), candidates: ids, unknownId: null };
}

/** The least spline engagement at full droop: the slip yoke's when known, else the shop's. */
export function minEngagementLimit(yoke: SlipYokeSummary | null, settings: ShopSettings): Limit {
  if (!yoke) return settings.slipMinReserveMm;
  return {
    value: yoke.minEngagementMm,
    source: `slip yoke ${yoke.id}'s least engagement in the shop catalogue (${yoke.source})`,
  };
}

/** Positions of the slip yoke (design.slip must be given). */
export function slipReport(
  design: DesignFile,
  settings: ShopSettings,
  yoke: SlipYokeSummary | null = null,
): SlipReport {
  const s = design.slip!;
  const out = design.lengthMm - s.collapsedLengthMm;
  const droop = s.droopExtensionMm ?? 0;
  const bump = s.bumpCompressionMm ?? 0;
  const outsideCollapsed = s.sealOutsideCollapsedMm ?? 0;
  const limit = minEngagementLimit(yoke, settings);
  return {
    outAtRideHeightMm: out,
    outAtFullDroopMm: out + droop,
    outAtFullBumpMm: out - bump,
    reserveAtFullDroopMm: s.travelMm - (out + droop),
    recommendedOutMinMm: settings.slipOutMinMm.value,
    recommendedOutMaxMm: settings.slipOutMaxMm.value,
    slipYokeId: yoke?.id ?? null,
    slipYoke: yoke,
    minEngagementMm: limit.value,
    minEngagementSource: limit.source,
    sealOutsideCollapsedMm: outsideCollapsed,
    sealLeftInBushingMm: yoke ? yoke.sealSurfaceLengthMm - outsideCollapsed - (out + droop) : null,
  };
}

/** slip-position, slip-bump, slip-reserve (the yoke's least engagement when known) and slip-seal. */
export function slipChecks(slip: SlipReport, settings: ShopSettings): Check[] {
  const lo = settings.slipOutMinMm;
  const hi = settings.slipOutMaxMm;
  const out = slip.outAtRideHeightMm;
  const inBand = out >= lo.value && out <= hi.value;
  const src = `${lo.source}; ${hi.source}`;
  const yoke = slip.slipYoke ?? null;
  const checks = [
    checkOf(
      "slip-position",
      inBand ? "pass" : "warn",
      `Slip yoke ${fmt(out, 1)} mm out from fully collapsed at ride height; recommended ${fmt(lo.value, 1)}–${fmt(hi.value, 1)} mm — ${src}`,
      src,
      out,
      lo.value,
    ),
    checkAtLeast({
      id: "slip-bump",
      what: "Slip yoke room left at full bump (out from collapsed)",
      value: slip.outAtFullBumpMm,
      unit: " mm",
      digits: 1,
      limit: { value: 0, source: "geometry: the slip must not bottom out" },
    }),
    checkAtLeast({
      id: "slip-reserve",
      what: yoke
        ? `Spline engagement left at full droop (slip yoke ${yoke.id})`
        : "Spline engagement left at full droop",
      value: slip.reserveAtFullDroopMm,
      unit: " mm",
      digits: 1,
      limit: minEngagementLimit(yoke, settings),
    }),
  ];
  if (yoke && slip.sealLeftInBushingMm != null) {
    const outside = slip.sealOutsideCollapsedMm ?? 0;
    checks.push(
      checkAtLeast({
        id: "slip-seal",
        what: `Seal surface of slip yoke ${yoke.id} left in the tail bushing at full droop (${fmt(yoke.sealSurfaceLengthMm, 1)} mm seal surface − ${fmt(outside, 1)} mm outside when collapsed − ${fmt(slip.outAtFullDroopMm, 1)} mm out at full droop)`,
        value: slip.sealLeftInBushingMm,
        unit: " mm",
        digits: 1,
        limit: settings.slipSealMinInBushingMm,
      }),
    );
  }
  return checks;
}

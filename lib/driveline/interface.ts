/**
 * Interface data, so the shop need not phone: the design's `interface` (the output spline, the
 * front and pinion ends as a yoke's caps or a companion flange, greaseable or sealed joints) is
 * matched to the catalogue. At each end the vehicle side's joint series is identified (named, or
 * by the measured caps), the shaft's end fitting is matched to it where Yokeline chose the
 * fitting, and the cross that joins the two sides is picked: a plain cross when both take the
 * same caps, else a CONVERSION cross (caps of one series on one side, `otherSeriesId` on the
 * other). What cannot be matched is a warning naming the field to fill; a part the design names
 * that does not fit the vehicle fails. Nothing is picked that does not fit without a check saying so.
 */
import {
  crossJoins,
  fittingFitsTube,
  fittingRatingNm,
  flangeMatches,
  seriesByCaps,
  sameCaps,
  seriesShareCaps,
  CAP_DIAMETER_TOLERANCE_MM,
  CAP_SPAN_TOLERANCE_MM,
  FLANGE_TOLERANCE_MM,
  SPLINE_DIAMETER_TOLERANCE_MM,
  endReport,
  type CatalogueIndex,
} from "./catalogue/lookup";
import type { Catalogue, EndFitting, JointSeries } from "./catalogue/types";
import { checkOf, fmt, worstStatus, type Check, type CheckStatus } from "./checks";
import { doubleCardanFor } from "./double-cardan";
import type { EndReport, SlipYokeSummary } from "./report";
import type { DesignFile } from "./schema";
import { resolveSlipYoke } from "./slip";

type Position = "front" | "rear";
type Lubrication = "greaseable" | "sealed";

/** What was matched at one end of the shaft and why. */
export interface InterfaceEndMatch {
  readonly position: Position;
  /** What the vehicle offers at this end. */
  readonly vehicle: "slip-yoke" | "yoke" | "flange" | "none";
  /** The joint series whose caps the vehicle side takes, when identified. */
  readonly vehicleSeriesId: string | null;
  /** The shaft's end fitting after matching, and where it came from. */
  readonly fittingId: string | null;
  readonly fittingOrigin: EndReport["origin"] | null;
  /** The joint fitted at this end and its kind. */
  readonly crossSeriesId: string | null;
  readonly crossKind: "cross" | "conversion" | "double-cardan" | null;
  readonly lubrication: Lubrication | null;
  /** True when everything the design gives at this end was matched to parts that fit. */
  readonly matched: boolean;
  /** In words: what was matched and why, or what could not be and which field to fill. */
  readonly reason: string;
}

/** A part the quote adds beyond the ends' fittings and joints. */
export interface InterfacePart {
  readonly role: "slip-yoke";
  readonly id: string;
  readonly name: string;
  readonly priceCents: number;
}

export interface InterfaceReport {
  readonly slipYoke: SlipYokeSummary | null;
  /** Catalogue slip yokes whose spline fits the output (when the design gives it). */
  readonly slipYokeCandidates: readonly string[];
  readonly front: InterfaceEndMatch | null;
  readonly rear: InterfaceEndMatch | null;
  readonly lubrication: Lubrication | null;
  /** Parts the quote prices beyond the ends' fittings and joints (the slip yoke). */
  readonly parts: readonly InterfacePart[];
}

export interface InterfaceFit {
  /** The ends after matching (front, rear). */
  readonly ends: readonly (EndReport | null)[];
  readonly slipYoke: SlipYokeSummary | null;
  readonly report: InterfaceReport | null;
  readonly checks: readonly Check[];
}

export interface InterfaceInput {
  readonly design: DesignFile;
  readonly catalogue: Catalogue;
  readonly index: CatalogueIndex;
  /** The ends as named or suggested (front, rear). */
  readonly ends: readonly (EndReport | null)[];
  /** The ends the design names (front, rear): these are never swapped, only checked. */
  readonly namedEnds: readonly (EndFitting | null)[];
  readonly tubeOdMm: number;
  readonly weldFamily: string;
  readonly torqueNm: number;
}

/** Where the interface checks' figures come from. */
export const INTERFACE_SOURCE = `shop catalogue, matched by Yokeline (measured sizes taken as a catalogue size within ±${CAP_DIAMETER_TOLERANCE_MM} mm cap diameter, ±${CAP_SPAN_TOLERANCE_MM} mm cap span, ±${SPLINE_DIAMETER_TOLERANCE_MM} mm spline diameter, ±${FLANGE_TOLERANCE_MM} mm bolt circle and pilot — Yokeline defaults)`;

const POSITIONS: readonly Position[] = ["front", "rear"];
const FIELD: Record<Position, string> = { front: "interface.front", rear: "interface.pinion" };
const label = (p: Position) => (p === "front" ? "Front" : "Rear");

function endOf(
  f: EndFitting,
  origin: EndReport["origin"],
  index: CatalogueIndex,
): EndReport & { -readonly [K in "crossSeriesId" | "torqueRatingNm"]?: EndReport[K] } {
  return endReport(f, origin, index);
}

/** Sort key: fewer is better, compared item by item. */
function byKeys<T>(items: readonly T[], key: (t: T) => (number | string)[]): T[] {
  return [...items].sort((a, b) => {
    const ka = key(a);
    const kb = key(b);
    for (let i = 0; i < ka.length; i++) {
      if (ka[i] === kb[i]) continue;
      return ka[i]! < kb[i]! ? -1 : 1;
    }
    return 0;
  });
}

const capsText = (c: {
  capDiameterMm?: number | null;
  capSpanMm?: number | null;
  retention?: string | null;
}) =>
  `${fmt(c.capDiameterMm ?? NaN, 1)} mm caps × ${fmt(c.capSpanMm ?? NaN, 1)} mm span${c.retention ? `, ${c.retention}` : ""}`;

interface EndState {
  end: (EndReport & { crossSeriesId?: string }) | null;
  vehicle: InterfaceEndMatch["vehicle"];
  vehicleSeries: JointSeries | null;
  crossSeriesId: string | null;
  crossKind: InterfaceEndMatch["crossKind"];
  status: CheckStatus;
  reasons: string[];
}

/**
 * Match the design's interface data (and a double-Cardan front joint) to the catalogue. Returns
 * the ends to use, the slip yoke, the report's `interface` block and the `interface.*` checks.
 */
export function fitInterface(input: InterfaceInput): InterfaceFit {
  const { design, catalogue, index, namedEnds, torqueNm } = input;
  const iface = design.interface ?? null;
  const lubrication = iface?.lubrication ?? null;
  const checks: Check[] = [];
  const frontSeries = input.ends[0] ? (index.series.get(input.ends[0].jointSeriesId) ?? null) : null;

  // The slip yoke: named, or matched to the output spline.
  const slipChoice =
    design.slip?.slipYokeId != null || iface?.transmissionOutput
      ? resolveSlipYoke(design, catalogue, index, frontSeries, torqueNm)
      : null;
  const slipYoke = slipChoice?.yoke ?? null;
  if (slipChoice)
    checks.push(slipYokeCheck(design, slipChoice.yoke, slipChoice.candidates, slipChoice.unknownId));

  const states: EndState[] = POSITIONS.map((p, i) => ({
    end: input.ends[i] ? { ...input.ends[i]! } : null,
    vehicle: "none",
    vehicleSeries: null,
    crossSeriesId: null,
    crossKind: null,
    status: "pass",
    reasons: [],
  }));

  POSITIONS.forEach((p, i) => {
    const s = states[i]!;
    const named = namedEnds[i] ?? null;
    const spec = p === "front" ? iface?.front : iface?.pinion;
    if (p === "front" && slipYoke) {
      s.vehicle = "slip-yoke";
      s.vehicleSeries = index.series.get(slipYoke.jointSeriesId) ?? null;
      s.reasons.push(
        s.vehicleSeries
          ? `slip yoke ${slipYoke.id} takes ${s.vehicleSeries.id} caps`
          : `slip yoke ${slipYoke.id} names joint series ${slipYoke.jointSeriesId}, which the catalogue lacks`,
      );
      if (!s.vehicleSeries) s.status = "warn";
      if (spec) s.reasons.push(`${FIELD.front} is not used: the front is the slip yoke on the output spline`);
    } else if (spec?.kind === "yoke") {
      s.vehicle = "yoke";
      identifyYoke(s, spec, p, catalogue, index);
    } else if (spec?.kind === "flange") {
      s.vehicle = "flange";
      matchFlange(s, spec.flange ?? null, p, named, input);
    }
    if (s.vehicleSeries && s.end && s.vehicle !== "flange") matchFittingToVehicle(s, p, named, input);
    if (s.end && (s.vehicleSeries || lubrication)) chooseCross(s, p, lubrication, input);
  });

  // A double-Cardan front joint: the catalogue's CV joint for the front fitting's caps
  // (double-cardan.ts checks it, and fails when there is none).
  if (design.frontJointType === "double-cardan" && states[0]!.end) {
    const s = states[0]!;
    const cv = doubleCardanFor(design, s.end!, index, catalogue, torqueNm);
    if (cv.series) {
      s.end = {
        ...s.end!,
        crossSeriesId: cv.series.id,
        torqueRatingNm: Math.min(s.end!.torqueRatingNm, cv.series.torqueRatingNm),
      };
      s.crossSeriesId = cv.series.id;
      s.crossKind = "double-cardan";
      s.reasons.push(cv.reason);
      if (s.vehicleSeries && s.vehicle !== "flange" && !seriesShareCaps(cv.series, s.vehicleSeries)) {
        s.status = worstStatus([s.status, "warn"]);
        s.reasons.push(
          `the double-Cardan joint ${cv.series.id} takes ${capsText(cv.series)}, the vehicle side ${s.vehicleSeries.id}'s ${capsText(s.vehicleSeries)}: no conversion is offered inside a double-Cardan joint — check ${FIELD.front}`,
        );
      }
    }
  }

  const given = iface != null || design.slip?.slipYokeId != null;
  const matches = POSITIONS.map((p, i) => {
    const s = states[i]!;
    const spec = p === "front" ? iface?.front : iface?.pinion;
    const touched = s.vehicle !== "none" || (lubrication && s.end) || (spec && !s.end);
    if (!given || !touched) return null;
    if (!s.end) {
      s.status = "warn";
      s.reasons.push("no end fitting to match (see the end-fitting check)");
    }
    const m: InterfaceEndMatch = {
      position: p,
      vehicle: s.vehicle,
      vehicleSeriesId: s.vehicleSeries?.id ?? null,
      fittingId: s.end?.fittingId ?? null,
      fittingOrigin: s.end?.origin ?? null,
      crossSeriesId: s.crossSeriesId ?? s.end?.crossSeriesId ?? s.end?.jointSeriesId ?? null,
      crossKind: s.crossKind ?? (s.end ? "cross" : null),
      lubrication: crossLubrication(s, index),
      matched: s.status === "pass",
      reason: s.reasons.join("; "),
    };
    checks.push(
      checkOf(
        `interface.${p}`,
        s.status,
        `${label(p)} end: ${m.reason || "nothing to match"} — ${INTERFACE_SOURCE}`,
        INTERFACE_SOURCE,
      ),
    );
    return m;
  });
  const report: InterfaceReport | null = given
    ? {
        slipYoke,
        slipYokeCandidates: slipChoice?.candidates ?? [],
        front: matches[0] ?? null,
        rear: matches[1] ?? null,
        lubrication,
        parts: slipYoke
          ? [{ role: "slip-yoke", id: slipYoke.id, name: slipYoke.name, priceCents: slipYoke.priceCents }]
          : [],
      }
    : null;
  return { ends: states.map((s) => s.end), slipYoke, report, checks };
}

function slipYokeCheck(
  design: DesignFile,
  yoke: SlipYokeSummary | null,
  candidates: readonly string[],
  unknownId: string | null,
): Check {
  const output = design.interface?.transmissionOutput;
  const outputText = output ? `${output.splineCount}-spline ${fmt(output.majorDiameterMm, 1)} mm output` : "";
  if (unknownId)
    return checkOf(
      "interface.slip-yoke",
      "fail",
      `slip.slipYokeId: "${unknownId}" is not a slip yoke in the shop catalogue — ${INTERFACE_SOURCE}`,
      INTERFACE_SOURCE,
    );
  if (!yoke)
    return checkOf(
      "interface.slip-yoke",
      "warn",
      `No slip yoke in the shop catalogue fits the ${outputText} (interface.transmissionOutput): check the spline count and major diameter, or add the slip yoke to the catalogue and name it in slip.slipYokeId; no slip yoke is priced and the shop's fixed spline engagement applies — ${INTERFACE_SOURCE}`,
      INTERFACE_SOURCE,
    );
  const yokeText = `${yoke.splineCount}-spline ${fmt(yoke.majorDiameterMm, 1)} mm`;
  if (yoke.origin === "design" && output && !candidates.includes(yoke.id))
    return checkOf(
      "interface.slip-yoke",
      "fail",
      `Slip yoke ${yoke.id} (slip.slipYokeId) is ${yokeText}; the transmission output is ${outputText} (interface.transmissionOutput): it does not fit${candidates.length ? ` — ${candidates.join(", ")} would` : ""} — ${INTERFACE_SOURCE}`,
      INTERFACE_SOURCE,
    );
  const why =
    yoke.origin === "design"
      ? `named by slip.slipYokeId${output ? `, fits the ${outputText}` : ""}`
      : `matched to the ${outputText} (interface.transmissionOutput)${candidates.length > 1 ? `, chosen from ${candidates.join(", ")}: its ears take the front fitting's caps, its joint carries the torque, then the lowest price` : ""}`;
  return checkOf(
    "interface.slip-yoke",
    "pass",
    `Slip yoke ${yoke.id} (${yokeText}, ${yoke.jointSeriesId} ears): ${why}; its least spline engagement ${fmt(yoke.minEngagementMm, 1)} mm applies — ${INTERFACE_SOURCE}`,
    INTERFACE_SOURCE,
  );
}

type VehicleEnd = NonNullable<NonNullable<DesignFile["interface"]>["pinion"]>;

/** The vehicle yoke's series: named, or by its measured caps (preferring the asked lubrication). */
function identifyYoke(
  s: EndState,
  spec: VehicleEnd,
  p: Position,
  catalogue: Catalogue,
  index: CatalogueIndex,
) {
  const field = FIELD[p];
  if (spec.jointSeriesId != null) {
    const series = index.series.get(spec.jointSeriesId);
    if (!series) {
      s.status = "warn";
      s.reasons.push(`${field}.jointSeriesId "${spec.jointSeriesId}" is not a joint series in the catalogue`);
      return;
    }
    s.vehicleSeries = series;
    s.reasons.push(`the vehicle's yoke takes ${series.id} caps (${field}.jointSeriesId)`);
    if (spec.capDiameterMm != null && spec.capSpanMm != null && series.capDiameterMm != null) {
      if (!sameCaps(series, pickCaps(spec))) {
        s.status = "warn";
        s.reasons.push(
          `but the measured ${capsText(spec)} are not ${series.id}'s ${capsText(series)}: measure again or correct ${field}.jointSeriesId`,
        );
      }
    }
    return;
  }
  if (spec.capDiameterMm == null || spec.capSpanMm == null) {
    s.status = "warn";
    const missing = [
      spec.capDiameterMm == null ? `${field}.capDiameterMm` : null,
      spec.capSpanMm == null ? `${field}.capSpanMm` : null,
    ].filter(Boolean);
    s.reasons.push(
      `the vehicle's yoke is not identified: give ${missing.join(" and ")} (or ${field}.jointSeriesId)`,
    );
    return;
  }
  const found = seriesByCaps(catalogue, pickCaps(spec));
  if (found.length === 0) {
    s.status = "warn";
    s.reasons.push(
      `no joint series in the catalogue takes ${capsText(spec)} (${field}.capDiameterMm, capSpanMm${spec.retention ? ", retention" : ""}): measure again, or add the series to the catalogue`,
    );
    return;
  }
  // Name the vehicle side by the series the shop's yokes are made for (not a lubrication variant).
  const withFittings = new Set(catalogue.endFittings.map((f) => f.jointSeriesId));
  const best = byKeys(found, (x) => [
    x.id === s.end?.jointSeriesId ? 0 : 1,
    withFittings.has(x.id) ? 0 : 1,
    x.id,
  ])[0]!;
  s.vehicleSeries = best;
  s.reasons.push(
    `the vehicle's yoke (${capsText(spec)}) takes ${best.id} caps (${capsText(best)})${spec.retention ? "" : `; give ${field}.retention to confirm the straps or U-bolts`}`,
  );
}

function pickCaps(spec: VehicleEnd) {
  return { capDiameterMm: spec.capDiameterMm, capSpanMm: spec.capSpanMm, retention: spec.retention };
}

/** A companion flange: the flange yoke whose bolt pattern matches, that takes the tube. */
function matchFlange(
  s: EndState,
  flange: VehicleEnd["flange"] | null,
  p: Position,
  named: EndFitting | null,
  input: InterfaceInput,
) {
  const field = `${FIELD[p]}.flange`;
  if (!flange) {
    s.status = "warn";
    s.reasons.push(
      `the companion flange's pattern is not given: fill ${field} (bolt count, bolt circle, pilot)`,
    );
    return;
  }
  const pattern = `${flange.boltCount} bolts on a ${fmt(flange.boltCircleMm, 1)} mm circle, ${fmt(flange.pilotMm, 1)} mm pilot`;
  if (named) {
    if (named.kind === "flange-yoke" && flangeMatches(named.flange, flange)) {
      s.reasons.push(`${named.id} (ends.${p}.fittingId) bolts to the companion flange (${pattern})`);
    } else {
      s.status = "fail";
      s.reasons.push(
        `${named.id} (ends.${p}.fittingId) does not bolt to the companion flange (${pattern}, ${field}): name a flange yoke with that pattern`,
      );
    }
    s.vehicleSeries = input.index.series.get(named.jointSeriesId) ?? null;
    return;
  }
  const fitting = input.catalogue.endFittings.filter(
    (f) =>
      f.kind === "flange-yoke" &&
      flangeMatches(f.flange, flange) &&
      fittingFitsTube(f, input.tubeOdMm, input.weldFamily),
  );
  const best = byKeys(fitting, (f) => [
    fittingRatingNm(f, input.index) >= input.torqueNm ? 0 : 1,
    f.priceCents,
  ])[0];
  if (!best) {
    s.status = "warn";
    s.reasons.push(
      `no flange yoke in the catalogue bolts to ${pattern} and takes the ${fmt(input.tubeOdMm, 1)} mm ${input.weldFamily} tube: check ${field}, add the flange yoke to the catalogue, or name ends.${p}.fittingId; the fitting priced does not bolt to this flange`,
    );
    return;
  }
  s.end = endOf(best, "matched", input.index);
  s.vehicleSeries = input.index.series.get(best.jointSeriesId) ?? null;
  s.reasons.push(`flange yoke ${best.id} bolts to the companion flange (${pattern})`);
}

/**
 * Where Yokeline chose the end fitting and its caps differ from the vehicle side's, use a
 * fitting of the vehicle's series that takes the tube and carries the torque (no conversion).
 */
function matchFittingToVehicle(s: EndState, p: Position, named: EndFitting | null, input: InterfaceInput) {
  const v = s.vehicleSeries!;
  const current = input.index.series.get(s.end!.jointSeriesId);
  if (named || (current && seriesShareCaps(current, v))) return;
  const kind = s.end!.kind;
  const options = input.catalogue.endFittings.filter((f) => {
    const fs = input.index.series.get(f.jointSeriesId);
    return (
      f.kind === kind &&
      fs != null &&
      seriesShareCaps(fs, v) &&
      fittingFitsTube(f, input.tubeOdMm, input.weldFamily) &&
      fittingRatingNm(f, input.index) >= input.torqueNm
    );
  });
  const best = byKeys(options, (f) => [f.priceCents, f.id])[0];
  if (!best) return;
  const before = s.end!.fittingId;
  s.end = endOf(best, "matched", input.index);
  s.reasons.push(
    `${best.id} (${best.jointSeriesId}) used instead of ${before} so the joint takes the vehicle's caps`,
  );
}

/** The cross that joins the shaft's fitting to the vehicle side, of the asked lubrication. */
function chooseCross(s: EndState, p: Position, lubrication: Lubrication | null, input: InterfaceInput) {
  const { index, catalogue, torqueNm } = input;
  const end = s.end!;
  const shaft = index.series.get(end.jointSeriesId);
  if (!shaft) return;
  const vehicle = s.vehicleSeries ?? shaft;
  const joining = catalogue.jointSeries.filter((c) => crossJoins(c, shaft, vehicle, index));
  const ofLubrication = lubrication ? joining.filter((c) => c.lubrication === lubrication) : joining;
  const rank = (list: JointSeries[]) =>
    byKeys(list, (c) => [
      c.id === shaft.id ? 0 : 1,
      c.torqueRatingNm >= torqueNm ? 0 : 1,
      c.priceCents,
      c.id,
    ])[0];
  const pick = rank(ofLubrication) ?? rank(joining);
  const conversion = !seriesShareCaps(shaft, vehicle);
  if (!pick) {
    s.status = worstStatus([s.status, "warn"]);
    s.reasons.push(
      `no conversion cross in the catalogue joins the shaft's ${shaft.id} yoke (${capsText(shaft)}) to the vehicle's ${vehicle.id} (${capsText(vehicle)}): add one to the catalogue (a joint series with caps of one and "other series" the other), or name ends.${p}.fittingId with a ${vehicle.id} yoke; the joint priced is a plain ${shaft.id} cross, which does not fit`,
    );
    return;
  }
  if (lubrication && pick.lubrication !== lubrication) {
    s.status = worstStatus([s.status, "warn"]);
    s.reasons.push(
      `no ${lubrication} cross in the catalogue joins ${shaft.id} to ${vehicle.id}: ${pick.id} is ${pick.lubrication ?? "of unstated lubrication"} (interface.lubrication asks ${lubrication})`,
    );
  }
  if (pick.id !== shaft.id) {
    s.end = {
      ...end,
      crossSeriesId: pick.id,
      torqueRatingNm: Math.min(end.torqueRatingNm, pick.torqueRatingNm),
    };
  }
  s.crossSeriesId = pick.id;
  s.crossKind = pick.otherSeriesId ? "conversion" : "cross";
  if (conversion)
    s.reasons.push(
      `conversion cross ${pick.id} joins the shaft's ${shaft.id} yoke (${capsText(shaft)}) to the vehicle's ${vehicle.id} (${capsText(vehicle)})`,
    );
  else if (pick.id !== shaft.id)
    s.reasons.push(`${pick.id} cross (${pick.lubrication ?? "lubrication not stated"})`);
  else s.reasons.push(`plain ${pick.id} cross${pick.lubrication ? ` (${pick.lubrication})` : ""}`);
}

function crossLubrication(s: EndState, index: CatalogueIndex): Lubrication | null {
  const id = s.crossSeriesId ?? s.end?.crossSeriesId ?? s.end?.jointSeriesId;
  return (id ? index.series.get(id)?.lubrication : undefined) ?? null;
}

/**
 * Changes and field paths in words, for the history, the confirmation and the error summary:
 * "Tubes › YL-T-DOM-3000-083 › Price per metre: $25.10 → $27.00". Pure.
 */
import { formatMoney } from "@/lib/money";
import type { ConfigChange } from "./diff";
import { FLOOR_LIMIT_META, LIMIT_META } from "./limits";

const SECTIONS: Record<string, string> = {
  "catalogue.materials": "Materials",
  "catalogue.tubes": "Tubes",
  "catalogue.endFittings": "End fittings",
  "catalogue.jointSeries": "Joints",
  "catalogue.slipYokes": "Slip yokes",
  "catalogue.centreBearings": "Centre bearings",
  "catalogue.name": "Catalogue name",
  "catalogue.demo": "Demonstration catalogue",
  settings: "Limits",
  priceBook: "Price book",
  "floor.routing": "Floor routing",
  "floor.limits": "Floor tolerances",
  floor: "Floor",
};

export const FIELD_LABELS: Record<string, string> = {
  id: "Id",
  name: "Name",
  source: "Source",
  elasticModulusGPa: "E (GPa)",
  densityKgM3: "Density (kg/m³)",
  tensileYieldMPa: "Minimum yield (MPa)",
  condition: "Condition",
  weldZoneTensileYieldMPa: "Weld-zone yield (MPa)",
  weldZoneSource: "Weld-zone source",
  continuousTorqueNm: "Continuous rating (N·m)",
  shearYieldMPa: "Shear yield (MPa)",
  weldFamily: "Weld family",
  materialId: "Material",
  odMm: "OD (mm)",
  wallMm: "Wall (mm)",
  maxLengthMm: "Longest piece (mm)",
  pricePerMetreCents: "Price per metre",
  kind: "Kind",
  jointSeriesId: "Joint series",
  tubeOdMm: "Tube OD (mm)",
  jointCentreToWeldSeatMm: "Joint centre to weld seat (mm)",
  massKg: "Mass (kg)",
  torqueRatingNm: "Torque rating (N·m)",
  priceCents: "Price",
  fastenerTorqueNm: "Flange bolt torque (N·m)",
  fastenerTorqueSource: "Flange bolt torque source",
  maxWorkingAngleDeg: "Largest working angle (°)",
  strapTorqueNm: "Strap torque (N·m)",
  strapTorqueSource: "Strap torque source",
  capDiameterMm: "Cap diameter (mm)",
  capSpanMm: "Span across caps (mm)",
  retention: "Held by",
  lubrication: "Lubrication",
  otherSeriesId: "Conversion: other side",
  boltCount: "Flange bolts",
  boltCircleMm: "Bolt circle (mm)",
  pilotMm: "Pilot (mm)",
  splineCount: "Splines",
  majorDiameterMm: "Spline major diameter (mm)",
  sealSurfaceLengthMm: "Seal surface (mm)",
  minEngagementMm: "Least engagement (mm)",
  value: "Value",
  currency: "Currency",
  timeZone: "Time zone",
  labourPerShaftCents: "Labour per shaft",
  balancingPerShaftCents: "Balancing per shaft",
  teardownPerShaftCents: "Re-tube teardown and inspection per shaft",
  labourPerExtraPieceCents: "Labour per extra piece (two-piece shafts)",
  tubeAllowanceMm: "Tube allowance per cut (mm)",
  minimumTubeChargeMm: "Shortest tube charged (mm)",
  taxRatePercent: "Tax (%)",
  shippingCents: "Shipping per shaft",
  depositPercent: "Deposit asked up front (%)",
  leadTimeWorkingDays: "Lead time (working days)",
  tubePreference: "Tube Yokeline picks",
  cancellationFeePercent: "Cancellation fee (% of the deposit kept)",
  shopCode: "Shop code (serials)",
  paperSize: "Paper size",
  units: "Floor units",
  phasingToleranceDeg: "Floor phasing tolerance (°)",
  code: "Code",
  instructions: "Instructions",
};

/** A field's name in words: section › row › field. `rowName` names a numbered row (its id). */
export function describePath(
  at: readonly string[],
  rowName?: (listPath: string, index: number) => string,
): string {
  const parts: string[] = [];
  let i = 0;
  // The longest section prefix that matches.
  for (const len of [2, 1]) {
    const key = at.slice(0, len).join(".");
    if (SECTIONS[key]) {
      parts.push(SECTIONS[key]!);
      i = len;
      break;
    }
  }
  const listPath = at.slice(0, i).join(".");
  for (; i < at.length; i++) {
    const seg = at[i]!;
    if (at[0] === "settings" && i === 1) parts.push(LIMIT_META[seg as keyof typeof LIMIT_META]?.label ?? seg);
    else if (listPath === "floor.limits" && i === 2)
      parts.push(FLOOR_LIMIT_META[seg as keyof typeof FLOOR_LIMIT_META]?.label ?? seg);
    else if (/^\d+$/.test(seg) && rowName) parts.push(rowName(listPath, Number(seg)));
    else if (/^\d+$/.test(seg)) parts.push(`row ${Number(seg) + 1}`);
    else if ((at[0] === "settings" || listPath === "floor.limits") && seg === "value") continue;
    else parts.push(i === at.length - 1 ? (FIELD_LABELS[seg] ?? seg) : seg);
  }
  return parts.join(" › ");
}

/** A value in words, in the unit its field name carries. */
export function describeValue(field: string, value: unknown, currency = "USD"): string {
  if (value === null || value === undefined || value === "") return "—";
  if (Array.isArray(value)) return value.map((v) => describeValue(field, v, currency)).join("; ");
  if (typeof value === "object") {
    const row = value as Record<string, unknown>;
    if ("value" in row && "source" in row) return `${String(row.value)} (${String(row.source)})`;
    return String(row.name ?? row.id ?? row.code ?? "a row");
  }
  if (typeof value === "number") {
    if (/Cents$/.test(field)) return formatMoney(value, currency);
    if (/Mm$/.test(field)) return `${value} mm`;
    if (/Percent$/.test(field)) return `${value} %`;
    return String(value);
  }
  if (typeof value === "boolean") return value ? "yes" : "no";
  return String(value);
}

export interface ChangeInWords {
  where: string;
  before: string;
  after: string;
  /** "added" and "removed" rows, or a changed value. */
  kind: "added" | "removed" | "changed";
}

export function describeChange(change: ConfigChange, currency = "USD"): ChangeInWords {
  const field = change.at[change.at.length - 1] ?? "";
  const kind =
    change.before === null && typeof change.after === "object" && change.after !== null
      ? "added"
      : change.after === null && typeof change.before === "object" && change.before !== null
        ? "removed"
        : "changed";
  // A limit's value carries its unit from the limit's own description.
  const meta =
    change.at[0] === "settings"
      ? LIMIT_META[change.at[1] as keyof typeof LIMIT_META]
      : change.at[0] === "floor" && change.at[1] === "limits"
        ? FLOOR_LIMIT_META[change.at[2] as keyof typeof FLOOR_LIMIT_META]
        : undefined;
  const word = (v: unknown) => {
    const text = describeValue(field, v, currency);
    return meta?.unit && field === "value" && typeof v === "number" ? `${text} ${meta.unit}` : text;
  };
  return { where: describePath(change.at), before: word(change.before), after: word(change.after), kind };
}

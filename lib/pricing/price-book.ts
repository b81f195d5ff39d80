import { addBusinessDays, formatISO } from "date-fns";
import { z } from "zod";
import { DEFAULT_TIME_ZONE, isTimeZone } from "../dates";
import { DEFAULT_CURRENCY } from "../money";
import type { Fulfilment } from "@/lib/orders/states";

const money = () =>
  z
    .number({ error: "must be an amount of money" })
    .min(0, { error: "must not be negative" })
    .int({ error: "must be a whole number of cents" })
    .max(100_000_000, { error: "must be at most 1,000,000.00" });
const percent = (min: number, max: number) =>
  z
    .number({ error: "must be a percentage" })
    .min(min, { error: `must be between ${min} and ${max} %` })
    .max(max, { error: `must be between ${min} and ${max} %` });
const wholePercent = (min: number, max: number) =>
  percent(min, max).int({ error: `must be a whole percentage between ${min} and ${max}` });
const millimetres = (max: number) =>
  z
    .number({ error: "must be a length in mm" })
    .min(0, { error: "must not be negative" })
    .max(max, { error: `must be at most ${max} mm` });

/** A price book: what the shop charges beyond the catalogue's parts. Money in integer cents. */
export const priceBookSchema = z.object({
  currency: z.string({ error: "must be a three-letter currency code" }).regex(/^[A-Z]{3}$/, {
    error: "must be a three-letter currency code",
  }),
  /** The shop's time zone (IANA name): dates on screens, e-mails, papers and exports are its days. */
  timeZone: z
    .string({ error: "must be a time zone such as America/Chicago" })
    .refine(isTimeZone, { error: "must be a time zone such as America/Chicago" })
    .default(DEFAULT_TIME_ZONE),
  /** Cutting, welding, phasing and straightening one shaft. */
  labourPerShaftCents: money(),
  balancingPerShaftCents: money(),
  /** Re-tube / repair orders: taking the customer's shaft apart and inspecting the parts kept, per shaft. */
  teardownPerShaftCents: money().default(4500),
  /** Two-piece shafts: cutting, welding and phasing the second piece and fitting the centre bearing. */
  labourPerExtraPieceCents: money().default(9500),
  /** Tube is charged on the cut length plus this allowance for facing and waste. */
  tubeAllowanceMm: millimetres(1_000),
  /** Shortest length of tube charged. */
  minimumTubeChargeMm: millimetres(10_000),
  taxRatePercent: percent(0, 50),
  shippingCents: money(),
  /** 0 < deposit < 100 asks a deposit and the balance at final inspection; 100 asks everything up front. */
  depositPercent: wholePercent(1, 100),
  /** Working days from order to the promised date. */
  leadTimeWorkingDays: z
    .number({ error: "must be a number of working days" })
    .int({ error: "must be a whole number of working days" })
    .min(0, { error: "must be between 0 and 120 working days" })
    .max(120, { error: "must be between 0 and 120 working days" }),
  /** When the customer leaves the tube to Yokeline: the cheapest or the lightest that passes every check. */
  tubePreference: z
    .enum(["cheapest", "lightest"], { error: "must be cheapest or lightest" })
    .default("cheapest"),
  /** Share of the deposit the shop keeps when an order is cancelled before release (0: all refunded). */
  cancellationFeePercent: wholePercent(0, 100).default(0),
});
export type PriceBook = z.infer<typeof priceBookSchema>;

/** Demo data: an invented shop's prices. */
export const defaultPriceBook: PriceBook = {
  currency: DEFAULT_CURRENCY,
  timeZone: DEFAULT_TIME_ZONE,
  labourPerShaftCents: 14500,
  balancingPerShaftCents: 6500,
  teardownPerShaftCents: 4500,
  labourPerExtraPieceCents: 9500,
  tubeAllowanceMm: 50,
  minimumTubeChargeMm: 300,
  taxRatePercent: 8.5,
  shippingCents: 4800,
  depositPercent: 50,
  leadTimeWorkingDays: 5,
  tubePreference: "cheapest",
  cancellationFeePercent: 0,
};

export interface QuoteLine {
  code:
    "tube" | "fitting" | "joint" | "centre-bearing" | "labour" | "balance" | "teardown" | "shipping" | "tax";
  label: string;
  quantity: number;
  unitCents: number;
  totalCents: number;
}

/** The parts of an evaluation report that pricing reads (kept narrow so frozen copies stay priceable). */
export interface PricedShaft {
  tube: {
    tubeId?: string | null;
    odMm: number;
    wallMm: number;
    materialId: string;
    tubeLengthMm: number;
    priceCents?: number | null;
  };
  ends: {
    front: PricedEnd | null;
    rear: PricedEnd | null;
  } | null;
  /** Parts matched to the vehicle beyond the ends' fittings and joints (the slip yoke). */
  interface?: { parts?: readonly { name: string; priceCents: number }[] } | null;
  /** Two-piece shafts: each piece's tube and ends, and the centre bearing (see quoteTwoPieceShaft). */
  layout?: "two-piece";
  pieces?: readonly PricedPiece[];
  centreBearing?: { name: string; priceCents: number; jointSeriesId: string };
}

/** One piece of a two-piece shaft as pricing reads it. */
export interface PricedPiece {
  piece: "A" | "B";
  position: "front" | "rear";
  tube: { tubeLengthMm: number };
  ends: {
    front: { name: string; priceCents: number; jointSeriesId: string; kind?: string } | null;
    rear: { name: string; priceCents: number; jointSeriesId: string; kind?: string } | null;
  };
}

/** An end fitting and the joint fitted there (`crossSeriesId`: a conversion cross, a greaseable cross or a double-Cardan joint). */
export interface PricedEnd {
  name: string;
  priceCents: number;
  jointSeriesId: string;
  crossSeriesId?: string;
}

export interface JointPrice {
  id: string;
  name: string;
  priceCents: number;
}

const line = (code: QuoteLine["code"], label: string, quantity: number, unitCents: number): QuoteLine => ({
  code,
  label,
  quantity,
  unitCents,
  totalCents: Math.round(quantity * unitCents),
});

/** A re-tube: which of the customer's parts are reused (lib/retube/intake.ts reusedForPrice). */
export interface ReusedParts {
  frontEnd: boolean;
  rearEnd: boolean;
  frontJoint: boolean;
  rearJoint: boolean;
  /** A slip yoke matched to the vehicle's output (priced from the interface data). */
  slipYoke?: boolean;
}

/** A part the customer's shaft already has: listed so the quote shows it, never charged. */
const reusedLine = (code: QuoteLine["code"], label: string): QuoteLine =>
  line(code, `${label}: the customer's, reused (not charged)`, 1, 0);

/**
 * The price lines of one shaft: tube by length (from the catalogue price per metre), the two end
 * fittings, a joint (cross) at each end, labour and balancing. A re-tube (`reused` given) does not
 * charge the parts reused and adds the price book's teardown and inspection line.
 */
export function quoteShaft(
  shaft: PricedShaft,
  book: PriceBook,
  tubePricePerMetreCents: number,
  joints: readonly JointPrice[],
  reused?: ReusedParts | null,
): QuoteLine[] {
  if (shaft.layout === "two-piece" && shaft.pieces?.length && shaft.centreBearing)
    return quoteTwoPieceShaft(shaft, book, tubePricePerMetreCents, joints);
  const chargedMm = Math.max(book.minimumTubeChargeMm, shaft.tube.tubeLengthMm + book.tubeAllowanceMm);
  const metres = Math.round(chargedMm) / 1000;
  const lines: QuoteLine[] = [
    line(
      "tube",
      `Tube ${shaft.tube.odMm.toFixed(1)} × ${shaft.tube.wallMm.toFixed(2)} mm ${shaft.tube.materialId}, ${Math.round(chargedMm)} mm`,
      metres,
      tubePricePerMetreCents,
    ),
  ];
  for (const [end, at] of [
    [shaft.ends?.front, "front"],
    [shaft.ends?.rear, "rear"],
  ] as const) {
    if (!end) continue;
    const keepEnd = at === "front" ? reused?.frontEnd : reused?.rearEnd;
    const keepJoint = at === "front" ? reused?.frontJoint : reused?.rearJoint;
    lines.push(keepEnd ? reusedLine("fitting", end.name) : line("fitting", end.name, 1, end.priceCents));
    const joint = joints.find((j) => j.id === (end.crossSeriesId ?? end.jointSeriesId));
    if (joint)
      lines.push(
        keepJoint
          ? reusedLine("joint", `Universal joint ${joint.name}`)
          : line("joint", `Universal joint ${joint.name}`, 1, joint.priceCents),
      );
  }
  lines.push(...interfacePartLines(shaft, reused));
  if (reused) lines.push(line("teardown", "Re-tube: teardown and inspection", 1, book.teardownPerShaftCents));
  lines.push(line("labour", "Cut, weld, phase and straighten", 1, book.labourPerShaftCents));
  lines.push(line("balance", "Dynamic balance", 1, book.balancingPerShaftCents));
  return lines;
}

/** The parts matched to the vehicle's interface data (the slip yoke), each a fitting line; a reused slip yoke is not charged. */
export function interfacePartLines(shaft: PricedShaft, reused?: ReusedParts | null): QuoteLine[] {
  return (shaft.interface?.parts ?? []).map((p) =>
    reused?.slipYoke ? reusedLine("fitting", p.name) : line("fitting", p.name, 1, p.priceCents),
  );
}

const PIECE_NAMES = { A: "piece A (front)", B: "piece B (rear)" } as const;

/**
 * The price lines of a two-piece shaft: each piece's tube by its own cut length (each cut gets the
 * allowance and the shortest charge), the fittings of both pieces (the front piece's stub comes with
 * the centre bearing), the centre bearing, a joint at the front, the centre and the rear, labour for
 * the first piece plus the extra piece, and balancing for each piece.
 */
export function quoteTwoPieceShaft(
  shaft: PricedShaft,
  book: PriceBook,
  tubePricePerMetreCents: number,
  joints: readonly JointPrice[],
): QuoteLine[] {
  const pieces = shaft.pieces ?? [];
  const lines: QuoteLine[] = [];
  for (const p of pieces) {
    const chargedMm = Math.max(book.minimumTubeChargeMm, p.tube.tubeLengthMm + book.tubeAllowanceMm);
    lines.push(
      line(
        "tube",
        `Tube ${shaft.tube.odMm.toFixed(1)} × ${shaft.tube.wallMm.toFixed(2)} mm ${shaft.tube.materialId}, ${PIECE_NAMES[p.piece]}, ${Math.round(chargedMm)} mm`,
        Math.round(chargedMm) / 1000,
        tubePricePerMetreCents,
      ),
    );
  }
  for (const p of pieces) {
    const ends = [
      [p.ends.front, p.position === "front" ? "front end" : "centre end"],
      [p.ends.rear, p.position === "rear" ? "rear end" : "centre end"],
    ] as const;
    for (const [end, where] of ends) {
      if (!end || end.kind === "centre-bearing-stub") continue;
      lines.push(line("fitting", `${end.name}, ${PIECE_NAMES[p.piece]}, ${where}`, 1, end.priceCents));
    }
  }
  const bearing = shaft.centreBearing!;
  lines.push(line("centre-bearing", bearing.name, 1, bearing.priceCents));
  const seriesIds = [
    ["front", pieces[0]?.ends.front?.jointSeriesId],
    ["centre", bearing.jointSeriesId],
    ["rear", pieces[pieces.length - 1]?.ends.rear?.jointSeriesId],
  ] as const;
  for (const [where, id] of seriesIds) {
    const joint = joints.find((j) => j.id === id);
    if (joint) lines.push(line("joint", `Universal joint ${joint.name}, ${where}`, 1, joint.priceCents));
  }
  lines.push(...interfacePartLines(shaft));
  lines.push(line("labour", "Cut, weld, phase and straighten", 1, book.labourPerShaftCents));
  lines.push(
    line(
      "labour",
      "Second piece: cut, weld, phase and straighten; fit the centre bearing",
      pieces.length - 1,
      book.labourPerExtraPieceCents,
    ),
  );
  lines.push(line("balance", "Dynamic balance, each piece", pieces.length, book.balancingPerShaftCents));
  return lines;
}

export interface OrderQuote {
  currency: string;
  lines: QuoteLine[];
  subtotalCents: number;
  shippingCents: number;
  taxCents: number;
  totalCents: number;
  /** Asked at checkout: the deposit, or the total when the policy is full payment. */
  dueNowCents: number;
}

/** Totals an order: the shafts' lines, shipping (none for pickup), tax on everything, the deposit. */
export function quoteOrder(
  shaftLines: readonly QuoteLine[][],
  fulfilment: Fulfilment,
  book: PriceBook,
): OrderQuote {
  const lines = shaftLines.flat();
  const subtotalCents = lines.reduce((sum, l) => sum + l.totalCents, 0);
  const shippingCents = fulfilment === "ship" ? book.shippingCents * Math.max(1, shaftLines.length) : 0;
  const taxCents = Math.round(((subtotalCents + shippingCents) * book.taxRatePercent) / 100);
  const totalCents = subtotalCents + shippingCents + taxCents;
  const dueNowCents =
    book.depositPercent >= 100 ? totalCents : Math.round((totalCents * book.depositPercent) / 100);
  return { currency: book.currency, lines, subtotalCents, shippingCents, taxCents, totalCents, dueNowCents };
}

/** The promised date: `workingDays` weekdays after `from`, as an ISO date. */
export function promisedDate(from: Date, workingDays: number): string {
  return formatISO(addBusinessDays(from, workingDays), { representation: "date" });
}

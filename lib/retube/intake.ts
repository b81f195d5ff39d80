/**
 * Re-tube / repair orders (pure): the customer sends their shaft in, the counter measures it and
 * says which parts are reused; the shop cuts a new tube and welds the reused (or new) ends to it.
 *
 * The rules, stated once:
 * - **Joint-centre length** (the design's `lengthMm`, the figure the engineering checks use): the
 *   counter MEASURES it on the shaft as received (centre of the front cross to centre of the rear
 *   cross) and types it into the builder like any shaft. It is not derived, because a reused yoke
 *   need not match the catalogue fitting the design names. The intake shows the figure derived from
 *   weld-to-weld + each catalogue end fitting's joint-centre-to-weld-seat beside it, as a cross-check
 *   (`retubeLengthCheck`).
 * - **Cut length** printed on the traveller for a re-tube = the weld-to-weld measured by the
 *   counter (`retubeCutLengthMm`): the new tube replaces the old one between the same weld seats, so
 *   the shaft keeps its length (common shop practice).
 * - **Price**: parts reused are not charged; a teardown/inspection labour line comes from the price
 *   book (`teardownPerShaftCents`).
 */
import { z } from "zod";

/** The parts of a one-piece shaft the counter may keep for reuse, in the order they are listed. */
export const RETUBE_PARTS = ["frontEnd", "rearEnd", "slipYoke", "frontJoint", "rearJoint"] as const;
export type RetubePart = (typeof RETUBE_PARTS)[number];

export const RETUBE_PART_LABEL: Record<RetubePart, string> = {
  frontEnd: "Front end fitting / yoke",
  rearEnd: "Rear end fitting / yoke",
  slipYoke: "Slip yoke",
  frontJoint: "Front joint",
  rearJoint: "Rear joint",
};

/** Longest weld-to-weld the intake takes (the core's longest shaft, lib/driveline/schema.ts PHYSICAL_MAX). */
export const MAX_WELD_TO_WELD_MM = 10_000;

const positive = "must be a positive number";

const partSchema = z
  .object(
    {
      reuse: z.boolean({ error: "must be yes or no" }),
      /** A short condition note, e.g. "bores round, no ear wear". */
      note: z
        .string({ error: "must be text" })
        .trim()
        .max(200, { error: "at most 200 characters" })
        .default(""),
    },
    { error: "say whether the part is reused" },
  )
  .superRefine((p, ctx) => {
    if (p.reuse && p.note.length < 2)
      ctx.addIssue({
        code: "custom",
        path: ["note"],
        message: "say what condition a reused part is in",
      });
  });

/** What the counter records on the customer's shaft. */
export const repairIntakeSchema = z.object({
  /** Weld bead centre to weld bead centre on the shaft as received, mm. */
  weldToWeldMm: z
    .number({ error: positive })
    .positive({ error: positive })
    .max(MAX_WELD_TO_WELD_MM, { error: `must be at most ${MAX_WELD_TO_WELD_MM} mm` }),
  parts: z.object(
    {
      frontEnd: partSchema,
      rearEnd: partSchema,
      slipYoke: partSchema,
      frontJoint: partSchema,
      rearJoint: partSchema,
    },
    { error: "list the parts and whether each is reused" },
  ),
});
export type RepairIntake = z.infer<typeof repairIntakeSchema>;

/** PUT /api/designs/[id]/repair: a new shaft, or a re-tube with the counter's intake. */
export const saveRepairBodySchema = z.discriminatedUnion(
  "job",
  [z.object({ job: z.literal("new") }), z.object({ job: z.literal("retube"), repair: repairIntakeSchema })],
  { error: 'must be "new" or "retube"' },
);
export type SaveRepairBody = z.infer<typeof saveRepairBodySchema>;

/** The stored block (on the draft, then frozen on the order shaft): the intake, who recorded it and when. */
export interface RepairBlock extends RepairIntake {
  recordedBy: { id: string; name: string };
  /** ISO date-time. */
  recordedAt: string;
}

export type ShaftJob = "new" | "retube";

/** The parts the counter meant to reuse, in list order. */
export function reusedParts(repair: Pick<RepairIntake, "parts">): RetubePart[] {
  return RETUBE_PARTS.filter((p) => repair.parts[p].reuse);
}

/** "Front end fitting / yoke, rear joint" or "none". */
export function describeReused(repair: Pick<RepairIntake, "parts">): string {
  const parts = reusedParts(repair).map((p, i) =>
    i === 0 ? RETUBE_PART_LABEL[p] : RETUBE_PART_LABEL[p].toLowerCase(),
  );
  return parts.length ? parts.join(", ") : "none (all new parts)";
}

/** Which priced parts are not charged (the ends, their joints, and a slip yoke matched to the output). */
export interface ReusedForPrice {
  frontEnd: boolean;
  rearEnd: boolean;
  frontJoint: boolean;
  rearJoint: boolean;
  slipYoke: boolean;
}

export function reusedForPrice(repair: Pick<RepairIntake, "parts">): ReusedForPrice {
  return {
    frontEnd: repair.parts.frontEnd.reuse,
    rearEnd: repair.parts.rearEnd.reuse,
    frontJoint: repair.parts.frontJoint.reuse,
    rearJoint: repair.parts.rearJoint.reuse,
    slipYoke: repair.parts.slipYoke.reuse,
  };
}

/** The cut length of a re-tube's new tube: the customer's weld-to-weld (common shop practice). */
export function retubeCutLengthMm(repair: Pick<RepairIntake, "weldToWeldMm">): number {
  return repair.weldToWeldMm;
}

export interface RetubeGeometry {
  /** The design's joint-centre length, as the counter measured it (mm). */
  lengthMm: number;
  /** Joint centre to weld seat of the catalogue end fittings the design names (null: the shop chooses). */
  frontSeatMm: number | null;
  rearSeatMm: number | null;
  /** The as-welded length tolerance of the frozen evaluation (report.shopFloor.lengthToleranceMm). */
  toleranceMm: number;
}

export interface RetubeLengthCheck {
  /** weld-to-weld + both seats, when both ends are catalogue fittings. */
  derivedMm: number | null;
  /** derived − measured (mm); null when it cannot be derived. */
  differenceMm: number | null;
  /** The difference is larger than the as-welded length tolerance. */
  disagrees: boolean;
}

/**
 * The cross-check shown at the counter: joint-centre length derived from weld-to-weld and the
 * catalogue end fittings' joint-centre-to-weld-seat, against the length the counter measured.
 */
export function retubeLengthCheck(weldToWeldMm: number, g: RetubeGeometry): RetubeLengthCheck {
  if (g.frontSeatMm == null || g.rearSeatMm == null || !Number.isFinite(weldToWeldMm))
    return { derivedMm: null, differenceMm: null, disagrees: false };
  const derivedMm = weldToWeldMm + g.frontSeatMm + g.rearSeatMm;
  const differenceMm = derivedMm - g.lengthMm;
  return { derivedMm, differenceMm, disagrees: Math.abs(differenceMm) > g.toleranceMm };
}

/** The geometry the cross-check needs, read from an evaluation report. */
export function retubeGeometryOf(report: {
  lengthMm: number;
  ends?: {
    front: { jointCentreToWeldSeatMm: number } | null;
    rear: { jointCentreToWeldSeatMm: number } | null;
  } | null;
  shopFloor: { lengthToleranceMm: number };
}): RetubeGeometry {
  return {
    lengthMm: report.lengthMm,
    frontSeatMm: report.ends?.front?.jointCentreToWeldSeatMm ?? null,
    rearSeatMm: report.ends?.rear?.jointCentreToWeldSeatMm ?? null,
    toleranceMm: report.shopFloor.lengthToleranceMm,
  };
}

/** An empty intake for the form: nothing reused until the counter says so. */
export function emptyIntake(): { weldToWeldMm: number | null; parts: RepairIntake["parts"] } {
  const part = () => ({ reuse: false, note: "" });
  return {
    weldToWeldMm: null,
    parts: {
      frontEnd: part(),
      rearEnd: part(),
      slipYoke: part(),
      frontJoint: part(),
      rearJoint: part(),
    },
  };
}

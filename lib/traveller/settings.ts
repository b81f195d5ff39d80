/**
 * The shop floor's settings: the routing every shaft follows, the floor tolerances that are not
 * already engineering limits (those stay in lib/driveline/settings.ts and reach us through the
 * frozen report's `shopFloor`), the paper size and the units the floor reads. Stored as one
 * document in `shop_config.floor`; every key is optional there and defaults here.
 */
import { z } from "zod";
import type { Limit } from "@/lib/driveline/settings";

/** What a step records (each kind has its own fields, see steps.ts). */
export const STEP_KINDS = [
  "cut",
  "weld-phase",
  "runout",
  "balance",
  "final-inspection",
  "dispatch",
  "sign-off",
  // Re-tube / repair orders only (lib/retube/steps.ts puts them before the routing).
  "teardown",
  "inspection",
  "assembly",
] as const;
export type StepKind = (typeof STEP_KINDS)[number];

export const routingStepSchema = z.object({
  /** Three letters, printed in the step's barcode; unique within the routing. */
  code: z.string().regex(/^[A-Z]{3}$/, "three letters A–Z"),
  kind: z.enum(STEP_KINDS),
  name: z.string().min(1).max(60),
  /** What the station does, one short line each (printed and shown at the scan station). */
  instructions: z.array(z.string().min(1).max(200)).max(6).default([]),
});
export type RoutingStep = z.infer<typeof routingStepSchema>;

/** The default routing (common shop practice for a welded one-piece tube shaft). */
export const defaultRouting: readonly RoutingStep[] = [
  {
    code: "CUT",
    kind: "cut",
    name: "Cut tube",
    instructions: ["Square-cut the tube to length and deburr", "Record the tube's heat or lot number"],
  },
  {
    code: "WLD",
    kind: "weld-phase",
    name: "Weld and phase",
    instructions: [
      "Fit both yokes, index the rear yoke to the phase shown, tack, check, then weld",
      "Measure between joint centres after welding",
    ],
  },
  {
    code: "RUN",
    kind: "runout",
    name: "Straighten and runout",
    instructions: ["Straighten as needed; read total indicated runout at each station"],
  },
  {
    code: "BAL",
    kind: "balance",
    name: "Balance",
    instructions: ["Balance in two planes; record the residual per plane and the weights added"],
  },
  {
    code: "FIN",
    kind: "final-inspection",
    name: "Final inspection",
    instructions: ["Check length, phase, free joints, paint and the serial marking"],
  },
  {
    code: "SHP",
    kind: "dispatch",
    name: "Pack and ship / pickup",
    instructions: ["Cap the ends, pack, and ship or hand over"],
  },
];

/**
 * Two-piece shafts: the assembly step that joins the pieces at the centre bearing and phases the
 * three joints, inserted before final inspection when the shop's routing has no step of kind
 * "assembly" of its own (one-piece shafts skip such a step). Common shop practice.
 */
export const defaultAssemblyStep: RoutingStep = {
  code: "ASM",
  kind: "assembly",
  name: "Assemble at the centre bearing",
  instructions: [
    "Fit the centre bearing and the end yoke on the front piece's stub to the phase marks",
    "Fit the centre joint to the rear piece, check both indices and the overall length",
  ],
};

/** The pieces of a two-piece shaft: routing steps of these kinds are done once per piece. */
export const PER_PIECE_KINDS: readonly StepKind[] = ["cut", "weld-phase", "runout", "balance"];

const SHOP = "common shop practice";

/** Floor tolerances with their defaults and sources (a shop may override each value). */
export const defaultFloorLimits = {
  cutLengthToleranceMm: {
    value: 0.8,
    source: `${SHOP} (±1/32 in on the saw, half the as-welded tolerance)`,
  },
  /** How far in from each weld the near-end runout station is. */
  runoutStationInsetMm: { value: 75, source: `${SHOP} (3 in in from each weld)` },
  /** At or above this service speed the tighter runout limits below apply. */
  fastShaftRpm: { value: 6000, source: "Yokeline default (shop setting)" },
  fastShaftRunoutEndsMm: {
    value: 0.13,
    source: "Yokeline default for fast shafts, 0.005 in TIR near each end (shop setting)",
  },
  fastShaftRunoutCentreMm: {
    value: 0.25,
    source: "Yokeline default for fast shafts, 0.010 in TIR at the centre (shop setting)",
  },
} as const satisfies Record<string, Limit>;
export type FloorLimitKey = keyof typeof defaultFloorLimits;
export type FloorLimits = { readonly [K in FloorLimitKey]: Limit };

export const floorSettingsSchema = z.object({
  /** First part of every serial: 2–4 letters. */
  shopCode: z
    .string()
    .regex(/^[A-Z]{2,4}$/, "2–4 letters A–Z")
    .default("YL"),
  paperSize: z.enum(["letter", "a4"]).default("letter"),
  /** Units the traveller and the scan station show and take (SI is stored either way). */
  units: z.enum(["in", "mm"]).default("in"),
  routing: z
    .array(routingStepSchema)
    .min(1)
    .refine((steps) => new Set(steps.map((s) => s.code)).size === steps.length, "step codes must be unique")
    .default(() => defaultRouting.map((s) => ({ ...s, instructions: [...s.instructions] }))),
  /** Overrides of defaultFloorLimits: a bare number ("shop setting") or { value, source }. */
  limits: z
    .record(
      z.string(),
      z.union([
        z.number().positive(),
        z.object({ value: z.number().positive(), source: z.string().trim().min(1) }),
      ]),
    )
    .default({}),
  /** Phase index tolerance at the floor; absent: the engineering setting in the report. */
  phasingToleranceDeg: z.number().positive().max(10).nullable().default(null),
});
export type FloorSettingsDocument = z.input<typeof floorSettingsSchema>;

export interface FloorSettings {
  shopCode: string;
  paperSize: "letter" | "a4";
  units: "in" | "mm";
  routing: readonly RoutingStep[];
  limits: FloorLimits;
  phasingToleranceDeg: number | null;
}

/** The stored document (or nothing) with every default filled in. */
export function resolveFloorSettings(doc?: unknown): FloorSettings {
  const parsed = floorSettingsSchema.parse(doc ?? {});
  const limits: Record<string, Limit> = { ...defaultFloorLimits };
  for (const [key, value] of Object.entries(parsed.limits)) {
    if (key in defaultFloorLimits)
      limits[key] = typeof value === "number" ? { value, source: "shop setting" } : value;
  }
  return { ...parsed, limits: limits as FloorLimits };
}

export const defaultFloorSettings: FloorSettings = resolveFloorSettings();

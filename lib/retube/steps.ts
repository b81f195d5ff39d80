/**
 * A re-tube's first two traveller steps (pure): teardown, then inspection of the parts the counter
 * meant to reuse. They come before the shop's usual routing (lib/traveller/settings.ts) and are
 * recorded, checked and printed like every other step.
 */
import type { FieldSpec, StepContext } from "@/lib/traveller/steps";
import type { RoutingStep } from "@/lib/traveller/settings";
import { RETUBE_PARTS, reusedParts, type RetubePart } from "./intake";

/** The re-tube steps (common shop practice: take the old shaft apart, then inspect what is kept). */
export const retubeRouting: readonly RoutingStep[] = [
  {
    code: "TDN",
    kind: "teardown",
    name: "Teardown",
    instructions: [
      "Measure weld-to-weld before cutting",
      "Cut the old tube off at the welds, press out the joints",
      "Record each part as it came off and its state (write 'not received' for a part that did not come in)",
    ],
  },
  {
    code: "INS",
    kind: "inspection",
    name: "Inspect reused parts",
    instructions: [
      "Check each part the counter meant to reuse: bores, ears, splines, seal surface, cracks, cross play",
      "A part that fails holds the shaft with what you found: it is replaced and inspected again, or the owner accepts it",
    ],
  },
];

/** The shop's routing with the re-tube steps first (a routing step already using one of their codes is left out). */
export function withRetubeSteps(routing: readonly RoutingStep[]): RoutingStep[] {
  const codes = new Set(retubeRouting.map((s) => s.code));
  return [...retubeRouting, ...routing.filter((s) => !codes.has(s.code))];
}

/** Short names for the floor's record sheets (the traveller's cells are narrow). */
const FLOOR_NAME: Record<RetubePart, string> = {
  frontEnd: "Front end",
  rearEnd: "Rear end",
  slipYoke: "Slip yoke",
  frontJoint: "Front joint",
  rearJoint: "Rear joint",
};

const stateKey = (part: RetubePart) => `${part}State`;
export const passKey = (part: RetubePart) => `${part}Passes`;
/** The inspection's findings, part by part: the reason a failed part gives for the hold. */
export const FINDINGS_KEY = "findings";

/**
 * Teardown: the weld-to-weld as received (checked against the counter's measurement, since the new
 * tube is cut to it) and each part as it came off with its state.
 */
export function teardownFields(ctx: StepContext): FieldSpec[] {
  const { report, repair } = ctx;
  const tol = report.shopFloor.lengthToleranceMm;
  const fields: FieldSpec[] = [];
  if (repair) {
    fields.push({
      key: "weldToWeldMm",
      label: "Weld-to-weld",
      type: "number",
      quantity: "length",
      limit: {
        min: repair.weldToWeldMm - tol,
        max: repair.weldToWeldMm + tol,
        nominal: repair.weldToWeldMm,
        source: `the counter's measurement (the new tube is cut to it), ± the as-welded length tolerance — ${report.shopFloor.sources[0] ?? "shop setting"}`,
      },
    });
  }
  for (const part of RETUBE_PARTS)
    fields.push({ key: stateKey(part), label: `${FLOOR_NAME[part]}: state`, type: "text" });
  return fields;
}

/**
 * Inspection: what was found, then "passes, reuse it" for each part the counter meant to reuse; a
 * "no" holds the step with the findings as the reason. With nothing reused, one confirmation that
 * every part is new.
 */
export function inspectionFields(ctx: StepContext): FieldSpec[] {
  const parts = ctx.repair ? reusedParts(ctx.repair) : [];
  if (!parts.length)
    return [{ key: "allNewParts", label: "Nothing reused: new parts fitted", type: "confirm" }];
  return [
    { key: FINDINGS_KEY, label: "What you found", type: "text" },
    ...parts.map((part): FieldSpec => ({
      key: passKey(part),
      label: `${FLOOR_NAME[part]} passes, reuse it`,
      type: "confirm",
      reasonKey: FINDINGS_KEY,
    })),
  ];
}

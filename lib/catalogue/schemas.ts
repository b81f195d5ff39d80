/**
 * The shop's configuration as the owner edits it, and the zod schema of a save. Built from the
 * core's own schemas (catalogue, limits, price book, floor settings) and extended with the ranges
 * and cross-checks an editor needs. Pure: the form and the server parse with the same schema.
 */
import { z } from "zod";
import { catalogueSchema, defaultSettings, limitSchema, type SettingKey } from "@/lib/driveline";
import { priceBookSchema } from "@/lib/pricing/price-book";
import { defaultFloorLimits, floorSettingsSchema, type FloorLimitKey } from "@/lib/traveller/settings";
import { FLOOR_LIMIT_META, LIMIT_META, rangeMessage, type LimitMeta } from "./limits";

/** A limit whose value lies in its range, with a source (the core's limit schema, narrowed). */
function rangedLimit(meta: LimitMeta) {
  const message = rangeMessage(meta);
  const value = z
    .number({ error: "must be a number" })
    .refine((v) => (meta.minExclusive ? v > meta.min : v >= meta.min) && v <= meta.max, { error: message });
  return limitSchema.extend({ value });
}

const settingKeys = Object.keys(defaultSettings) as SettingKey[];
const floorLimitKeys = Object.keys(defaultFloorLimits) as FloorLimitKey[];

const settingsDocumentSchema = z
  .object(
    Object.fromEntries(settingKeys.map((k) => [k, rangedLimit(LIMIT_META[k])])) as Record<
      SettingKey,
      ReturnType<typeof rangedLimit>
    >,
  )
  .check((ctx) => {
    const s = ctx.value;
    if (s.warnCriticalSpeedRatio.value > s.maxCriticalSpeedRatio.value)
      ctx.issues.push({
        code: "custom",
        input: s,
        path: ["warnCriticalSpeedRatio", "value"],
        message: "must not be above the largest service / critical speed",
      });
    if (s.slipOutMinMm.value > s.slipOutMaxMm.value)
      ctx.issues.push({
        code: "custom",
        input: s,
        path: ["slipOutMinMm", "value"],
        message: "must not be more than the most the slip yoke may be out",
      });
  });

const floorDocumentSchema = floorSettingsSchema
  .extend({
    limits: z.object(
      Object.fromEntries(floorLimitKeys.map((k) => [k, rangedLimit(FLOOR_LIMIT_META[k])])) as Record<
        FloorLimitKey,
        ReturnType<typeof rangedLimit>
      >,
    ),
  })
  .check((ctx) => {
    const routing = ctx.value.routing;
    const add = (path: (string | number)[], message: string) =>
      ctx.issues.push({ code: "custom", input: routing, path, message });
    const first = new Map<string, number>();
    routing.forEach((step, i) => {
      const seen = first.get(step.code);
      if (seen === undefined) first.set(step.code, i);
      else add(["routing", i, "code"], `must be unique (step ${seen + 1} already uses ${step.code})`);
    });
    // The floor's wiring needs one final inspection (sets the order ready) and one dispatch, last (ships it).
    const inspections = routing.flatMap((s, i) => (s.kind === "final-inspection" ? [i] : []));
    const dispatches = routing.flatMap((s, i) => (s.kind === "dispatch" ? [i] : []));
    if (inspections.length !== 1)
      add(["routing"], "must hold exactly one final-inspection step (it sets the order ready)");
    if (dispatches.length !== 1 || dispatches[0] !== routing.length - 1)
      add(["routing"], "must end with exactly one dispatch step (it ships the shaft)");
    else if (inspections.length === 1 && inspections[0]! > dispatches[0]!)
      add(["routing"], "must inspect before dispatch");
  });

/** Everything the owner edits, resolved: every limit with its value and source. */
export const shopConfigDocumentSchema = z.object({
  catalogue: catalogueSchema,
  settings: settingsDocumentSchema,
  priceBook: priceBookSchema,
  floor: floorDocumentSchema,
});
export type ShopConfigDocument = z.output<typeof shopConfigDocumentSchema>;
export type ShopConfigDocumentInput = z.input<typeof shopConfigDocumentSchema>;

/** POST /api/catalogue/versions — a new version, based on the one the editor was opened with. */
export const saveShopConfigBodySchema = shopConfigDocumentSchema.extend({
  basedOnVersion: z
    .number({ error: "must be the version number you started from" })
    .int({ error: "must be the version number you started from" })
    .min(1, { error: "must be the version number you started from" }),
  note: z
    .string({ error: "must be text" })
    .trim()
    .min(1, { error: "Say in a few words what changed and why." })
    .max(500, { error: "must be at most 500 characters" }),
});
export type SaveShopConfigBody = z.output<typeof saveShopConfigBodySchema>;
export type SaveShopConfigInput = z.input<typeof saveShopConfigBodySchema>;

/** zod's issue path as the form names fields: dots, numbers for rows (`catalogue.tubes.3.wallMm`). */
export function fieldPath(path: readonly PropertyKey[]): string {
  return path.map(String).join(".") || "body";
}

/** The first message per field, keyed by its dotted path. */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) fields[fieldPath(issue.path)] ??= issue.message;
  return fields;
}

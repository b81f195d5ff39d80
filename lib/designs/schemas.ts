import { z } from "zod";

/** Body of POST /api/designs/evaluate: the design file itself, or `{ design, curves? }`. */
export const evaluateDesignBodySchema = z.object({
  design: z.unknown(),
  curves: z.boolean().optional(),
});

/** How the shaft is used, as the customer tells the shop. */
export const SHAFT_USES = ["street", "towing", "off-road", "race", "industrial"] as const;
export type ShaftUse = (typeof SHAFT_USES)[number];

/** What the shaft goes in and how it is used (shared by the builder form and the API). */
export const designApplicationSchema = z.object({
  description: z
    .string({ error: "must be text" })
    .trim()
    .max(2000, { error: "must be at most 2000 characters" }),
  use: z.enum(SHAFT_USES, { error: "must be street, towing, off-road, race or industrial" }),
});
export type DesignApplication = z.infer<typeof designApplicationSchema>;

/** A draft's name (shared by the builder form and the API). */
export const designNameSchema = z
  .string({ error: "must be text" })
  .trim()
  .min(1, { error: "must not be empty" })
  .max(200, { error: "must be at most 200 characters" });

/**
 * Body of POST /api/designs and PUT /api/designs/[id]. `design` is checked with the core's
 * parseDesign (against the shop's catalogue) by the service, not here, so its messages are the
 * core's own. `customerId` is read only for staff (the counter saving for a phone customer).
 */
export const saveDesignBodySchema = z.object({
  name: designNameSchema,
  design: z.unknown(),
  application: designApplicationSchema,
  customerId: z.uuid({ error: "must be a customer id" }).optional(),
});
export type SaveDesignBody = z.infer<typeof saveDesignBodySchema>;

/** Query of GET /api/designs (staff may filter by customer). */
export const listDesignsQuerySchema = z.object({
  customerId: z.uuid({ error: "must be a customer id" }).optional(),
});

import { z } from "zod";

const reason = z
  .string({ error: "must be text" })
  .trim()
  .min(3, { error: "say why (at least 3 characters)" })
  .max(500, { error: "must be at most 500 characters" });

/** Query of GET /api/floor/scan: what the scanner (or a person) typed. */
export const scanFloorQuerySchema = z.object({
  code: z
    .string({ error: "scan a traveller barcode or a serial" })
    .trim()
    .min(1, { error: "scan a traveller barcode or a serial" })
    .max(100, { error: "is too long for a traveller code" }),
});

/**
 * Body of POST /api/floor/steps: the scanned step code, the values in the shop's units (checked
 * against the step's record sheet by the service) and a key the station keeps for this submission.
 */
export const submitStepBodySchema = z.object({
  code: z
    .string({ error: "scan the step's barcode" })
    .trim()
    .min(1, { error: "scan the step's barcode" })
    .max(100),
  values: z.record(z.string(), z.unknown(), { error: "must be an object of measured values" }),
  idempotencyKey: z
    .string({ error: "is required" })
    .trim()
    .min(1, { error: "is required" })
    .max(200, { error: "must be at most 200 characters" }),
});
export type SubmitStepBody = z.infer<typeof submitStepBodySchema>;

/** Body of POST /api/floor/work-orders/:id/concession — the owner accepts a held step. */
export const concedeHoldBodySchema = z.object({ reason });

/** Input of the desk's "Release to the shop" (a reason only when the deposit is not paid). */
export const releaseOrderBodySchema = z.object({
  orderId: z.uuid({ error: "must be an order id" }),
  reason: z.string().trim().max(500, { error: "must be at most 500 characters" }).optional(),
});

/** Input of "Void and reissue traveller" after a design change. */
export const reissueTravellerBodySchema = z.object({
  workOrderId: z.uuid({ error: "must be a work order id" }),
  reason,
});

/** Input of "Reorder" from an as-built record. */
export const reorderShaftBodySchema = z.object({
  serial: z.string().trim().min(1).max(40),
});

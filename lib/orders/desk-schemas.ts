import { z } from "zod";

/** The shortest written reason an owner may give for accepting a failed check (form and server alike). */
export const ACCEPTANCE_REASON_MIN_CHARS = 15;

const orderId = z.uuid({ error: "Not an order id." });

/** The counter e-mails the customer a link to pay what is due now. */
export const sendPaymentLinkSchema = z.object({ orderId });
export type SendPaymentLinkInput = z.infer<typeof sendPaymentLinkSchema>;

/** A payment taken at the counter: cash, cheque or card terminal, with a reference for the last two. */
export const recordCounterPaymentSchema = z
  .object({
    orderId,
    method: z.enum(["cash", "cheque", "terminal"], { error: "Choose cash, cheque or card terminal." }),
    /** Integer cents; left out, it is what the order asks for next. */
    amountCents: z
      .number({ error: "Enter the amount taken." })
      .int({ error: "Enter the amount in cents." })
      .positive({ error: "The amount must be more than zero." })
      .optional(),
    reference: z.string().trim().max(120, { error: "At most 120 characters." }).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.method !== "cash" && !v.reference)
      ctx.addIssue({
        code: "custom",
        path: ["reference"],
        message:
          v.method === "cheque" ? "The cheque number is required." : "The terminal reference is required.",
      });
  });
export type RecordCounterPaymentInput = z.infer<typeof recordCounterPaymentSchema>;

/** A note on an order: staff-only, or shown to the customer. */
export const addOrderNoteSchema = z.object({
  orderId,
  body: z
    .string({ error: "Write the note." })
    .trim()
    .min(2, { error: "Write the note." })
    .max(2000, { error: "At most 2,000 characters." }),
  visibility: z.enum(["staff", "customer"], { error: "Choose who sees the note." }),
});
export type AddOrderNoteInput = z.infer<typeof addOrderNoteSchema>;

/** Cancelling an order, with the reason (the customer reads it in the cancellation e-mail). */
export const cancelOrderSchema = z.object({
  orderId,
  reason: z
    .string({ error: "Say why the order is cancelled." })
    .trim()
    .min(5, { error: "Say why the order is cancelled (at least 5 characters)." })
    .max(500, { error: "At most 500 characters." }),
});
export type CancelOrderInput = z.infer<typeof cancelOrderSchema>;

/** An owner accepts one failed check for one order shaft, with a written reason. */
export const acceptFailedCheckSchema = z.object({
  orderId,
  shaftId: z.uuid({ error: "Not a shaft id." }),
  checkId: z.string().trim().min(1, { error: "Choose the check." }).max(100),
  reason: z
    .string({ error: "Write why this check does not apply to this order." })
    .trim()
    .min(ACCEPTANCE_REASON_MIN_CHARS, {
      error: `Write why this check does not apply to this order (at least ${ACCEPTANCE_REASON_MIN_CHARS} characters).`,
    })
    .max(1000, { error: "At most 1,000 characters." }),
});
export type AcceptFailedCheckInput = z.infer<typeof acceptFailedCheckSchema>;

/**
 * The counter edits an order's details: the promised date and where it ships. `version` is the
 * one the form was opened with: a save based on an older one is refused (409), naming who saved
 * in between, so two people at the desk never overwrite each other silently.
 */
export const updateOrderDetailsSchema = z.object({
  orderId,
  version: z.number({ error: "Reload the order." }).int({ error: "Reload the order." }).min(1),
  promisedDate: z.iso.date({ error: "Enter a date (yyyy-mm-dd)." }),
  shipTo: z.string().trim().max(500, { error: "At most 500 characters." }).nullable(),
});
export type UpdateOrderDetailsInput = z.infer<typeof updateOrderDetailsSchema>;

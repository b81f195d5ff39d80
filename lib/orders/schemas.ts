import { z } from "zod";

/** Placing an order from saved designs (the server re-evaluates and re-prices them). */
export const placeOrderBodySchema = z
  .object({
    designIds: z
      .array(z.uuid({ error: "Choose a saved design." }))
      .min(1, { error: "Add at least one shaft." })
      .max(10),
    fulfilment: z.enum(["pickup", "ship"], { error: "Choose pickup or shipping." }),
    shipTo: z.string().trim().max(500).optional(),
    notes: z.string().trim().max(2000).optional(),
    /** Counter only: the customer the order is for. */
    customerId: z.uuid().optional(),
    /**
     * Per design, in the order of `designIds`: the ids of the checks the customer (online) or the
     * counter (on the phone) acknowledged. Every warning must be among them, and at the counter
     * every failed check too; the server re-evaluates to know which those are.
     */
    shafts: z
      .array(
        z.object({
          acknowledgements: z
            .array(z.string().trim().min(1).max(200), { error: "Acknowledge the warnings as a list." })
            .max(50),
        }),
      )
      .max(10)
      .optional(),
  })
  .superRefine((v, ctx) => {
    if (v.shafts && v.shafts.length > v.designIds.length) {
      ctx.addIssue({ code: "custom", path: ["shafts"], message: "One entry per shaft of the order." });
    }
    if (v.fulfilment === "ship" && (!v.shipTo || v.shipTo.length < 8)) {
      ctx.addIssue({ code: "custom", path: ["shipTo"], message: "Enter the full shipping address." });
    }
  });
export type PlaceOrderBody = z.infer<typeof placeOrderBodySchema>;

export const refundPaymentBodySchema = z.object({
  paymentId: z.uuid(),
  amountCents: z
    .number({ error: "Enter the amount to refund." })
    .int()
    .positive({ error: "The refund must be more than zero." }),
  reason: z.string().trim().min(3, { error: "Say why (the customer sees this)." }).max(400),
});
export type RefundPaymentBody = z.infer<typeof refundPaymentBodySchema>;

export const startPaymentBodySchema = z.object({
  orderId: z.uuid(),
  kind: z.enum(["deposit", "balance", "full"]).optional(),
});

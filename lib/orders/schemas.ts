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
  })
  .superRefine((v, ctx) => {
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

"use server";
import { revalidatePath } from "next/cache";
import { refundPaymentBodySchema } from "@/lib/orders/schemas";
import { refundPayment } from "@/lib/orders/payments";
import { defineAction } from "./define-action";

/** Owner gives money back on a payment (audited with who and why). */
export const refundPaymentAction = defineAction(
  "payments.refund",
  refundPaymentBodySchema,
  async (input, user) => {
    const refund = await refundPayment(user, input);
    revalidatePath("/desk");
    return { id: refund.id, amountCents: refund.amountCents };
  },
);

"use server";
import { revalidatePath } from "next/cache";
import { sendPaymentLinkSchema } from "@/lib/orders/desk-schemas";
import { sendPaymentLink } from "@/lib/orders/payments";
import { defineAction } from "./define-action";

/** The counter e-mails the customer a link to pay what the order asks for now. */
export const sendPaymentLinkAction = defineAction(
  "orders.desk",
  sendPaymentLinkSchema,
  async ({ orderId }, user) => {
    const payment = await sendPaymentLink(orderId, user);
    revalidatePath(`/desk/orders/${orderId}`);
    return { amountCents: payment.amountCents, kind: payment.kind };
  },
);

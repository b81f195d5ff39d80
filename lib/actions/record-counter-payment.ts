"use server";
import { revalidatePath } from "next/cache";
import { recordCounterPaymentSchema } from "@/lib/orders/desk-schemas";
import { recordCounterPayment } from "@/lib/orders/counter-payment";
import { defineAction } from "./define-action";

/** The counter records money taken in person (cash, cheque, card terminal). */
export const recordCounterPaymentAction = defineAction(
  "orders.desk",
  recordCounterPaymentSchema,
  async (input, user) => {
    const payment = await recordCounterPayment(user, input);
    revalidatePath(`/desk/orders/${input.orderId}`);
    return { id: payment.id, amountCents: payment.amountCents, kind: payment.kind };
  },
);

"use server";
import { z } from "zod";
import { revalidatePath } from "next/cache";
import { requestBalance } from "@/lib/orders/payments";
import { defineAction } from "./define-action";

/** Counter or owner asks the customer for the balance (normally after final inspection). */
export const requestBalanceAction = defineAction(
  "orders.desk",
  z.object({ orderId: z.uuid() }),
  async ({ orderId }, user) => {
    const payment = await requestBalance(orderId, user);
    revalidatePath(`/desk/orders/${orderId}`);
    return { checkoutUrl: payment.checkoutUrl, amountCents: payment.amountCents };
  },
);

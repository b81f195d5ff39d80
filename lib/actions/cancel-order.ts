"use server";
import { revalidatePath } from "next/cache";
import { cancelOrderSchema } from "@/lib/orders/desk-schemas";
import { cancelOrder } from "@/lib/orders/cancel";
import { defineAction } from "./define-action";

/** Counter (before release) or owner cancels an order; the deposit is refunded per the shop's policy. */
export const cancelOrderAction = defineAction("orders.desk", cancelOrderSchema, async (input, user) => {
  const result = await cancelOrder(user, input);
  revalidatePath(`/desk/orders/${input.orderId}`);
  return result;
});

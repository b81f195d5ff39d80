"use server";
import { revalidatePath } from "next/cache";
import { updateOrderDetailsSchema } from "@/lib/orders/desk-schemas";
import { updateOrderDetails } from "@/lib/orders/details";
import { defineAction } from "./define-action";

/** Counter or owner saves an order's promised date and ship-to address (409 when someone saved since). */
export const updateOrderDetailsAction = defineAction(
  "orders.desk",
  updateOrderDetailsSchema,
  async (input, user) => {
    const details = await updateOrderDetails(user, input);
    revalidatePath(`/desk/orders/${input.orderId}`);
    return details;
  },
);

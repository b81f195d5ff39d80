"use server";
import { revalidatePath } from "next/cache";
import { releaseOrderBodySchema } from "@/lib/floor/schemas";
import { releaseOrder } from "@/lib/floor/work-orders";
import { defineAction } from "./define-action";

/** The counter releases an order to the shop (with a reason when the deposit is not paid). */
export const releaseOrderAction = defineAction(
  "orders.desk",
  releaseOrderBodySchema,
  async ({ orderId, reason }, user) => {
    const released = await releaseOrder(orderId, user, reason);
    revalidatePath(`/desk/orders/${orderId}`);
    return { serials: released.workOrders.map((w) => w.serial) };
  },
);

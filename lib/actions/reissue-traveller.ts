"use server";
import { revalidatePath } from "next/cache";
import { reissueTravellerBodySchema } from "@/lib/floor/schemas";
import { voidAndReissue } from "@/lib/floor/work-orders";
import { defineAction } from "./define-action";

/** After a design change: the shaft's traveller in force is void and a new revision is issued (audited). */
export const reissueTravellerAction = defineAction(
  "orders.desk",
  reissueTravellerBodySchema,
  async ({ workOrderId, reason }, user) => {
    const issued = await voidAndReissue(workOrderId, user, reason);
    revalidatePath("/desk/orders", "layout");
    return issued;
  },
);

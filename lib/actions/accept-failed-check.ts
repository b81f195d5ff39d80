"use server";
import { revalidatePath } from "next/cache";
import { acceptFailedCheckSchema } from "@/lib/orders/desk-schemas";
import { acceptFailedCheck } from "@/lib/orders/engineering-signoff";
import { defineAction } from "./define-action";

/** An owner accepts one failed engineering check for one order, with a written reason. */
export const acceptFailedCheckAction = defineAction(
  "engineering.signoff",
  acceptFailedCheckSchema,
  async (input, user) => {
    const acceptance = await acceptFailedCheck(user, input);
    revalidatePath(`/desk/orders/${input.orderId}`);
    return { checkId: acceptance.checkId, byName: acceptance.byName, at: acceptance.at };
  },
);

"use server";
import { revalidatePath } from "next/cache";
import { addOrderNoteSchema } from "@/lib/orders/desk-schemas";
import { addOrderNote } from "@/lib/orders/notes";
import { defineAction } from "./define-action";

/** Counter or owner adds a note to an order (staff-only or for the customer). */
export const addOrderNoteAction = defineAction("orders.desk", addOrderNoteSchema, async (input, user) => {
  const note = await addOrderNote(user, input);
  revalidatePath(`/desk/orders/${input.orderId}`);
  return note;
});

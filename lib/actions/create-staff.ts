"use server";
import { revalidatePath } from "next/cache";
import { createStaffBodySchema } from "@/lib/auth/schemas";
import { createStaffUser } from "@/lib/users/staff";
import { defineAction } from "./define-action";

/** Owner creates a counter, floor or owner account. */
export const createStaffAction = defineAction("staff.manage", createStaffBodySchema, async (input, user) => {
  const staff = await createStaffUser(input, user.id);
  revalidatePath("/overview/staff");
  return staff;
});

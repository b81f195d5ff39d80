"use server";
import { revalidatePath } from "next/cache";
import { changeStaffRoleBodySchema } from "@/lib/users/schemas";
import { changeStaffRole } from "@/lib/users/staff";
import { defineAction } from "./define-action";

/** Owner sets a staff member's role (never their own, never the last owner's). */
export const changeStaffRoleAction = defineAction(
  "staff.manage",
  changeStaffRoleBodySchema,
  async (input, user) => {
    const result = await changeStaffRole(input, user.id);
    revalidatePath("/overview/staff");
    return result;
  },
);

"use server";
import { revalidatePath } from "next/cache";
import { setStaffActiveBodySchema } from "@/lib/users/schemas";
import { setStaffActive } from "@/lib/users/staff";
import { defineAction } from "./define-action";

/** Owner deactivates (signing the person out everywhere) or reactivates a staff account. */
export const setStaffActiveAction = defineAction(
  "staff.manage",
  setStaffActiveBodySchema,
  async (input, user) => {
    const result = await setStaffActive(input, user.id);
    revalidatePath("/overview/staff");
    return result;
  },
);

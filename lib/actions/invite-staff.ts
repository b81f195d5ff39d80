"use server";
import { revalidatePath } from "next/cache";
import { inviteStaffBodySchema, staffInvitationBodySchema } from "@/lib/users/schemas";
import { inviteStaff, resendStaffInvitation, revokeStaffInvitation } from "@/lib/users/invitations";
import { defineAction } from "./define-action";

/** Owner invites a counter, floor or owner: a one-time link by e-mail. */
export const inviteStaffAction = defineAction("staff.manage", inviteStaffBodySchema, async (input, user) => {
  const invitation = await inviteStaff(input, user);
  revalidatePath("/overview/staff");
  return invitation;
});

/** Owner sends a pending invitation again (a new link; the old one stops working). */
export const resendStaffInvitationAction = defineAction(
  "staff.manage",
  staffInvitationBodySchema,
  async (input, user) => {
    const invitation = await resendStaffInvitation(input.invitationId, user);
    revalidatePath("/overview/staff");
    return invitation;
  },
);

/** Owner withdraws a pending invitation. */
export const revokeStaffInvitationAction = defineAction(
  "staff.manage",
  staffInvitationBodySchema,
  async (input, user) => {
    const result = await revokeStaffInvitation(input.invitationId, user.id);
    revalidatePath("/overview/staff");
    return result;
  },
);

import { z } from "zod";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { signUpBodySchema } from "@/lib/auth/schemas";

const staffRole = z.enum(STAFF_ROLES, { error: "Choose counter, floor or owner." });
const userId = z.uuid({ error: "Choose a staff member." });
const invitationId = z.uuid({ error: "Choose an invitation." });

/** The owner invites someone to the staff: the link goes to this address. */
export const inviteStaffBodySchema = z.object({
  name: z.string().trim().min(2, { error: "Enter the person's name." }).max(120),
  email: z
    .email({ error: "Enter a valid e-mail address." })
    .max(254, { error: "Use a shorter e-mail address." }),
  role: staffRole,
});
export type InviteStaffBody = z.infer<typeof inviteStaffBodySchema>;

/** Resend or withdraw one pending invitation. */
export const staffInvitationBodySchema = z.object({ invitationId });
export type StaffInvitationBody = z.infer<typeof staffInvitationBodySchema>;

export const changeStaffRoleBodySchema = z.object({ userId, role: staffRole });
export type ChangeStaffRoleBody = z.infer<typeof changeStaffRoleBodySchema>;

export const setStaffActiveBodySchema = z.object({
  userId,
  active: z.boolean({ error: "Say whether the account should be active." }),
});
export type SetStaffActiveBody = z.infer<typeof setStaffActiveBodySchema>;

/** Accepting a staff invitation: the address and role come from the invitation, not the form. */
export const acceptStaffInviteBodySchema = z.object({
  token: z.string().min(20).max(200),
  name: signUpBodySchema.shape.name,
  password: signUpBodySchema.shape.password,
});
export type AcceptStaffInviteBody = z.infer<typeof acceptStaffInviteBodySchema>;

/** The invitee's form (the token travels separately). */
export const acceptStaffInviteFormSchema = acceptStaffInviteBodySchema.omit({ token: true });
export type AcceptStaffInviteForm = z.infer<typeof acceptStaffInviteFormSchema>;

import { z } from "zod";
import { ROLES } from "./roles";
import { safeNextPath } from "@/lib/http/safe-next";

export const signInBodySchema = z.object({
  email: z.email({ error: "Enter the e-mail address you signed up with." }),
  password: z.string().min(1, { error: "Enter your password." }),
});
export type SignInBody = z.infer<typeof signInBodySchema>;

export const signUpBodySchema = z.object({
  name: z.string().trim().min(2, { error: "Enter your name (at least 2 characters)." }).max(120),
  email: z.email({ error: "Enter a valid e-mail address." }),
  password: z.string().min(10, { error: "Use at least 10 characters." }).max(128),
});
export type SignUpBody = z.infer<typeof signUpBodySchema>;

export const createStaffBodySchema = z.object({
  name: z.string().trim().min(2, { error: "Enter the person's name." }).max(120),
  email: z.email({ error: "Enter a valid e-mail address." }),
  role: z.enum(ROLES.filter((r) => r !== "customer") as ["counter", "floor", "owner"], {
    error: "Choose counter, floor or owner.",
  }),
  password: z.string().min(10, { error: "Use at least 10 characters." }).max(128),
});
export type CreateStaffBody = z.infer<typeof createStaffBodySchema>;

/**
 * What the server accepts at sign-up (the auth library's JSON endpoint): the form's fields, the
 * return path, and nothing else — every field checked here, not only in the browser.
 */
export const signUpServerBodySchema = signUpBodySchema
  .extend({
    email: z
      .email({ error: "Enter a valid e-mail address." })
      .max(254, { error: "Use a shorter e-mail address." }),
    callbackURL: z
      .string()
      .refine((v) => safeNextPath(v) !== null, { error: "Must be a path on this site." })
      .optional(),
    rememberMe: z.boolean().optional(),
  })
  .strict();

/** Accepting the counter's invitation: the address comes from the invitation, not the form. */
export const acceptInviteBodySchema = z.object({
  token: z.string().min(20).max(200),
  name: signUpBodySchema.shape.name,
  password: signUpBodySchema.shape.password,
});
export type AcceptInviteBody = z.infer<typeof acceptInviteBodySchema>;

/** The counter invites a customer it knows to an account of their own. */
export const inviteCustomerBodySchema = z.object({
  customerId: z.uuid({ error: "Choose a customer." }),
});
export type InviteCustomerBody = z.infer<typeof inviteCustomerBodySchema>;

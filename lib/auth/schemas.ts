import { z } from "zod";
import { ROLES } from "./roles";

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

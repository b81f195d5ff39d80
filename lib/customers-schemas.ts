import { z } from "zod";
import { hasNoNul } from "@/lib/validation";

export const createCustomerBodySchema = z.object({
  name: z.string().trim().min(2, { error: "Enter the customer's name." }).max(120),
  email: z.email({ error: "Enter an e-mail address for receipts and updates." }),
  phone: z
    .string()
    .trim()
    .max(40, { error: "At most 40 characters." })
    .refine((v) => v === "" || (/^[0-9+()\-.\s/x]+$/i.test(v) && v.replace(/[^0-9]/g, "").length >= 7), {
      error: "Enter a phone number of at least 7 digits (spaces, dashes and brackets are fine).",
    })
    .optional(),
  company: z.string().trim().max(120).optional(),
  addressLines: z.string().trim().max(500).optional(),
});
export type CreateCustomerBody = z.infer<typeof createCustomerBodySchema>;

/** Query of GET /api/customers/search: any part of a name, phone, e-mail or company. */
export const searchCustomersQuerySchema = z.object({
  q: z
    .string({ error: "Type part of a name, phone, e-mail or company." })
    .trim()
    .min(1, { error: "Type part of a name, phone, e-mail or company." })
    .max(100, { error: "At most 100 characters." })
    .refine(hasNoNul, { error: "Must not contain a NUL character." }),
  limit: z.coerce
    .number({ error: "A whole number from 1 to 20." })
    .int({ error: "A whole number from 1 to 20." })
    .min(1, { error: "A whole number from 1 to 20." })
    .max(20, { error: "A whole number from 1 to 20." })
    .default(8),
});
export type SearchCustomersQuery = z.infer<typeof searchCustomersQuerySchema>;

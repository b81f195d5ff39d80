import { z } from "zod";

export const createCustomerBodySchema = z.object({
  name: z.string().trim().min(2, { error: "Enter the customer's name." }).max(120),
  email: z.email({ error: "Enter an e-mail address for receipts and updates." }),
  phone: z.string().trim().max(40).optional(),
  company: z.string().trim().max(120).optional(),
  addressLines: z.string().trim().max(500).optional(),
});
export type CreateCustomerBody = z.infer<typeof createCustomerBodySchema>;

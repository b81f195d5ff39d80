"use server";
import { inviteCustomerBodySchema } from "@/lib/auth/schemas";
import { inviteCustomer } from "@/lib/auth/invite";
import { defineAction } from "./define-action";

/** Counter sends a phone customer a sign-up link to the address on record. */
export const inviteCustomerAction = defineAction("orders.desk", inviteCustomerBodySchema, (input, user) =>
  inviteCustomer(input.customerId, user.id),
);

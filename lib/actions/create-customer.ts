"use server";
import { createCustomerBodySchema } from "@/lib/customers-schemas";
import { createPhoneCustomer } from "@/lib/customers";
import { defineAction } from "./define-action";

/** Counter enters a new customer for a phone order. */
export const createCustomerAction = defineAction("orders.desk", createCustomerBodySchema, (input, user) =>
  createPhoneCustomer(input, user.id),
);

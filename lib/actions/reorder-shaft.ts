"use server";
import { reorderShaftBodySchema } from "@/lib/floor/schemas";
import { reorderShaft } from "@/lib/floor/reorder";
import { defineAction } from "./define-action";

/** The counter or an owner reorders a built shaft for its customer (a new draft, same design). */
export const reorderShaftAction = defineAction("orders.desk", reorderShaftBodySchema, ({ serial }, user) =>
  reorderShaft(user, serial),
);

/** A customer reorders one of their own built shafts. */
export const reorderMyShaftAction = defineAction("orders.own", reorderShaftBodySchema, ({ serial }, user) =>
  reorderShaft(user, serial),
);

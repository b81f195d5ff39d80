import type { Role } from "./roles";

/** Everything a signed-in user may be allowed to do, as "resource.action". */
export type Permission =
  | "orders.own" // see and place one's own orders
  | "orders.desk" // see every order, enter phone orders, take payment
  | "floor.scan" // sign off traveller steps and record measurements
  | "shop.overview" // status, lateness, throughput and money
  | "shop.manage" // catalogue, prices, settings
  | "staff.manage" // create staff accounts
  | "payments.refund"
  | "orders.cancel-released" // cancel an order already released to the shop
  | "engineering.signoff" // accept a failed engineering check for one order
  | "mail.outbox"; // see what the app has sent (demo mode)

/** The one table of who may do what. Checked on the server only. */
export const ROLE_PERMISSIONS: Record<Role, readonly Permission[]> = {
  customer: ["orders.own"],
  counter: ["orders.desk"],
  floor: ["floor.scan"],
  owner: [
    "orders.desk",
    "floor.scan",
    "shop.overview",
    "shop.manage",
    "staff.manage",
    "payments.refund",
    "orders.cancel-released",
    "engineering.signoff",
    "mail.outbox",
  ],
};

export function can(role: Role, permission: Permission): boolean {
  return ROLE_PERMISSIONS[role].includes(permission);
}

/** Where each role lands after signing in. */
export const ROLE_HOME: Record<Role, string> = {
  customer: "/orders",
  counter: "/desk",
  floor: "/floor",
  owner: "/overview",
};

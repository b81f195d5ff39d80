/** The four kinds of user. Customers sign up themselves; staff are created by an owner. */
export const ROLES = ["customer", "counter", "floor", "owner"] as const;
export type Role = (typeof ROLES)[number];
export const STAFF_ROLES = ["counter", "floor", "owner"] as const satisfies readonly Role[];
export type StaffRole = (typeof STAFF_ROLES)[number];

export function isStaffRole(value: unknown): value is StaffRole {
  return typeof value === "string" && (STAFF_ROLES as readonly string[]).includes(value);
}

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}

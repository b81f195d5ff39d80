import { describe, expect } from "vitest";
import { AccessError, authorize } from "@/lib/auth/guard";
import { ROLE_PERMISSIONS, type Permission } from "@/lib/auth/permissions";
import { createStaffUser } from "@/lib/users/staff";
import type { Role } from "@/lib/auth/roles";
import { authRequest, sessionCookie, signUpVerified, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";

const PASSWORD = "a-long-password-1";

async function signedInAs(role: Role): Promise<Headers> {
  const email = uniqueEmail(role);
  if (role === "customer") {
    await signUpVerified({ name: "Cust", email, password: PASSWORD });
  } else {
    await createStaffUser({ name: `A ${role}`, email, role, password: PASSWORD }, null);
  }
  const res = await authRequest("/sign-in/email", { email, password: PASSWORD });
  expect(res.status).toBe(200);
  return new Headers({ cookie: sessionCookie(res) });
}

const STAFF_PERMISSIONS: Permission[] = [
  "orders.desk",
  "floor.scan",
  "shop.overview",
  "shop.manage",
  "staff.manage",
  "payments.refund",
];

describe("the one access guard", () => {
  dbTest("no session → 401", async () => {
    await expect(authorize("orders.own", new Headers())).rejects.toMatchObject({ status: 401 });
  });

  dbTest("a customer is refused every staff permission (403)", async () => {
    const headers = await signedInAs("customer");
    for (const permission of STAFF_PERMISSIONS) {
      const error = await authorize(permission, headers).catch((e: unknown) => e);
      expect(error, permission).toBeInstanceOf(AccessError);
      expect((error as AccessError).status).toBe(403);
    }
    await expect(authorize("orders.own", headers)).resolves.toMatchObject({ role: "customer" });
  });

  dbTest("each staff role holds exactly the permissions of the role table", async () => {
    for (const role of ["counter", "floor", "owner"] as const) {
      const headers = await signedInAs(role);
      for (const permission of [...STAFF_PERMISSIONS, "orders.own" as const]) {
        const allowed = ROLE_PERMISSIONS[role].includes(permission);
        const outcome = await authorize(permission, headers).then(
          () => "allowed",
          (e: AccessError) => e.status,
        );
        expect(outcome, `${role} ${permission}`).toBe(allowed ? "allowed" : 403);
      }
    }
  });
});

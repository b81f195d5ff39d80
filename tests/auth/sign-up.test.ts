import { describe, expect } from "vitest";
import { AuditEvent, Customer, User } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { authorize } from "@/lib/auth/guard";
import { authRequest, sessionCookie, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";

describe("sign-up", () => {
  dbTest("creates a customer, their customer record and an audit entry", async () => {
    const email = uniqueEmail("signup");
    const res = await authRequest("/sign-up/email", {
      name: "Ada Test",
      email,
      password: "a-long-password-1",
    });
    expect(res.status).toBe(200);

    const em = await getEm();
    const user = await em.findOneOrFail(User, { email });
    expect(user.role).toBe("customer");
    const customer = await em.findOneOrFail(Customer, { user: user.id });
    expect(customer.email).toBe(email);
    expect(await em.count(AuditEvent, { action: "user.sign-up", subjectId: user.id })).toBe(1);

    // The new session is a customer's, and the one guard says so.
    const me = await authorize(null, new Headers({ cookie: sessionCookie(res) }));
    expect(me).toMatchObject({ email, role: "customer" });
  });

  dbTest("cannot choose its own role", async () => {
    const email = uniqueEmail("sneaky");
    const res = await authRequest("/sign-up/email", {
      name: "Sneaky",
      email,
      password: "a-long-password-1",
      role: "owner",
    });
    const em = await getEm();
    const user = await em.findOne(User, { email });
    // Either refused outright or created as a customer: never an owner.
    if (res.ok) expect(user?.role).toBe("customer");
    else expect(user).toBeNull();
  });

  dbTest("refuses a short password and names the problem", async () => {
    const res = await authRequest("/sign-up/email", {
      name: "Short",
      email: uniqueEmail("short"),
      password: "short",
    });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { message: string }).message).toMatch(/password/i);
  });
});

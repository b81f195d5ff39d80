import { describe, expect } from "vitest";
import { AuditEvent, Customer, EmailMessage, User } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { authorize } from "@/lib/auth/guard";
import { createPhoneCustomer, customerForUser } from "@/lib/customers";
import { createStaffUser } from "@/lib/users/staff";
import { listOrders } from "@/lib/orders/queries";
import { authRequest, openLink, sessionCookie, uniqueEmail, verificationLink } from "../setup/auth-requests";
import { dbTest } from "../setup/db";
import { createTestOrder } from "../setup/test-orders";

const PASSWORD = "a-long-password-1";

/** An order the counter took for a phone customer (demo data). */
async function placeCounterOrder(customerId: string): Promise<string> {
  return (await createTestOrder(await getEm(), { customerId })).number;
}

/** The order numbers a customer's order list shows. */
async function listOrdersFor(user: User): Promise<string[]> {
  const rows = await listOrders(await getEm(), {
    id: user.id,
    name: user.name,
    email: user.email,
    role: "customer",
  });
  return rows.map((r) => r.number);
}

describe("sign-up with e-mail verification", () => {
  dbTest("makes an unverified account with no session; the link verifies, links and signs in", async () => {
    const email = uniqueEmail("signup");
    const res = await authRequest("/sign-up/email", { name: "Ada Test", email, password: PASSWORD });
    expect(res.status).toBe(200);
    expect(sessionCookie(res)).not.toMatch(/session_token=\w/);

    const em = await getEm();
    const user = await em.findOneOrFail(User, { email });
    expect(user.role).toBe("customer");
    expect(user.emailVerified).toBe(false);
    expect(await em.count(Customer, { user: user.id })).toBe(0);
    expect(await em.count(AuditEvent, { action: "user.sign-up", subjectId: user.id })).toBe(1);

    // The link went through the mail port's outbox.
    const mail = await em.findOneOrFail(EmailMessage, { to: email, template: "verify-email" });
    expect(mail.subject).toMatch(/confirm your e-mail/i);

    // Signing in before verifying is refused and says why.
    const early = await authRequest("/sign-in/email", { email, password: PASSWORD });
    expect(early.status).toBe(403);
    expect(((await early.json()) as { code: string }).code).toBe("EMAIL_NOT_VERIFIED");

    const verified = await openLink(await verificationLink(email));
    expect(verified.status).toBe(302);
    expect(verified.headers.get("location")).toBe("/");
    const me = await authorize(null, new Headers({ cookie: sessionCookie(verified) }));
    expect(me).toMatchObject({ email, role: "customer" });
    const customer = await customerForUser(user.id);
    expect(customer?.email).toBe(email);
  });

  dbTest("a phone customer's address is not taken over by an unverified sign-up", async () => {
    const counter = await createStaffUser(
      { name: "Counter", email: uniqueEmail("counter"), role: "counter", password: PASSWORD },
      null,
    );
    const email = uniqueEmail("phone");
    const phone = await createPhoneCustomer({ name: "Phone Person", email }, counter.id);
    const order = await placeCounterOrder(phone.id);

    const res = await authRequest("/sign-up/email", { name: "Someone Else", email, password: PASSWORD });
    expect(res.status).toBe(200);
    const em = await getEm();
    const intruder = await em.findOneOrFail(User, { email });
    // Not linked, and no way in: no session, sign-in refused, no orders.
    expect((await em.findOneOrFail(Customer, { id: phone.id })).user).toBeNull();
    expect(await customerForUser(intruder.id)).toBeNull();
    expect((await authRequest("/sign-in/email", { email, password: PASSWORD })).status).toBe(403);
    expect(await listOrdersFor(intruder)).toEqual([]);

    // Whoever reads that inbox proves the address: now the phone customer's record is theirs.
    const verified = await openLink(await verificationLink(email));
    expect(verified.status).toBe(302);
    expect((await customerForUser(intruder.id))?.id).toBe(phone.id);
    expect(await listOrdersFor(intruder)).toContain(order);
  });

  dbTest("resending the link sends a new e-mail for an unverified address", async () => {
    const email = uniqueEmail("resend");
    await authRequest("/sign-up/email", { name: "Re Send", email, password: PASSWORD });
    const res = await authRequest("/send-verification-email", { email, callbackURL: "/orders" });
    expect(res.status).toBe(200);
    const em = await getEm();
    expect(await em.count(EmailMessage, { to: email, template: "verify-email" })).toBe(2);
  });

  dbTest("a tampered link does not verify", async () => {
    const email = uniqueEmail("tamper");
    await authRequest("/sign-up/email", { name: "Tam Per", email, password: PASSWORD });
    const link = await verificationLink(email);
    const res = await openLink(
      link.replace(/token=([^&]+)/, (_m, t: string) => `token=${t.slice(0, -4)}AAAA`),
    );
    expect(sessionCookie(res)).not.toMatch(/session_token=\w/);
    const em = await getEm();
    expect((await em.findOneOrFail(User, { email })).emailVerified).toBe(false);
  });
});

describe("sign-up fields are checked on the server", () => {
  const good = () => ({ name: "Val Idate", email: uniqueEmail("valid"), password: PASSWORD });
  const CASES: [string, Record<string, unknown>, string][] = [
    ["a short password", { password: "short" }, "password"],
    ["a very long password", { password: "x".repeat(129) }, "password"],
    ["a one-letter name", { name: "A" }, "name"],
    ["a blank name", { name: "   " }, "name"],
    ["a name of 121 characters", { name: "N".repeat(121) }, "name"],
    ["a name that is not text", { name: 42 }, "name"],
    ["an invalid e-mail", { email: "not-an-address" }, "email"],
    ["a missing e-mail", { email: undefined }, "email"],
    ["a role", { role: "owner" }, "role"],
    ["an image", { image: "https://evil.example/x.png" }, "image"],
    ["a foreign return address", { callbackURL: "https://evil.example/" }, "callbackURL"],
  ];

  for (const [label, change, field] of CASES) {
    dbTest(`refuses ${label} with 422 naming "${field}"`, async () => {
      const body = { ...good(), ...change };
      const res = await authRequest("/sign-up/email", body);
      expect(res.status).toBe(422);
      const json = (await res.json()) as { error: { code: string; fields: Record<string, string> } };
      expect(json.error.code).toBe("invalid");
      expect(Object.keys(json.error.fields)).toContain(field);
      const em = await getEm();
      if (typeof body.email === "string") expect(await em.count(User, { email: body.email })).toBe(0);
    });
  }
});

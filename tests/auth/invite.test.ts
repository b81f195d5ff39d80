import { describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { Customer, EmailMessage, User } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { authorize } from "@/lib/auth/guard";
import { findInvite, inviteCustomer } from "@/lib/auth/invite";
import { createPhoneCustomer } from "@/lib/customers";
import { createStaffUser } from "@/lib/users/staff";
import { POST as acceptInvitePost } from "@/app/api/auth/invite/route";
import { appUrl } from "@/lib/http/app-url";
import { authRequest, sessionCookie, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";

const PASSWORD = "a-long-password-1";

async function counterUser() {
  return createStaffUser(
    { name: "Counter", email: uniqueEmail("counter"), role: "counter", password: PASSWORD },
    null,
  );
}

/** The invitation link's token, read from the e-mail in the outbox. */
async function inviteToken(email: string): Promise<string> {
  const em = await getEm();
  const [mail] = await em.find(
    EmailMessage,
    { to: email, template: "customer-invite" },
    { orderBy: { createdAt: "desc" }, limit: 1 },
  );
  const token = mail?.text.match(/\/sign-up\?invite=([A-Za-z0-9_-]+)/)?.[1];
  if (!token) throw new Error("no invitation e-mail");
  return token;
}

function accept(body: unknown, headers: Record<string, string> = {}) {
  return acceptInvitePost(
    new NextRequest(`${appUrl()}/api/auth/invite`, {
      method: "POST",
      headers: { "content-type": "application/json", ...headers },
      body: JSON.stringify(body),
    }),
    { params: Promise.resolve({}) },
  );
}

describe("the counter invites a phone customer", () => {
  dbTest("the link makes a verified account linked to their record, once", async () => {
    const counter = await counterUser();
    const email = uniqueEmail("invited");
    const phone = await createPhoneCustomer({ name: "Harl Invite", email }, counter.id);
    await inviteCustomer(phone.id, counter.id);
    const token = await inviteToken(email);
    expect(await findInvite(token)).toMatchObject({ customerId: phone.id, email });

    const res = await accept({ token, name: "Harl Invite", password: PASSWORD });
    expect(res.status).toBe(201);
    const me = await authorize(null, new Headers({ cookie: sessionCookie(res) }));
    expect(me).toMatchObject({ email, role: "customer" });
    const em = await getEm();
    const user = await em.findOneOrFail(User, { email });
    expect(user.emailVerified).toBe(true);
    expect((await em.findOneOrFail(Customer, { id: phone.id })).user?.id).toBe(user.id);
    expect(await em.count(Customer, { email })).toBe(1);

    // The link works once.
    const again = await accept({ token, name: "Someone", password: PASSWORD });
    expect(again.status).toBe(404);
    // And the customer now has an account: no second invitation.
    await expect(inviteCustomer(phone.id, counter.id)).rejects.toMatchObject({ code: "conflict" });
  });

  dbTest("an unverified sign-up squatting the address is replaced by the invited customer", async () => {
    const counter = await counterUser();
    const email = uniqueEmail("squat");
    const phone = await createPhoneCustomer({ name: "Real Person", email }, counter.id);
    await authRequest("/sign-up/email", { name: "Squatter", email, password: "squatters-password" });
    await inviteCustomer(phone.id, counter.id);
    const res = await accept({ token: await inviteToken(email), name: "Real Person", password: PASSWORD });
    expect(res.status).toBe(201);
    // The squatter's password no longer opens anything.
    expect((await authRequest("/sign-in/email", { email, password: "squatters-password" })).status).toBe(401);
    const em = await getEm();
    expect((await em.findOneOrFail(Customer, { id: phone.id }, { populate: ["user"] })).user?.name).toBe(
      "Real Person",
    );
  });

  dbTest("refuses bad input and foreign sites", async () => {
    expect((await accept({ token: "x".repeat(30), name: "A Name", password: PASSWORD })).status).toBe(404);
    const bad = await accept({ token: "x".repeat(30), name: "A", password: "short" });
    expect(bad.status).toBe(422);
    const fields = ((await bad.json()) as { error: { fields: Record<string, string> } }).error.fields;
    expect(Object.keys(fields).sort()).toEqual(["name", "password"]);
    const cross = await accept(
      { token: "x".repeat(30), name: "A Name", password: PASSWORD },
      { "sec-fetch-site": "cross-site", origin: "http://evil.example" },
    );
    expect(cross.status).toBe(403);
  });
});

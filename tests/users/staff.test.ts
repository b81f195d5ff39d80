import { beforeAll, describe, expect, vi } from "vitest";
import { NextRequest } from "next/server";
import { Client } from "pg";
import { AuditEvent, EmailMessage, Session, StaffInvitation, User } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { authorize } from "@/lib/auth/guard";
import { appUrl } from "@/lib/http/app-url";
import { createStaffUser, changeStaffRole, setStaffActive } from "@/lib/users/staff";
import { lookupStaffInvitation } from "@/lib/users/invitations";
import {
  inviteStaffAction,
  resendStaffInvitationAction,
  revokeStaffInvitationAction,
} from "@/lib/actions/invite-staff";
import { changeStaffRoleAction } from "@/lib/actions/change-staff-role";
import { setStaffActiveAction } from "@/lib/actions/set-staff-active";
import { POST as acceptPost } from "@/app/api/auth/staff-invite/route";
import { POST as signInPost } from "@/app/api/sign-in/route";
import { authRequest, sessionCookie, signUpVerified, uniqueEmail } from "../setup/auth-requests";
import { dbTest, requireDatabase } from "../setup/db";

// Server actions read the session from next/headers; outside a Next request we hand it the cookie.
const session = vi.hoisted(() => ({ cookie: "" }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ cookie: session.cookie }) }));
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const PASSWORD = "a-long-password-1";

interface Member {
  id: string;
  email: string;
  cookie: string;
}

async function staffMember(role: "counter" | "floor" | "owner", name = `A ${role}`): Promise<Member> {
  const email = uniqueEmail(role);
  const made = await createStaffUser({ name, email, role, password: PASSWORD }, null);
  const res = await authRequest("/sign-in/email", { email, password: PASSWORD });
  expect(res.status).toBe(200);
  return { id: made.id, email, cookie: sessionCookie(res) };
}

function acceptInvite(body: unknown, headers: Record<string, string> = {}) {
  return acceptPost(
    new NextRequest(`${appUrl()}/api/auth/staff-invite`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: appUrl(), ...headers },
      body: JSON.stringify(body),
    }),
    { params: Promise.resolve({}) },
  );
}

/** The link's token from the newest staff invitation e-mail in the outbox (what the mail fake shows). */
async function tokenFromOutbox(email: string): Promise<string> {
  const em = await getEm();
  const [mail] = await em.find(
    EmailMessage,
    { to: email, template: "staff-invite" },
    { orderBy: { createdAt: "desc" }, limit: 1 },
  );
  const token = mail?.text.match(/\/set-password\?token=([A-Za-z0-9_-]+)/)?.[1];
  if (!token) throw new Error(`no staff invitation e-mail to ${email}`);
  return token;
}

async function auditOf(subjectId: string, action: string) {
  const em = await getEm();
  return em.find(AuditEvent, { subjectId, action }, { orderBy: { at: "asc" }, populate: ["actor"] });
}

let owner: Member;

beforeAll(async () => {
  requireDatabase();
  owner = await staffMember("owner", "Owner Inviting");
});

describe("staff invitations", () => {
  dbTest("sent through the outbox; the link makes the account once and signs it in", async () => {
    session.cookie = owner.cookie;
    const email = uniqueEmail("Invited-Floor");
    const sent = await inviteStaffAction({ name: "Ines Floor", email, role: "floor" });
    expect(sent.ok).toBe(true);
    const lower = email.toLowerCase();

    const em = await getEm();
    const [mail] = await em.find(EmailMessage, { to: lower, template: "staff-invite" });
    expect(mail?.subject).toMatch(/floor account/i);
    expect(mail?.text).toContain("Owner Inviting");
    const token = await tokenFromOutbox(lower);
    // Only the token's hash is stored.
    const invitation = await em.findOneOrFail(StaffInvitation, { email: lower });
    expect(invitation.tokenHash).not.toContain(token);
    // 7 days (the link's promised life).
    expect(invitation.expiresAt.getTime() - invitation.sentAt.getTime()).toBe(7 * 24 * 3600_000);
    expect(await lookupStaffInvitation(token)).toMatchObject({ state: "open", role: "floor" });
    expect(await auditOf(invitation.id, "staff.invite")).toHaveLength(1);

    // No account until the link is used.
    expect(await em.count(User, { email: lower })).toBe(0);
    const res = await acceptInvite({ token, name: "Ines Floor", password: PASSWORD });
    expect(res.status).toBe(201);
    expect(await res.json()).toEqual({ ok: true, home: "/floor" });
    const me = await authorize(null, new Headers({ cookie: sessionCookie(res) }));
    expect(me).toMatchObject({ email: lower, role: "floor", name: "Ines Floor" });
    const user = await (await getEm()).findOneOrFail(User, { email: lower });
    expect(user.emailVerified).toBe(true);
    expect(user.lastSignInAt).toBeInstanceOf(Date);
    expect((await authRequest("/sign-in/email", { email: lower, password: PASSWORD })).status).toBe(200);
    expect(await auditOf(user.id, "staff.join")).toHaveLength(1);

    // The link works once; the page says why.
    const again = await acceptInvite({ token, name: "Someone Else", password: "another-password-1" });
    expect(again.status).toBe(404);
    expect(((await again.json()) as { error: { message: string } }).error.message).toMatch(
      /already been used/,
    );
    expect(await lookupStaffInvitation(token)).toMatchObject({ state: "used" });
    // Gone from the pending list: resending or withdrawing it is refused.
    const resend = await resendStaffInvitationAction({ invitationId: invitation.id });
    expect(resend).toMatchObject({ ok: false, error: { code: "conflict" } });
  });

  dbTest("an expired link is refused; resending makes a new one and kills the old", async () => {
    session.cookie = owner.cookie;
    const email = uniqueEmail("late");
    const sent = await inviteStaffAction({ name: "Lew Late", email, role: "counter" });
    if (!sent.ok) throw new Error(sent.error.message);
    const first = await tokenFromOutbox(email);
    const em = await getEm();
    // Eight days on: the invitation's expiry moved into the past.
    await em.nativeUpdate(StaffInvitation, { id: sent.data.id }, { expiresAt: new Date(Date.now() - 1000) });
    expect(await lookupStaffInvitation(first)).toMatchObject({ state: "expired" });
    const late = await acceptInvite({ token: first, name: "Lew Late", password: PASSWORD });
    expect(late.status).toBe(404);
    expect(((await late.json()) as { error: { message: string } }).error.message).toMatch(/expired/);
    expect(await em.count(User, { email })).toBe(0);

    const resent = await resendStaffInvitationAction({ invitationId: sent.data.id });
    expect(resent).toMatchObject({ ok: true, data: { sendCount: 2, expired: false } });
    const second = await tokenFromOutbox(email);
    expect(second).not.toBe(first);
    expect(await lookupStaffInvitation(first)).toEqual({ state: "unknown" });
    expect(await em.count(EmailMessage, { to: email, template: "staff-invite" })).toBe(2);
    const ok = await acceptInvite({ token: second, name: "Lew Late", password: PASSWORD });
    expect(ok.status).toBe(201);
    expect(await ok.json()).toMatchObject({ home: "/desk" });
  });

  dbTest("a withdrawn invitation's link is refused, and the address can be invited again", async () => {
    session.cookie = owner.cookie;
    const email = uniqueEmail("withdrawn");
    const sent = await inviteStaffAction({ name: "Wren Withdrawn", email, role: "owner" });
    if (!sent.ok) throw new Error(sent.error.message);
    const token = await tokenFromOutbox(email);
    expect(await revokeStaffInvitationAction({ invitationId: sent.data.id })).toMatchObject({ ok: true });
    const [audit] = await auditOf(sent.data.id, "staff.invite-revoke");
    expect(audit?.actor?.id).toBe(owner.id);
    const res = await acceptInvite({ token, name: "Wren Withdrawn", password: PASSWORD });
    expect(res.status).toBe(404);
    expect(((await res.json()) as { error: { message: string } }).error.message).toMatch(/withdrawn/);
    expect(await inviteStaffAction({ name: "Wren Withdrawn", email, role: "floor" })).toMatchObject({
      ok: true,
    });
  });

  dbTest(
    "refuses, naming the e-mail field: a customer's account, a staff member, a pending invitation",
    async () => {
      session.cookie = owner.cookie;
      const customerEmail = uniqueEmail("customer");
      await signUpVerified({ name: "Cora Customer", email: customerEmail, password: PASSWORD });
      const asCustomer = await inviteStaffAction({ name: "Cora", email: customerEmail, role: "counter" });
      expect(asCustomer).toMatchObject({ ok: false, error: { code: "conflict" } });
      if (asCustomer.ok) return;
      expect(asCustomer.error.fields?.email).toMatch(/customer account/);
      // The customer is still a customer.
      const em = await getEm();
      expect((await em.findOneOrFail(User, { email: customerEmail })).role).toBe("customer");

      const counter = await staffMember("counter", "Kit Counter");
      const asStaff = await inviteStaffAction({
        name: "Kit",
        email: counter.email.toUpperCase(),
        role: "owner",
      });
      expect(asStaff).toMatchObject({ ok: false, error: { code: "conflict" } });
      if (!asStaff.ok) expect(asStaff.error.fields?.email).toMatch(/already on the staff/);

      const email = uniqueEmail("twice");
      expect((await inviteStaffAction({ name: "Tam Twice", email, role: "floor" })).ok).toBe(true);
      const twice = await inviteStaffAction({ name: "Tam Twice", email, role: "floor" });
      expect(twice).toMatchObject({ ok: false, error: { code: "conflict" } });
      if (!twice.ok) expect(twice.error.fields?.email).toMatch(/already pending/);

      const bad = await inviteStaffAction({ name: "", email: "not-an-address", role: "customer" });
      expect(bad).toMatchObject({ ok: false, error: { code: "invalid" } });
      if (!bad.ok) expect(Object.keys(bad.error.fields ?? {}).sort()).toEqual(["email", "name", "role"]);
    },
  );

  dbTest("the accept endpoint refuses bad input (422 naming fields) and other sites (403)", async () => {
    const bad = await acceptInvite({ token: "x".repeat(30), name: "A", password: "short" });
    expect(bad.status).toBe(422);
    const { error } = (await bad.json()) as { error: { fields: Record<string, string> } };
    expect(Object.keys(error.fields).sort()).toEqual(["name", "password"]);
    expect((await acceptInvite({ token: "x".repeat(30), name: "A Name", password: PASSWORD })).status).toBe(
      404,
    );
    const cross = await acceptInvite(
      { token: "x".repeat(30), name: "A Name", password: PASSWORD },
      { "sec-fetch-site": "cross-site", origin: "http://evil.example" },
    );
    expect(cross.status).toBe(403);
  });
});

describe("roles and deactivation", () => {
  dbTest("a role change is audited with before → after and takes effect at once", async () => {
    session.cookie = owner.cookie;
    const floor = await staffMember("floor");
    const res = await changeStaffRoleAction({ userId: floor.id, role: "counter" });
    expect(res).toEqual({ ok: true, data: { id: floor.id, role: "counter", changed: true } });
    const [audit] = await auditOf(floor.id, "staff.role-change");
    expect(audit?.actor?.id).toBe(owner.id);
    expect(audit?.details).toMatchObject({ before: { role: "floor" }, after: { role: "counter" } });
    // The same session now has the counter's rights, not the floor's.
    expect(await authorize(null, new Headers({ cookie: floor.cookie }))).toMatchObject({ role: "counter" });
    const bad = await changeStaffRoleAction({ userId: floor.id, role: "customer" });
    expect(bad).toMatchObject({
      ok: false,
      error: { code: "invalid", fields: { role: expect.any(String) } },
    });
    const notUuid = await changeStaffRoleAction({ userId: "nobody", role: "floor" });
    expect(notUuid).toMatchObject({
      ok: false,
      error: { code: "invalid", fields: { userId: expect.any(String) } },
    });
    const missing = await changeStaffRoleAction({ userId: crypto.randomUUID(), role: "floor" });
    expect(missing).toMatchObject({ ok: false, error: { code: "not_found" } });
  });

  dbTest(
    "deactivation ends the sessions and refuses sign-in clearly; reactivation lets them back",
    async () => {
      session.cookie = owner.cookie;
      const counter = await staffMember("counter");
      const em = await getEm();
      expect(await em.count(Session, { user: counter.id })).toBe(1);

      const res = await setStaffActiveAction({ userId: counter.id, active: false });
      expect(res).toMatchObject({ ok: true, data: { active: false, changed: true, sessionsRevoked: 1 } });
      expect(await em.count(Session, { user: counter.id })).toBe(0);
      await expect(authorize(null, new Headers({ cookie: counter.cookie }))).rejects.toMatchObject({
        status: 401,
      });
      const [audit] = await auditOf(counter.id, "staff.deactivate");
      expect(audit?.actor?.id).toBe(owner.id);
      expect(audit?.details).toMatchObject({ before: { active: true }, after: { active: false } });

      // The right password: refused with its own reason, and no session made.
      const direct = await authRequest("/sign-in/email", { email: counter.email, password: PASSWORD });
      expect(direct.status).toBe(403);
      expect(await direct.json()).toMatchObject({ code: "ACCOUNT_DEACTIVATED" });
      expect(await em.count(Session, { user: counter.id })).toBe(0);
      // The sign-in form's own route sends them back with the message.
      const form = await signInPost(
        new NextRequest(`${appUrl()}/api/sign-in`, {
          method: "POST",
          headers: { "content-type": "application/x-www-form-urlencoded", origin: appUrl() },
          body: new URLSearchParams({ email: counter.email, password: PASSWORD }).toString(),
        }),
      );
      expect(form.status).toBe(303);
      expect(form.headers.get("location")).toMatch(/^\/sign-in\?error=deactivated/);
      // A wrong password learns nothing more than for anyone else.
      const wrong = await authRequest("/sign-in/email", {
        email: counter.email,
        password: "wrong-password-1",
      });
      expect(wrong.status).toBe(401);

      const back = await setStaffActiveAction({ userId: counter.id, active: true });
      expect(back).toMatchObject({ ok: true, data: { active: true, changed: true } });
      expect((await auditOf(counter.id, "staff.reactivate"))[0]?.details).toMatchObject({
        before: { active: false },
        after: { active: true },
      });
      expect((await authRequest("/sign-in/email", { email: counter.email, password: PASSWORD })).status).toBe(
        200,
      );
    },
  );

  dbTest("an owner can neither change their own role nor deactivate themselves", async () => {
    session.cookie = owner.cookie;
    const own = await changeStaffRoleAction({ userId: owner.id, role: "counter" });
    expect(own).toMatchObject({
      ok: false,
      error: { code: "forbidden", fields: { role: expect.any(String) } },
    });
    const off = await setStaffActiveAction({ userId: owner.id, active: false });
    expect(off).toMatchObject({ ok: false, error: { code: "forbidden" } });
    const em = await getEm();
    const me = await em.findOneOrFail(User, { id: owner.id });
    expect(me.role).toBe("owner");
    expect(me.deactivatedAt).toBeNull();
  });
});

describe("the last owner", () => {
  /**
   * Leaves exactly `owners` as the shop's active owners for the test (this database holds owners
   * made by other tests), and puts the others back afterwards.
   */
  async function withOnlyOwners(owners: string[], work: () => Promise<void>) {
    const em = await getEm();
    const others = await em.find(User, { role: "owner", deactivatedAt: null, id: { $nin: owners } });
    const ids = others.map((u) => u.id);
    await em.nativeUpdate(User, { id: { $in: ids } }, { deactivatedAt: new Date() });
    try {
      await work();
    } finally {
      await em.nativeUpdate(User, { id: { $in: ids } }, { deactivatedAt: null });
    }
  }

  const activeOwners = async () => (await getEm()).count(User, { role: "owner", deactivatedAt: null });

  /**
   * Runs both calls so that they truly overlap: a separate connection holds both owners' rows
   * locked until both calls have started and are waiting, then lets them go at the same moment.
   */
  async function atOnce<T>(ids: string[], calls: (() => Promise<T>)[]) {
    const holder = new Client({ connectionString: requireDatabase() });
    await holder.connect();
    try {
      await holder.query("begin");
      await holder.query("select id from app_user where id = any($1) for update", [ids]);
      const running = calls.map((call) => call());
      const settled = Promise.allSettled(running);
      // Wait until both are blocked inside their transactions (visible in pg_stat_activity).
      for (let i = 0; i < 100; i++) {
        // The activity view is a snapshot per transaction unless cleared.
        await holder.query("select pg_stat_clear_snapshot()");
        const { rows } = await holder.query<{ n: number }>(
          "select count(*)::int as n from pg_stat_activity where datname = current_database() and wait_event_type = 'Lock'",
        );
        if ((rows[0]?.n ?? 0) >= calls.length) break;
        await new Promise((r) => setTimeout(r, 50));
      }
      await holder.query("commit");
      return await settled;
    } finally {
      await holder.end();
    }
  }

  dbTest("cannot be demoted or deactivated", async () => {
    const a = await staffMember("owner", "Ada Owner");
    const counter = await staffMember("counter");
    await withOnlyOwners([a.id], async () => {
      // The rule is the server's, whoever asks: here called past the permission check.
      await expect(changeStaffRole({ userId: a.id, role: "floor" }, counter.id)).rejects.toMatchObject({
        code: "conflict",
        message: expect.stringMatching(/last active owner/),
      });
      await expect(setStaffActive({ userId: a.id, active: false }, counter.id)).rejects.toMatchObject({
        code: "conflict",
      });
      expect(await activeOwners()).toBe(1);
    });
  });

  dbTest("two owners demoting each other at once leave one owner", async () => {
    const a = await staffMember("owner", "Ada Owner");
    const b = await staffMember("owner", "Bo Owner");
    await withOnlyOwners([a.id, b.id], async () => {
      const results = await atOnce(
        [a.id, b.id],
        [
          () => changeStaffRole({ userId: b.id, role: "counter" }, a.id),
          () => changeStaffRole({ userId: a.id, role: "floor" }, b.id),
        ],
      );
      expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
      const refused = results.find((r) => r.status === "rejected");
      expect(refused?.status === "rejected" && refused.reason).toMatchObject({ code: "conflict" });
      expect(await activeOwners()).toBe(1);
    });
  });

  dbTest("two owners deactivating each other at once leave one active owner", async () => {
    const a = await staffMember("owner", "Ada Owner");
    const b = await staffMember("owner", "Bo Owner");
    await withOnlyOwners([a.id, b.id], async () => {
      const results = await atOnce(
        [a.id, b.id],
        [
          () => setStaffActive({ userId: b.id, active: false }, a.id),
          () => setStaffActive({ userId: a.id, active: false }, b.id),
        ],
      );
      expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
      const refused = results.find((r) => r.status === "rejected");
      expect(refused?.status === "rejected" && refused.reason).toMatchObject({
        code: "conflict",
        message: expect.stringMatching(/last active owner/),
      });
      expect(await activeOwners()).toBe(1);
    });
  });
});

describe("only owners manage staff", () => {
  dbTest("counter, floor, customer and anonymous callers are refused every staff action", async () => {
    const target = await staffMember("floor");
    const customerEmail = uniqueEmail("cust");
    const customerCookie = await signUpVerified({
      name: "Cus Tomer",
      email: customerEmail,
      password: PASSWORD,
    });
    session.cookie = owner.cookie;
    const invited = await inviteStaffAction({
      name: "Pending Person",
      email: uniqueEmail("p"),
      role: "floor",
    });
    if (!invited.ok) throw new Error(invited.error.message);
    const callers = {
      counter: (await staffMember("counter")).cookie,
      floor: (await staffMember("floor")).cookie,
      customer: customerCookie,
      anonymous: "",
    };
    for (const [who, cookie] of Object.entries(callers)) {
      session.cookie = cookie;
      const code = who === "anonymous" ? "unauthenticated" : "forbidden";
      const calls = [
        inviteStaffAction({ name: "Sneaky", email: uniqueEmail("sneaky"), role: "owner" }),
        resendStaffInvitationAction({ invitationId: invited.data.id }),
        revokeStaffInvitationAction({ invitationId: invited.data.id }),
        changeStaffRoleAction({ userId: target.id, role: "owner" }),
        setStaffActiveAction({ userId: target.id, active: false }),
      ];
      for (const result of await Promise.all(calls)) {
        expect(result, who).toMatchObject({ ok: false, error: { code } });
      }
    }
    const em = await getEm();
    expect((await em.findOneOrFail(User, { id: target.id })).role).toBe("floor");
    expect((await em.findOneOrFail(User, { id: target.id })).deactivatedAt).toBeNull();
    expect((await em.findOneOrFail(StaffInvitation, { id: invited.data.id })).revokedAt).toBeNull();
    expect(await em.count(StaffInvitation, { name: "Sneaky" })).toBe(0);
  });
});

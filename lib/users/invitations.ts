import "server-only";
import { LockMode } from "@mikro-orm/core";
import type { EntityManager } from "@mikro-orm/postgresql";
import { StaffInvitation, User } from "@/entities";
import { recordAudit } from "@/lib/audit";
import { auth } from "@/lib/auth/server";
import { hashOneTimeToken, isOneTimeTokenShape, newOneTimeToken } from "@/lib/auth/one-time-token";
import { ROLE_HOME } from "@/lib/auth/permissions";
import type { StaffRole } from "@/lib/auth/roles";
import { getEm, inTransaction } from "@/lib/db/orm";
import { appUrl } from "@/lib/http/app-url";
import { AppError } from "@/lib/http/errors";
import { enqueueDelivery, queueEmail } from "@/lib/mail";
import { ROLE_LABEL } from "@/lib/navigation";
import { formatLongDate } from "@/lib/dates";
import { getShopLocale } from "@/lib/shop/locale";
import type { AcceptStaffInviteBody, InviteStaffBody } from "./schemas";

/** How long an owner's invitation link works (the first owner's printed link: FIRST_OWNER_HOURS). */
export const INVITATION_DAYS = 7;

/** What each staff role does, in the words of the invitation e-mail and the role picker. */
export const ROLE_DUTIES: Record<StaffRole, string> = {
  counter: "takes orders and payments",
  floor: "scans travellers and records measurements",
  owner: "everything, including prices and staff",
};

export interface InvitationRow {
  id: string;
  name: string;
  email: string;
  role: StaffRole;
  invitedBy: string | null;
  sentAt: string;
  sendCount: number;
  expiresAt: string;
  expired: boolean;
}

const toRow = (i: StaffInvitation, now = new Date()): InvitationRow => ({
  id: i.id,
  name: i.name,
  email: i.email,
  role: i.role,
  invitedBy: i.invitedBy?.name ?? null,
  sentAt: i.sentAt.toISOString(),
  sendCount: i.sendCount,
  expiresAt: i.expiresAt.toISOString(),
  expired: i.expiresAt <= now,
});

const linkFor = (token: string) => `${appUrl()}/set-password?token=${token}`;

/** The account, if any, that already uses `email` (any capitals). */
async function accountWithEmail(em: EntityManager, email: string): Promise<User | null> {
  return em.findOne(User, { email: { $ilike: email.replace(/[\\%_]/g, (c) => `\\${c}`) } });
}

/**
 * Why an address cannot be invited, or null. A customer's proven account is never turned into a
 * staff account: its password is the customer's, and staff rights would go to whoever holds it.
 * An unverified sign-up never proved the address, so the invitation (which does) replaces it.
 */
function refusalFor(existing: User | null): string | null {
  if (!existing) return null;
  if (existing.role === "customer") {
    return existing.emailVerified
      ? "This address belongs to a customer account, which cannot be made into staff. Invite the person at another address (a work address)."
      : null;
  }
  if (existing.deactivatedAt) {
    return `${existing.name} has a deactivated staff account with this address: reactivate it in the staff list instead.`;
  }
  return `${existing.name} is already on the staff (${ROLE_LABEL[existing.role]}): change the role in the staff list instead.`;
}

async function queueInvitationEmail(
  em: EntityManager,
  invitation: StaffInvitation,
  token: string,
  invitedBy: string,
) {
  return queueEmail(em, {
    template: "staff-invite",
    to: invitation.email,
    props: {
      name: invitation.name,
      roleLabel: ROLE_LABEL[invitation.role],
      roleDuties: ROLE_DUTIES[invitation.role],
      invitedBy,
      url: linkFor(token),
      expiresOn: formatLongDate(invitation.expiresAt, (await getShopLocale()).timeZone),
    },
  });
}

/**
 * Makes an open invitation (hashed token, `days` valid). Written in the caller's transaction;
 * refuses an address that has an account or an open invitation (the field named).
 */
async function createInvitation(
  em: EntityManager,
  input: InviteStaffBody,
  actorId: string | null,
  validForMs: number,
): Promise<{ invitation: StaffInvitation; token: string }> {
  const email = input.email.trim().toLowerCase();
  const refusal = refusalFor(await accountWithEmail(em, email));
  if (refusal) throw new AppError("conflict", refusal, { email: refusal });
  const open = await em.findOne(StaffInvitation, {
    email: { $ilike: email.replace(/[\\%_]/g, (c) => `\\${c}`) },
    acceptedAt: null,
    revokedAt: null,
  });
  if (open) {
    const message = "An invitation to this address is already pending: resend or withdraw it in the list.";
    throw new AppError("conflict", message, { email: message });
  }
  const { token, hash } = newOneTimeToken();
  const now = new Date();
  const invitation = em.create(StaffInvitation, {
    email,
    name: input.name.trim(),
    role: input.role,
    tokenHash: hash,
    invitedBy: actorId ? em.getReference(User, actorId) : null,
    createdAt: now,
    sentAt: now,
    expiresAt: new Date(now.getTime() + validForMs),
  });
  em.persist(invitation);
  await recordAudit(
    {
      actorId,
      action: "staff.invite",
      subjectType: "staff_invitation",
      subjectId: invitation.id,
      details: { email, name: invitation.name, role: input.role, expiresAt: invitation.expiresAt },
    },
    em,
  );
  return { invitation, token };
}

/**
 * The owner invites someone to the staff: a one-time link (valid INVITATION_DAYS, single use) goes
 * through the outbox, in the same transaction as the invitation and its audit entry.
 */
export async function inviteStaff(
  input: InviteStaffBody,
  actor: { id: string; name: string },
): Promise<InvitationRow> {
  const { row, messageId } = await inTransaction(async (em) => {
    const { invitation, token } = await createInvitation(
      em,
      input,
      actor.id,
      INVITATION_DAYS * 24 * 3600_000,
    );
    const message = await queueInvitationEmail(em, invitation, token, actor.name);
    await em.flush();
    return { row: { ...toRow(invitation), invitedBy: actor.name }, messageId: message.id };
  });
  await enqueueDelivery([messageId]);
  return row;
}

/**
 * A link that is printed rather than e-mailed (the first owner, `npm run owner:create`). The
 * caller has checked that it may be made.
 */
export async function createPrintedInvitation(
  em: EntityManager,
  input: InviteStaffBody,
  validForMs: number,
): Promise<{ link: string; invitation: StaffInvitation }> {
  const { invitation, token } = await createInvitation(em, input, null, validForMs);
  return { link: linkFor(token), invitation };
}

/** Locks one invitation that is still open (not used, not withdrawn); refuses otherwise. */
async function lockOpenInvitation(em: EntityManager, id: string): Promise<StaffInvitation> {
  const invitation = await em.findOne(
    StaffInvitation,
    { id },
    { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true },
  );
  if (!invitation) throw new AppError("not_found", "No such invitation.");
  if (invitation.acceptedAt) throw new AppError("conflict", "This invitation has already been accepted.");
  if (invitation.revokedAt) throw new AppError("conflict", "This invitation has been withdrawn.");
  return invitation;
}

/** A new link (the old one stops working) and a fresh INVITATION_DAYS, e-mailed again. */
export async function resendStaffInvitation(
  id: string,
  actor: { id: string; name: string },
): Promise<InvitationRow> {
  const { row, messageId } = await inTransaction(async (em) => {
    const invitation = await lockOpenInvitation(em, id);
    const before = { sentAt: invitation.sentAt, expiresAt: invitation.expiresAt };
    const { token, hash } = newOneTimeToken();
    const now = new Date();
    invitation.tokenHash = hash;
    invitation.sentAt = now;
    invitation.sendCount += 1;
    invitation.expiresAt = new Date(now.getTime() + INVITATION_DAYS * 24 * 3600_000);
    const message = await queueInvitationEmail(em, invitation, token, actor.name);
    await recordAudit(
      {
        actorId: actor.id,
        action: "staff.invite-resend",
        subjectType: "staff_invitation",
        subjectId: invitation.id,
        details: { email: invitation.email, before, after: { sentAt: now, expiresAt: invitation.expiresAt } },
      },
      em,
    );
    await em.flush();
    await em.populate(invitation, ["invitedBy"]);
    return { row: toRow(invitation), messageId: message.id };
  });
  await enqueueDelivery([messageId]);
  return row;
}

/** Withdraws an open invitation: its link stops working at once. */
export async function revokeStaffInvitation(id: string, actorId: string): Promise<{ id: string }> {
  return inTransaction(async (em) => {
    const invitation = await lockOpenInvitation(em, id);
    invitation.revokedAt = new Date();
    invitation.revokedBy = em.getReference(User, actorId);
    await recordAudit(
      {
        actorId,
        action: "staff.invite-revoke",
        subjectType: "staff_invitation",
        subjectId: invitation.id,
        details: { email: invitation.email, role: invitation.role, before: "open", after: "withdrawn" },
      },
      em,
    );
    return { id: invitation.id };
  });
}

/** Invitations not yet used or withdrawn (expired ones too: they can be resent), newest first. */
export async function listOpenInvitations(): Promise<InvitationRow[]> {
  const em = await getEm();
  const rows = await em.find(
    StaffInvitation,
    { acceptedAt: null, revokedAt: null },
    { orderBy: { sentAt: "desc" }, populate: ["invitedBy"] },
  );
  const now = new Date();
  return rows.map((r) => toRow(r, now));
}

export type InvitationLookup =
  | { state: "open"; name: string; email: string; role: StaffRole }
  | { state: "used" | "withdrawn" | "expired"; email: string }
  | { state: "unknown" };

/** What a link's token stands for (for the page it opens); never throws for a bad token. */
export async function lookupStaffInvitation(token: string): Promise<InvitationLookup> {
  if (!isOneTimeTokenShape(token)) return { state: "unknown" };
  const em = await getEm();
  const invitation = await em.findOne(StaffInvitation, { tokenHash: hashOneTimeToken(token) });
  if (!invitation) return { state: "unknown" };
  const { email } = invitation;
  if (invitation.acceptedAt) return { state: "used", email };
  if (invitation.revokedAt) return { state: "withdrawn", email };
  if (invitation.expiresAt <= new Date()) return { state: "expired", email };
  return { state: "open", name: invitation.name, email, role: invitation.role };
}

/** The message for a link that no longer works, by why. */
export function closedInvitationMessage(state: "used" | "withdrawn" | "expired" | "unknown"): string {
  switch (state) {
    case "used":
      return "This invitation has already been used. Sign in with the password you chose.";
    case "withdrawn":
      return "This invitation has been withdrawn. Ask the shop's owner if you should have access.";
    case "expired":
      return "This invitation has expired. Ask the shop's owner to send a new one.";
    default:
      return "This link is not valid. Check that you copied all of it, or ask the shop's owner for a new one.";
  }
}

/**
 * The invitee chooses a password: makes the staff account (address verified: the link reached it)
 * with the invitation's role, and signs it in. The link works once: the invitation is marked used
 * under its row lock before the account is made (and unmarked if making it fails).
 * Returns the auth library's sign-in response (its session cookie) and the role's home.
 */
export async function acceptStaffInvitation(
  body: AcceptStaffInviteBody,
  requestHeaders: Headers,
): Promise<{ signedIn: Response; home: string }> {
  const lookup = await lookupStaffInvitation(body.token);
  if (lookup.state !== "open") throw new AppError("not_found", closedInvitationMessage(lookup.state));

  const claimed = await inTransaction(async (em) => {
    const invitation = await em.findOne(
      StaffInvitation,
      { tokenHash: hashOneTimeToken(body.token) },
      { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true },
    );
    const state = !invitation
      ? "unknown"
      : invitation.acceptedAt
        ? "used"
        : invitation.revokedAt
          ? "withdrawn"
          : invitation.expiresAt <= new Date()
            ? "expired"
            : null;
    if (!invitation || state) throw new AppError("not_found", closedInvitationMessage(state ?? "unknown"));
    const existing = await accountWithEmail(em, invitation.email);
    if (refusalFor(existing)) {
      // Someone made an account with this address after the invitation was sent.
      throw new AppError(
        "conflict",
        "An account with this e-mail already exists, so this invitation cannot make another. Ask the shop's owner.",
      );
    }
    invitation.acceptedAt = new Date();
    return { id: invitation.id, email: invitation.email, role: invitation.role, squatter: existing?.id };
  });

  const ctx = await auth.$context;
  let userId: string;
  try {
    // An unverified sign-up with this address never proved it: the invitation's holder replaces it.
    if (claimed.squatter) await ctx.internalAdapter.deleteUser(claimed.squatter);
    const user = await ctx.internalAdapter.createUser(
      { email: claimed.email, name: body.name, emailVerified: true, role: claimed.role },
      { method: "admin" },
    );
    await ctx.internalAdapter.linkAccount({
      userId: user.id,
      providerId: "credential",
      accountId: user.id,
      password: await ctx.password.hash(body.password),
    });
    userId = user.id;
  } catch (error) {
    const em = await getEm();
    await em.nativeUpdate(StaffInvitation, { id: claimed.id }, { acceptedAt: null });
    throw error;
  }

  await inTransaction(async (em) => {
    await em.nativeUpdate(StaffInvitation, { id: claimed.id }, { user: userId });
    await recordAudit(
      {
        actorId: userId,
        action: "staff.join",
        subjectType: "user",
        subjectId: userId,
        details: { email: claimed.email, role: claimed.role, invitationId: claimed.id },
      },
      em,
    );
  });

  const signedIn = await auth.api.signInEmail({
    body: { email: claimed.email, password: body.password },
    headers: requestHeaders,
    asResponse: true,
  });
  return { signedIn, home: ROLE_HOME[claimed.role] };
}

import "server-only";
import { Customer } from "@/entities";
import { recordAudit } from "@/lib/audit";
import { getEm } from "@/lib/db/orm";
import { appUrl } from "@/lib/http/app-url";
import { AppError } from "@/lib/http/errors";
import { sendAccountEmail } from "./auth-mail";
import { hashOneTimeToken, isOneTimeTokenShape, newOneTimeToken } from "./one-time-token";
import type { AcceptInviteBody } from "./schemas";
import { auth } from "./server";

const INVITE_DAYS = 7;

/** Only a hash is stored, so the token table does not hold working links. */
const identifierOf = (token: string) => `customer-invite:${hashOneTimeToken(token)}`;

/**
 * The counter invites a customer it knows (a phone customer, no account yet): a one-time sign-up
 * link goes to the address on record. Following it proves the address, so the account made with it
 * is that customer's. Inviting again replaces nothing; any unused link keeps working until it expires.
 */
export async function inviteCustomer(customerId: string, actorId: string): Promise<{ email: string }> {
  const em = await getEm();
  const customer = await em.findOne(Customer, { id: customerId });
  if (!customer) throw new AppError("not_found", "No such customer.");
  if (customer.user) throw new AppError("conflict", "This customer already has an account.");
  const ctx = await auth.$context;
  const existing = await ctx.internalAdapter.findUserByEmail(customer.email);
  if (existing?.user.emailVerified) {
    throw new AppError("conflict", "Someone already has an account with this customer's e-mail.");
  }
  const { token, hash } = newOneTimeToken();
  await ctx.internalAdapter.createVerificationValue({
    identifier: `customer-invite:${hash}`,
    value: customer.id,
    expiresAt: new Date(Date.now() + INVITE_DAYS * 24 * 3600_000),
  });
  await recordAudit({
    actorId,
    action: "customer.invite",
    subjectType: "customer",
    subjectId: customer.id,
    details: { email: customer.email },
  });
  await sendAccountEmail("customer-invite", customer.email, {
    customerName: customer.name,
    url: `${appUrl()}/sign-up?invite=${token}`,
  });
  return { email: customer.email };
}

export interface OpenInvite {
  customerId: string;
  name: string;
  email: string;
}

/** The customer an unused, unexpired invitation is for; null otherwise. */
export async function findInvite(token: string): Promise<OpenInvite | null> {
  if (!isOneTimeTokenShape(token)) return null;
  const ctx = await auth.$context;
  const row = await ctx.internalAdapter.findVerificationValue(identifierOf(token));
  if (!row || row.expiresAt < new Date()) return null;
  const em = await getEm();
  const customer = await em.findOne(Customer, { id: row.value, user: null });
  return customer ? { customerId: customer.id, name: customer.name, email: customer.email } : null;
}

/**
 * Makes the invited customer's account (address verified, linked to their record) and returns the
 * sign-in response of the auth library (its session cookie). The link works once.
 */
export async function acceptInvite(body: AcceptInviteBody, requestHeaders: Headers): Promise<Response> {
  const invite = await findInvite(body.token);
  if (!invite) {
    throw new AppError(
      "not_found",
      "This invitation has been used or has expired. Ask the counter for a new one.",
    );
  }
  const ctx = await auth.$context;
  const existing = await ctx.internalAdapter.findUserByEmail(invite.email);
  if (existing?.user.emailVerified) {
    throw new AppError("conflict", "An account with this e-mail already exists. Sign in instead.");
  }
  if (!(await ctx.internalAdapter.consumeVerificationValue(identifierOf(body.token)))) {
    throw new AppError(
      "not_found",
      "This invitation has been used or has expired. Ask the counter for a new one.",
    );
  }
  // An unverified sign-up with this address never proved it: the invitation's holder replaces it.
  if (existing) await ctx.internalAdapter.deleteUser(existing.user.id);
  // emailVerified: the invitation reached this address. The user hook links the customer record.
  const user = await ctx.internalAdapter.createUser(
    { email: invite.email, name: body.name, emailVerified: true, role: "customer" },
    { method: "admin" },
  );
  await ctx.internalAdapter.linkAccount({
    userId: user.id,
    providerId: "credential",
    accountId: user.id,
    password: await ctx.password.hash(body.password),
  });
  const em = await getEm();
  const linked = await em.findOneOrFail(Customer, { id: invite.customerId });
  if (linked.user?.id !== user.id) {
    throw new AppError("conflict", "This customer record was taken meanwhile. Ask the counter.");
  }
  return auth.api.signInEmail({
    body: { email: invite.email, password: body.password },
    headers: requestHeaders,
    asResponse: true,
  });
}

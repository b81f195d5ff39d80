import { randomBytes } from "node:crypto";
import { User } from "@/entities";
import { recordAudit } from "@/lib/audit";
import { getEm } from "@/lib/db/orm";
import { appUrl } from "@/lib/http/app-url";
import { AppError } from "@/lib/http/errors";
import { signUpBodySchema } from "./schemas";
import { auth } from "./server";

const LINK_HOURS = 24;

/**
 * `npm run owner:create -- EMAIL`: the shop's first owner, outside demo mode (where the seed makes
 * no accounts). The account has no password yet; the returned one-time link (valid 24 hours) lets
 * its holder choose one. Refused once any owner exists — further staff are added by an owner.
 */
export async function createFirstOwner(
  emailInput: string,
  name?: string,
): Promise<{ link: string; expiresAt: Date }> {
  const email = signUpBodySchema.shape.email.parse(emailInput.trim()).toLowerCase();
  const em = await getEm();
  if ((await em.count(User, { role: "owner" })) > 0) {
    throw new AppError(
      "conflict",
      "An owner already exists; owners add further staff under Overview → Staff.",
    );
  }
  const ctx = await auth.$context;
  if (await ctx.internalAdapter.findUserByEmail(email)) {
    throw new AppError("conflict", "Someone already has an account with that e-mail.");
  }
  const user = await ctx.internalAdapter.createUser(
    { email, name: name?.trim() || email.split("@")[0]!, emailVerified: true, role: "owner" },
    { method: "admin" },
  );
  // The auth library's own password-reset token: /set-password hands it to its reset endpoint,
  // which adds the credential account on first use.
  const token = randomBytes(32).toString("base64url");
  const expiresAt = new Date(Date.now() + LINK_HOURS * 3600_000);
  await ctx.internalAdapter.createVerificationValue({
    identifier: `reset-password:${token}`,
    value: user.id,
    expiresAt,
  });
  await recordAudit({
    actorId: null,
    action: "owner.create",
    subjectType: "user",
    subjectId: user.id,
    details: { email },
  });
  return { link: `${appUrl()}/set-password?token=${token}`, expiresAt };
}

import "server-only";
import { StaffInvitation, User } from "@/entities";
import { inTransaction } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import { createPrintedInvitation } from "@/lib/users/invitations";
import { signUpBodySchema } from "./schemas";

const LINK_HOURS = 24;

/**
 * `npm run owner:create -- EMAIL`: the shop's first owner, outside demo mode (where the seed makes
 * no accounts). It is a staff invitation like any other (lib/users/invitations.ts) whose link is
 * printed instead of e-mailed, valid 24 hours: its holder chooses the password at /set-password
 * and is signed in as the owner. Refused once any owner exists — further staff are invited by an
 * owner — and while an earlier first-owner link still works.
 */
export async function createFirstOwner(
  emailInput: string,
  name?: string,
): Promise<{ link: string; expiresAt: Date }> {
  const email = signUpBodySchema.shape.email.parse(emailInput.trim()).toLowerCase();
  return inTransaction(async (em) => {
    // The same lock as every change to the owners (lib/users/staff.ts).
    await em.execute(`select pg_advisory_xact_lock(hashtext('yokeline:staff-owners'))`);
    if ((await em.count(User, { role: "owner" })) > 0) {
      throw new AppError(
        "conflict",
        "An owner already exists; owners add further staff under Overview → Staff.",
      );
    }
    const now = new Date();
    const earlier = await em.find(StaffInvitation, {
      role: "owner",
      invitedBy: null,
      acceptedAt: null,
      revokedAt: null,
    });
    const working = earlier.find((i) => i.expiresAt > now);
    if (working) {
      throw new AppError(
        "conflict",
        `A first-owner link already exists for ${working.email}, valid until ${working.expiresAt.toISOString()}. Use it, or run this again after it expires.`,
      );
    }
    // Expired links are closed, so the same address can be given a new one.
    for (const old of earlier) old.revokedAt = now;
    await em.flush();
    const { link, invitation } = await createPrintedInvitation(
      em,
      { email, name: name?.trim() || email.split("@")[0]!, role: "owner" },
      LINK_HOURS * 3600_000,
    );
    return { link, expiresAt: invitation.expiresAt };
  });
}

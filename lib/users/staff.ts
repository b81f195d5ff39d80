import "server-only";
import { LockMode } from "@mikro-orm/core";
import type { EntityManager } from "@mikro-orm/postgresql";
import { Session, User } from "@/entities";
import { auth } from "@/lib/auth/server";
import { recordAudit } from "@/lib/audit";
import type { CreateStaffBody } from "@/lib/auth/schemas";
import { getEm, inTransaction } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import { STAFF_ROLES, type StaffRole } from "@/lib/auth/roles";
import { ROLE_LABEL } from "@/lib/navigation";
import type { ChangeStaffRoleBody, SetStaffActiveBody } from "./schemas";

export interface StaffRow {
  id: string;
  name: string;
  email: string;
  role: string;
  createdAt: string;
  /** null while the account is active */
  deactivatedAt?: string | null;
  lastSignInAt?: string | null;
}

/**
 * Creates a staff account with a password the owner hands over. Written through the auth
 * library so the password is hashed as at sign-up; recorded in the audit log.
 */
export async function createStaffUser(input: CreateStaffBody, actorId: string | null): Promise<StaffRow> {
  const ctx = await auth.$context;
  const email = input.email.toLowerCase();
  if (await ctx.internalAdapter.findUserByEmail(email)) {
    throw new AppError("conflict", "Someone already has an account with that e-mail.", {
      email: "Already in use.",
    });
  }
  const user = await ctx.internalAdapter.createUser(
    { email, name: input.name, emailVerified: true, role: input.role },
    { method: "admin" },
  );
  await ctx.internalAdapter.linkAccount({
    userId: user.id,
    providerId: "credential",
    accountId: user.id,
    password: await ctx.password.hash(input.password),
  });
  await recordAudit({
    actorId,
    action: "staff.create",
    subjectType: "user",
    subjectId: user.id,
    details: { email, role: input.role },
  });
  return {
    id: user.id,
    name: user.name,
    email: user.email,
    role: input.role,
    createdAt: new Date(user.createdAt).toISOString(),
  };
}

/** Every staff account, active ones first, then by role and name. */
export async function listStaff(): Promise<StaffRow[]> {
  const em = await getEm();
  const users = await em.find(
    User,
    { role: { $in: [...STAFF_ROLES] } },
    { orderBy: { deactivatedAt: "asc nulls first", role: "asc", name: "asc" } },
  );
  return users.map((u) => ({
    id: u.id,
    name: u.name,
    email: u.email,
    role: u.role,
    createdAt: u.createdAt.toISOString(),
    deactivatedAt: u.deactivatedAt?.toISOString() ?? null,
    lastSignInAt: u.lastSignInAt?.toISOString() ?? null,
  }));
}

/**
 * Serialises every change that could lower the number of active owners (role changes,
 * deactivation): a transaction-scoped advisory lock, so two owners demoting each other at once run
 * one after the other and the second sees the first's result. Then locks and loads the target.
 */
async function lockStaffMember(em: EntityManager, userId: string): Promise<User> {
  await em.execute(`select pg_advisory_xact_lock(hashtext('yokeline:staff-owners'))`);
  const user = await em.findOne(
    User,
    { id: userId },
    { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true },
  );
  if (!user || user.role === "customer") throw new AppError("not_found", "No such staff member.");
  return user;
}

async function activeOwnerCount(em: EntityManager): Promise<number> {
  return em.count(User, { role: "owner", deactivatedAt: null });
}

const LAST_OWNER = (name: string) =>
  `${name} is the shop's last active owner. Make someone else an owner first.`;

/**
 * An owner changes a staff member's role (audited, before → after). Refuses one's own role and
 * the last active owner's. Sessions stay: every request reads the role afresh.
 */
export async function changeStaffRole(
  input: ChangeStaffRoleBody,
  actorId: string,
): Promise<{ id: string; role: StaffRole; changed: boolean }> {
  return inTransaction(async (em) => {
    const user = await lockStaffMember(em, input.userId);
    const before = user.role as StaffRole;
    if (before === input.role) return { id: user.id, role: before, changed: false };
    if (user.id === actorId) {
      const message = "You cannot change your own role. Another owner can.";
      throw new AppError("forbidden", message, { role: message });
    }
    if (before === "owner" && !user.deactivatedAt && (await activeOwnerCount(em)) <= 1) {
      throw new AppError("conflict", LAST_OWNER(user.name), { role: LAST_OWNER(user.name) });
    }
    user.role = input.role;
    await recordAudit(
      {
        actorId,
        action: "staff.role-change",
        subjectType: "user",
        subjectId: user.id,
        details: {
          email: user.email,
          before: { role: before },
          after: { role: input.role },
          summary: `${ROLE_LABEL[before]} → ${ROLE_LABEL[input.role]}`,
        },
      },
      em,
    );
    return { id: user.id, role: input.role, changed: true };
  });
}

/**
 * Deactivates (no sign-in; every session of the person removed in the same transaction) or
 * reactivates a staff account; audited. Refuses oneself and the last active owner.
 */
export async function setStaffActive(
  input: SetStaffActiveBody,
  actorId: string,
): Promise<{ id: string; active: boolean; changed: boolean; sessionsRevoked: number }> {
  return inTransaction(async (em) => {
    const user = await lockStaffMember(em, input.userId);
    const wasActive = !user.deactivatedAt;
    if (wasActive === input.active) {
      return { id: user.id, active: wasActive, changed: false, sessionsRevoked: 0 };
    }
    if (user.id === actorId) {
      throw new AppError("forbidden", "You cannot deactivate your own account. Another owner can.");
    }
    let sessionsRevoked = 0;
    if (!input.active) {
      if (user.role === "owner" && (await activeOwnerCount(em)) <= 1) {
        throw new AppError("conflict", LAST_OWNER(user.name));
      }
      user.deactivatedAt = new Date();
      sessionsRevoked = await em.nativeDelete(Session, { user: user.id });
    } else {
      user.deactivatedAt = null;
    }
    await recordAudit(
      {
        actorId,
        action: input.active ? "staff.reactivate" : "staff.deactivate",
        subjectType: "user",
        subjectId: user.id,
        details: {
          email: user.email,
          role: user.role,
          before: { active: wasActive },
          after: { active: input.active },
          ...(input.active ? {} : { sessionsRevoked }),
        },
      },
      em,
    );
    return { id: user.id, active: input.active, changed: true, sessionsRevoked };
  });
}

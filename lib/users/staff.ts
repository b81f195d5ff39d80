import { User } from "@/entities";
import { auth } from "@/lib/auth/server";
import { recordAudit } from "@/lib/audit";
import type { CreateStaffBody } from "@/lib/auth/schemas";
import { getEm } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import { STAFF_ROLES } from "@/lib/auth/roles";

export interface StaffRow {
  id: string;
  name: string;
  email: string;
  role: string;
  createdAt: string;
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

export async function listStaff(): Promise<StaffRow[]> {
  const em = await getEm();
  const users = await em.find(
    User,
    { role: { $in: [...STAFF_ROLES] } },
    { orderBy: { role: "asc", name: "asc" } },
  );
  return users.map((u) => ({
    id: u.id,
    name: u.name,
    email: u.email,
    role: u.role,
    createdAt: u.createdAt.toISOString(),
  }));
}

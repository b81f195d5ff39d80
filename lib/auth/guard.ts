import "server-only";
import { cache } from "react";
import { headers } from "next/headers";
import { forbidden, redirect } from "next/navigation";
import { auth, authPool } from "./server";
import { rememberedSessionUser, rememberSession } from "./session-cache";
import { can, type Permission } from "./permissions";
import { isRole, type Role } from "./roles";
import { AccessError, type CurrentUser } from "./access";

export { AccessError, type CurrentUser } from "./access";

async function sessionUser(requestHeaders: Headers): Promise<CurrentUser | null> {
  const cookie = requestHeaders.get("cookie");
  // A cookie the auth library accepted a moment ago: its session row and user read live (session-cache.ts).
  const remembered = cookie ? await rememberedSessionUser(cookie, authPool) : undefined;
  if (remembered !== undefined) return remembered && currentUser(remembered);
  if (!cookie) return librarySessionUser(requestHeaders, null);
  // Requests with one cookie that arrive together (a page's parallel fetches, or every request of a
  // busy client the moment its remembered session runs out) share one read by the auth library.
  let pending = resolving.get(cookie);
  if (!pending) {
    pending = librarySessionUser(requestHeaders, cookie).finally(() => resolving.delete(cookie));
    resolving.set(cookie, pending);
  }
  return pending;
}

/** Cookies the auth library is reading now: the answer each will get (per server process). */
const resolving = new Map<string, Promise<CurrentUser | null>>();

async function librarySessionUser(
  requestHeaders: Headers,
  cookie: string | null,
): Promise<CurrentUser | null> {
  const session = await auth.api.getSession({ headers: requestHeaders });
  if (!session) return null;
  if (cookie) rememberSession(cookie, session.session.token, session.session.expiresAt);
  return currentUser(session.user);
}

function currentUser(user: { id: string; name: string; email: string; role?: unknown }): CurrentUser {
  const { id, name, email, role } = user;
  return { id, name, email, role: isRole(role) ? role : "customer" };
}

/** The signed-in user of this request, or null (read once per request). */
export const getCurrentUser = cache(async (): Promise<CurrentUser | null> => sessionUser(await headers()));

/**
 * The one access check. Every protected page, server action and route handler goes through it:
 * returns the user who holds `permission`, or throws AccessError(401 | 403).
 */
export async function authorize(
  permission: Permission | null,
  requestHeaders?: Headers,
): Promise<CurrentUser> {
  const user = requestHeaders ? await sessionUser(requestHeaders) : await getCurrentUser();
  if (!user) throw new AccessError(401);
  if (permission && !can(user.role, permission)) throw new AccessError(403);
  return user;
}

/** For pages: anonymous visitors go to sign-in (and come back), others without access get 403. */
export async function requirePermission(permission: Permission | null, from?: string): Promise<CurrentUser> {
  try {
    return await authorize(permission);
  } catch (error) {
    if (!(error instanceof AccessError)) throw error;
    if (error.status === 401) {
      const back = from ?? (await headers()).get("x-yokeline-path");
      redirect(back ? `/sign-in?next=${encodeURIComponent(back)}` : "/sign-in");
    }
    forbidden();
  }
}

/** For pages that belong to one set of roles (e.g. every staff page). */
export async function requireRole(roles: readonly Role[], from?: string): Promise<CurrentUser> {
  const user = await requirePermission(null, from);
  if (!roles.includes(user.role)) forbidden();
  return user;
}

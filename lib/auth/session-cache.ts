import "server-only";
import type { Pool } from "pg";

/**
 * Remembers, for a short while, which session an exact Cookie header resolved to, so a signed-in
 * request costs one indexed query instead of the auth library's full session read (cookie
 * signature, session row, user row). Only what the auth library itself accepted is remembered.
 * On every hit the session row is read again with its user: a session signed out, revoked or
 * deleted with a deactivated account, or past its expiry, is refused on the very next request,
 * and a changed role or name applies at once. Past the TTL the auth library reads the session
 * again (its signature check and its sliding expiry). Per server process; bounded in size.
 */
export interface CachedSessionUser {
  id: string;
  name: string;
  email: string;
  role: unknown;
}

interface Entry {
  token: string;
  /** Until when the auth library's answer is reused (never past the session's own expiry). */
  until: number;
}

const TTL_MS = 60_000;
const MAX_ENTRIES = 2_000;
const entries = new Map<string, Entry>();

/** After the auth library resolved `cookie` to the session `token` (expiring at `expiresAt`). */
export function rememberSession(cookie: string, token: string, expiresAt: Date): void {
  const until = Math.min(Date.now() + TTL_MS, new Date(expiresAt).getTime());
  if (!(until > Date.now())) return;
  entries.delete(cookie);
  if (entries.size >= MAX_ENTRIES) entries.delete(entries.keys().next().value!);
  entries.set(cookie, { token, until });
}

/** Forget every remembered session (tests; sign-out and other session changes in this process). */
export function forgetSessions(): void {
  entries.clear();
}

/**
 * The live user of a remembered cookie: undefined when nothing usable is remembered (ask the
 * auth library), null when the remembered session no longer exists or has expired.
 */
export async function rememberedSessionUser(
  cookie: string,
  pool: Pool,
): Promise<CachedSessionUser | null | undefined> {
  const entry = entries.get(cookie);
  if (!entry) return undefined;
  if (entry.until <= Date.now()) {
    entries.delete(cookie);
    return undefined;
  }
  // A named statement: each pooled connection parses and plans it once (every signed-in request runs it).
  const { rows } = await pool.query<CachedSessionUser>({
    name: "session_cache_user",
    text: `select u.id, u.name, u.email, u.role
       from auth_session s join app_user u on u.id = s.user_id
      where s.token = $1 and s.expires_at > now()`,
    values: [entry.token],
  });
  if (!rows[0]) {
    entries.delete(cookie);
    return null;
  }
  return rows[0];
}

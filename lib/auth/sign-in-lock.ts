import "server-only";
import { getEm } from "@/lib/db/orm";

/**
 * The per-account limit on failed passwords: after `max` failures within `windowMinutes` the
 * address cannot sign in for `lockMinutes`, whichever client addresses the guesses came from
 * (the per-client rate limit alone lets a botnet guess on). Kept in PostgreSQL (auth_sign_in_failure).
 */
export function signInLockPolicy() {
  return {
    max: Number(process.env.AUTH_ACCOUNT_LOCK_MAX ?? 5),
    windowMinutes: Number(process.env.AUTH_ACCOUNT_LOCK_WINDOW_MINUTES ?? 15),
    lockMinutes: Number(process.env.AUTH_ACCOUNT_LOCK_MINUTES ?? 15),
  };
}

const key = (email: string) => email.trim().toLowerCase().slice(0, 320);

/** When the address's sign-in is locked, the time it opens again; otherwise null. */
export async function signInLockedUntil(email: string, now = new Date()): Promise<Date | null> {
  const em = await getEm();
  const rows = await em
    .getConnection()
    .execute<{ locked_until: Date | null }[]>(
      `select locked_until from auth_sign_in_failure where email = ? and locked_until > ?`,
      [key(email), now],
    );
  const until = rows[0]?.locked_until;
  return until ? new Date(until) : null;
}

/** Counts one failed password for the address (one statement, so parallel guesses all count). */
export async function recordSignInFailure(email: string, now = new Date()): Promise<Date | null> {
  const { max, windowMinutes, lockMinutes } = signInLockPolicy();
  const windowStart = new Date(now.getTime() - windowMinutes * 60_000);
  const lockUntil = new Date(now.getTime() + lockMinutes * 60_000);
  const em = await getEm();
  const rows = await em.getConnection().execute<{ locked_until: Date | null }[]>(
    `insert into auth_sign_in_failure as f (email, failures, first_failed_at, locked_until)
       values (?, 1, ?, case when 1 >= ? then ?::timestamptz end)
     on conflict (email) do update set
       failures = case when f.first_failed_at < ? then 1 else f.failures + 1 end,
       first_failed_at = case when f.first_failed_at < ? then excluded.first_failed_at else f.first_failed_at end,
       locked_until = case
         when (case when f.first_failed_at < ? then 1 else f.failures + 1 end) >= ? then ?::timestamptz
         else f.locked_until end
     returning locked_until`,
    [key(email), now, max, lockUntil, windowStart, windowStart, windowStart, max, lockUntil],
  );
  const raw = rows[0]?.locked_until;
  const locked = raw ? new Date(raw) : null;
  return locked && locked > now ? locked : null;
}

/** A successful sign-in forgets the address's failures. */
export async function clearSignInFailures(email: string): Promise<void> {
  const em = await getEm();
  await em.getConnection().execute(`delete from auth_sign_in_failure where email = ?`, [key(email)]);
}

/** "Wait 15 minutes", for the refusal message. */
export function waitMinutes(until: Date, now = new Date()): number {
  return Math.max(1, Math.ceil((until.getTime() - now.getTime()) / 60_000));
}

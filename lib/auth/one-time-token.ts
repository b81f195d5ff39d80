import { createHash, randomBytes } from "node:crypto";

/**
 * The one kind of one-time link token the app makes (customer invitations, staff invitations, the
 * first owner's link): 32 random bytes, base64url. Only its SHA-256 is stored, so the database
 * never holds a working link.
 */
export function newOneTimeToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashOneTimeToken(token) };
}

export function hashOneTimeToken(token: string): string {
  return createHash("sha256").update(token).digest("base64url");
}

/** Whether `token` could be one of ours (anything else is not looked up at all). */
export function isOneTimeTokenShape(token: unknown): token is string {
  return typeof token === "string" && /^[A-Za-z0-9_-]{20,200}$/.test(token);
}

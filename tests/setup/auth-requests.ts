import { createStaffUser } from "@/lib/users/staff";
import { EmailMessage } from "@/entities";
import { auth } from "@/lib/auth/server";
import { CLIENT_ADDRESS_HEADER } from "@/lib/auth/client-address";
import { getEm } from "@/lib/db/orm";

const BASE = process.env.BETTER_AUTH_URL ?? "http://127.0.0.1:3999";

let nextIp = Math.floor(Math.random() * 60_000);
/** A fresh client address per call (198.18.0.0/15, the benchmarking range), so tests don't share a rate-limit bucket. */
export function freshIp(): string {
  nextIp += 1;
  return `198.18.${(nextIp >> 8) & 255}.${nextIp & 255}`;
}

/**
 * Sends one request through the real auth handler, as a browser at `ip` would (a fresh one by
 * default). The address goes in the header our server stamps from the socket (lib/auth/client-address.ts).
 */
export async function authRequest(
  path: string,
  body: unknown,
  ip = freshIp(),
  cookie?: string,
): Promise<Response> {
  const headers = new Headers({
    "content-type": "application/json",
    origin: BASE,
    [CLIENT_ADDRESS_HEADER]: ip,
  });
  if (cookie) headers.set("cookie", cookie);
  return auth.handler(
    new Request(`${BASE}/api/auth${path}`, { method: "POST", headers, body: JSON.stringify(body) }),
  );
}

/** The newest verification link the outbox holds for `email` (what the mail fake would show). */
export async function verificationLink(email: string): Promise<string> {
  const em = await getEm();
  const [message] = await em.find(
    EmailMessage,
    { to: email, template: "verify-email" },
    { orderBy: { createdAt: "desc" }, limit: 1 },
  );
  const url = message?.text.match(/https?:\/\/\S*\/verify-email\?token=[^\s\]\)]+/)?.[0];
  if (!url) throw new Error(`no verification e-mail for ${email}`);
  return url;
}

/** Opens a verification link through the auth handler, as the browser would; the answer carries the session. */
export async function openLink(url: string, ip = freshIp()): Promise<Response> {
  return auth.handler(new Request(url, { headers: { [CLIENT_ADDRESS_HEADER]: ip } }));
}

/** Signs up and follows the verification link, as a new customer does; returns the session cookie. */
export async function signUpVerified(body: {
  name: string;
  email: string;
  password: string;
}): Promise<string> {
  const res = await authRequest("/sign-up/email", body);
  if (res.status !== 200) throw new Error(`sign-up failed: ${res.status} ${await res.text()}`);
  const verified = await openLink(await verificationLink(body.email));
  if (verified.status >= 400) throw new Error(`verification failed: ${verified.status}`);
  return sessionCookie(verified);
}

/** The session cookie a response sets, ready for a Cookie header. */
export function sessionCookie(res: Response): string {
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}

let counter = 0;
/** A unique test address per call (RFC 2606 reserved domain). */
export function uniqueEmail(prefix = "user"): string {
  counter += 1;
  return `${prefix}-${Date.now().toString(36)}-${counter}@test.example`;
}

/** A new staff member of `role`, signed in: their session cookie. */
export async function staffCookie(
  role: "owner" | "counter" | "floor",
  name = `Test ${role}`,
  password = "a-long-password-1",
): Promise<string> {
  const user = await createStaffUser({ name, email: uniqueEmail(role), role, password }, null);
  return sessionCookie(await authRequest("/sign-in/email", { email: user.email, password }));
}

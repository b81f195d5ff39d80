import { auth } from "@/lib/auth/server";

const BASE = process.env.BETTER_AUTH_URL ?? "http://127.0.0.1:3999";

let nextIp = Math.floor(Math.random() * 60_000);
/** A fresh client address per call (198.18.0.0/15, the benchmarking range), so tests don't share a rate-limit bucket. */
function freshIp(): string {
  nextIp += 1;
  return `198.18.${(nextIp >> 8) & 255}.${nextIp & 255}`;
}

/** Sends one request through the real auth handler, as a browser at `ip` would (a fresh one by default). */
export async function authRequest(
  path: string,
  body: unknown,
  ip = freshIp(),
  cookie?: string,
): Promise<Response> {
  const headers = new Headers({ "content-type": "application/json", origin: BASE, "x-forwarded-for": ip });
  if (cookie) headers.set("cookie", cookie);
  return auth.handler(
    new Request(`${BASE}/api/auth${path}`, { method: "POST", headers, body: JSON.stringify(body) }),
  );
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

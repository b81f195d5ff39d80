import { auth } from "@/lib/auth/server";

const BASE = process.env.BETTER_AUTH_URL ?? "http://127.0.0.1:3999";

/** Sends one request through the real auth handler, as a browser at `ip` would. */
export async function authRequest(path: string, body: unknown, ip = "203.0.113.10", cookie?: string): Promise<Response> {
  const headers = new Headers({ "content-type": "application/json", origin: BASE, "x-forwarded-for": ip });
  if (cookie) headers.set("cookie", cookie);
  return auth.handler(new Request(`${BASE}/api/auth${path}`, { method: "POST", headers, body: JSON.stringify(body) }));
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

import type { NextRequest } from "next/server";
import { auth } from "@/lib/auth/server";
import { signInBodySchema } from "@/lib/auth/schemas";
import { ROLE_HOME } from "@/lib/auth/permissions";
import { isRole } from "@/lib/auth/roles";
import { CLIENT_ADDRESS_HEADER } from "@/lib/auth/client-address";
import { crossSiteRefusal, isSameOriginRequest } from "@/lib/auth/same-origin";
import { appUrl } from "@/lib/http/app-url";
import { safeNextPath } from "@/lib/http/safe-next";
import { FORM_BODY_LIMIT_BYTES, readForm } from "@/lib/http/body";
import { errorResponse } from "@/lib/http/route";

/** Headers of the browser's request that the auth library needs to see as they were sent. */
const PASSED_ON = [
  "origin",
  "referer",
  "sec-fetch-site",
  "sec-fetch-mode",
  "sec-fetch-dest",
  CLIENT_ADDRESS_HEADER,
  "user-agent",
  "cookie",
];

// POST /api/sign-in — the sign-in form's own submission (works without JavaScript). Refuses posts
// from other sites (403), then goes through the auth library's handler with the browser's own
// headers, so its origin checks and rate limits apply, and redirects.
export async function POST(req: NextRequest) {
  if (!isSameOriginRequest(req.headers)) return crossSiteRefusal();
  let form: FormData;
  try {
    form = await readForm(req, FORM_BODY_LIMIT_BYTES);
  } catch (error) {
    return errorResponse(error);
  }
  const next = safeNextPath(form.get("next"));
  const email = form.get("email");
  const back = (error: string, extra: Record<string, string> = {}) => {
    const query = new URLSearchParams({ error, ...extra });
    if (typeof email === "string") query.set("email", email.slice(0, 200));
    if (next) query.set("next", next);
    return seeOther(`/sign-in?${query}`);
  };

  const parsed = signInBodySchema.safeParse({ email, password: form.get("password") });
  if (!parsed.success) return back("invalid");

  const baseURL = process.env.BETTER_AUTH_URL ?? appUrl();
  const headers = new Headers({ "content-type": "application/json" });
  for (const name of PASSED_ON) {
    const value = req.headers.get(name);
    if (value) headers.set(name, value);
  }
  const res = await auth.handler(
    new Request(new URL("/api/auth/sign-in/email", baseURL), {
      method: "POST",
      headers,
      // The verification link (sent again on signing in unverified) leads back here.
      body: JSON.stringify({ ...parsed.data, callbackURL: next ?? "/orders" }),
    }),
  );
  if (res.status === 429) {
    const body = (await res.json().catch(() => ({}))) as { code?: string; message?: string };
    return body.code === "ACCOUNT_LOCKED" ? back("locked") : back("too-many");
  }
  if (res.status === 403) {
    const body = (await res.json().catch(() => ({}))) as { code?: string };
    if (body.code === "ACCOUNT_DEACTIVATED") return back("deactivated");
    if (body.code === "EMAIL_NOT_VERIFIED") {
      return seeOther(`/check-email?${new URLSearchParams({ email: parsed.data.email, from: "sign-in" })}`);
    }
    return crossSiteRefusal();
  }
  if (!res.ok) return back("credentials");

  const body = (await res.json()) as { user?: { role?: unknown } };
  const role = isRole(body.user?.role) ? body.user.role : "customer";
  const redirect = seeOther(next ?? ROLE_HOME[role]);
  for (const cookie of res.headers.getSetCookie()) redirect.headers.append("set-cookie", cookie);
  return redirect;
}

/** A redirect to a path on this site (relative, so it keeps whatever host the browser used). */
function seeOther(path: string): Response {
  return new Response(null, { status: 303, headers: { location: path } });
}

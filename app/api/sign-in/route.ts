import type { NextRequest } from "next/server";
import { auth } from "@/lib/auth/server";
import { signInBodySchema } from "@/lib/auth/schemas";
import { ROLE_HOME } from "@/lib/auth/permissions";
import { isRole } from "@/lib/auth/roles";
import { safeNextPath } from "@/lib/http/safe-next";
import { FORM_BODY_LIMIT_BYTES, readForm } from "@/lib/http/body";
import { errorResponse } from "@/lib/http/route";

// POST /api/sign-in — the sign-in form's own submission (works without JavaScript). It goes
// through the auth library's handler, so its checks and rate limit apply, then redirects.
export async function POST(req: NextRequest) {
  let form: FormData;
  try {
    form = await readForm(req, FORM_BODY_LIMIT_BYTES);
  } catch (error) {
    return errorResponse(error);
  }
  const next = safeNextPath(form.get("next"));
  const back = (error: string) => {
    const query = new URLSearchParams({ error });
    const email = form.get("email");
    if (typeof email === "string") query.set("email", email.slice(0, 200));
    if (next) query.set("next", next);
    return seeOther(`/sign-in?${query}`);
  };

  const parsed = signInBodySchema.safeParse({ email: form.get("email"), password: form.get("password") });
  if (!parsed.success) return back("invalid");

  const baseURL = process.env.BETTER_AUTH_URL ?? new URL(req.url).origin;
  const headers = new Headers({ "content-type": "application/json", origin: baseURL });
  for (const name of ["x-forwarded-for", "x-real-ip", "user-agent", "cookie"]) {
    const value = req.headers.get(name);
    if (value) headers.set(name, value);
  }
  const res = await auth.handler(
    new Request(new URL("/api/auth/sign-in/email", baseURL), {
      method: "POST",
      headers,
      body: JSON.stringify(parsed.data),
    }),
  );
  if (res.status === 429) return back("too-many");
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

import { NextResponse, type NextRequest } from "next/server";
import { contentSecurityPolicy, HSTS, newNonce, servedOverHttps } from "@/lib/config/security-headers";

/**
 * Sets each page's content security policy with a fresh nonce (Next reads it from the request's
 * policy header and puts it on its scripts), HSTS when served over https, and passes the requested
 * path to server components (so a sign-in redirect can bring the visitor back). It decides no
 * access: every page, action and handler checks that on the server.
 */
export function proxy(req: NextRequest) {
  const https = servedOverHttps(req.headers);
  const nonce = newNonce();
  const csp = contentSecurityPolicy(nonce, { dev: process.env.NODE_ENV === "development", https });
  const headers = new Headers(req.headers);
  headers.set("x-yokeline-path", req.nextUrl.pathname + req.nextUrl.search);
  headers.set("x-nonce", nonce);
  headers.set("Content-Security-Policy", csp);
  const res = NextResponse.next({ request: { headers } });
  res.headers.set("Content-Security-Policy", csp);
  if (https) res.headers.set("Strict-Transport-Security", HSTS);
  return res;
}

// Pages only. Route handlers are left out so the proxy never buffers a request body (their
// handlers cap bodies while streaming); they and static files get next.config.mjs's headers.
// Server actions skip it too: Next buffers a body the proxy sees, whatever its size, so an
// oversized one would be read to the end instead of being cut off at the 1 MB action limit.
export const config = {
  matcher: [
    {
      source: "/((?!api/|_next/|favicon|.*\\.(?:svg|png|woff2)$).*)",
      missing: [{ type: "header", key: "next-action" }],
    },
  ],
};

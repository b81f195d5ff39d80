import { NextResponse, type NextRequest } from "next/server";

/**
 * Passes the requested path to server components (so a sign-in redirect can bring the visitor
 * back). It decides no access: every page, action and handler checks that on the server.
 */
export function proxy(req: NextRequest) {
  const headers = new Headers(req.headers);
  headers.set("x-yokeline-path", req.nextUrl.pathname + req.nextUrl.search);
  return NextResponse.next({ request: { headers } });
}

export const config = {
  matcher: [
    {
      source: "/((?!api/|_next/|favicon|.*\\.(?:svg|png|woff2)$).*)",
      // Server actions skip the proxy: Next buffers a body the proxy sees, whatever its size, so
      // an oversized one would be read to the end instead of being cut off at the 1 MB action limit.
      missing: [{ type: "header", key: "next-action" }],
    },
  ],
};

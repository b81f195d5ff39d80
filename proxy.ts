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

export const config = { matcher: ["/((?!api/|_next/|favicon|.*\\.(?:svg|png|woff2)$).*)"] };

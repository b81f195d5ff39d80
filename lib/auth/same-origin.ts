import { appUrl } from "@/lib/http/app-url";

/**
 * Whether a state-changing browser request comes from our own pages. Browsers send
 * Sec-Fetch-Site and Origin with every POST; a page on another site that auto-posts a form
 * (login CSRF: signing the visitor into the attacker's account) shows up as "cross-site" or
 * with a foreign Origin. A client that sends neither is not a browser and cannot be used that way.
 */
export function isSameOriginRequest(headers: Headers, own: string = appUrl()): boolean {
  const site = headers.get("sec-fetch-site");
  if (site && site !== "same-origin") return false;
  const origin = headers.get("origin");
  if (origin) {
    let ownOrigin: string;
    try {
      ownOrigin = new URL(own).origin;
    } catch {
      return false;
    }
    if (origin !== ownOrigin) return false;
  }
  return true;
}

/** The answer to a refused cross-site post: a plain page with a way to sign in here instead. */
export function crossSiteRefusal(): Response {
  const html = `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Refused</title></head>
<body style="font-family:system-ui,sans-serif;max-width:36rem;margin:3rem auto;padding:0 1rem">
<h1>Sign-in refused</h1>
<p>This sign-in was sent from another website, so it was not carried out. If you meant to sign in,
open the sign-in page of this shop and sign in there.</p>
<p><a href="/sign-in">Go to the sign-in page</a></p></body></html>`;
  return new Response(html, {
    status: 403,
    headers: { "content-type": "text/html; charset=utf-8", "cache-control": "no-store" },
  });
}

type Env = Record<string, string | undefined>;

// nosniff, Referrer-Policy and X-Frame-Options are the same on every response: next.config.mjs.

/** HSTS for a year; sent only on https. */
export const HSTS = "max-age=31536000; includeSubDomains";

/**
 * Whether this request reached the shop over https: the public address says so, or (only when
 * the shop sits behind a proxy it trusts, TRUST_PROXY=1) the proxy's forwarded protocol does.
 */
export function servedOverHttps(requestHeaders: Headers, env: Env = process.env): boolean {
  if ((env.APP_URL ?? env.BETTER_AUTH_URL ?? "").startsWith("https://")) return true;
  if (env.TRUST_PROXY !== "1") return false;
  const proto = requestHeaders.get("x-forwarded-proto")?.split(",")[0]?.trim().toLowerCase();
  return proto === "https";
}

/** A fresh, unguessable nonce for one response (128 bits, base64). */
export function newNonce(): string {
  return Buffer.from(crypto.getRandomValues(new Uint8Array(16))).toString("base64");
}

/**
 * The content security policy of a page. Scripts run only with this response's nonce (Next puts it
 * on its own bootstrap scripts; 'strict-dynamic' lets those load the app's chunks). Styles allow
 * inline: React and Tailwind write style attributes, and the mail preview's srcdoc frame inherits
 * this policy with the e-mail's inline styles. Payments leave by navigation, not by form post.
 */
export function contentSecurityPolicy(
  nonce: string,
  { dev = false, https = false }: { dev?: boolean; https?: boolean } = {},
): string {
  const directives: string[] = [
    "default-src 'self'",
    // 'unsafe-eval' only for React's development build (it rebuilds call stacks with eval).
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    `connect-src 'self'${dev ? " ws: wss:" : ""}`,
    "frame-src 'self'",
    "media-src 'self'",
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ];
  if (https) directives.push("upgrade-insecure-requests");
  return directives.join("; ");
}

import { describe, expect, test } from "vitest";
import { contentSecurityPolicy, newNonce, servedOverHttps } from "@/lib/config/security-headers";

describe("servedOverHttps (decides HSTS)", () => {
  const forwarded = new Headers({ "x-forwarded-proto": "https" });
  test.each([
    ["an https public address", new Headers(), { APP_URL: "https://shop.example.org" }, true],
    ["a plain-http public address", new Headers(), { APP_URL: "http://127.0.0.1:3000" }, false],
    ["a forwarded https from a trusted proxy", forwarded, { APP_URL: "http://x", TRUST_PROXY: "1" }, true],
    ["a forwarded https without TRUST_PROXY", forwarded, { APP_URL: "http://x" }, false],
    [
      "a forwarded http from a trusted proxy",
      new Headers({ "x-forwarded-proto": "http" }),
      { TRUST_PROXY: "1" },
      false,
    ],
  ])("%s", (_label, headers, env, expected) => {
    expect(servedOverHttps(headers, env)).toBe(expected);
  });
});

describe("contentSecurityPolicy", () => {
  test("scripts only with the nonce; no framing; https upgrades insecure requests", () => {
    const csp = contentSecurityPolicy("abc123", { https: true });
    expect(csp).toContain("script-src 'self' 'nonce-abc123' 'strict-dynamic'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("form-action 'self'");
    expect(csp).toContain("upgrade-insecure-requests");
    expect(csp).not.toContain("unsafe-eval");
    expect(contentSecurityPolicy("n")).not.toContain("upgrade-insecure-requests");
    expect(contentSecurityPolicy("n", { dev: true })).toContain("'unsafe-eval'");
  });

  test("nonces are fresh and 128 bits", () => {
    const a = newNonce();
    expect(Buffer.from(a, "base64")).toHaveLength(16);
    expect(newNonce()).not.toBe(a);
  });
});

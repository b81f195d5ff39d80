import { describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { POST as signInPost } from "@/app/api/sign-in/route";
import { CLIENT_ADDRESS_HEADER } from "@/lib/auth/client-address";
import { appUrl } from "@/lib/http/app-url";
import { authRequest, freshIp, signUpVerified, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";

const PASSWORD = "a-long-password-1";

function post(fields: Record<string, string>, headers: Record<string, string>) {
  return signInPost(
    new NextRequest(`${appUrl()}/api/sign-in`, {
      method: "POST",
      headers: {
        "content-type": "application/x-www-form-urlencoded",
        [CLIENT_ADDRESS_HEADER]: freshIp(),
        ...headers,
      },
      body: new URLSearchParams(fields),
    }),
  );
}

const own = () => new URL(appUrl()).origin;

describe("the sign-in form's own route", () => {
  const CROSS: [string, Record<string, string>][] = [
    ["Sec-Fetch-Site cross-site", { "sec-fetch-site": "cross-site", origin: "http://evil.example" }],
    [
      "Sec-Fetch-Site same-site (a sibling host)",
      { "sec-fetch-site": "same-site", origin: "http://shop.evil.example" },
    ],
    ["a foreign Origin without fetch metadata", { origin: "http://evil.example" }],
    ["the null Origin of a sandboxed page", { origin: "null" }],
  ];
  for (const [label, headers] of CROSS) {
    dbTest(`refuses ${label} with a 403 page and no session`, async () => {
      const email = uniqueEmail("csrf");
      await signUpVerified({ name: "Cee Surf", email, password: PASSWORD });
      const res = await post({ email, password: PASSWORD }, headers);
      expect(res.status).toBe(403);
      expect(res.headers.get("content-type")).toMatch(/text\/html/);
      expect(await res.text()).toMatch(/another website/);
      expect(res.headers.getSetCookie()).toEqual([]);
    });
  }

  dbTest("signs in from our own page, back to a safe path only", async () => {
    const email = uniqueEmail("own");
    await signUpVerified({ name: "Own Page", email, password: PASSWORD });
    const headers = { "sec-fetch-site": "same-origin", origin: own() };
    const res = await post({ email, password: PASSWORD, next: "/orders?x=1" }, headers);
    expect(res.status).toBe(303);
    expect(res.headers.get("location")).toBe("/orders?x=1");
    expect(res.headers.getSetCookie().join(";")).toMatch(/session_token=/);

    const sneaky = await post({ email, password: PASSWORD, next: "/\t/evil.example" }, headers);
    expect(sneaky.headers.get("location")).toBe("/orders");
  });

  dbTest("an unverified account is sent to the check-your-e-mail page", async () => {
    const email = uniqueEmail("unverified");
    await authRequest("/sign-up/email", { name: "Un Verified", email, password: PASSWORD });
    const res = await post({ email, password: PASSWORD }, { "sec-fetch-site": "same-origin", origin: own() });
    expect(res.status).toBe(303);
    expect(res.headers.get("location")).toMatch(/^\/check-email\?email=/);
    expect(res.headers.getSetCookie()).toEqual([]);
  });

  dbTest("a locked account is told to wait", async () => {
    const email = uniqueEmail("wait");
    await signUpVerified({ name: "Wai Ting", email, password: PASSWORD });
    const headers = { "sec-fetch-site": "same-origin", origin: own() };
    for (let i = 0; i < 5; i += 1) await post({ email, password: `wrong-${i}-password` }, headers);
    const res = await post({ email, password: PASSWORD }, headers);
    expect(res.headers.get("location")).toMatch(/error=locked/);
  });
});

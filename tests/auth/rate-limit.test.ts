import { Server, type IncomingMessage } from "node:http";
import type { AddressInfo } from "node:net";
import { afterEach, describe, expect, test } from "vitest";
import { auth } from "@/lib/auth/server";
import { CLIENT_ADDRESS_HEADER, clientAddress, installClientAddressStamp } from "@/lib/auth/client-address";
import { getEm } from "@/lib/db/orm";
import { authRequest, freshIp, signUpVerified, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";

const PASSWORD = "the-right-password";

describe("sign-in rate limit per client", () => {
  dbTest("repeated bad sign-ins from one client are refused with 429; other clients are not", async () => {
    const email = uniqueEmail("target");
    await signUpVerified({ name: "Target", email, password: PASSWORD });
    const ip = freshIp();
    const statuses: number[] = [];
    // Different accounts each time, so only the per-client limit is at work here.
    for (let i = 0; i < 12; i += 1) {
      const res = await authRequest(
        "/sign-in/email",
        { email: uniqueEmail("nobody"), password: "wrong-password" },
        ip,
      );
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 3).every((s) => s === 401)).toBe(true);
    expect(statuses).toContain(429);
    // Once limited, even the right password waits out the window…
    expect((await authRequest("/sign-in/email", { email, password: PASSWORD }, ip)).status).toBe(429);
    // …while another client is unaffected.
    expect((await authRequest("/sign-in/email", { email, password: PASSWORD }, freshIp())).status).toBe(200);
  });
});

describe("per-account lock on failed passwords", () => {
  dbTest(
    "five wrong passwords from five addresses lock the account for everyone, with a wait message",
    async () => {
      const email = uniqueEmail("locked");
      await signUpVerified({ name: "Lock Ed", email, password: PASSWORD });
      for (let i = 0; i < 5; i += 1) {
        const res = await authRequest(
          "/sign-in/email",
          { email, password: `wrong-${i}-password` },
          freshIp(),
        );
        expect(res.status).toBe(401);
      }
      const locked = await authRequest(
        "/sign-in/email",
        { email: email.toUpperCase(), password: PASSWORD },
        freshIp(),
      );
      expect(locked.status).toBe(429);
      const body = (await locked.json()) as { code: string; message: string };
      expect(body.code).toBe("ACCOUNT_LOCKED");
      expect(body.message).toMatch(/wait 15 minutes/i);

      // When the lock has run out, the right password works and the count starts afresh.
      const em = await getEm();
      await em
        .getConnection()
        .execute(
          `update auth_sign_in_failure set locked_until = now() - interval '1 second' where email = ?`,
          [email],
        );
      expect((await authRequest("/sign-in/email", { email, password: PASSWORD }, freshIp())).status).toBe(
        200,
      );
      const rows = await em
        .getConnection()
        .execute(`select * from auth_sign_in_failure where email = ?`, [email]);
      expect(rows).toHaveLength(0);
    },
  );

  dbTest("fewer failures than the limit, then the right password: signed in", async () => {
    const email = uniqueEmail("almost");
    await signUpVerified({ name: "Al Most", email, password: PASSWORD });
    for (let i = 0; i < 4; i += 1)
      await authRequest("/sign-in/email", { email, password: `nope-${i}-password` });
    expect((await authRequest("/sign-in/email", { email, password: PASSWORD })).status).toBe(200);
  });
});

describe("the client address the limit keys on", () => {
  const CASES: [string, Record<string, string>, boolean, string][] = [
    [
      "no proxy: the socket, whatever X-Forwarded-For says",
      { "x-forwarded-for": "203.0.113.9" },
      false,
      "10.0.0.1",
    ],
    ["no proxy: the socket, whatever X-Real-IP says", { "x-real-ip": "203.0.113.9" }, false, "10.0.0.1"],
    [
      "behind a proxy: the entry the proxy appended",
      { "x-forwarded-for": "203.0.113.9, 198.51.100.7" },
      true,
      "198.51.100.7",
    ],
    ["behind a proxy: a single entry", { "x-forwarded-for": "198.51.100.7" }, true, "198.51.100.7"],
    [
      "behind a proxy: X-Real-IP when no X-Forwarded-For",
      { "x-real-ip": "198.51.100.8" },
      true,
      "198.51.100.8",
    ],
    ["behind a proxy without headers: the socket", {}, true, "10.0.0.1"],
  ];
  test.each(CASES)("%s", (_label, headers, trust, expected) => {
    expect(clientAddress(headers, "10.0.0.1", trust)).toBe(expected);
  });

  let server: Server | null = null;
  afterEach(async () => {
    delete process.env.TRUST_PROXY;
    await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
    server = null;
  });

  /** A real HTTP server stamped as under `next start`, handing sign-ins to the auth handler. */
  async function stampedServer(): Promise<string> {
    class StampedServer extends Server {}
    installClientAddressStamp(StampedServer);
    server = new StampedServer(async (req: IncomingMessage, res) => {
      const chunks: Buffer[] = [];
      for await (const chunk of req) chunks.push(chunk as Buffer);
      const headers = new Headers();
      for (const [k, v] of Object.entries(req.headers)) if (typeof v === "string") headers.set(k, v);
      if (req.url === "/echo") {
        res.end(String(req.headers[CLIENT_ADDRESS_HEADER] ?? ""));
        return;
      }
      const answer = await auth.handler(
        new Request(`${process.env.BETTER_AUTH_URL}/api/auth/sign-in/email`, {
          method: "POST",
          headers,
          body: Buffer.concat(chunks),
        }),
      );
      res.statusCode = answer.status;
      res.end(await answer.text());
    });
    await new Promise<void>((resolve) => server!.listen(0, "127.0.0.1", resolve));
    return `http://127.0.0.1:${(server!.address() as AddressInfo).port}`;
  }

  dbTest("a made-up header is overwritten by the socket's address", async () => {
    const base = await stampedServer();
    const forged = { "x-forwarded-for": "203.0.113.9", [CLIENT_ADDRESS_HEADER]: "203.0.113.10" };
    expect(await (await fetch(`${base}/echo`, { headers: forged })).text()).toBe("127.0.0.1");
    process.env.TRUST_PROXY = "1";
    expect(await (await fetch(`${base}/echo`, { headers: forged })).text()).toBe("203.0.113.9");
  });

  dbTest("a new X-Forwarded-For per guess no longer dodges the limit", async () => {
    const base = await stampedServer();
    // Clear this address's bucket from earlier runs.
    const em = await getEm();
    await em.getConnection().execute(`delete from auth_rate_limit where key like ?`, ["%127.0.0.1%"]);
    const statuses: number[] = [];
    for (let i = 0; i < 12; i += 1) {
      const res = await fetch(base, {
        method: "POST",
        headers: {
          "content-type": "application/json",
          origin: process.env.BETTER_AUTH_URL!,
          "x-forwarded-for": `203.0.113.${i + 1}`,
        },
        body: JSON.stringify({ email: uniqueEmail("guess"), password: "wrong-password" }),
      });
      statuses.push(res.status);
    }
    expect(statuses).toContain(429);
    await em.getConnection().execute(`delete from auth_rate_limit where key like ?`, ["%127.0.0.1%"]);
  });
});

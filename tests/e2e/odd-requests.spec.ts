import { expect, test } from "@playwright/test";
import { readFileSync } from "node:fs";
import { ACCOUNTS, signIn } from "./fixtures";
import { chunkedPost } from "../http/chunked-client";

const port = Number(process.env.APP_PORT ?? 3100);

/** A chunked POST of up to `totalBytes` (no Content-Length) to the running `next start`. */
const chunkedPostToApp = (path: string, totalBytes: number, headers: Record<string, string>) =>
  chunkedPost(port, path, totalBytes, headers["content-type"] ?? "application/octet-stream", headers);

const JSON_TYPE = { "content-type": "application/json" };
const FORM_TYPE = { "content-type": "application/x-www-form-urlencoded" };

test.describe("bodies without a length are refused early by the running app", () => {
  for (const [path, headers] of [
    ["/api/designs/evaluate", JSON_TYPE],
    ["/api/designs/quote", JSON_TYPE],
    ["/api/payments/webhook", JSON_TYPE],
    ["/api/auth/sign-in/email", JSON_TYPE],
    ["/api/sign-in", FORM_TYPE],
  ] as const) {
    test(`POST ${path}: 100 MB chunked → 413 too_large long before the end`, async () => {
      const res = await chunkedPostToApp(path, 100 * 1024 * 1024, headers);
      expect(res.status).toBe(413);
      expect(JSON.parse(res.body)).toMatchObject({ error: { code: "too_large" } });
      expect(res.writtenBytes).toBeLessThan(16 * 1024 * 1024);
    });
  }
});

test("a server action's body is cut off at Next's 1 MB action limit, not read to the end", async () => {
  // The action's id as this build named it.
  const manifest = JSON.parse(readFileSync(".next/server/server-reference-manifest.json", "utf8")) as {
    node: Record<string, { exportedName?: string }>;
  };
  const id = Object.entries(manifest.node).find(([, v]) => v.exportedName === "createCustomerAction")?.[0];
  expect(id).toBeTruthy();
  const res = await chunkedPostToApp("/desk/new", 100 * 1024 * 1024, {
    "next-action": id!,
    accept: "text/x-component",
    "content-type": "text/plain;charset=UTF-8",
  });
  // Next answers a fetch action past its limit with its generic error (500), the action never runs.
  expect(res.status).not.toBe(200);
  expect(res.writtenBytes).toBeLessThan(16 * 1024 * 1024);
});

test.describe("malformed ids in pages answer 404, never 500", () => {
  test("customer pages", async ({ page }) => {
    await signIn(page, ACCOUNTS.customer);
    for (const url of [
      "/orders/not-a-uuid",
      "/orders/%00",
      "/orders/------------------------------------",
      "/orders/new?design=not-a-uuid",
      "/orders/new?design=------------------------------------",
      "/build?draft=%00",
    ]) {
      const res = await page.request.get(url, { maxRedirects: 0 });
      expect(res.status(), url).toBeLessThan(500);
    }
    expect((await page.request.get("/orders/not-a-uuid")).status()).toBe(404);
  });

  test("counter pages", async ({ page }) => {
    await signIn(page, ACCOUNTS.counter);
    for (const url of [
      "/desk/orders/%00",
      "/desk/orders/not-a-uuid",
      "/desk/new?customer=------------------------------------",
      "/desk/new?customer=x&draft=%00",
      "/desk/new/quote?customer=------------------------------------&design=00000000-0000-4000-8000-000000000000",
    ]) {
      const res = await page.request.get(url, { maxRedirects: 0 });
      expect(res.status(), url).toBeLessThan(500);
    }
    expect((await page.request.get("/desk/orders/%00")).status()).toBe(404);
  });
});

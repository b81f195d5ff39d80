import { readFileSync } from "node:fs";
import { expect, type Cookie, type Page } from "@playwright/test";
import { DEMO_CUSTOMERS, DEMO_PASSWORD, DEMO_STAFF } from "../../lib/demo";

export const ACCOUNTS = {
  owner: DEMO_STAFF[0].email,
  counter: DEMO_STAFF[1].email,
  floor: DEMO_STAFF[2].email,
  customer: DEMO_CUSTOMERS[0].email,
} as const;

/** Signs in through the real form, as a person would. */
export async function signInWithForm(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).not.toHaveURL(/\/sign-in/);
}

/** The demo accounts' sessions this worker signed in through the form, for later tests to reuse. */
const sessions = new Map<string, Cookie[]>();

/**
 * Signs a demo account in: through the form the first time in this worker (tests/e2e/roles.spec.ts
 * proves the form for every role), then with the session it made. Either way the page ends on the
 * account's home, where the sign-in page sends a signed-in visitor. A session that has ended since
 * (signed out, deactivated) is dropped and the form used again.
 */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  const demo = password === DEMO_PASSWORD && Object.values(ACCOUNTS).includes(email as never);
  const saved = demo ? sessions.get(email) : undefined;
  if (saved) {
    await page.context().addCookies(saved);
    await page.goto("/sign-in");
    if (!new URL(page.url()).pathname.startsWith("/sign-in")) return;
    sessions.delete(email);
  }
  await signInWithForm(page, email, password);
  if (demo)
    sessions.set(
      email,
      (await page.context().cookies()).filter((c) => c.name.includes("better-auth")),
    );
}

/** The local mail fake's inbox (the port `npm test` gives it). */
export const MAIL_FAKE = `http://127.0.0.1:${process.env.MAIL_FAKE_HTTP_PORT ?? 12680}`;

/** Waits (up to 30 s) for the mail fake to catch an e-mail to `email` whose subject matches. */
export async function mailTo(email: string, subject: RegExp): Promise<{ subject: string; text: string }> {
  for (let i = 0; i < 60; i++) {
    const res = await fetch(`${MAIL_FAKE}/messages?to=${encodeURIComponent(email)}`);
    const { data } = (await res.json()) as { data: { subject: string; text: string }[] };
    const hit = data.find((m) => subject.test(m.subject));
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`no e-mail to ${email} matching ${subject}`);
}

const streetTruck = JSON.parse(readFileSync("examples/street-truck.json", "utf8")) as unknown;

/**
 * The signed-in customer saves the README street truck and orders it (as the shop page does). It is
 * a street shaft: ordered for towing, the service factor takes its torsion margin below the limit.
 */
export async function customerOrder(page: Page, name: string): Promise<{ id: string; number: string }> {
  const origin = new URL(page.url()).origin;
  const design = await page.request.post("/api/designs", {
    headers: { origin },
    data: { name, design: streetTruck, application: { description: "Ranch pickup", use: "street" } },
  });
  expect(design.status()).toBe(201);
  const { id: designId } = (await design.json()) as { id: string };
  const order = await page.request.post("/api/orders", {
    headers: { origin },
    data: { designIds: [designId], fulfilment: "pickup" },
  });
  expect(order.status()).toBe(201);
  return (await order.json()) as { id: string; number: string };
}

/** Pays on the payment fake's hosted checkout page (the success card unless told). */
export async function payOnCheckoutPage(page: Page, card = "4242 4242 4242 4242"): Promise<void> {
  await expect(page).toHaveURL(/127\.0\.0\.1:\d+\/pay\/cs_/);
  await page.getByLabel("Card number").fill(card);
  await page.getByLabel("Expiry (MM/YY)").fill("12/34");
  await page.getByLabel("CVC").fill("123");
  await page.getByRole("button", { name: /^Pay / }).click();
}

import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { expect, test } from "@playwright/test";
import { DEMO_PASSWORD, DEMO_PHONE_CUSTOMERS, DEMO_STAFF } from "../../lib/demo";
import { ACCOUNTS, MAIL_FAKE, mailTo, signIn } from "./fixtures";

const MAIL = MAIL_FAKE;

/**
 * The newest verification link the mail fake caught for `email` (once more than `after` are there),
 * or the newest one that `match`es: the sign-up and the resend return to `/orders?welcome=1`, the
 * link a sign-in attempt sends does not, and the outbox may deliver them in any order.
 */
async function verificationLink(email: string, after = 0, match?: RegExp): Promise<string> {
  for (let i = 0; i < 60; i++) {
    const res = await fetch(`${MAIL}/messages?to=${encodeURIComponent(email)}`);
    const { data } = (await res.json()) as { data: { subject: string; text: string }[] };
    const links = data
      .filter((m) => /confirm your e-mail/i.test(m.subject))
      .map((m) => m.text.match(/https?:\/\/\S+\/verify-email\?token=[^\s\])]+/)?.[0])
      .filter((l): l is string => Boolean(l) && (!match || match.test(decodeURIComponent(l!))));
    if (links.length > after) return links[0]!;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`no verification e-mail to ${email}`);
}

test("signing up with a phone customer's address shows nothing of theirs until the link in the e-mail is followed", async ({
  page,
}) => {
  const phone = DEMO_PHONE_CUSTOMERS[0];
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Not Harlan");
  await page.getByLabel("E-mail").fill(phone.email);
  await page.getByLabel("Password").fill("someone-elses-password");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page).toHaveURL(/\/check-email\?/);
  await expect(page.getByRole("heading", { name: "Check your e-mail" })).toBeVisible();

  // No session: the orders page sends us to sign in, and signing in says to check the e-mail.
  await page.goto("/orders");
  await expect(page).toHaveURL(/\/sign-in\?next=%2Forders/);
  await page.getByLabel("E-mail").fill(phone.email);
  await page.getByLabel("Password").fill("someone-elses-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/check-email\?/);
  await expect(page.getByText("Your address is not confirmed yet.")).toBeVisible();
  await expect(page.getByText("Feed-mixer drive")).toHaveCount(0);

  // A new link on request.
  await page.getByRole("button", { name: "Send the link again" }).click();
  await expect(page.getByText(/A new link is on its way/)).toBeVisible();

  // Whoever can read the inbox proves the address: signed in, with the phone customer's order.
  await page.goto(await verificationLink(phone.email, 0, /welcome=1/));
  await expect(page).toHaveURL(/\/orders\?welcome=1/);
  await expect(page.getByText("Feed-mixer drive").first()).toBeVisible(); // his demo order (and his history)
});

test.describe("a page on another site", () => {
  let server: Server;
  let foreign: string;
  test.beforeAll(async ({ baseURL }) => {
    // A tiny attacker page on another origin that auto-posts the sign-in form (login CSRF).
    server = createServer((_req, res) => {
      res.setHeader("content-type", "text/html");
      res.end(`<!doctype html><title>Win a prize</title>
<form id="f" method="post" action="${baseURL}/api/sign-in">
<input name="email" value="${DEMO_STAFF[1].email}"><input name="password" value="${DEMO_PASSWORD}">
<input name="next" value="/desk"></form><script>document.getElementById("f").submit()</script>`);
    });
    await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
    // "localhost" is another origin (and site) than 127.0.0.1 to the browser.
    foreign = `http://localhost:${(server.address() as AddressInfo).port}/`;
  });
  test.afterAll(async () => {
    await new Promise<void>((resolve) => server.close(() => resolve()));
  });

  test("cannot sign the visitor in (403, no session)", async ({ page, context }) => {
    const answer = page.waitForResponse((r) => r.url().endsWith("/api/sign-in"));
    await page.goto(foreign);
    expect((await answer).status()).toBe(403);
    await expect(page.getByRole("heading", { name: "Sign-in refused" })).toBeVisible();
    expect((await context.cookies()).filter((c) => /session_token/.test(c.name))).toEqual([]);
    await page.goto("/desk");
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fdesk/);
  });
});

test("the counter invites a phone customer; the link in the e-mail makes their account", async ({
  browser,
}) => {
  const email = `invited-${Date.now()}@farm.example`;
  const desk = await browser.newPage();
  await signIn(desk, ACCOUNTS.counter);
  await desk.goto("/desk/new");
  const newCustomer = desk.getByRole("region", { name: "A new customer" });
  await newCustomer.getByLabel("Name").fill("Ines Invited");
  await newCustomer.getByLabel("E-mail").fill(email);
  await newCustomer.getByLabel("Phone").fill("555-0177");
  await newCustomer.getByRole("button", { name: "Save and start the order" }).click();
  await expect(desk.getByRole("heading", { name: "Phone order for Ines Invited" })).toBeVisible();
  await desk.goto("/desk/customers");
  await desk
    .getByRole("row", { name: /Ines Invited/ })
    .getByRole("button", { name: "Invite to an account" })
    .click();
  await expect(desk.getByRole("status").filter({ hasText: `Invitation sent to ${email}` })).toBeVisible();
  await desk.close();

  const page = await browser.newPage();
  const mail = await mailTo(email, /follow your orders online/i);
  const link = mail.text.match(/https?:\/\/\S+\/sign-up\?invite=[\w-]+/)?.[0];
  expect(link).toBeTruthy();
  await page.goto(link!);
  await expect(page.getByLabel("E-mail")).toHaveValue(email);
  await page.getByLabel("Password").fill("invited-password-1");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page).toHaveURL(/\/orders\?welcome=1/);
  await page.close();
});

import { expect, test } from "@playwright/test";
import { ACCOUNTS, mailTo, signIn } from "./fixtures";

// The staff journey: the owner invites a floor technician by e-mail; the link (caught by
// the mail fake) lets them choose a password and lands them on the scan station; once the owner
// deactivates them they are signed out and cannot sign in again.
test("the owner invites a floor user, who joins; deactivated, they can no longer sign in", async ({
  page,
  browser,
}) => {
  // Two browsers, the mail fake and two sign-ins: more than the default minute on a busy machine.
  test.setTimeout(180_000);
  const email = `floor-${Date.now()}@tallgrass.example`;
  const name = "Odile Brandt";
  const password = "floor-password-1";

  await signIn(page, ACCOUNTS.owner);
  await page.goto("/overview/staff");
  await page.getByLabel("Name", { exact: true }).fill(name);
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Role", { exact: true }).selectOption("floor");
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Invitation sent" })).toContainText(email);
  const pending = page.getByRole("region", { name: "Pending invitations" });
  await expect(pending).toContainText(email);

  const mail = await mailTo(email, /floor account/i);
  const link = mail.text.match(/https?:\/\/\S+\/set-password\?token=[\w-]+/)?.[0];
  expect(link).toBeTruthy();
  const path = new URL(link!).pathname + new URL(link!).search;

  const invitee = await browser.newContext();
  const them = await invitee.newPage();
  await them.goto(path);
  await expect(them.getByRole("heading", { name: "Choose your password" })).toBeVisible();
  await expect(them.getByLabel("Your name")).toHaveValue(name);
  await them.getByLabel("Password").fill(password);
  await them.getByRole("button", { name: "Set password and sign in" }).click();
  await expect(them).toHaveURL("/floor");
  await expect(them.getByRole("heading", { level: 1, name: "Scan station" })).toBeVisible();

  // The link works once: a clear page, not an error.
  const again = await them.goto(path);
  expect(again?.status()).toBe(200);
  await expect(them.getByRole("heading", { name: "This invitation has been used" })).toBeVisible();

  // The owner sees them as an active floor member and deactivates them (confirmed in a dialog).
  await page.reload();
  await expect(pending).not.toContainText(email);
  const row = page.getByRole("row").filter({ hasText: email });
  await expect(row).toContainText("Floor");
  await expect(row).toContainText("Active");
  await row.getByRole("button", { name: `Deactivate ${name}` }).click();
  const dialog = page.getByRole("dialog");
  await expect(dialog).toContainText("signed out on every device");
  await dialog.getByRole("button", { name: "Deactivate" }).click();
  await expect(page.getByRole("status").filter({ hasText: "is deactivated" })).toBeVisible();
  await expect(row).toContainText("Deactivated");

  // Their open session is gone, and signing in again is refused with a reason.
  await them.goto("/floor");
  await expect(them).toHaveURL(/\/sign-in/);
  await them.getByLabel("E-mail").fill(email);
  await them.getByLabel("Password").fill(password);
  await them.getByRole("button", { name: "Sign in" }).click();
  await expect(them.getByRole("alert").filter({ hasText: "deactivated" })).toBeVisible();
  await expect(them).toHaveURL(/\/sign-in/);
  await invitee.close();
});

import { expect, test, type Page } from "@playwright/test";
import { mailTo, payOnCheckoutPage } from "./fixtures";

// The acceptance journey, end to end in Chromium, against the local Stripe and mail fakes.
// A 1×1 PNG (the smallest valid image; demo data).
const PNG = Buffer.from(
  "iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==",
  "base64",
);

async function typeInto(page: Page, label: string, value: string) {
  const field = page.getByLabel(label, { exact: true });
  await field.fill(value);
  await field.blur();
}

test("a new customer designs a shaft, fixes it, uploads a photo, pays a deposit and sees the order paid", async ({
  page,
}) => {
  test.setTimeout(120_000);
  const email = `journey-${Date.now()}@customer.example`;

  // Sign up.
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Jo Journey");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("journey-password-1");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page).toHaveURL(/\/check-email\?/);
  // The account works once the address is confirmed through the link in the e-mail.
  const verify = await mailTo(email, /confirm your e-mail/i);
  const link = verify.text.match(/https?:\/\/\S+\/verify-email\?token=[^\s\])]+/)?.[0];
  expect(link).toBeTruthy();
  await page.goto(link!);
  await expect(page).toHaveURL(/\/orders\?welcome=1/);

  // Design in inches, switch to millimetres and back.
  await page.getByRole("link", { name: "Design a shaft" }).first().click();
  await page.locator("[data-builder-ready]").waitFor();
  await page.getByLabel("Design name").fill("Ranch truck rear shaft");
  await typeInto(page, "Installed length", "60");
  await page.getByRole("radio", { name: "Millimetres, N·m, km/h" }).check();
  await expect(page.getByLabel("Installed length", { exact: true })).toHaveValue("1524.0");
  await page.getByRole("radio", { name: "Inches, lb·ft, mph" }).check();
  await expect(page.getByLabel("Installed length", { exact: true })).toHaveValue("60.00");

  // A thin tube fails critical speed; the suggested tube fixes it.
  await page.getByLabel("I want a specific tube").check();
  await page.getByLabel("Tube material", { exact: true }).selectOption({ label: "Carbon steel DOM tube" });
  await page.getByLabel("Outside diameter", { exact: true }).selectOption({ label: "2.000 in" });
  await page.getByLabel("Wall", { exact: true }).selectOption({ label: "0.065 in" });
  await expect(page.getByTestId("check-critical-speed")).toHaveAttribute("data-status", "fail");
  await page.getByRole("button", { name: "Use suggested tube" }).click();
  await expect(page.getByTestId("check-critical-speed")).toHaveAttribute("data-status", /^(pass|warn)$/);

  // Quote, then place the order with pickup.
  await page.getByRole("button", { name: "Get a quote" }).click();
  await expect(page).toHaveURL(/\/orders\/new\?design=/);
  await expect(page.getByRole("heading", { name: "Your quote" })).toBeVisible();
  await page.getByRole("button", { name: /Place order and pay/ }).click();

  // The local Stripe fake's hosted checkout: a declined card first, then the success card.
  await payOnCheckoutPage(page, "4000 0000 0000 0002");
  await expect(page.getByText("The bank turned this card down.")).toBeVisible();
  await payOnCheckoutPage(page);

  // Back on the order: confirmed by the webhook, shown as paid.
  await expect(page).toHaveURL(/\/orders\/[0-9a-f-]{36}\?paid=cs_/);
  await expect(page.getByText("Payment received")).toBeVisible({ timeout: 30_000 });
  await expect(page.getByText("Deposit paid").first()).toBeVisible();
  await expect(page.getByRole("list", { name: "Order timeline" })).toContainText(
    /Deposit of \$[\d,.]+ received/,
  );
  const orderNumber = (await page.getByRole("heading", { level: 1 }).textContent())!
    .replace("Order ", "")
    .trim();

  // Attach a photo of the old shaft.
  await page
    .getByLabel("Attach a photo or measurement sheet")
    .setInputFiles({ name: "old-shaft.png", mimeType: "image/png", buffer: PNG });
  await expect(page.getByRole("link", { name: /old-shaft\.png/ }).first()).toBeVisible();

  // The confirmation and the receipt arrived in the local mail fake.
  const received = await mailTo(email, /We have your order/);
  expect(received.subject).toContain(orderNumber);
  const receipt = await mailTo(email, /^Receipt: /);
  expect(receipt.subject).toContain(orderNumber);

  // The order list shows it paid.
  await page.getByRole("link", { name: "My orders" }).first().click();
  await expect(page.getByRole("link", { name: new RegExp(orderNumber) })).toContainText("Deposit paid");
});

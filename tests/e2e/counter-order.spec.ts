import { expect, test } from "@playwright/test";
import { ACCOUNTS, signIn, payOnCheckoutPage } from "./fixtures";

test("the counter enters a phone order for a new customer, takes the deposit, and the owner refunds part of it", async ({
  page,
  browser,
}) => {
  test.setTimeout(120_000);
  const email = `phone-${Date.now()}@customer.example`;

  // A new phone customer.
  await signIn(page, ACCOUNTS.counter);
  await page.getByRole("link", { name: "New phone order" }).first().click();
  const newCustomer = page.getByRole("region", { name: "A new customer" });
  await newCustomer.getByLabel("Name").fill("Odell Pruitt");
  await newCustomer.getByLabel("E-mail").fill(email);
  await newCustomer.getByLabel("Phone").fill("555-0163");
  await newCustomer.getByRole("button", { name: "Save and start the order" }).click();
  await expect(page.getByRole("heading", { name: "Phone order for Odell Pruitt" })).toBeVisible();

  // The same builder; the defaults are a passing street shaft.
  await page.locator("[data-builder-ready]").waitFor();
  await page.getByLabel("Design name").fill("Dually rear shaft");
  await page.getByRole("button", { name: "Get a quote" }).click();
  await expect(page).toHaveURL(/\/desk\/new\/quote\?customer=.*design=/);
  await expect(page.getByRole("heading", { name: "Quote for Odell Pruitt" })).toBeVisible();
  await page.getByRole("button", { name: /Place order \(.* due now\)/ }).click();

  // On the order, the counter takes the deposit over the phone.
  await expect(page).toHaveURL(/\/desk\/orders\/[0-9a-f-]{36}\?placed=1/);
  await expect(page.getByText("Order placed")).toBeVisible();
  const orderUrl = new URL(page.url());
  await page.getByRole("button", { name: /^Take deposit of/ }).click();
  await payOnCheckoutPage(page);
  await expect(page).toHaveURL(/\?paid=cs_/);
  await expect(page.getByText("Payment received")).toBeVisible({ timeout: 30_000 });

  // The owner refunds part of the deposit, with a reason the customer sees.
  const owner = await browser.newPage();
  await signIn(owner, ACCOUNTS.owner);
  await owner.goto(`/desk/orders/${orderUrl.pathname.split("/").pop()}`);
  owner.once("dialog", (d) => void d.accept());
  await owner.getByLabel("Amount (USD)").fill("25.00");
  await owner.getByLabel("Reason (the customer sees it)").fill("Customer supplied his own centre bolts");
  await owner.getByRole("button", { name: "Refund", exact: true }).click();
  await expect(owner.getByRole("status").filter({ hasText: "Refunded $25.00" })).toBeVisible();
  await expect(owner.getByRole("list", { name: "Order timeline" })).toContainText("Refund of $25.00");
  await expect(owner.getByText("Partly refunded").first()).toBeVisible();

  // A refund larger than what is left is refused, and nothing changes.
  owner.once("dialog", (d) => void d.accept());
  await owner.getByLabel("Amount (USD)").fill("99999");
  await owner.getByLabel("Reason (the customer sees it)").fill("Too much");
  await owner.getByRole("button", { name: "Refund", exact: true }).click();
  await expect(owner.getByRole("alert").filter({ hasText: /At most \$/ })).toBeVisible();
  await owner.close();
});

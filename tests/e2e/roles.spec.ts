import { expect, test } from "@playwright/test";
import { ACCOUNTS, signInWithForm } from "./fixtures";

const HOMES = [
  {
    role: "owner",
    path: "/overview",
    heading: "Overview",
    nav: ["Overview", "Order desk", "Orders", "Floor", "Shafts", "Catalogue & prices", "Staff", "Sent mail"],
  },
  {
    role: "counter",
    path: "/desk",
    heading: "Order desk",
    nav: ["Order desk", "New phone order", "Orders", "Customers", "Work queue"],
  },
  { role: "floor", path: "/floor", heading: "Scan station", nav: ["Scan station", "Work queue"] },
  { role: "customer", path: "/orders", heading: "My orders", nav: ["My orders", "Design a shaft"] },
] as const;

for (const home of HOMES) {
  test(`${home.role} signs in, lands on their home with their navigation, and signs out`, async ({
    page,
  }) => {
    await signInWithForm(page, ACCOUNTS[home.role]);
    await expect(page).toHaveURL(home.path);
    await expect(page.getByRole("heading", { level: 1, name: home.heading })).toBeVisible();
    const nav = page.getByRole("navigation", { name: "Main" }).first();
    await expect(nav.getByRole("link")).toHaveText([...home.nav]);
    await expect(nav.getByRole("link", { name: home.nav[0] })).toHaveAttribute("aria-current", "page");

    await page.getByRole("button", { name: "Sign out" }).first().click();
    await expect(page).toHaveURL(/\/sign-in\?signed-out=1/);
    await page.goto(home.path);
    await expect(page).toHaveURL(new RegExp(`/sign-in\\?next=${encodeURIComponent(home.path)}`));
  });
}

test("a wrong password shows an error and keeps the e-mail", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(ACCOUNTS.counter);
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "do not match" })).toBeVisible();
  await expect(page.getByLabel("E-mail")).toHaveValue(ACCOUNTS.counter);
});

test("the sign-in form names an empty field before submitting", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText("Enter the e-mail address you signed up with.")).toBeVisible();
  await expect(page.getByLabel("E-mail")).toHaveAttribute("aria-invalid", "true");
});

test("demo mode lists the demo accounts on the sign-in page", async ({ page }) => {
  await page.goto("/sign-in");
  const demo = page.getByRole("region", { name: "Demo accounts" });
  await expect(demo).toContainText(ACCOUNTS.owner);
  await demo.getByRole("button", { name: "Use the Floor demo account" }).click();
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL("/floor");
});

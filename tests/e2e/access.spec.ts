import { expect, test } from "@playwright/test";
import { ACCOUNTS, signIn } from "./fixtures";

const STAFF_PAGES = [
  "/desk",
  "/desk/new",
  "/desk/customers",
  "/floor",
  "/floor/queue",
  "/overview",
  "/overview/catalogue",
  "/overview/staff",
];

test("an anonymous visitor is sent to sign-in, and comes back after", async ({ page }) => {
  await page.goto("/desk/customers");
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fdesk%2Fcustomers/);
  await page.getByLabel("E-mail").fill(ACCOUNTS.counter);
  await page.getByLabel("Password").fill("yokeline-demo-2026");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL("/desk/customers");
  await expect(page.getByRole("cell", { name: "Harlan Voss" })).toBeVisible();
});

test("a visitor's Design your shaft asks them to sign in, then opens the builder", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByText(/do not replace a qualified engineer/)).toBeVisible();
  await page.getByRole("link", { name: "Design your shaft" }).click();
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fbuild/);
  await page.getByLabel("E-mail").fill(ACCOUNTS.customer);
  await page.getByLabel("Password").fill("yokeline-demo-2026");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL("/build");
  await expect(page.getByRole("heading", { name: "Design a shaft" })).toBeVisible();
});

test("a customer is refused every staff page with 403", async ({ page }) => {
  await signIn(page, ACCOUNTS.customer);
  for (const path of STAFF_PAGES) {
    const res = await page.goto(path);
    expect(res?.status(), path).toBe(403);
    await expect(page.getByRole("heading", { name: "This page is for shop staff" })).toBeVisible();
  }
});

test("floor staff are refused the owner's pages", async ({ page }) => {
  await signIn(page, ACCOUNTS.floor);
  for (const path of ["/overview", "/overview/staff", "/desk"]) {
    expect((await page.goto(path))?.status(), path).toBe(403);
    // They are staff: the page says their role does not include it, not that it is for staff.
    await expect(page.getByRole("heading", { name: "This page is not part of your role" })).toBeVisible();
    await expect(page.getByText("Your account (Floor) does not have access to it.")).toBeVisible();
  }
});

test("health reports the version and a database round-trip", async ({ request }) => {
  const res = await request.get("/api/health");
  expect(res.status()).toBe(200);
  const body = await res.json();
  expect(body.database.ok).toBe(true);
  expect(body.version).toMatch(/^\d+\.\d+\.\d+/);
});

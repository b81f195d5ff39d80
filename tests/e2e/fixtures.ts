import { expect, type Page } from "@playwright/test";
import { DEMO_CUSTOMERS, DEMO_PASSWORD, DEMO_STAFF } from "../../lib/demo";

export const ACCOUNTS = {
  owner: DEMO_STAFF[0].email,
  counter: DEMO_STAFF[1].email,
  floor: DEMO_STAFF[2].email,
  customer: DEMO_CUSTOMERS[0].email,
} as const;

/** Signs in through the real form, as a person would. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).not.toHaveURL(/\/sign-in/);
}

import { expect, test } from "@playwright/test";
import { ACCOUNTS, signIn } from "./fixtures";

// Vibration triage (issue 10): staff open a shipped shaft's as-built record from the demo history
// (every step signed off), describe where and when it shakes, and read the ranked causes.
test("staff triage a shipped shaft's vibration from its as-built record", async ({ page }) => {
  await signIn(page, ACCOUNTS.owner);
  await page.goto("/overview/shafts?state=shipped");
  await page.locator('a[href^="/floor/shafts/"]').first().click();
  await expect(page).toHaveURL(/\/floor\/shafts\/[A-Z0-9-]+$/);

  const panel = page.getByRole("region", { name: "Vibration triage" });
  await expect(panel).toBeVisible();
  await panel.getByLabel("Shaft rpm").check();
  await panel.getByLabel("Under load (accelerating)").check();

  // A missing number names its field; nothing is computed.
  await panel.getByRole("button", { name: "Run triage" }).click();
  await expect(panel.getByText("Shaft speed: enter a number")).toBeVisible();

  // From the keyboard: type the speed and press Enter.
  const rpm = panel.getByLabel("Shaft speed (rpm)");
  await rpm.fill("3000");
  await rpm.press("Enter");

  await expect(panel.getByText("Shaft speed 3000 rpm (50.0 Hz)")).toBeVisible();
  await expect(panel.getByText(/should not be driven at speed until it has been checked/)).toBeVisible();
  const causes = panel.getByRole("list", { name: "Likely causes, most likely first" }).locator(":scope > li");
  await expect(causes).toHaveCount(4);
  const titles = await causes.locator("h3").allTextContents();
  expect(titles.map((t) => t.replace(/^\d+\.\s*/, "")).sort()).toEqual([
    "Margin to the critical speed",
    "Runout (once per turn)",
    "Unbalance (once per turn)",
    "Working angles and phasing (twice per turn)",
  ]);
  // Every step is signed off, so each cause is scored (none "not measured"), with its frequency.
  await expect(panel.getByText("Not measured yet")).toHaveCount(0);
  await expect(panel.getByText("100.0 Hz · 2× shaft")).toBeVisible();
  await expect(panel.getByText("50.0 Hz · once per turn (1× shaft)").first()).toBeVisible();
});

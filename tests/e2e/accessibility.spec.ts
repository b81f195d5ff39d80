import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { ACCOUNTS, signIn } from "./fixtures";

/** Serious and critical WCAG 2.1 A/AA problems found by axe on the page as it stands. */
async function violations(page: Page) {
  const result = await new AxeBuilder({ page })
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  return result.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .map(
      (v) =>
        `${v.id}: ${v.help} — ${v.nodes
          .map((n) => n.target.join(" "))
          .slice(0, 3)
          .join(", ")}`,
    );
}

const SCREENS = [
  {
    who: null,
    paths: ["/", "/sign-in", "/sign-up", "/check-email?email=a%40b.example", "/set-password?token=x"],
  },
  { who: ACCOUNTS.customer, paths: ["/orders", "/build"] },
  { who: ACCOUNTS.counter, paths: ["/desk", "/desk/new", "/desk/customers"] },
  { who: ACCOUNTS.owner, paths: ["/overview", "/overview/staff", "/overview/mail", "/overview/catalogue"] },
  { who: ACCOUNTS.floor, paths: ["/floor"] },
] as const;

for (const { who, paths } of SCREENS) {
  test(`no serious accessibility problems: ${paths.join(", ")}`, async ({ page }) => {
    if (who) await signIn(page, who);
    for (const path of paths) {
      await page.goto(path);
      await page.waitForLoadState("networkidle");
      expect(await violations(page), path).toEqual([]);
    }
  });
}

test("no serious accessibility problems on an order page and its quote", async ({ page }) => {
  await signIn(page, ACCOUNTS.counter);
  await page.goto("/desk");
  await page
    .getByRole("link", { name: /^Y\d{2}-\d{4}$/ })
    .first()
    .click();
  await page.waitForLoadState("networkidle");
  expect(await violations(page), page.url()).toEqual([]);
});

import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { formatStepCode } from "../../lib/traveller/codes";
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

/**
 * What sticks out past the screen's right edge at desk and phone widths (a page that scrolls
 * sideways): the outermost such elements, outside boxes that scroll on purpose (wide tables).
 */
async function widerThanScreen(page: Page): Promise<string[]> {
  const found: string[] = [];
  const size = page.viewportSize() ?? { width: 1280, height: 720 };
  for (const width of [1280, 390]) {
    await page.setViewportSize({ width, height: size.height });
    await page.evaluate(() => new Promise((done) => requestAnimationFrame(() => done(null))));
    found.push(
      ...(await page.evaluate((screen) => {
        if (document.documentElement.scrollWidth <= screen) return [];
        const sticking = [...document.querySelectorAll("body *")].filter(
          (el) =>
            el.getBoundingClientRect().right > screen + 1 && !el.closest(".overflow-x-auto, .overflow-auto"),
        );
        return sticking
          .filter((el) => !sticking.includes(el.parentElement as Element))
          .slice(0, 3)
          .map(
            (el) => `${screen} px: <${el.tagName.toLowerCase()} class="${el.getAttribute("class") ?? ""}">`,
          );
      }, width)),
    );
  }
  await page.setViewportSize(size);
  return found;
}

const SCREENS = [
  {
    who: null,
    paths: ["/", "/sign-in", "/sign-up", "/check-email?email=a%40b.example", "/set-password?token=x"],
  },
  { who: ACCOUNTS.customer, paths: ["/orders", "/build"] },
  { who: ACCOUNTS.counter, paths: ["/desk", "/desk/new", "/desk/customers", "/desk/orders"] },
  {
    who: ACCOUNTS.owner,
    paths: [
      "/overview",
      "/overview/staff",
      "/overview/mail",
      "/overview/catalogue",
      "/overview/steps",
      "/overview/shafts",
    ],
  },
  { who: ACCOUNTS.floor, paths: ["/floor", "/floor/queue", "/floor/shafts"] },
] as const;

for (const { who, paths } of SCREENS) {
  test(`no serious accessibility problems, nothing wider than the screen: ${paths.join(", ")}`, async ({
    page,
  }) => {
    // axe reads every one of the catalogue editor's thousand inputs: about 40 s on 2 cores.
    test.setTimeout(150_000);
    if (who) await signIn(page, who);
    for (const path of paths) {
      await page.goto(path);
      await page.waitForLoadState("networkidle");
      expect(await violations(page), path).toEqual([]);
      expect(await widerThanScreen(page), path).toEqual([]);
    }
  });
}

test("no serious accessibility problems on an order page, nothing wider than the screen", async ({
  page,
}) => {
  await signIn(page, ACCOUNTS.counter);
  await page.goto("/desk");
  await page
    .getByRole("link", { name: /^Y\d{2}-\d{4}$/ })
    .first()
    .click();
  await page.waitForLoadState("networkidle");
  expect(await violations(page), page.url()).toEqual([]);
  expect(await widerThanScreen(page), page.url()).toEqual([]);
});

test("no serious accessibility problems on the floor's screens with a shaft in the shop", async ({
  browser,
}) => {
  test.setTimeout(90_000);
  // The counter releases a demo order by hand (its deposit is not paid), as the desk would.
  const desk = await (await browser.newContext()).newPage();
  await signIn(desk, ACCOUNTS.counter);
  await desk.goto("/desk");
  await desk
    .getByRole("link", { name: /^Y\d{2}-\d{4}$/ })
    .last()
    .click();
  await desk.waitForURL(/\/desk\/orders\/[0-9a-f-]{36}$/);
  const box = desk.getByRole("region", { name: "Shop floor" });
  await expect(box).toBeVisible();
  const release = box.getByRole("button", { name: "Release to the shop" });
  if (await release.isVisible()) {
    await box.getByLabel(/why release now/).fill("Regular customer, pays on pickup");
    await release.click();
  }
  await expect(box.getByRole("link", { name: "Print traveller" })).toBeVisible();
  expect(await violations(desk), desk.url()).toEqual([]);
  expect(await widerThanScreen(desk), desk.url()).toEqual([]);
  const serial = (await box.locator("a.font-mono").first().textContent())!.trim();
  await desk.close();

  const page = await (await browser.newContext()).newPage();
  await signIn(page, ACCOUNTS.floor);
  const scan = page.getByLabel("Scan a traveller barcode or a serial");
  await page.locator("[data-station-ready]").waitFor();
  await scan.fill(formatStepCode({ serial, step: "CUT", revision: 1 }));
  await scan.press("Enter");
  await expect(page.getByRole("heading", { name: /Step 1 of \d+: Cut tube/ })).toBeVisible();
  expect(await violations(page), "/floor with a step open").toEqual([]);
  // A length far off its limit: the hold panel.
  await page.getByLabel("Tube heat / lot number").fill("H-1");
  await page.getByLabel(/^Cut length/).fill("1");
  await page.getByRole("button", { name: /^Submit/ }).click();
  await expect(page.getByText("On hold: Cut tube")).toBeVisible();
  expect(await violations(page), "/floor after a hold").toEqual([]);
  for (const path of ["/floor/queue", `/floor/shafts/${serial}`]) {
    await page.goto(path);
    await page.waitForLoadState("networkidle");
    expect(await violations(page), path).toEqual([]);
    expect(await widerThanScreen(page), path).toEqual([]);
  }
});

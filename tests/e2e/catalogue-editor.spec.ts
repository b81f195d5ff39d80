import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import { DEMO_STAFF } from "../../lib/demo";
import { ACCOUNTS, signIn } from "./fixtures";

const streetTruck = JSON.parse(readFileSync("examples/street-truck.json", "utf8")) as Record<string, unknown>;

test("the owner changes a tube's price: a new version with its audit entry; a placed order keeps its total", async ({
  page,
}) => {
  // A thousand inputs on one page: give a loaded machine time.
  test.setTimeout(180_000);
  // The tube Yokeline picks for the README street truck (a demo order is one), and its price in a quote now.
  const report = (await (await page.request.post("/api/designs/evaluate", { data: streetTruck })).json()) as {
    tube: { tubeId: string };
  };
  const tubeId = report.tube.tubeId;
  const quoteTubeCents = async () => {
    const quote = (await (
      await page.request.post("/api/designs/quote", { data: { design: streetTruck } })
    ).json()) as { lines: { code: string; unitCents: number }[] };
    return quote.lines.find((l) => l.code === "tube")!.unitCents;
  };
  const before = await quoteTubeCents();

  await signIn(page, ACCOUNTS.owner);

  // A demo order placed before the change, and its total.
  await page.goto("/desk");
  const orderHref = await page.locator('a[href^="/desk/orders/"]').first().getAttribute("href");
  expect(orderHref).toBeTruthy();
  const total = (p: typeof page) =>
    p
      .locator("dl > div")
      .filter({ has: p.locator("dt", { hasText: /^Total$/ }) })
      .locator("dd");
  await page.goto(orderHref!);
  const orderTotal = (await total(page).first().textContent())!.trim();

  await page.goto("/overview/catalogue");
  await expect(page.getByRole("heading", { level: 1, name: "Catalogue & prices" })).toBeVisible();
  await expect(page.getByText("Demonstration catalogue", { exact: true })).toBeVisible();
  const version = Number((await page.getByText(/Editing version \d+/).textContent())!.match(/\d+/)![0]);

  // A wrong value first: named next to the field, nothing saved.
  const price = page.getByLabel(`Price per metre of tube ${tubeId}`, { exact: true });
  await price.fill("-5");
  await page.getByRole("button", { name: "Save as new version…" }).click();
  await expect(page.getByText("must not be negative").first()).toBeVisible();
  await expect(price).toHaveAttribute("aria-invalid", "true");

  const newDollars = ((before + 1250) / 100).toFixed(2); // demo data: an invented price rise
  await price.fill(newDollars);
  await expect(price).not.toHaveAttribute("aria-invalid", "true");
  await page.getByRole("button", { name: "Save as new version…" }).click();
  const dialog = page.getByRole("dialog", { name: `Save as version ${version + 1}?` });
  await expect(dialog).toBeVisible();
  await expect(
    dialog.getByRole("row").filter({ hasText: `Tubes › ${tubeId} › Price per metre` }),
  ).toContainText(`$${newDollars}`);
  await dialog.getByLabel("Note for the history").fill("Steel price list, December");
  await dialog.getByRole("button", { name: `Save version ${version + 1}` }).click();

  await expect(page.getByText(`Saved as version ${version + 1}`)).toBeVisible({ timeout: 45_000 });
  await expect(page.getByText(`Editing version ${version + 1}.`)).toBeVisible();
  const entry = page
    .getByRole("listitem")
    .filter({ has: page.getByRole("heading", { name: `Version ${version + 1}` }) });
  await expect(entry).toContainText("current");
  await expect(entry).toContainText(DEMO_STAFF[0].name);
  await expect(entry).toContainText("Steel price list, December");
  await expect(
    entry.getByRole("row").filter({ hasText: `Tubes › ${tubeId} › Price per metre` }),
  ).toContainText(`$${(before / 100).toFixed(2)}`);
  await expect(
    entry.getByRole("row").filter({ hasText: `Tubes › ${tubeId} › Price per metre` }),
  ).toContainText(`$${newDollars}`);

  // The placed order keeps its total; a new quote uses the new price.
  await page.goto(orderHref!);
  await expect(total(page).first()).toHaveText(orderTotal);
  expect(await quoteTubeCents()).toBe(before + 1250);
});

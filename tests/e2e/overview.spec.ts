import { expect, test } from "@playwright/test";
import { ACCOUNTS, signIn } from "./fixtures";

// The owner's overview on the demo shop's history: the figures link to the orders table's
// filters, holds say why, and each chart has its figures as a table for screen readers.
test("the owner reads the overview: states, late and at risk, holds with reasons, charts with tables", async ({
  page,
}) => {
  await signIn(page, ACCOUNTS.owner);
  await page.goto("/overview");
  await expect(page.getByRole("heading", { name: "Overview", level: 1 })).toBeVisible();

  const late = page.getByRole("link", { name: "past their promised date" });
  await expect(late).toHaveAttribute("href", "/desk/orders?late=1");
  await expect(page.getByRole("link", { name: /will miss the promise/ })).toHaveAttribute(
    "href",
    "/desk/orders?atRisk=1",
  );

  const states = page.getByRole("table", { name: "Orders by state, with their count and value" });
  for (const state of ["Awaiting payment", "In the shop", "Ready", "Shipped", "Cancelled"])
    await expect(states.getByRole("row", { name: new RegExp(`^${state}`) })).toBeVisible();
  await expect(states.getByRole("link").first()).toHaveAttribute("href", /^\/desk\/orders\?status=/);

  const holds = page.getByRole("region", { name: "On hold and why" });
  await expect(holds.getByText(/is outside the limit/).first()).toBeVisible();

  // Charts: a title, a summary, and (for screen readers and print) the same figures as a table.
  for (const [title, rows] of [
    ["Shafts finished per week", 12],
    ["Days from order to ship", 6],
    ["Time per step", 6],
  ] as const) {
    const card = page.getByRole("region", { name: title });
    await expect(card.locator(".recharts-surface")).toBeAttached();
    await expect(card.getByRole("table").getByRole("row")).toHaveCount(rows + 1);
  }
  await expect(page.getByRole("table", { name: "Money by week" }).getByRole("row")).toHaveCount(13);
});

test("the counter is refused the overview", async ({ page }) => {
  await signIn(page, ACCOUNTS.counter);
  const res = await page.goto("/overview");
  expect(res?.status()).toBe(403);
});

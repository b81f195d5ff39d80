import { randomUUID } from "node:crypto";
import { readFileSync } from "node:fs";
import { Client } from "pg";
import { expect, test } from "@playwright/test";
import { ACCOUNTS, signIn } from "./fixtures";
import { readCsv } from "../tables/csv-read";

// Issue 9's "Done when": the owner filters the orders table to late orders, the URL says so, the
// back button restores the unfiltered table, and the exported CSV holds the table's rows.

const tag = `E2E${randomUUID().slice(0, 5).toUpperCase()}`;

/** Three orders of our own (demo data): two late (promised in the past, still open), one shipped long ago. */
async function seedOrders(): Promise<void> {
  const db = new Client({ connectionString: process.env.DATABASE_URL });
  await db.connect();
  try {
    const {
      rows: [customer],
    } = await db.query<{ id: string }>(
      `insert into customer (id, name, email, company, created_at)
       values (gen_random_uuid(), $1, $2, 'Late Lane Haulage', now()) returning id`,
      [`Lena Late ${tag}`, `lena-${tag.toLowerCase()}@customer.example`],
    );
    const orders: [string, string, string, number][] = [
      [`${tag}-1`, "received", "2020-03-02", 0],
      [`${tag}-2`, "in_shop", "2020-03-01", 0],
      [`${tag}-3`, "shipped", "2020-02-01", 52_000],
    ];
    for (const [number, status, promised, paid] of orders)
      await db.query(
        `insert into shop_order (id, number, customer_id, channel, status, payment_state, fulfilment, currency,
           subtotal_cents, tax_cents, shipping_cents, total_cents, deposit_cents, paid_cents, refunded_cents,
           promised_date, created_at, updated_at)
         values (gen_random_uuid(), $1, $2, 'counter', $3, $4, 'pickup', 'USD', 52000, 0, 0, 52000, 26000, $5, 0, $6, now(), now())`,
        [number, customer!.id, status, paid ? "paid" : "unpaid", paid, promised],
      );
  } finally {
    await db.end();
  }
}

test("the owner filters the orders table to late orders, goes back, and exports what the table shows", async ({
  page,
}) => {
  test.setTimeout(90_000);
  await seedOrders();
  await signIn(page, ACCOUNTS.owner);
  await page.goto("/desk");
  await page.getByRole("link", { name: "All orders", exact: true }).click();
  await expect(page).toHaveURL(/\/desk\/orders$/);
  const table = page.getByRole("table", { name: "Orders" });
  await expect(table.getByRole("link", { name: `${tag}-3` })).toBeVisible();

  // Late only, then narrowed to our own customer by the search box (Enter applies it).
  await page.getByRole("checkbox", { name: "Late only" }).check();
  await expect(page).toHaveURL(/[?&]late=1(&|$)/);
  await expect(table.getByRole("link", { name: `${tag}-3` })).toHaveCount(0);
  await page.getByRole("searchbox", { name: "Search" }).fill(`Lena Late ${tag}`);
  await page.getByRole("searchbox", { name: "Search" }).press("Enter");
  await expect(page).toHaveURL(new RegExp(`q=Lena\\+Late\\+${tag}`));
  await expect(table.locator("tbody tr")).toHaveCount(2);

  // Sorted by promise, soonest first: a click on the column header.
  await table.getByRole("button", { name: "Promised" }).click();
  await expect(page).toHaveURL(/sort=promised/);
  await expect(table.getByRole("columnheader", { name: "Promised" })).toHaveAttribute(
    "aria-sort",
    "ascending",
  );
  const shown = await table.locator("tbody tr td:first-child").allInnerTexts();
  expect(shown).toEqual([`${tag}-2`, `${tag}-1`]);
  await expect(table.locator("tbody tr").first()).toContainText("Late");

  // The back button steps back through the filters, and the controls follow the URL.
  await page.goBack();
  await expect(page).not.toHaveURL(/sort=promised/);
  await page.goBack();
  await expect(page).toHaveURL(/[?&]late=1$/);
  await expect(page.getByRole("searchbox", { name: "Search" })).toHaveValue("");
  await page.goBack();
  await expect(page).toHaveURL(/\/desk\/orders$/);
  await expect(page.getByRole("checkbox", { name: "Late only" })).not.toBeChecked();
  await expect(table.getByRole("link", { name: `${tag}-3` })).toBeVisible();
  await page.goForward();
  await page.goForward();
  await page.goForward();
  await expect(page).toHaveURL(/sort=promised/);
  await expect(page.getByRole("checkbox", { name: "Late only" })).toBeChecked();

  // The export: a download of every matching row, the same rows in the same order as the table.
  const downloading = page.waitForEvent("download");
  await page.getByRole("link", { name: /Export CSV \(2 rows\)/ }).click();
  const download = await downloading;
  expect(download.suggestedFilename()).toMatch(/^orders-\d{4}-\d{2}-\d{2}\.csv$/);
  const [header, ...rows] = readCsv(readFileSync((await download.path())!, "utf8"));
  expect(header?.[0]).toBe("Order");
  expect(rows.map((r) => r[0])).toEqual(shown);
  const lateColumn = header!.indexOf("Late");
  expect(rows.map((r) => r[lateColumn])).toEqual(["late", "late"]);

  // Hiding a column is kept in the URL, and the file leaves it out too.
  await page.getByText("Columns", { exact: true }).click();
  await page.getByRole("checkbox", { name: "E-mail" }).uncheck();
  await expect(page).toHaveURL(/hide=email/);
  await expect(table.getByRole("columnheader", { name: "E-mail" })).toHaveCount(0);
  const csv = await page.request.get(
    (await page.getByRole("link", { name: /Export CSV/ }).getAttribute("href"))!,
  );
  expect(readCsv(await csv.text())[0]).not.toContain("E-mail");
});

test("a link the table cannot read shows the defaults and says why; other roles are refused", async ({
  browser,
}) => {
  const owner = await browser.newPage();
  await signIn(owner, ACCOUNTS.owner);
  await owner.goto("/desk/orders?sort=nonsense&page=-4");
  await expect(owner.getByRole("status").filter({ hasText: "was not understood" })).toContainText("sort");
  await expect(owner.getByRole("table", { name: "Orders" })).toBeVisible();
  const bad = await owner.request.get("/api/exports/orders?late=yes");
  expect(bad.status()).toBe(422);
  expect(((await bad.json()) as { error: { fields: Record<string, string> } }).error.fields).toHaveProperty(
    "late",
  );
  for (const path of ["/overview/shafts", "/overview/steps"])
    expect((await owner.goto(path))?.status(), path).toBe(200);
  await owner.close();

  const floor = await browser.newPage();
  await signIn(floor, ACCOUNTS.floor);
  for (const path of ["/desk/orders", "/desk/customers", "/overview/shafts", "/overview/steps"])
    expect((await floor.goto(path))?.status(), path).toBe(403);
  expect((await floor.request.get("/api/exports/orders")).status()).toBe(403);
  await floor.close();

  const counter = await browser.newPage();
  await signIn(counter, ACCOUNTS.counter);
  expect((await counter.goto("/desk/orders"))?.status()).toBe(200);
  expect((await counter.goto("/overview/shafts"))?.status()).toBe(403);
  expect((await counter.request.get("/api/exports/shafts")).status()).toBe(403);
  await counter.close();
});

import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import { ACCOUNTS, signIn } from "./fixtures";
import { floorStation, payAndConfirm, record, releaseAndPrint, scan } from "./floor-helpers";

// Issue 10's "Done when": a two-piece shaft goes from quote through the floor. The customer saves a
// two-piece design (through the builder's own API: the builder has no two-piece control of its own
// yet), sees it quoted with both tubes and the centre bearing, orders and pays; the counter releases
// it and prints the traveller (one page per piece, every code read back); the floor signs off each
// piece's steps, the assembly, final inspection and pickup.
const twoPieceVan = JSON.parse(readFileSync("examples/two-piece-van.json", "utf8")) as unknown;
const STEPS = ["CUA", "CUB", "WLA", "WLB", "RUA", "RUB", "BAA", "BAB", "ASM", "FIN", "SHP"];

test("a two-piece shaft from quote through the floor", async ({ page, browser }) => {
  test.setTimeout(240_000);

  // The customer's quote: two tubes, the centre bearing, three joints, balancing per piece.
  await signIn(page, ACCOUNTS.customer);
  const origin = new URL(page.url()).origin;
  const saved = await page.request.post("/api/designs", {
    headers: { origin },
    data: {
      name: `Van two-piece ${Date.now()}`,
      design: twoPieceVan,
      application: { description: "Long-wheelbase van", use: "street" },
    },
  });
  expect(saved.status()).toBe(201);
  const { id: designId } = (await saved.json()) as { id: string };
  await page.goto(`/orders/new?design=${designId}`);
  const main = page.getByRole("main");
  await expect(main.getByText(/piece A \(front\), \d+ mm/)).toBeVisible();
  await expect(main.getByText(/piece B \(rear\), \d+ mm/)).toBeVisible();
  await expect(main.getByText(/^Centre bearing, stub and end yoke YL-X41/)).toBeVisible();
  await expect(main.getByText("Dynamic balance, each piece")).toBeVisible();
  await page.getByLabel("Pick up at the shop").check();
  await page.getByRole("button", { name: /Place order and pay/ }).click();
  const orderId = await payAndConfirm(page);

  // The counter releases it (unless the paid deposit already did) and prints the traveller.
  const { serial, printed } = await releaseAndPrint(browser, orderId);
  const codeOf = (s: string) => printed.find((c) => c.startsWith(`${serial}-${s}-R1-`))!;
  for (const s of STEPS) expect(codeOf(s), `code ${s} on the traveller`).toBeTruthy();

  // The floor scans and records each piece's steps, then the assembly, inspection and pickup.
  const floor = await floorStation(browser);
  for (const s of STEPS.slice(0, -1)) {
    await scan(floor, codeOf(s));
    await record(floor, codeOf(s));
    await expect(floor.getByRole("status").filter({ hasText: "Passed:" })).toBeVisible();
    if (s === "CUB") await expect(floor.getByText(/Cut tube — piece B \(rear\)/).first()).toBeVisible();
    if (s === "ASM") await expect(floor.getByText(/Assemble at the centre bearing/).first()).toBeVisible();
  }
  await scan(floor, codeOf("SHP"));
  await record(floor, codeOf("SHP"), { pickedUpBy: "Rosa" });
  await expect(floor.getByRole("status").filter({ hasText: "Passed: Pickup" })).toBeVisible();
  await expect(floor.getByText("This shaft has left the shop.")).toBeVisible();

  // The customer's timeline shows both pieces' steps and the assembly.
  await page.goto(`/orders/${orderId}`);
  const timeline = page.getByRole("list", { name: "Order timeline" });
  for (const name of [
    "Cut tube — piece A (front)",
    "Balance — piece B (rear)",
    "Assemble at the centre bearing",
  ]) {
    await expect(timeline).toContainText(`${serial}: ${name} done`);
  }
});

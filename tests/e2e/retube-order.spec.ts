import { expect, test } from "@playwright/test";
import { ACCOUNTS, signIn } from "./fixtures";
import { readCodes, record, scan } from "./floor-helpers";

// Issue 10's re-tube journey: the counter quotes a re-tube of a walk-in customer's shaft (weld-to-
// weld, the parts reused, priced without them and with the teardown line), places and releases it;
// the traveller starts with teardown and inspection; the floor scans every step — a reused joint
// fails inspection, is replaced and passes as rework — through to pickup.

test("a re-tube goes from the counter's quote through teardown, inspection and the floor to pickup", async ({
  page,
  browser,
}) => {
  test.setTimeout(240_000);

  // A walk-in customer brings their shaft; the counter builds it as usual.
  await signIn(page, ACCOUNTS.counter);
  await page.getByRole("link", { name: "New phone order" }).first().click();
  const newCustomer = page.getByRole("region", { name: "A new customer" });
  await newCustomer.getByLabel("Name").fill("Wendell Ostrander");
  await newCustomer.getByLabel("E-mail").fill(`retube-${Date.now()}@customer.example`);
  await newCustomer.getByLabel("Phone").fill("555-0177");
  await newCustomer.getByRole("button", { name: "Save and start the order" }).click();
  await expect(page.getByTestId("retube-hint")).toBeVisible();
  await page.locator("[data-builder-ready]").waitFor();
  await page.getByLabel("Design name").fill("Farm truck re-tube");
  await page.getByRole("button", { name: "Get a quote" }).click();
  await expect(page).toHaveURL(/\/desk\/new\/quote\?customer=.*design=/);

  // The quote: a new shaft until the counter says re-tube.
  const intake = page.getByTestId("retube-intake");
  await expect(page.getByText("Re-tube: teardown and inspection")).toHaveCount(0);
  await intake.getByLabel(/Re-tube \/ repair/).check();
  await intake.getByLabel("Weld-to-weld (in)").fill("0");
  await intake.getByLabel("Reuse: Rear end fitting / yoke").check();
  await intake.getByLabel("Rear end fitting / yoke: condition").fill("ears straight, bores round");
  await intake.getByLabel("Reuse: Rear joint").check();
  await intake.getByRole("button", { name: "Save re-tube details and re-price" }).click();
  // Each mistake is named at its field, and what was typed stays.
  await expect(intake.getByText("must be a positive number")).toBeVisible();
  await expect(intake.getByText("say what condition a reused part is in")).toBeVisible();
  await expect(intake.getByLabel("Rear end fitting / yoke: condition")).toHaveValue(
    "ears straight, bores round",
  );
  await intake.getByLabel("Weld-to-weld (in)").fill("46.750");
  await intake.getByLabel("Rear joint: condition").fill("smooth, no play");
  await expect(intake.getByTestId("retube-length-check")).toContainText("Cross-check from weld-to-weld");
  await intake.getByRole("button", { name: "Save re-tube details and re-price" }).click();
  await expect(intake.getByText("Saved: the quote is priced as a re-tube.")).toBeVisible();
  // Re-priced: the teardown line, the reused parts at no charge, and "Re-tube" on the shaft.
  await expect(page.getByText("Re-tube: teardown and inspection")).toBeVisible();
  await expect(page.getByText(/the customer's, reused \(not charged\)/)).toHaveCount(2);
  await expect(page.getByTestId("retube-badge").first()).toBeVisible();
  await page.getByRole("button", { name: /Place order \(.* due now\)/ }).click();

  // The order: Re-tube on the shaft and in the timeline; released by hand (pays at pickup).
  await expect(page).toHaveURL(/\/desk\/orders\/[0-9a-f-]{36}\?placed=1/);
  const orderId = new URL(page.url()).pathname.split("/").pop()!;
  await expect(page.getByTestId("retube-badge").first()).toBeVisible();
  await expect(page.getByRole("list", { name: "Order timeline" })).toContainText("a re-tube of your shaft");
  const floorBox = page.getByRole("region", { name: "Shop floor" });
  await floorBox.getByLabel("The deposit is not paid: why release now?").fill("Pays in full at pickup");
  await floorBox.getByRole("button", { name: "Release to the shop" }).click();
  await expect(floorBox.getByRole("link", { name: "Print traveller" })).toBeVisible();
  const serial = (await floorBox.locator("a.font-mono").first().textContent())!.trim();

  // The traveller: teardown and inspection first, every step's code readable from the print.
  const pdf = await page.request.get(`/desk/orders/${orderId}/traveller`);
  expect(pdf.status()).toBe(200);
  const printed = readCodes(await pdf.body());
  const steps = ["TDN", "INS", "CUT", "WLD", "RUN", "BAL", "FIN", "SHP"];
  const codeOf = (s: string) => printed.find((c) => c.startsWith(`${serial}-${s}-R1-`))!;
  for (const s of steps) expect(codeOf(s), s).toBeTruthy();

  // The floor: teardown, then inspection, where the reused joint fails and holds the shaft.
  const floor = await (await browser.newContext()).newPage();
  await signIn(floor, ACCOUNTS.floor);
  await scan(floor, codeOf("TDN"));
  await expect(floor.getByText("Teardown").first()).toBeVisible();
  await record(floor, codeOf("TDN"), { slipYokeState: "not received" });
  await expect(floor.getByRole("status").filter({ hasText: "Passed: Teardown" })).toBeVisible();
  await scan(floor, codeOf("INS"));
  await record(floor, codeOf("INS"), { findings: "rear joint: caps brinelled", rearJointPasses: "no" });
  await expect(floor.getByRole("alert").filter({ hasText: "On hold: Inspect reused parts" })).toContainText(
    "Rear joint passes, reuse it: no — rear joint: caps brinelled",
  );
  // The joint is replaced; inspection again passes as rework.
  await scan(floor, codeOf("INS"));
  await expect(floor.getByText("On hold — rework, then measure again")).toBeVisible();
  await record(floor, codeOf("INS"), { findings: "rear joint replaced with a new one" });
  await expect(
    floor.getByRole("status").filter({ hasText: "Rework passed: Inspect reused parts" }),
  ).toBeVisible();

  // Then the usual steps, to pickup.
  for (const s of ["CUT", "WLD", "RUN", "BAL", "FIN"]) {
    await scan(floor, codeOf(s));
    await record(floor, codeOf(s));
    await expect(floor.getByRole("status").filter({ hasText: "Passed:" })).toBeVisible();
  }
  await scan(floor, codeOf("SHP"));
  await record(floor, codeOf("SHP"), { pickedUpBy: "Wendell Ostrander" });
  await expect(floor.getByRole("status").filter({ hasText: "Passed: Pickup" })).toBeVisible();

  // The as-built record says re-tube and keeps the teardown and the inspection's hold.
  await floor.goto(`/floor/shafts/${serial}`);
  await expect(floor.getByTestId("retube-badge")).toBeVisible();
  await expect(floor.getByText("Cut length (re-tube: the customer's weld-to-weld)")).toBeVisible();
  await expect(floor.getByRole("heading", { name: /Inspect reused parts/ })).toBeVisible();
  await page.reload();
  await expect(page.getByRole("list", { name: "Order timeline" })).toContainText(
    "your shaft is taken apart and its parts inspected first",
  );
  await floor.close();
});

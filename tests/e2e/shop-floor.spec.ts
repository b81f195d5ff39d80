import { expect, test } from "@playwright/test";
import { ACCOUNTS, mailTo, signIn } from "./fixtures";
import { floorStation, payAndConfirm, record, releaseAndPrint, scan, traveller } from "./floor-helpers";

// The shop floor issue's "Done when" journey: a paid order is released at the desk, its traveller
// PDF's codes are read back from the rendered page, the floor signs off every step by "scanning"
// (typing the code plus Enter), a runout hold is reworked, the shaft ships, the customer's
// timeline shows each step and a void traveller's code is refused.

test("a paid order goes through the shop: release, traveller, scans, a hold and rework, shipping", async ({
  page,
  browser,
}) => {
  test.setTimeout(240_000);

  // The customer orders a shaft with shipping and pays the deposit on the payment fake's page.
  await signIn(page, ACCOUNTS.customer);
  await page.goto("/build");
  await page.locator("[data-builder-ready]").waitFor();
  await page.getByLabel("Design name").fill("Floor journey shaft");
  await page.getByRole("button", { name: "Get a quote" }).click();
  await expect(page).toHaveURL(/\/orders\/new\?design=/);
  await page.getByLabel("Ship it").check();
  await page.getByLabel("Shipping address").fill("12 Prairie Road\nHutchinson KS 67501");
  await page.getByRole("button", { name: /Place order and pay/ }).click();
  const orderId = await payAndConfirm(page);

  // The counter releases it (unless the deposit already did) and prints the traveller.
  const { desk, floorBox, serial, printed } = await releaseAndPrint(browser, orderId);
  expect(serial).toMatch(/^[A-Z]{2,4}-\d{2}-\d{5}-[0-9A-Z]$/);

  const steps = ["CUT", "WLD", "RUN", "BAL", "FIN", "SHP"];
  // A Code 128 per step (serial, step, revision, check character) and the serial's QR code.
  expect(printed).toContain(serial);
  for (const s of steps)
    expect(printed).toContainEqual(expect.stringMatching(new RegExp(`^${serial}-${s}-R1-[0-9A-Z]$`)));
  expect(await traveller(desk.request, orderId)).toEqual(printed); // a reprint gives the same codes

  // A design change after release: revision 1 is void and revision 2 is printed.
  await floorBox.getByText("Void and reissue traveller").click();
  desk.once("dialog", (d) => void d.accept());
  await floorBox.getByLabel("Why (the design changed how?)").fill("Customer re-measured the pinion angle");
  await floorBox.getByRole("button", { name: "Void and reissue", exact: true }).click();
  await expect(desk.getByText(/revision 2 issued; revision 1 is void/)).toBeVisible();
  const reprinted = await traveller(desk.request, orderId);
  const codeOf = (s: string) => reprinted.find((c) => c.startsWith(`${serial}-${s}-R2-`))!;
  for (const s of steps) expect(codeOf(s)).toBeTruthy();

  // The floor: scans are typed into the one input, which always has focus.
  const floor = await floorStation(browser);

  // A void traveller's code is refused with a clear message; a mistyped code too.
  await scan(
    floor,
    printed.find((c) => c.startsWith(`${serial}-CUT-R1-`))!,
  );
  await expect(floor.getByRole("alert").filter({ hasText: "Not accepted" })).toContainText(
    "This traveller is void",
  );
  await scan(floor, codeOf("CUT").slice(0, -1) + (codeOf("CUT").endsWith("A") ? "B" : "A"));
  await expect(floor.getByRole("alert").filter({ hasText: "Not accepted" })).toContainText(
    "fails its check character",
  );

  // Scanning ahead says which step is next.
  await scan(floor, codeOf("BAL"));
  await expect(floor.getByText("Not its turn yet")).toBeVisible();
  await expect(floor.getByText(/Next for .* is step 1: Cut tube/)).toBeVisible();
  await floor.getByRole("button", { name: "Back to scanning" }).click();

  for (const s of ["CUT", "WLD"]) {
    await scan(floor, codeOf(s));
    await record(floor, codeOf(s));
    await expect(floor.getByRole("status").filter({ hasText: "Passed:" })).toBeVisible();
  }

  // Runout out of limit at mid-span: a hold naming the value and the limit.
  await scan(floor, codeOf("RUN"));
  await record(floor, codeOf("RUN"), { runoutMidMm: "0.0500" });
  const hold = floor.getByRole("alert").filter({ hasText: "On hold: Straighten and runout" });
  await expect(hold).toContainText(/Runout at mid-span 0\.0500 in is outside the limit at most/);
  await expect(floor.getByLabel("Scan a traveller barcode or a serial")).toBeFocused();

  // Rework, then a new measurement in limit.
  await scan(floor, codeOf("RUN"));
  await expect(floor.getByText("On hold — rework, then measure again")).toBeVisible();
  await record(floor, codeOf("RUN"));
  await expect(
    floor.getByRole("status").filter({ hasText: "Rework passed: Straighten and runout" }),
  ).toBeVisible();

  for (const s of ["BAL", "FIN"]) {
    await scan(floor, codeOf(s));
    await record(floor, codeOf(s));
    await expect(floor.getByRole("status").filter({ hasText: "Passed:" })).toBeVisible();
  }
  // Final inspection passed: the balance is requested and "ready" is in the mail fake.
  const orderNumber = (await floor
    .getByText(/order Y\d{2}-\d{4}/)
    .first()
    .textContent())!.match(/Y\d{2}-\d{4}/)![0];
  expect(
    (await mailTo(ACCOUNTS.customer, new RegExp(`^Order ${orderNumber} is ready`))).subject,
  ).toBeTruthy();
  expect(
    (await mailTo(ACCOUNTS.customer, new RegExp(`^Balance of .* due for order ${orderNumber}`))).subject,
  ).toBeTruthy();

  await scan(floor, codeOf("SHP"));
  await record(floor, codeOf("SHP"), { carrier: "Demo Freight", trackingNumber: "1Z-DEMO-0042" });
  await expect(floor.getByRole("status").filter({ hasText: "Passed: Pack and ship" })).toBeVisible();
  await expect(floor.getByText("This shaft has left the shop.")).toBeVisible();
  const shipped = await mailTo(ACCOUNTS.customer, new RegExp(`^Order ${orderNumber} has shipped`));
  expect(shipped.text).toContain("1Z-DEMO-0042");

  // Scanning the serial opens its as-built record with every measurement.
  await scan(floor, serial);
  await expect(floor).toHaveURL(new RegExp(`/floor/shafts/${serial}$`));
  await expect(floor.getByRole("heading", { name: `Shaft ${serial}` })).toBeVisible();
  await expect(floor.getByText("Rework, then pass")).toBeVisible();
  await expect(floor.getByText("1Z-DEMO-0042")).toBeVisible();

  // The customer's timeline shows every step signed off, without the internal hold.
  await page.goto(`/orders/${orderId}`);
  const timeline = page.getByRole("list", { name: "Order timeline" });
  for (const name of ["Cut tube", "Weld and phase", "Straighten and runout", "Balance", "Final inspection"]) {
    await expect(timeline).toContainText(`${serial}: ${name} done`);
  }
  await expect(timeline).toContainText(`${serial} shipped: Demo Freight 1Z-DEMO-0042`);
  await expect(timeline).not.toContainText("on hold");

  // The customer's own record of the shaft, and a reorder from it.
  await page.getByRole("link", { name: serial }).click();
  await expect(page.getByRole("heading", { name: `Your shaft ${serial}` })).toBeVisible();
  await page.getByRole("button", { name: "Reorder this shaft" }).click();
  await expect(page).toHaveURL(/\/build\?draft=[0-9a-f-]{36}/);
});

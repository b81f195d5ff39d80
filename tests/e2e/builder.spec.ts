import { expect, test, type Page } from "@playwright/test";
import { readFileSync } from "node:fs";
import { ACCOUNTS, signIn } from "./fixtures";

const length = (page: Page) => page.getByLabel("Installed length", { exact: true });
const inches = (page: Page) => page.getByRole("radio", { name: "Inches, lb·ft, mph" });
const millimetres = (page: Page) => page.getByRole("radio", { name: "Millimetres, N·m, km/h" });
const criticalSpeed = (page: Page) => page.getByTestId("check-critical-speed");

async function typeInto(page: Page, label: string, value: string) {
  const field = page.getByLabel(label, { exact: true });
  await field.fill(value);
  await field.blur();
}

test.describe("shaft builder", () => {
  test.beforeEach(async ({ page }) => {
    await signIn(page, ACCOUNTS.customer);
    await page.goto("/build");
    await expect(page.getByRole("heading", { name: "Design a shaft" })).toBeVisible();
    await page.locator("[data-builder-ready]").waitFor();
  });

  test("designs in inches, switches units, fails and fixes critical speed, saves, reloads, downloads and re-uploads", async ({
    page,
  }) => {
    await expect(inches(page)).toBeChecked();
    await page.getByLabel("Design name").fill(`E2E shaft ${Date.now()}`);

    // Units switch without losing precision.
    await typeInto(page, "Installed length", "52");
    await expect(length(page)).toHaveValue("52.00");
    await millimetres(page).check();
    await expect(length(page)).toHaveValue("1320.8");
    await inches(page).check();
    await expect(length(page)).toHaveValue("52.00");

    // A long shaft on a thin 2 in tube: critical speed fails.
    await typeInto(page, "Installed length", "60");
    await page.getByLabel("I want a specific tube").check();
    await page.getByLabel("Tube material", { exact: true }).selectOption({ label: "Carbon steel DOM tube" });
    await page.getByLabel("Outside diameter", { exact: true }).selectOption({ label: "2.000 in" });
    await page.getByLabel("Wall", { exact: true }).selectOption({ label: "0.065 in" });
    await expect(criticalSpeed(page)).toHaveAttribute("data-status", "fail");
    await expect(criticalSpeed(page)).toContainText("Fail");
    await expect(page.getByTestId("safety-caution")).toBeVisible();
    await expect(page.getByRole("button", { name: "Get a quote" })).toBeDisabled();

    // One click on the suggestion fixes it.
    await page.getByRole("button", { name: "Use suggested tube" }).click();
    await expect(criticalSpeed(page)).toHaveAttribute("data-status", /^(pass|warn)$/);
    await expect(criticalSpeed(page)).toContainText(/Pass|Warning/);
    const odAfter = await page.getByLabel("Outside diameter", { exact: true }).inputValue();
    expect(Number(odAfter)).toBeGreaterThan(50.8);

    // Save, then reload the draft from its address.
    await page.getByRole("button", { name: /Save (as )?draft/ }).click();
    await expect(page.getByTestId("save-status")).toContainText("Saved ✓");
    await expect(page).toHaveURL(/\/build\?draft=[0-9a-f-]{36}/);
    await page.reload();
    await page.locator("[data-builder-ready]").waitFor();
    await expect(length(page)).toHaveValue("60.00");
    await expect(page.getByLabel("I want a specific tube")).toBeChecked();
    await expect(criticalSpeed(page)).toHaveAttribute("data-status", /^(pass|warn)$/);

    // Download the design file: SI, the contract's fields.
    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("button", { name: "Download design file" }).click(),
    ]);
    const file = await download.path();
    const design = JSON.parse(readFileSync(file, "utf8"));
    expect(design.lengthMm).toBeCloseTo(1524, 6);
    expect(design.tube.odMm).toBeCloseTo(Number(odAfter), 6);
    expect(design.geometry.transmission.verticalDeg).toBe(3);

    // Change something, then upload the file: it comes back.
    await typeInto(page, "Installed length", "48");
    await expect(length(page)).toHaveValue("48.00");
    await page.getByTestId("design-upload").setInputFiles(file);
    await expect(page.getByText(/^Loaded /)).toBeVisible();
    await expect(length(page)).toHaveValue("60.00");

    // A bad file names the bad field and changes nothing.
    await page.getByTestId("design-upload").setInputFiles({
      name: "bad-design.json",
      mimeType: "application/json",
      buffer: Buffer.from(JSON.stringify({ ...design, lengthMm: -3, torque: { engineTorqueNm: "lots" } })),
    });
    await expect(page.getByTestId("upload-errors")).toContainText("lengthMm: must be a positive number");
    await expect(page.getByTestId("upload-errors")).toContainText("torque.engineTorqueNm:");
    await expect(length(page)).toHaveValue("60.00");
  });

  test("a field the core rejects shows its message and the results say to fix it", async ({ page }) => {
    await typeInto(page, "Installed length", "-4");
    await expect(page.getByText("lengthMm: must be a positive number")).toBeVisible();
    await expect(page.getByTestId("stale-note").first()).toBeVisible();
    await expect(page.getByRole("button", { name: "Get a quote" })).toBeDisabled();
    await typeInto(page, "Installed length", "52");
    await expect(page.getByTestId("stale-note")).toHaveCount(0);
    await expect(page.getByRole("img", { name: /Side view of the driveline/ })).toBeVisible();
    await expect(page.getByRole("img", { name: /Speed ratio over one turn/ })).toBeVisible();
  });
});

test("a customer deletes a saved design after confirming (a dropped connection first leaves nothing busy)", async ({
  page,
}) => {
  await signIn(page, ACCOUNTS.customer);
  await page.goto("/build");
  await page.locator("[data-builder-ready]").waitFor();
  const name = `Throwaway ${Date.now()}`;
  await page.getByLabel("Design name").fill(name);
  // The connection drops: the save and the quote say so and both buttons are free again.
  await page.route("**/api/designs", (r) => r.abort("internetdisconnected"));
  await page.getByRole("button", { name: "Get a quote" }).click();
  await expect(page.getByTestId("save-status")).toContainText("No connection to the shop");
  await expect(page.getByRole("button", { name: "Get a quote" })).toBeEnabled();
  await expect(page.getByRole("button", { name: /Save (as )?draft/ })).toBeEnabled();
  await expect(page).toHaveURL(/\/build$/);
  await page.unroute("**/api/designs");
  await page.getByRole("button", { name: /Save (as )?draft/ }).click();
  await expect(page.getByTestId("save-status")).toContainText("Saved ✓");
  const list = page.getByTestId("draft-list");
  await expect(list).toContainText(name);
  page.once("dialog", (d) => void d.accept());
  await list.getByRole("button", { name: `Delete ${name}` }).click();
  await expect(page.getByTestId("draft-list").getByText(name)).toHaveCount(0);
  await expect(page).not.toHaveURL(/draft=/);
  await page.reload();
  await page.locator("[data-builder-ready]").waitFor();
  await expect(page.getByTestId("draft-list").getByText(name)).toHaveCount(0);
});

test("the builder's checks cannot be fetched: no error in the page, and saving says the shop is unreachable", async ({
  page,
}) => {
  const pageErrors: string[] = [];
  page.on("pageerror", (error) => pageErrors.push(error.message));
  await signIn(page, ACCOUNTS.customer);
  await page.goto("/build");
  await page.locator("[data-builder-ready]").waitFor();
  // The page has its scripts; the engineering core is fetched at the first edit, and that fails.
  await page.route("**/_next/static/chunks/**", (r) => r.abort("internetdisconnected"));
  await page.getByLabel("Design name").fill(`Offline ${Date.now()}`);
  await typeInto(page, "Installed length", "52");
  await page.getByRole("button", { name: /Save (as )?draft/ }).click();
  await expect(page.getByTestId("save-status")).toContainText("No connection to the shop");
  await expect(page.getByRole("button", { name: /Save (as )?draft/ })).toBeEnabled();
  // Enter in a field submits the form through its check: nothing is thrown there either.
  await page.getByLabel("Installed length", { exact: true }).press("Enter");
  expect(pageErrors).toEqual([]);

  await page.unrouteAll();
  await page.getByRole("button", { name: /Save (as )?draft/ }).click();
  await expect(page.getByTestId("save-status")).toContainText("Saved ✓");
  expect(pageErrors).toEqual([]);
});

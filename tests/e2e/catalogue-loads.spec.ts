import { expect, test } from "@playwright/test";
import { ACCOUNTS, signIn } from "./fixtures";

test("the owner sees each material's minimum and weld-zone yield with sources, the joints' continuous ratings and the limits per use, and saves a continuous rating", async ({
  page,
}) => {
  // A thousand inputs on one page: give a loaded machine time.
  test.setTimeout(180_000);
  await signIn(page, ACCOUNTS.owner);
  await page.goto("/overview/catalogue");
  await expect(page.getByRole("heading", { level: 1, name: "Catalogue & prices" })).toBeVisible();
  const version = Number((await page.getByText(/Editing version \d+/).textContent())!.match(/\d+/)![0]);

  // Materials: minimum yield, condition, weld-zone yield and its source.
  const al = "material aluminium-6061-t6";
  await expect(page.getByLabel(`Minimum yield (MPa) of ${al}`, { exact: true })).toHaveValue("241");
  await expect(page.getByLabel(`Condition of ${al}`, { exact: true })).toHaveValue("T6, drawn tube");
  await expect(page.getByLabel(`Weld-zone yield (MPa) of ${al}`, { exact: true })).toHaveValue("103");
  await expect(page.getByLabel(`Weld-zone yield source of ${al}`, { exact: true })).toHaveValue(
    /welded values/,
  );
  await expect(page.getByLabel("Condition of material steel-dom", { exact: true })).toHaveValue(
    /stress-relieved/,
  );

  // Limits: the new ones sit with the others, each with its source.
  for (const limit of [
    "Service factor, towing",
    "Tyre–road adhesion, race",
    "Largest service / critical speed, industrial",
    "Smallest weld-zone torsion safety factor",
  ])
    await expect(page.getByRole("rowheader", { name: limit })).toBeVisible();
  await expect(page.getByLabel("Service factor, towing", { exact: true })).toHaveValue("1.25");
  await expect(page.getByLabel("Source of Service factor, towing", { exact: true })).toHaveValue(
    /from memory/,
  );

  // Joints: the continuous rating beside the peak; above the peak it is refused by name.
  const continuous = page.getByLabel("Continuous rating (N·m) of joint series YL-X41", { exact: true });
  await expect(continuous).toHaveValue("1500");
  await expect(
    page.getByLabel("Peak torque rating (N·m) of joint series YL-X41", { exact: true }),
  ).toHaveValue("4200");
  await continuous.fill("5000");
  await page.getByRole("button", { name: "Save as new version…" }).click();
  await expect(page.getByText("must not be above the peak torque rating").first()).toBeVisible();
  await expect(continuous).toHaveAttribute("aria-invalid", "true");

  // Demo data: a shop's lower continuous figure, saved as a new version and named in the history.
  await continuous.fill("1400");
  await expect(continuous).not.toHaveAttribute("aria-invalid", "true");
  await page.getByRole("button", { name: "Save as new version…" }).click();
  const dialog = page.getByRole("dialog", { name: `Save as version ${version + 1}?` });
  await expect(
    dialog.getByRole("row").filter({ hasText: "Joints › YL-X41 › Continuous rating (N·m)" }),
  ).toContainText("1400");
  await dialog.getByLabel("Note for the history").fill("Joint maker's continuous ratings");
  await dialog.getByRole("button", { name: `Save version ${version + 1}` }).click();
  await expect(page.getByText(`Saved as version ${version + 1}`)).toBeVisible({ timeout: 45_000 });
  await expect(continuous).toHaveValue("1400");
});

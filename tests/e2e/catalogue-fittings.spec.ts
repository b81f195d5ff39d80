import { expect, test, type APIRequestContext } from "@playwright/test";
import { truckDesign } from "../driveline/fixtures";
import { ACCOUNTS, signIn } from "./fixtures";

// Demo design (invented): a slip yoke on a 27-spline 1.25 in output, a 4-bolt companion flange at the pinion.
const design = {
  name: "Fittings journey truck",
  ...truckDesign,
  tube: { materialId: "steel-dom", odMm: 101.6, wallMm: 2.108 },
  slip: { collapsedLengthMm: 1298.8, travelMm: 90, droopExtensionMm: 40 },
  interface: {
    transmissionOutput: { splineCount: 27, majorDiameterMm: 31.75 },
    // Demo flange pattern of YL-FY-X35-4000: 4 bolts on 3.75 in, 2.25 in pilot.
    pinion: { kind: "flange", flange: { boltCount: 4, boltCircleMm: 95.25, pilotMm: 57.15 } },
  },
};

interface Report {
  slip: { slipYokeId: string | null; minEngagementMm: number };
  ends: { rear: { fittingId: string } };
}
const evaluate = async (request: APIRequestContext) =>
  (await (await request.post("/api/designs/evaluate", { data: { design } })).json()) as Report;

test("interface data are matched and priced; the owner edits slip yokes and joint caps without losing them", async ({
  page,
}) => {
  test.setTimeout(180_000);
  // The quote prices the slip yoke matched to the output spline and the flange yoke matched to the flange.
  const quote = (await (await page.request.post("/api/designs/quote", { data: { design } })).json()) as {
    lines: { code: string; label: string; unitCents: number }[];
  };
  expect(quote.lines.find((l) => l.label.startsWith("Slip yoke, 27 splines"))?.unitCents).toBe(9800); // demo price
  expect(quote.lines.some((l) => l.label.startsWith("Weld-on flange yoke YL-X35"))).toBe(true);
  const before = await evaluate(page.request);
  expect(before.slip.slipYokeId).toBe("YL-SY-27-1250-X30");
  expect(before.slip.minEngagementMm).toBe(25);
  expect(before.ends.rear.fittingId).toBe("YL-FY-X35-4000");

  await signIn(page, ACCOUNTS.owner);
  await page.goto("/overview/catalogue");
  await expect(page.getByRole("heading", { name: /^Slip yokes \(\d+\)$/ })).toBeVisible();
  const version = Number((await page.getByText(/Editing version \d+/).textContent())!.match(/\d+/)![0]);

  // Half a bolt pattern is refused, naming the field.
  const bolts = page.getByLabel("Flange bolts of fitting YL-FY-X35-4000", { exact: true });
  await bolts.fill("");
  await page.getByRole("button", { name: "Save as new version…" }).click();
  await expect(bolts).toHaveAttribute("aria-invalid", "true");
  await expect(page.getByText("must be given with the rest of the bolt pattern").first()).toBeVisible();
  await bolts.fill("4");

  // A new least engagement (demo data) and U-bolts for a series.
  await page
    .getByLabel("Least spline engagement (mm) of slip yoke YL-SY-27-1250-X30", { exact: true })
    .fill("30");
  await page.getByLabel("Held by (joint series YL-X30)", { exact: true }).selectOption("u-bolt");
  await page.getByRole("button", { name: "Save as new version…" }).click();
  const dialog = page.getByRole("dialog", { name: `Save as version ${version + 1}?` });
  await expect(dialog).toBeVisible();
  await expect(
    dialog.getByRole("row").filter({ hasText: "Slip yokes › YL-SY-27-1250-X30 › Least engagement (mm)" }),
  ).toContainText("30 mm");
  await expect(dialog.getByRole("row").filter({ hasText: "Joints › YL-X30 › Held by" })).toContainText(
    "u-bolt",
  );
  await dialog.getByLabel("Note for the history").fill("Slip yoke sheet, December");
  await dialog.getByRole("button", { name: `Save version ${version + 1}` }).click();
  await expect(page.getByText(`Saved as version ${version + 1}`)).toBeVisible({ timeout: 45_000 });

  // The evaluation uses the new figure, and the flange pattern survived the save.
  const after = await evaluate(page.request);
  expect(after.slip.minEngagementMm).toBe(30);
  expect(after.ends.rear.fittingId).toBe("YL-FY-X35-4000");
});

import { expect, test, type Page } from "@playwright/test";
import { ACCOUNTS, signIn } from "./fixtures";

async function typeInto(page: Page, label: string, value: string) {
  const field = page.getByLabel(label, { exact: true });
  await field.fill(value);
  await field.blur();
}

const openGroup = (page: Page, testId: string) => page.getByTestId(testId).locator("> summary").click();

test("the builder's new fields (use, traction, engine path, slip, interface, double-Cardan) reach the evaluation and the saved design", async ({
  page,
}) => {
  test.setTimeout(90_000);
  await signIn(page, ACCOUNTS.customer);
  await page.goto("/build");
  await page.locator("[data-builder-ready]").waitFor();
  await page.getByLabel("Design name").fill(`New fields ${Date.now()}`);

  // The use the customer picks is in the results (and, below, in the design file sent).
  await page.getByLabel("Use", { exact: true }).selectOption("towing");
  await expect(page.getByTestId("loads-use")).toContainText("Towing");

  // Traction in inches and pounds: converted to SI at the edge.
  await openGroup(page, "group-traction");
  await typeInto(page, "Driven axle load", "3968");
  await typeInto(page, "Tire radius under load", "16.5");
  await typeInto(page, "Tire grip (adhesion)", "0.85");

  // The engine-speed path: 6000 rpm through a 0.70 overdrive = 8571 rpm at the shaft, faster than
  // the road path (200 km/h, 711 mm tire, 3.73 axle: 5566 rpm), so it governs.
  await expect(page.getByTestId("speed-path")).toContainText("The road-speed path governs");
  await typeInto(page, "Top gear ratio", "0.7");
  await typeInto(page, "Maximum engine rpm", "6000");
  await expect(page.getByTestId("speed-path")).toContainText("The engine path governs: 8,571 rpm");
  await expect(page.getByTestId("loads-speed")).toContainText("8,571 rpm");

  // Slip data in millimetres (installed length 1320.8 mm).
  await page.getByRole("radio", { name: "Millimetres, N·m, km/h" }).check();
  await openGroup(page, "group-slip");
  await typeInto(page, "Collapsed length", "1300");
  await typeInto(page, "Slip travel", "100");
  await typeInto(page, "Droop extension", "40");
  await typeInto(page, "Bump compression", "10");
  // 20.8 mm out at ride height; 100 − 60.8 = 39.2 mm engaged at full droop.
  await expect(page.getByTestId("check-slip-reserve")).toHaveAttribute("data-status", "pass");
  await expect(page.getByTestId("loads-slip")).toContainText("39.2 mm of spline left engaged");
  // More droop than the spline has: the reserve check fails, and says so.
  await typeInto(page, "Droop extension", "90");
  await expect(page.getByTestId("check-slip-reserve")).toHaveAttribute("data-status", "fail");
  await expect(page.getByTestId("check-slip-reserve")).toContainText("Fail");
  await typeInto(page, "Droop extension", "40");
  await expect(page.getByTestId("check-slip-reserve")).toHaveAttribute("data-status", "pass");
  // A required slip field left empty is named.
  await typeInto(page, "Slip travel", "");
  await expect(page.getByText("slip.travelMm: must be a positive number")).toBeVisible();
  await typeInto(page, "Slip travel", "100");

  // Double-Cardan front joint: the builder says how to set the axle end.
  await page.getByLabel(/A double-Cardan \(CV\) joint/).check();
  await expect(page.getByTestId("double-cardan-note")).toContainText("near zero");

  // Interface data.
  await openGroup(page, "group-interface");
  await typeInto(page, "Output spline count", "32");
  await typeInto(page, "Spline major diameter", "35.2");
  await page.getByLabel("Pinion end: what the shaft bolts to").selectOption("yoke");
  await typeInto(page, "Pinion end: cap diameter", "28.6");
  await typeInto(page, "Pinion end: span across the caps", "92.1");
  await page.getByLabel("Pinion end: caps held by").selectOption("u-bolt");
  await page.getByLabel("Joints", { exact: true }).selectOption("greaseable");

  // The measuring guide opens (customers see it; the counter's sheet leaves it out of the tab order).
  await page.getByText("How to measure: leaf springs wrap under load").click();
  await expect(page.getByText(/the pinion nose climbs/)).toBeVisible();
  await page.getByText("How to measure: length with no shaft yet").click();
  await expect(page.getByText(/measure from the face of the transmission.s output seal/)).toBeVisible();

  // What the builder sends carries every new field: none can be silently dropped.
  const request = page.waitForRequest((r) => r.method() === "POST" && r.url().endsWith("/api/designs"));
  await page.getByRole("button", { name: /Save (as )?draft/ }).click();
  const body = (await request).postDataJSON();
  await expect(page.getByTestId("save-status")).toContainText("Saved ✓");
  const d = body.design;
  expect(body.application.use).toBe("towing");
  expect(d.use).toBe("towing");
  expect(d.traction.drivenAxleLoadKg).toBeCloseTo(3968 * 0.45359237, 6); // 1 lb = 0.45359237 kg exactly
  expect(d.traction.tireLoadedRadiusMm).toBeCloseTo(16.5 * 25.4, 6); // 1 in = 25.4 mm exactly
  expect(d.traction.adhesion).toBe(0.85);
  expect(d.torque.topGearRatio).toBe(0.7);
  expect(d.speed).toMatchObject({ maxEngineRpm: 6000, topGearRatio: 0.7 });
  expect(d.slip).toMatchObject({
    collapsedLengthMm: 1300,
    travelMm: 100,
    droopExtensionMm: 40,
    bumpCompressionMm: 10,
  });
  expect(d.interface).toMatchObject({
    transmissionOutput: { splineCount: 32, majorDiameterMm: 35.2 },
    pinion: { kind: "yoke", capDiameterMm: 28.6, capSpanMm: 92.1, retention: "u-bolt" },
    lubrication: "greaseable",
  });
  expect(d.frontJointType).toBe("double-cardan");

  // The saved draft opens with them again.
  await page.reload();
  await page.locator("[data-builder-ready]").waitFor();
  await expect(page.getByLabel("Maximum engine rpm", { exact: true })).toHaveValue("6000");
  await expect(page.getByLabel("Use", { exact: true })).toHaveValue("towing");
  await expect(page.getByTestId("group-slip")).toHaveAttribute("open", "");
  await expect(page.getByLabel(/A double-Cardan \(CV\) joint/)).toBeChecked();
  await expect(page.getByTestId("speed-path")).toContainText("The engine path governs");
});

import { expect, test, type Page } from "@playwright/test";
import { DEMO_STAFF } from "../../lib/demo";
import { ACCOUNTS, signIn } from "./fixtures";

/** The focused element's name as a person hears it: its label, its aria-label, or its text. */
function focusedName(page: Page): Promise<string> {
  return page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body) return "";
    const labelled = el.getAttribute("aria-labelledby");
    const fromLabels =
      (el as HTMLInputElement).labels?.[0]?.textContent ??
      (labelled ? document.getElementById(labelled)?.textContent : null);
    return (fromLabels ?? el.getAttribute("aria-label") ?? el.textContent ?? "").replace(/\s+/g, " ").trim();
  });
}

/**
 * Presses Tab until the focused element's name matches (at most `max` presses), and returns the
 * names passed on the way: the tab order, as the keyboard meets it.
 */
async function tabTo(page: Page, name: RegExp, max = 40): Promise<string[]> {
  const passed: string[] = [];
  for (let i = 0; i < max; i++) {
    await page.keyboard.press("Tab");
    const now = await focusedName(page);
    passed.push(now);
    if (name.test(now)) return passed;
  }
  throw new Error(`no ${name} within ${max} tabs; passed: ${passed.join(" | ")}`);
}

/** Replaces a field's text as a typist does: select all, type. */
async function retype(page: Page, text: string) {
  await page.keyboard.press("ControlOrMeta+A");
  await page.keyboard.type(text);
}

test("the counter takes a phone order for a new customer with the keyboard alone and acknowledges a warning", async ({
  page,
}) => {
  test.setTimeout(120_000);
  const stamp = Date.now().toString(36);
  const name = `Ingrid Halvorsen ${stamp}`;
  const email = `ingrid-${stamp}@customer.example`;

  await signIn(page, ACCOUNTS.counter);
  // From here on: keyboard only.
  await page.goto("/desk/new");

  // The search has the focus; a name nobody has offers "New customer" as the one option.
  const search = page.getByRole("combobox", { name: /Find a customer/ });
  await expect(search).toBeFocused();
  await page.keyboard.type(name);
  await expect(page.getByRole("status").filter({ hasText: "No customer matches" })).toBeVisible();
  await expect(page.getByRole("option", { name: `New customer “${name}”` })).toHaveAttribute(
    "aria-selected",
    "true",
  );
  await page.keyboard.press("Enter");

  // The new-customer form starts with the name typed; the rest by Tab.
  const form = page.getByRole("region", { name: "A new customer" });
  await expect(form.getByLabel("Name")).toBeFocused();
  await expect(form.getByLabel("Name")).toHaveValue(name);
  await page.keyboard.press("Tab");
  await expect(form.getByLabel("E-mail")).toBeFocused();
  await page.keyboard.type(email);
  await page.keyboard.press("Tab");
  await page.keyboard.type("555 014 2277");
  await page.keyboard.press("Tab");
  await page.keyboard.type("Halvorsen Orchards");
  await page.keyboard.press("Enter");
  await expect(page.getByRole("heading", { name: `Phone order for ${name}` })).toBeVisible();

  // The compact builder: the first field of the measuring sheet has the focus.
  await page.locator("[data-builder-ready]").waitFor();
  await expect(page.getByLabel("Use", { exact: true })).toBeFocused();
  await page.keyboard.press("Tab");
  await page.keyboard.type("1982 flatbed, 5-speed manual, rear shaft");

  // Tab order follows the sheet: length, the three angles, torque, speed, tube, then the order details.
  const toPinion = await tabTo(page, /^Pinion angle/);
  expect(toPinion.slice(0, 5)).toEqual([
    "Installed length",
    "Front end fitting",
    "Rear end fitting",
    "Transmission angle",
    "Driveshaft angle",
  ]);
  // Pinion 4.5°: the working angles differ by 1.5°, over the 1° road-shaft limit — a warning.
  await retype(page, "4.5");
  const toName = await tabTo(page, /^Design name/);
  const order = ["Engine peak torque", "Top speed", "Tire diameter", "Axle ratio", "Let Yokeline pick"];
  const at = order.map((label) => toName.findIndex((n) => n.startsWith(label)));
  expect(at.every((i) => i >= 0)).toBe(true);
  expect([...at].sort((a, b) => a - b)).toEqual(at);
  await retype(page, "Halvorsen flatbed rear");
  // Enter in the last field does not submit anything by surprise.
  await page.keyboard.press("Enter");
  await expect(page.getByTestId("save-status")).toHaveText("Not saved yet");
  await expect(page.getByRole("heading", { name: "Results" })).toBeVisible();
  await expect(page.getByText(/Front\/rear working-angle difference 1\.50°/).first()).toBeVisible();

  await page.keyboard.press("Tab");
  expect(await focusedName(page)).toBe("Get a quote");
  await page.keyboard.press("Enter");

  // The quote: the warning is acknowledged by name with Space, then the order placed with Enter.
  await expect(page).toHaveURL(/\/desk\/new\/quote\?customer=.*design=/);
  await expect(page.getByRole("heading", { name: `Quote for ${name}` })).toBeVisible();
  await tabTo(page, /^Warning: Front\/rear working-angle difference/, 60);
  await page.keyboard.press("Space");
  await expect(page.getByRole("checkbox", { name: /Front\/rear working-angle difference/ })).toBeChecked();
  await tabTo(page, /^Place order/, 5);
  await page.keyboard.press("Enter");

  // The order page keeps who acknowledged which warning, and how.
  await expect(page).toHaveURL(/\/desk\/orders\/[0-9a-f-]{36}\?placed=1/);
  const acks = page.getByRole("region", { name: "Warnings acknowledged for Halvorsen flatbed rear" });
  await expect(acks).toContainText("Front/rear working-angle difference 1.50°");
  await expect(acks).toContainText(`Acknowledged by ${DEMO_STAFF[1].name} (counter, by phone)`);
});

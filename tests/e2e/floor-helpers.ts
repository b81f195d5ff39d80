/** The floor's helpers for browser tests: traveller codes read back as a scanner would, scanning, recording. */
import { expect, type APIRequestContext, type Browser, type Page } from "@playwright/test";
import { ACCOUNTS, payOnCheckoutPage, signIn } from "./fixtures";
import { readCodes } from "../setup/scan-pdf";

export { readCodes };

export async function traveller(request: APIRequestContext, orderId: string): Promise<string[]> {
  const res = await request.get(`/desk/orders/${orderId}/traveller`);
  expect(res.status()).toBe(200);
  expect(res.headers()["content-type"]).toBe("application/pdf");
  return readCodes(await res.body());
}

export interface Field {
  key: string;
  label: string;
  type: string;
  unit: string | null;
  limit: string | null;
}

/** A value inside a limit as the station shows it ("46.803 in ± 0.031 in", "at most 0.0100 in"). */
export function inside(limit: string | null): string {
  const tol = /^(-?[\d.]+)\S* ?\S* ± /.exec(limit ?? "");
  if (tol) return tol[1]!;
  const max = /^at most ([\d.]+)/.exec(limit ?? "");
  if (max) return String(Number(max[1]) / 2);
  return "2500"; // the balancing speed: "at least 1 rpm"
}

export async function scan(page: Page, code: string) {
  await page.locator("[data-station-ready]").waitFor();
  const input = page.getByLabel("Scan a traveller barcode or a serial");
  await expect(input).toBeFocused();
  await input.pressSequentially(code, { delay: 5 });
  await input.press("Enter");
}

/** Fills the open step's form with in-limit values (or `override`s). */
export async function fillStep(page: Page, code: string, override: Record<string, string> = {}) {
  const res = await page.request.get(`/api/floor/scan?code=${encodeURIComponent(code)}`);
  const { step } = (await res.json()) as { step: { fields: Field[] } };
  for (const f of step.fields) {
    const value = override[f.key];
    if (f.type === "number") {
      await page.getByLabel(`${f.label} (${f.unit})`, { exact: true }).fill(value ?? inside(f.limit));
    } else if (f.type === "text") {
      await page.getByLabel(f.label, { exact: true }).fill(value ?? `${f.key}-lot-7`);
    } else if (f.type === "confirm") {
      await page
        .getByRole("group", { name: f.label })
        .getByLabel(value === "no" ? "No" : "Yes")
        .check();
    }
  }
}

/** Fills the open step's form with in-limit values (or `override`s) and submits it. */
export async function record(page: Page, code: string, override: Record<string, string> = {}) {
  await fillStep(page, code, override);
  await page.getByRole("button", { name: /^Submit/ }).click();
}

/** Pays the order just placed on the checkout page; back on the order, returns its id. */
export async function payAndConfirm(page: Page): Promise<string> {
  await payOnCheckoutPage(page);
  await expect(page.getByText("Payment received")).toBeVisible({ timeout: 30_000 });
  return new URL(page.url()).pathname.split("/").pop()!;
}

/**
 * The counter (in a browser of their own) releases the order, unless the paid deposit already
 * did, and prints its traveller: its serial and every code read back from the PDF.
 */
export async function releaseAndPrint(browser: Browser, orderId: string) {
  const desk = await (await browser.newContext()).newPage();
  await signIn(desk, ACCOUNTS.counter);
  await desk.goto(`/desk/orders/${orderId}`);
  const floorBox = desk.getByRole("region", { name: "Shop floor" });
  await expect(floorBox).toBeVisible();
  const release = floorBox.getByRole("button", { name: "Release to the shop" });
  if (await release.isVisible()) await release.click();
  await expect(floorBox.getByRole("link", { name: "Print traveller" })).toBeVisible();
  const serial = (await floorBox.locator("a.font-mono").first().textContent())!.trim();
  return { desk, floorBox, serial, printed: await traveller(desk.request, orderId) };
}

/** The floor's scan station in a browser of its own. */
export async function floorStation(browser: Browser): Promise<Page> {
  const floor = await (await browser.newContext()).newPage();
  await signIn(floor, ACCOUNTS.floor);
  await expect(floor).toHaveURL(/\/floor$/);
  return floor;
}

/** The floor's helpers for browser tests: traveller codes read back as a scanner would, scanning, recording. */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readdirSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { expect, type APIRequestContext, type Page } from "@playwright/test";

/** Every symbol on every page of a PDF, read by zbarimg from a 300 dpi render (as a scanner would). */
export function readCodes(pdf: Buffer): string[] {
  const work = mkdtempSync(path.join(tmpdir(), "traveller-e2e-"));
  const file = path.join(work, "t.pdf");
  writeFileSync(file, pdf);
  execFileSync("pdftoppm", ["-r", "300", "-gray", "-png", file, path.join(work, "p")]);
  const codes: string[] = [];
  for (const png of readdirSync(work).filter((f) => f.endsWith(".png"))) {
    const out = execFileSync("zbarimg", ["-q", path.join(work, png)], { encoding: "utf8" });
    codes.push(
      ...out
        .split("\n")
        .filter(Boolean)
        .map((l) => l.replace(/^[^:]+:/, "")),
    );
  }
  return codes;
}

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

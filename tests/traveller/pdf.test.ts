import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, test } from "vitest";
import { PDFDocument } from "pdf-lib";
import { parseStepCode } from "@/lib/traveller/codes";
import { resolveFloorSettings } from "@/lib/traveller/settings";
import { renderTraveller, renderTravellers } from "@/lib/traveller/pdf";
import { scanPdf } from "../setup/scan-pdf";
import { exampleView } from "./fixtures";

const work = mkdtempSync(path.join(tmpdir(), "traveller-"));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function pdfText(pdf: Uint8Array, name: string, layout = true): string {
  const file = path.join(work, `${name}-text.pdf`);
  writeFileSync(file, pdf);
  return execFileSync("pdftotext", [layout ? "-layout" : "-raw", file, "-"], { encoding: "utf8" });
}

describe("traveller PDF", () => {
  test(
    "every step's Code 128 and the serial's QR code decode from the rendered page",
    { timeout: 60_000 },
    async () => {
      const view = exampleView();
      const pdf = await renderTraveller(view);
      const [symbols] = scanPdf(pdf);
      const expected = [
        `QR-Code:${view.serial}`,
        ...view.steps.map((s) => `CODE-128:${s.barcodeText}`),
      ].sort();
      expect(symbols).toEqual(expected);
      // What was decoded is a valid step code for this serial, revision and step, in routing order.
      const decoded = symbols!.filter((s) => s.startsWith("CODE-128:")).map((s) => parseStepCode(s.slice(9)));
      expect(decoded.every((d) => d.ok && d.serial === view.serial && d.revision === 1)).toBe(true);
      expect(view.steps.map((s) => s.barcodeText.split("-")[4])).toEqual([
        "CUT",
        "WLD",
        "RUN",
        "BAL",
        "FIN",
        "SHP",
      ]);
    },
  );

  test("letter or A4 by the shop's setting, one page per shaft, fonts embedded", async () => {
    const letter = await PDFDocument.load(await renderTraveller(exampleView()));
    expect(letter.getPages().map((p) => p.getSize())).toEqual([{ width: 612, height: 792 }]);
    const a4Bytes = await renderTravellers([
      exampleView({ floor: { paperSize: "a4", units: "mm" } }),
      exampleView({ floor: { paperSize: "a4", units: "mm" }, file: "compound-offset.json" }),
    ]);
    const a4 = await PDFDocument.load(a4Bytes);
    expect(a4.getPageCount()).toBe(2);
    expect(a4.getPage(0).getSize().width).toBeCloseTo(595.28, 1);
    const fonts = execFileSync("pdffonts", ["-"], { input: Buffer.from(a4Bytes), encoding: "utf8" });
    for (const line of fonts.split("\n").slice(2).filter(Boolean)) expect(line).toMatch(/ yes /); // emb
    expect(fonts).toMatch(/Inter/);
    expect(fonts).toMatch(/JetBrainsMono/);
    const pages = scanPdf(a4Bytes);
    expect(pages).toHaveLength(2);
    for (const symbols of pages) expect(symbols).toHaveLength(7);
  }, 60_000);

  test("shows what each station needs, in the shop's units", async () => {
    const inches = pdfText(await renderTraveller(exampleView()), "in");
    // README street truck: cut 1188.8 mm = 46.803 in; between joint centres 1320.8 mm = 52.000 in.
    expect(inches).toContain("46.803 in ± 0.031 in");
    expect(inches).toContain("52.000 in ± 0.063 in");
    expect(inches).toContain("Bea Buyer");
    expect(inches).toContain("2026-12-24");
    expect(inches).toContain("YL-T-DOM-3500-083");
    expect(inches).toMatch(/0\.0°/);
    expect(inches).toContain("ISO 21940-11 G 16 at 5566 rpm");
    expect(inches).toContain("Checks: PASS");
    expect(inches.match(/Signed/g)).toHaveLength(6);
    const mm = pdfText(await renderTraveller(exampleView({ floor: { units: "mm" } })), "mm");
    expect(mm).toContain("1188.8 mm ± 0.8 mm");
    expect(mm).toContain("at most 134 g·mm per plane");
    expect(mm).toContain("75.0 mm from front weld: at most 0.25 mm");
  });

  test("prints the limits frozen with the revision, not today's settings", async () => {
    const frozen = exampleView({
      floor: { units: "mm", limits: { cutLengthToleranceMm: 0.5, runoutStationInsetMm: 50 } },
    });
    const reprint = { ...frozen, floor: resolveFloorSettings({ shopCode: "TGW", units: "mm" }) };
    const text = pdfText(await renderTraveller(reprint), "frozen");
    expect(text).toContain("1188.8 mm ± 0.5 mm");
    expect(text).toContain("50.0 mm from front weld: at most 0.25 mm");
  });

  test(
    "reprinting gives the same codes; a new revision gives new ones; a void page says so",
    { timeout: 60_000 },
    async () => {
      const first = exampleView();
      const again = exampleView();
      expect(again.steps.map((s) => s.barcodeText)).toEqual(first.steps.map((s) => s.barcodeText));
      // The reprint decodes to the very codes the first print carries.
      const [reprinted] = scanPdf(await renderTraveller(again));
      expect(reprinted).toEqual(
        [`QR-Code:${first.serial}`, ...first.steps.map((s) => `CODE-128:${s.barcodeText}`)].sort(),
      );
      const rev2 = exampleView({ revision: 2 });
      expect(rev2.steps.every((s, i) => s.barcodeText !== first.steps[i]!.barcodeText)).toBe(true);
      const voided = pdfText(await renderTraveller(exampleView({ voidedBy: 2 })), "void", false);
      expect(voided.replace(/\s+/g, " ")).toContain("VOID - see revision 2");
    },
  );
});

import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { defaultCatalogue, evaluateDesign, parseDesign } from "@/lib/driveline";
import { defaultPriceBook, priceBookSchema, quoteOrder, quoteShaft } from "@/lib/pricing/price-book";

// Prices below are demo data (the demonstration catalogue and the invented shop's price book).
const parsed = parseDesign(JSON.parse(readFileSync("examples/two-piece-van.json", "utf8")));
if (!parsed.ok) throw new Error("bad example");
const report = evaluateDesign(parsed.design);
const tubePerMetre = defaultCatalogue.tubes.find((t) => t.id === "YL-T-DOM-3500-083")!.pricePerMetreCents;

describe("quoting a two-piece shaft", () => {
  const lines = quoteShaft(report, defaultPriceBook, tubePerMetre, defaultCatalogue.jointSeries);

  it("prices two tubes, both pieces' fittings, the centre bearing, three joints, labour and balancing per piece", () => {
    expect(lines.map((l) => l.code)).toEqual([
      "tube",
      "tube",
      "fitting",
      "fitting",
      "fitting",
      "centre-bearing",
      "joint",
      "joint",
      "joint",
      "labour",
      "labour",
      "balance",
    ]);
    // Each piece's span: hypot(950, h), h = tan 1° · 950 · 950 / 1900 = 8.2911 mm → 950.0362 mm.
    // Cut A = span − 66 (YL-X41 weld yoke) − 145 (centre bearing stub) = 739.04 mm; + 50 mm allowance → 789 mm.
    // Cut B = span − 66 − 66 = 818.04 mm; + 50 → 868 mm.
    expect(lines[0]!.quantity).toBe(0.789);
    expect(lines[1]!.quantity).toBe(0.868);
    expect(lines[0]!.totalCents).toBe(Math.round(0.789 * tubePerMetre));
    expect(lines[1]!.totalCents).toBe(Math.round(0.868 * tubePerMetre));
    expect(lines[0]!.label).toContain("piece A (front)");
    // Fittings: the front weld yoke on A, the centre weld yoke and the rear weld yoke on B, $88.00 each (demo);
    // A's stub comes with the centre bearing and is not charged twice.
    expect(lines.slice(2, 5).map((l) => l.totalCents)).toEqual([8800, 8800, 8800]);
    // Centre bearing YL-CB-X41-3500: round(8800 × 3.4 + 4500) = 34 420 (demo).
    expect(lines[5]).toMatchObject({ label: report.centreBearing!.name, totalCents: 34_420 });
    // Three YL-X41 crosses at $145.00.
    expect(lines.slice(6, 9).map((l) => [l.label.split(", ").at(-1), l.totalCents])).toEqual([
      ["front", 14_500],
      ["centre", 14_500],
      ["rear", 14_500],
    ]);
    // Labour: the shaft $145.00 plus one extra piece $95.00; balancing $65.00 × 2 pieces.
    expect(lines.slice(9).map((l) => [l.quantity, l.totalCents])).toEqual([
      [1, 14_500],
      [1, 9_500],
      [2, 13_000],
    ]);
  });

  it("totals the order with shipping and tax on top", () => {
    const parts =
      Math.round(0.789 * tubePerMetre) + Math.round(0.868 * tubePerMetre) + 3 * 8800 + 34_420 + 3 * 14_500;
    const subtotal = parts + 14_500 + 9_500 + 13_000;
    const q = quoteOrder([lines], "ship", defaultPriceBook);
    expect(q.subtotalCents).toBe(subtotal);
    expect(q.shippingCents).toBe(4800);
    expect(q.taxCents).toBe(Math.round(((subtotal + 4800) * 8.5) / 100));
    expect(q.totalCents).toBe(subtotal + 4800 + q.taxCents);
    expect(q.dueNowCents).toBe(Math.round(q.totalCents / 2));
  });

  it("the extra-piece labour has a default for price books saved before it existed, and refuses bad money", () => {
    const { labourPerExtraPieceCents: _l, ...older } = defaultPriceBook;
    expect(priceBookSchema.parse(older).labourPerExtraPieceCents).toBe(9500);
    const bad = priceBookSchema.safeParse({ ...defaultPriceBook, labourPerExtraPieceCents: -1 });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues[0]!.path).toEqual(["labourPerExtraPieceCents"]);
  });
});

import { describe, expect, it } from "vitest";
import {
  defaultPriceBook,
  promisedDate,
  quoteOrder,
  quoteShaft,
  type PricedShaft,
} from "@/lib/pricing/price-book";

// Prices and policies below are demo data (an invented shop's price book).
const shaft: PricedShaft = {
  tube: { odMm: 88.9, wallMm: 2.108, materialId: "steel-dom", tubeLengthMm: 1188.8 },
  ends: {
    front: { name: "Slip yoke", priceCents: 12000, jointSeriesId: "J1" },
    rear: { name: "Weld yoke", priceCents: 8000, jointSeriesId: "J1" },
  },
};
const joints = [{ id: "J1", name: "J1 cross", priceCents: 4500 }];

describe("price book", () => {
  it("prices the tube on its cut length plus the allowance, the fittings, a joint at each end, labour and balancing", () => {
    const lines = quoteShaft(shaft, defaultPriceBook, 4000, joints);
    expect(lines.map((l) => l.code)).toEqual([
      "tube",
      "fitting",
      "joint",
      "fitting",
      "joint",
      "labour",
      "balance",
    ]);
    const tube = lines[0]!;
    expect(tube.quantity).toBeCloseTo((1188.8 + defaultPriceBook.tubeAllowanceMm) / 1000, 3);
    expect(tube.totalCents).toBe(Math.round(tube.quantity * 4000));
  });

  it("charges at least the minimum tube length", () => {
    const short = { ...shaft, tube: { ...shaft.tube, tubeLengthMm: 100 } };
    expect(quoteShaft(short, defaultPriceBook, 4000, joints)[0]!.quantity).toBe(
      defaultPriceBook.minimumTubeChargeMm / 1000,
    );
  });

  it("adds shipping only when shipped, taxes everything, and asks the deposit the policy sets", () => {
    const lines = quoteShaft(shaft, defaultPriceBook, 4000, joints);
    const pickup = quoteOrder([lines], "pickup", defaultPriceBook);
    const ship = quoteOrder([lines, lines], "ship", defaultPriceBook);
    expect(pickup.shippingCents).toBe(0);
    expect(ship.shippingCents).toBe(2 * defaultPriceBook.shippingCents);
    expect(pickup.taxCents).toBe(Math.round((pickup.subtotalCents * defaultPriceBook.taxRatePercent) / 100));
    expect(pickup.totalCents).toBe(pickup.subtotalCents + pickup.taxCents);
    expect(pickup.dueNowCents).toBe(Math.round(pickup.totalCents * 0.5));
  });

  it("a full-payment policy asks the whole total up front", () => {
    const book = { ...defaultPriceBook, depositPercent: 100 };
    const q = quoteOrder([quoteShaft(shaft, book, 4000, joints)], "pickup", book);
    expect(q.dueNowCents).toBe(q.totalCents);
  });

  it("prices the joint actually fitted (a conversion cross) and the parts matched to the vehicle (a slip yoke)", () => {
    // Demo prices (invented).
    const matched = {
      ...shaft,
      ends: { front: shaft.ends!.front, rear: { ...shaft.ends!.rear!, crossSeriesId: "C1" } },
      interface: { parts: [{ name: "Slip yoke 27 splines", priceCents: 9800 }] },
    };
    const all = [...joints, { id: "C1", name: "C1 conversion cross", priceCents: 7900 }];
    const lines = quoteShaft(matched, defaultPriceBook, 4000, all);
    expect(lines.filter((l) => l.code === "joint").map((l) => l.unitCents)).toEqual([4500, 7900]);
    const yoke = lines.find((l) => l.label === "Slip yoke 27 splines")!;
    expect([yoke.code, yoke.quantity, yoke.totalCents]).toEqual(["fitting", 1, 9800]);
    const plain = quoteShaft(shaft, defaultPriceBook, 4000, all);
    const sum = (ls: typeof lines) => ls.reduce((s, l) => s + l.totalCents, 0);
    expect(sum(lines) - sum(plain)).toBe(9800 + 7900 - 4500);
  });

  it("promises a date in working days, skipping weekends", () => {
    // Friday 4 December 2026 + 1 working day → Monday 7 December.
    expect(promisedDate(new Date("2026-12-04T10:00:00Z"), 1)).toBe("2026-12-07");
    expect(promisedDate(new Date("2026-12-02T10:00:00Z"), 5)).toBe("2026-12-09");
  });
});

import { describe, expect, test } from "vitest";
import { defaultCatalogue } from "@/lib/driveline";
import { describeChange } from "@/lib/catalogue/describe";
import { diffConfig } from "@/lib/catalogue/diff";
import { toEditable, toStored } from "@/lib/catalogue/documents";
import { shopConfigDocumentSchema } from "@/lib/catalogue/schemas";
import { defaultPriceBook } from "@/lib/pricing/price-book";

const start = () =>
  toEditable({ catalogue: defaultCatalogue, settings: {}, priceBook: defaultPriceBook, floor: {} });

describe("configuration differences", () => {
  test("the built-in configuration passes the editor's schema unchanged", () => {
    const doc = start();
    const parsed = shopConfigDocumentSchema.safeParse(doc);
    expect(parsed.success).toBe(true);
    expect(diffConfig(doc, parsed.data)).toEqual([]);
  });

  test("rows are matched by id: removing one names that row only, adding one names the new row", () => {
    const before = start();
    const after = structuredClone(before);
    const [gone] = after.catalogue.tubes.splice(1, 1);
    after.catalogue.tubes.push({ ...gone!, id: "SHOP-T-1", pricePerMetreCents: 999 });
    const changes = diffConfig(before, after);
    expect(changes.map((c) => c.path)).toEqual([`catalogue.tubes.${gone!.id}`, "catalogue.tubes.SHOP-T-1"]);
    expect(describeChange(changes[0]!).kind).toBe("removed");
    expect(describeChange(changes[1]!).kind).toBe("added");
  });

  test("a limit's change reads in words with its unit, money in dollars", () => {
    const before = start();
    const after = structuredClone(before);
    // ISO 21940-11:2016 Table 1: G 6.3 is the next finer grade after G 16.
    after.settings.balanceGradeMmS = { value: 6.3, source: "ISO 21940-11:2016, G 6.3" };
    after.priceBook.labourPerShaftCents = 15000; // demo data
    const words = diffConfig(before, after).map((c) => describeChange(c));
    expect(words).toContainEqual({
      where: "Limits › Balance grade G",
      before: "16 mm/s",
      after: "6.3 mm/s",
      kind: "changed",
    });
    expect(words).toContainEqual({
      where: "Price book › Labour per shaft",
      before: "$145.00",
      after: "$150.00",
      kind: "changed",
    });
  });

  test("only limits that differ from the reference are stored as overrides, with their source", () => {
    const doc = start();
    doc.settings.runoutCentreMm = { value: 0.3, source: "our customer's drawing" };
    const stored = toStored(doc);
    expect(stored.settings).toEqual({ runoutCentreMm: { value: 0.3, source: "our customer's drawing" } });
    expect(stored.floor.limits).toEqual({});
    expect(toEditable(stored).settings.runoutCentreMm).toEqual({
      value: 0.3,
      source: "our customer's drawing",
    });
  });
});

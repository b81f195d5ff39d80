import { describe, expect, it } from "vitest";
import {
  defaultCatalogue,
  evaluateDesign,
  inToMm,
  parseDesign,
  type Catalogue,
  type DesignFile,
  type EvaluationReport,
} from "@/lib/driveline";
import { truckDesign } from "./fixtures";
import { defaultPriceBook, quoteShaft } from "@/lib/pricing/price-book";

// Demo design (invented). Design torque 250 N·m × 3.06 × 1.8 = 1376.9 N·m, so on a 3.5 in steel
// tube Yokeline's own pick at each end is the cheapest weld yoke that carries it: YL-X30 (1700 N·m).
const base = {
  name: "Interface test truck",
  ...truckDesign,
};

function evaluate(extra: Record<string, unknown>, catalogue: Catalogue = defaultCatalogue): EvaluationReport {
  const parsed = parseDesign({ ...base, ...extra }, { catalogue });
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("\n"));
  return evaluateDesign(parsed.design as DesignFile, { catalogue });
}
const check = (r: EvaluationReport, id: string) => r.checks.find((c) => c.id === id);
const price = (id: string) => defaultCatalogue.jointSeries.find((s) => s.id === id)!.priceCents;

// Demo catalogue caps (demo data, typical of the trade from memory): YL-X30 30 mm × 92.1 mm, YL-X35
// 35 mm × 106.4 mm, straps; YL-X48 48 mm × 136.5 mm, U-bolts.
const X35_YOKE = { kind: "yoke", capDiameterMm: 35.1, capSpanMm: 106.2, retention: "strap" };

describe("interface: the pinion yoke", () => {
  it("with no interface data nothing is matched and the report says so", () => {
    const r = evaluate({});
    expect(r.interface).toBeNull();
    expect(r.ends.rear!.fittingId).toBe("YL-WY-X30-3500");
    expect(r.ends.rear!.origin).toBe("suggested");
    expect(r.checks.some((c) => c.id.startsWith("interface."))).toBe(false);
  });

  it("measured caps identify the series; Yokeline's own pick gives way to a yoke of that series", () => {
    const r = evaluate({ interface: { pinion: X35_YOKE } });
    expect(r.interface!.rear!.vehicleSeriesId).toBe("YL-X35");
    expect(r.ends.rear!.fittingId).toBe("YL-WY-X35-3500");
    expect(r.ends.rear!.origin).toBe("matched");
    expect(r.ends.rear!.crossSeriesId).toBeUndefined();
    expect(r.interface!.rear!.crossKind).toBe("cross");
    expect(check(r, "interface.rear")!.status).toBe("pass");
    expect(r.joints[1]!.jointSeriesId).toBe("YL-X35");
  });

  it("a named fitting of another series gets a conversion cross, priced in the quote", () => {
    const r = evaluate({ interface: { pinion: X35_YOKE }, ends: { rear: { fittingId: "YL-WY-X30-3500" } } });
    expect(r.ends.rear!.fittingId).toBe("YL-WY-X30-3500");
    expect(r.ends.rear!.crossSeriesId).toBe("YL-C30-35");
    expect(r.interface!.rear!.crossKind).toBe("conversion");
    expect(check(r, "interface.rear")!.message).toContain("conversion cross YL-C30-35");
    // Rated as the smaller series (demo data): min(fitting 1700, conversion 1700).
    expect(r.ends.rear!.torqueRatingNm).toBe(1700);
    expect(r.joints[1]!.jointSeriesId).toBe("YL-C30-35");

    const lines = quoteShaft(r, defaultPriceBook, 4000, defaultCatalogue.jointSeries);
    const joints = lines.filter((l) => l.code === "joint");
    expect(joints.map((l) => l.unitCents)).toEqual([price("YL-X30"), price("YL-C30-35")]);
    expect(joints[1]!.label).toContain("Conversion cross");
  });

  it("no conversion cross between the two series: a warning naming what to fill, never a silent pick", () => {
    const r = evaluate({
      interface: { pinion: { kind: "yoke", capDiameterMm: 48, capSpanMm: 136.5, retention: "u-bolt" } },
      ends: { rear: { fittingId: "YL-WY-X30-3500" } },
    });
    const c = check(r, "interface.rear")!;
    expect(c.status).toBe("warn");
    expect(c.message).toContain("no conversion cross in the catalogue joins the shaft's YL-X30 yoke");
    expect(c.message).toContain("ends.rear.fittingId");
    expect(r.interface!.rear!.matched).toBe(false);
  });

  it("caps that match no series, or half the measurement, warn and name the field", () => {
    const odd = evaluate({ interface: { pinion: { kind: "yoke", capDiameterMm: 33, capSpanMm: 100 } } });
    expect(check(odd, "interface.rear")!.status).toBe("warn");
    expect(check(odd, "interface.rear")!.message).toContain("interface.pinion.capDiameterMm");
    const half = evaluate({ interface: { pinion: { kind: "yoke", capDiameterMm: 35 } } });
    expect(check(half, "interface.rear")!.message).toContain("give interface.pinion.capSpanMm");
    // Round bores take snap-ring caps, not the demo's strap caps.
    const round = evaluate({ interface: { pinion: { ...X35_YOKE, retention: "round" } } });
    expect(check(round, "interface.rear")!.status).toBe("warn");
    // U-bolts clamp the same caps as straps (common shop practice).
    const ubolt = evaluate({ interface: { pinion: { ...X35_YOKE, retention: "u-bolt" } } });
    expect(ubolt.interface!.rear!.vehicleSeriesId).toBe("YL-X35");
  });

  it("a vehicle series named outright is used; an unknown one is a field error", () => {
    const r = evaluate({ interface: { pinion: { kind: "yoke", jointSeriesId: "YL-X35" } } });
    expect(r.ends.rear!.fittingId).toBe("YL-WY-X35-3500");
    const bad = parseDesign({ ...base, interface: { pinion: { kind: "yoke", jointSeriesId: "nope" } } });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.issues[0]!.path).toBe("interface.pinion.jointSeriesId");
  });
});

describe("interface: companion flanges", () => {
  // Demo flange pattern of YL-FY-X35-4000: 4 bolts on 3.75 in, 2.25 in pilot (demo data).
  const flange = { boltCount: 4, boltCircleMm: inToMm(3.75), pilotMm: inToMm(2.25) };
  const tube4 = { materialId: "steel-dom", odMm: inToMm(4), wallMm: inToMm(0.083) };

  it("matches the flange yoke by bolt count, circle and pilot, and prices it", () => {
    const r = evaluate({ tube: tube4, interface: { pinion: { kind: "flange", flange } } });
    expect(r.ends.rear!.fittingId).toBe("YL-FY-X35-4000");
    expect(r.ends.rear!.origin).toBe("matched");
    expect(check(r, "interface.rear")!.status).toBe("pass");
    const fy = defaultCatalogue.endFittings.find((f) => f.id === "YL-FY-X35-4000")!;
    const lines = quoteShaft(r, defaultPriceBook, 4000, defaultCatalogue.jointSeries);
    expect(lines.filter((l) => l.code === "fitting").map((l) => l.unitCents)).toContain(fy.priceCents);
  });

  it("another pattern warns (field named); a named weld yoke on a flange fails", () => {
    const other = evaluate({
      tube: tube4,
      interface: { pinion: { kind: "flange", flange: { ...flange, boltCircleMm: 100 } } },
    });
    expect(check(other, "interface.rear")!.status).toBe("warn");
    expect(check(other, "interface.rear")!.message).toContain("interface.pinion.flange");
    const named = evaluate({
      tube: tube4,
      interface: { pinion: { kind: "flange", flange } },
      ends: { rear: { fittingId: "YL-WY-X35-4000" } },
    });
    expect(check(named, "interface.rear")!.status).toBe("fail");
    expect(named.overall).toBe("fail");
    const missing = evaluate({ tube: tube4, interface: { pinion: { kind: "flange" } } });
    expect(check(missing, "interface.rear")!.message).toContain("fill interface.pinion.flange");
  });
});

describe("interface: lubrication", () => {
  it("greaseable asked: the greaseable cross of the same caps, priced; its lower rating is checked", () => {
    const r = evaluate({ interface: { lubrication: "greaseable" } });
    expect(r.ends.front!.crossSeriesId).toBe("YL-X30G");
    expect(r.ends.rear!.crossSeriesId).toBe("YL-X30G");
    // Demo data: greaseable crosses rated 10 % below the sealed ones.
    expect(r.ends.rear!.torqueRatingNm).toBe(Math.round(1700 * 0.9));
    expect(check(r, "joint-torque.rear")!.limit).toBe(1530);
    expect(r.interface!.rear!.lubrication).toBe("greaseable");
    const lines = quoteShaft(r, defaultPriceBook, 4000, defaultCatalogue.jointSeries);
    expect(lines.filter((l) => l.code === "joint").map((l) => l.unitCents)).toEqual([
      price("YL-X30G"),
      price("YL-X30G"),
    ]);
  });

  it("sealed asked with sealed crosses: nothing changes", () => {
    const r = evaluate({ interface: { lubrication: "sealed" } });
    expect(r.ends.rear!.crossSeriesId).toBeUndefined();
    expect(check(r, "interface.rear")!.status).toBe("pass");
  });

  it("no greaseable cross for a series: a warning naming interface.lubrication", () => {
    const r = evaluate({
      interface: { lubrication: "greaseable" },
      ends: { rear: { fittingId: "YL-WY-X48-5000" } },
      tube: { materialId: "steel-dom", odMm: inToMm(5), wallMm: inToMm(0.12) },
    });
    expect(check(r, "interface.rear")!.status).toBe("warn");
    expect(check(r, "interface.rear")!.message).toContain("interface.lubrication");
  });
});

describe("interface: the front slip yoke and the quote", () => {
  it("slip yoke ears of another series than the front fitting: conversion at the front; the yoke is priced", () => {
    // 31 splines 1.375 in → YL-SY-31-1375-X35 (YL-X35 ears); the named front fitting is YL-X30.
    const r = evaluate({
      interface: { transmissionOutput: { splineCount: 31, majorDiameterMm: inToMm(1.375) } },
      ends: { front: { fittingId: "YL-WY-X30-3500" } },
    });
    expect(r.interface!.slipYoke!.id).toBe("YL-SY-31-1375-X35");
    expect(r.interface!.front!.vehicle).toBe("slip-yoke");
    expect(r.ends.front!.crossSeriesId).toBe("YL-C30-35");
    const lines = quoteShaft(r, defaultPriceBook, 4000, defaultCatalogue.jointSeries);
    const yoke = lines.find((l) => l.label.startsWith("Slip yoke"))!;
    expect(yoke.unitCents).toBe(12400); // demo price
    // Yokeline's own front pick instead gives way to a YL-X35 weld yoke: no conversion.
    const own = evaluate({
      interface: { transmissionOutput: { splineCount: 31, majorDiameterMm: inToMm(1.375) } },
    });
    expect(own.ends.front!.fittingId).toBe("YL-WY-X35-3500");
    expect(own.ends.front!.crossSeriesId).toBeUndefined();
  });
});

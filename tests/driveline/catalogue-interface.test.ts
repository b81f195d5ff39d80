import { describe, expect, it } from "vitest";
import { catalogueSchema, defaultCatalogue, formatPath } from "@/lib/driveline";
import { shopConfigDocumentSchema } from "@/lib/catalogue/schemas";

type Row = Record<string, unknown>;
const copy = () =>
  JSON.parse(JSON.stringify(defaultCatalogue)) as {
    jointSeries: Row[];
    endFittings: Row[];
    slipYokes?: Row[];
  } & Row;
const issuesOf = (input: unknown) => {
  const r = catalogueSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => `${formatPath(i.path)}: ${i.message}`);
};

describe("catalogue schema: slip yokes, joint caps, conversions, double-Cardan joints, flange patterns", () => {
  it("the demo catalogue's interface data survive a save", () => {
    const parsed = catalogueSchema.parse(copy());
    expect(parsed.slipYokes!.length).toBe(defaultCatalogue.slipYokes!.length);
    const x35 = parsed.jointSeries.find((s) => s.id === "YL-X35")!;
    expect([x35.capDiameterMm, x35.capSpanMm, x35.retention, x35.lubrication]).toEqual([
      35,
      106.4,
      "strap",
      "sealed",
    ]); // demo data
    expect(parsed.jointSeries.find((s) => s.id === "YL-C30-35")!.otherSeriesId).toBe("YL-X35");
    expect(parsed.jointSeries.find((s) => s.id === "YL-DC35")!.kind).toBe("double-cardan");
    const fy = parsed.endFittings.find((f) => f.id === "YL-FY-X35-4000")!;
    expect(fy.flange).toEqual({ boltCount: 4, boltCircleMm: 95.25, pilotMm: 57.15 }); // 3.75 in, 2.25 in
  });

  it("a catalogue saved before these lists existed stays valid", () => {
    const old = copy();
    delete old.slipYokes;
    for (const s of old.jointSeries)
      for (const k of ["capDiameterMm", "capSpanMm", "retention", "lubrication", "otherSeriesId", "kind"])
        delete s[k];
    old.jointSeries = old.jointSeries.filter((s) => !String(s.id).startsWith("YL-C"));
    for (const f of old.endFittings) delete f.flange;
    expect(issuesOf(old)).toEqual([]);
  });

  it("the editor's blanks mean 'not given'", () => {
    const c = copy();
    Object.assign(c.jointSeries[0]!, { retention: "", lubrication: "", kind: "", otherSeriesId: "" });
    c.endFittings[0]!.flange = { boltCount: undefined, boltCircleMm: undefined, pilotMm: undefined };
    const parsed = catalogueSchema.parse(c);
    expect(parsed.jointSeries[0]!.retention).toBeUndefined();
    expect(parsed.jointSeries[0]!.otherSeriesId).toBeUndefined();
    expect(parsed.endFittings[0]!.flange).toBeUndefined();
  });

  it("names each bad field", () => {
    const c = copy();
    c.endFittings[0]!.flange = { boltCount: 4, boltCircleMm: 95 };
    c.slipYokes![2]!.source = " ";
    c.slipYokes![3]!.splineCount = 27.5;
    const conv = c.jointSeries.find((s) => s.id === "YL-C30-35")!;
    delete conv.capSpanMm;
    c.jointSeries.find((s) => s.id === "YL-X30")!.retention = "glue";
    expect(issuesOf(c)).toEqual(
      expect.arrayContaining([
        "endFittings[0].flange.pilotMm: must be given with the rest of the bolt pattern (or leave all three empty)",
        expect.stringMatching(/^slipYokes\[2\]\.source: must name its source/),
        "slipYokes[3].splineCount: must be a whole number from 1 to 100",
        `jointSeries[${c.jointSeries.indexOf(conv)}].capSpanMm: must be given for a conversion cross (the caps on its own side)`,
        expect.stringMatching(/retention: must be strap, u-bolt or round$/),
      ]),
    );
  });

  it("references between rows must hold (once every row is valid)", () => {
    const c = copy();
    c.slipYokes![0]!.jointSeriesId = "nope";
    c.slipYokes![1]!.id = c.slipYokes![0]!.id;
    c.jointSeries.find((s) => s.id === "YL-C28-30")!.otherSeriesId = "YL-C30-35";
    c.jointSeries.find((s) => s.id === "YL-C30-35")!.otherSeriesId = "missing";
    expect(issuesOf(c)).toEqual(
      expect.arrayContaining([
        'slipYokes[0].jointSeriesId: must be a joint series in this catalogue (no series "nope")',
        expect.stringMatching(/^slipYokes\[1\]\.id: must be unique/),
        expect.stringMatching(/otherSeriesId: must be a plain single-cross series$/),
        expect.stringMatching(
          /otherSeriesId: must be a joint series in this catalogue \(no series "missing"\)$/,
        ),
      ]),
    );
  });

  it("the owner's editor document takes the new lists (the save's schema)", () => {
    const doc = shopConfigDocumentSchema.shape.catalogue.safeParse(copy());
    expect(doc.success).toBe(true);
  });
});

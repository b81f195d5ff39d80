import { describe, expect, test } from "vitest";
import { catalogueSchema, defaultCatalogue } from "@/lib/driveline";

describe("fastener torques in the catalogue", () => {
  test("the demo catalogue's torques survive the schema and are marked as demo data", () => {
    const parsed = catalogueSchema.parse(JSON.parse(JSON.stringify(defaultCatalogue)));
    const x41 = parsed.jointSeries.find((s) => s.id === "YL-X41")!;
    expect(x41.strapTorqueNm).toBe(41); // demo data (invented), not a maker's figure
    for (const s of parsed.jointSeries) expect(s.strapTorqueSource).toMatch(/^demo data/);
    const flanges = parsed.endFittings.filter((f) => f.kind === "flange-yoke");
    expect(flanges.length).toBeGreaterThan(0);
    for (const f of flanges) {
      expect(f.fastenerTorqueNm).toBeGreaterThan(0);
      expect(f.fastenerTorqueSource).toMatch(/^demo data/);
    }
  });

  test("a shop's own catalogue may leave them out, but not give a negative one", () => {
    const bare = JSON.parse(JSON.stringify(defaultCatalogue)) as {
      jointSeries: Record<string, unknown>[];
    };
    for (const s of bare.jointSeries) delete s.strapTorqueNm;
    expect(catalogueSchema.safeParse(bare).success).toBe(true);
    bare.jointSeries[0]!.strapTorqueNm = -5;
    expect(catalogueSchema.safeParse(bare).success).toBe(false);
  });
});

import { describe, expect, test } from "vitest";
import {
  SHAFT_USE_LABEL,
  TUBE_OD_MATCH_TOLERANCE_MM,
  TUBE_WALL_MATCH_TOLERANCE_MM,
  defaultCatalogue,
  evaluateDesign,
  findCatalogueTube,
  parseDesign,
  sameTube,
  shaftUseLabel,
} from "@/lib/driveline";
import { SHAFT_USES } from "@/lib/designs/schemas";
import { readFileSync } from "node:fs";

describe("tube matching", () => {
  // 3.500 in × 0.083 in: 88.9 mm × 2.1082 mm (1 in = 25.4 mm exactly); a file rounds them.
  const od = 3.5 * 25.4;
  const wall = 0.083 * 25.4;

  test("the tolerances: under the rounding of a printed size, far under the step between sizes", () => {
    // Common shop practice: sizes are read to the last printed digit (0.1 mm OD, 0.01 mm wall);
    // neighbouring tube ODs are 1/8 in = 3.175 mm apart and walls about 0.2 mm.
    expect(TUBE_OD_MATCH_TOLERANCE_MM).toBe(0.05);
    expect(TUBE_WALL_MATCH_TOLERANCE_MM).toBe(0.01);
  });

  test("a size rounded in a file is the catalogue's tube; the next size is not", () => {
    const a = { materialId: "steel-dom", odMm: od, wallMm: wall };
    expect(sameTube(a, { materialId: "steel-dom", odMm: 88.9, wallMm: 2.108 })).toBe(true);
    expect(sameTube(a, { materialId: "steel-dom", odMm: 88.96, wallMm: 2.108 })).toBe(false);
    expect(sameTube(a, { materialId: "steel-dom", odMm: 88.9, wallMm: 2.12 })).toBe(false);
    expect(sameTube(a, { materialId: "chromoly-4130", odMm: od, wallMm: wall })).toBe(false);
    // 3.625 in, the next OD up, is no match.
    expect(sameTube(a, { materialId: "steel-dom", odMm: 3.625 * 25.4, wallMm: wall })).toBe(false);
  });

  test("the core names the catalogue tube a design file gives by size", () => {
    const t = defaultCatalogue.tubes[0]!;
    expect(
      findCatalogueTube(defaultCatalogue, { ...t, odMm: t.odMm + 0.04, wallMm: t.wallMm - 0.009 })?.id,
    ).toBe(t.id);
    expect(findCatalogueTube(defaultCatalogue, { ...t, odMm: t.odMm + 0.06 })).toBeUndefined();
    const parsed = parseDesign(JSON.parse(readFileSync("examples/street-truck.json", "utf8")));
    if (!parsed.ok) throw new Error("example does not parse");
    const design = {
      ...parsed.design,
      tube: {
        materialId: t.materialId,
        odMm: Number(t.odMm.toFixed(1)),
        wallMm: Number(t.wallMm.toFixed(2)),
      },
    };
    expect(evaluateDesign(design).tube.tubeId).toBe(t.id);
  });
});

describe("use labels", () => {
  test("every use the design file allows has its name", () => {
    expect(Object.keys(SHAFT_USE_LABEL).sort()).toEqual([...SHAFT_USES].sort());
    expect(shaftUseLabel("off-road")).toBe("Off-road");
    expect(shaftUseLabel("towing")).toBe("Towing");
  });

  test("a value this version does not know is shown as stored, never as 'undefined'", () => {
    expect(shaftUseLabel("forestry")).toBe("forestry");
    expect(shaftUseLabel("toString")).toBe("toString");
    expect(shaftUseLabel(null)).toBe("");
  });
});

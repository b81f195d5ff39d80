import { describe, expect, test } from "vitest";
import { readFileSync } from "node:fs";
import { defaultCatalogue, parseDesign, type DesignFile } from "@/lib/driveline";
import {
  defaultBuilderForm,
  designFileJson,
  designFileToForm,
  formatInUnits,
  formToDesignFile,
  parseInUnits,
  validateBuilderForm,
  type BuilderForm,
} from "@/components/shaft-builder/model";

const example = (name: string): DesignFile => {
  const parsed = parseDesign(JSON.parse(readFileSync(`examples/${name}.json`, "utf8")));
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("\n"));
  return parsed.design;
};

describe("unit display", () => {
  test("inch ↔ mm round trip keeps precision", () => {
    const si = parseInUnits("52.00", "length", "imperial")!;
    expect(si).toBeCloseTo(1320.8, 10);
    expect(formatInUnits(si, "length", "metric")).toBe("1320.8");
    expect(formatInUnits(si, "length", "imperial")).toBe("52.00");
    // Switching units many times changes only the display, never the stored SI value.
    let stored = si;
    for (let i = 0; i < 50; i++) {
      formatInUnits(stored, "length", i % 2 ? "metric" : "imperial");
      stored = stored + 0;
    }
    expect(stored).toBe(si);
  });

  test("an odd SI value survives display in inches and back to mm", () => {
    const si = 1234.567891;
    expect(formatInUnits(si, "length", "metric")).toBe("1234.6");
    expect(parseInUnits(formatInUnits(si, "length", "imperial"), "length", "imperial")).toBeCloseTo(si, 0);
  });

  test.each([
    ["torque", "405.7", "imperial", 550.05],
    ["speed", "124.3", "imperial", 200.04],
    ["torque", "550", "metric", 550],
  ] as const)("%s %s (%s) → %d SI", (quantity, text, system, si) => {
    expect(parseInUnits(text, quantity, system)).toBeCloseTo(si, 1);
  });

  test("empty text is null and non-numbers are NaN (so the core reports them)", () => {
    expect(parseInUnits("  ", "length", "imperial")).toBeNull();
    expect(Number.isNaN(parseInUnits("12abc", "length", "imperial"))).toBe(true);
    expect(parseInUnits("3,5", null, "metric")).toBe(3.5);
    expect(parseInUnits("−2", null, "metric")).toBe(-2);
  });
});

describe("form ↔ design file", () => {
  test("the default form is a valid street-truck design", () => {
    const v = validateBuilderForm(defaultBuilderForm(), defaultCatalogue);
    expect(v.issues).toEqual([]);
    expect(v.design?.lengthMm).toBe(1320.8);
    expect(v.design?.tube).toBeUndefined();
  });

  test.each(["street-truck", "compound-offset", "long-van-critical-speed-fail"])(
    "%s: design file → form → design file loses nothing",
    (name) => {
      const design = example(name);
      const form = designFileToForm(design);
      const again = parseDesign(formToDesignFile(form));
      expect(again.ok).toBe(true);
      if (!again.ok) return;
      // Same JSON once nulls are dropped (how a download writes it).
      expect(JSON.parse(designFileJson(again.design))).toEqual(JSON.parse(designFileJson(design)));
    },
  );

  test("form → design file → form", () => {
    const form: BuilderForm = {
      ...defaultBuilderForm(),
      offset: true,
      geometry: {
        transmission: { verticalDeg: 2.5, horizontalDeg: 1 },
        driveshaft: { verticalDeg: 4, horizontalDeg: 1.5 },
        pinion: { verticalDeg: 2.5, horizontalDeg: 0.5 },
      },
      ends: { front: "YL-WY-X41-3500", rear: "" },
      tubeMode: "chosen",
      tube: { materialId: "steel-dom", odMm: 88.9, wallMm: 2.108 },
      speedMode: "rpm",
      speed: { topSpeedKmh: null, tireDiameterMm: null, axleRatio: null, maxShaftRpm: 4200 },
    };
    const parsed = parseDesign(formToDesignFile(form));
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const back = designFileToForm(parsed.design, { application: form.application });
    expect(back).toEqual(form);
  });

  test("top-view angles count only while the offset toggle is on", () => {
    const form = defaultBuilderForm();
    form.geometry.driveshaft.horizontalDeg = 3;
    const file = formToDesignFile(form) as { geometry: { driveshaft: { horizontalDeg: number } } };
    expect(file.geometry.driveshaft.horizontalDeg).toBe(0);
  });

  test("bad fields carry the core's own messages, at the form's field paths", () => {
    const form = defaultBuilderForm();
    form.lengthMm = NaN;
    form.geometry.pinion.verticalDeg = 60;
    const v = validateBuilderForm(form, defaultCatalogue);
    expect(v.design).toBeNull();
    expect(v.fieldErrors.lengthMm).toBe("lengthMm: must be a positive number");
    expect(v.fieldErrors["geometry.pinion.verticalDeg"]).toMatch(
      /^geometry\.pinion\.verticalDeg: must be an angle/,
    );
  });

  test("an unknown end fitting is reported beside the fitting select", () => {
    const form = defaultBuilderForm();
    form.ends.front = "NOPE";
    expect(validateBuilderForm(form, defaultCatalogue).fieldErrors["ends.front"]).toMatch(
      /^ends\.front\.fittingId: must be an end fitting/,
    );
  });
});

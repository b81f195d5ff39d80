import { describe, expect, test } from "vitest";
import { readFileSync } from "node:fs";
import { defaultCatalogue, evaluateDesign, parseDesign, type DesignFile } from "@/lib/driveline";

// Parts the demo catalogue has (the parser refuses ids the catalogue does not know).
const SLIP_YOKE_ID = defaultCatalogue.slipYokes![0]!.id;
const BEARING_ID = defaultCatalogue.centreBearings![0]!.id;
import {
  defaultBuilderForm,
  designFileJson,
  designFileToForm,
  formatInUnits,
  formToDesignFile,
  parseInUnits,
  type BuilderForm,
} from "@/components/shaft-builder/model";
import { validateBuilderForm } from "@/components/shaft-builder/builder-core";

const example = (name: string): DesignFile => {
  const parsed = parseDesign(JSON.parse(readFileSync(`examples/${name}.json`, "utf8")));
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("\n"));
  return parsed.design;
};

describe("unit display", () => {
  test("inch ↔ mm round trip keeps precision", () => {
    // 1 in = 25.4 mm exactly (international inch, 1959): 52.00 in is 1320.8 mm.
    const si = parseInUnits("52.00", "length", "imperial")!;
    expect(si).toBeCloseTo(1320.8, 10);
    expect(formatInUnits(si, "length", "metric")).toBe("1320.8");
    expect(formatInUnits(si, "length", "imperial")).toBe("52.00");
    // Switching units many times and taking the shown text back (what a person retyping the
    // shown value does) never drifts: after 50 switches it is still 52 in = 1320.8 mm.
    let stored = si;
    for (let i = 0; i < 50; i++) {
      const system = i % 2 ? "metric" : "imperial";
      stored = parseInUnits(formatInUnits(stored, "length", system), "length", system)!;
    }
    expect(stored).toBeCloseTo(1320.8, 10);
    expect(formatInUnits(stored, "length", "imperial")).toBe("52.00");
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

  test.each([
    // 1 lb = 0.45359237 kg exactly (international pound, 1959).
    ["mass", "3968", "imperial", 3968 * 0.45359237],
    // 1 in = 25.4 mm exactly: a 1.386 in spline major diameter.
    ["diameter", "1.386", "imperial", 35.2044],
  ] as const)("%s %s (%s) → SI", (quantity, text, system, si) => {
    expect(parseInUnits(text, quantity, system)).toBeCloseTo(si, 6);
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
    "%s: design file → form → design file loses nothing (and adds only the use, street by default)",
    (name) => {
      const design = example(name);
      const form = designFileToForm(design);
      const again = parseDesign(formToDesignFile(form));
      expect(again.ok).toBe(true);
      if (!again.ok) return;
      // Same JSON once nulls are dropped (how a download writes it); the builder always says the use.
      expect(JSON.parse(designFileJson(again.design))).toEqual({
        ...JSON.parse(designFileJson(design)),
        use: "street",
      });
      // No empty optional group is written.
      for (const key of ["traction", "interface", "frontJointType", "layout", "centreBearing"])
        expect(again.design).not.toHaveProperty(key);
    },
  );

  test.each(["street-truck", "compound-offset", "long-van-critical-speed-fail"])(
    "%s: the builder's file evaluates to the same figures as the example",
    (name) => {
      const design = example(name);
      const again = parseDesign(formToDesignFile(designFileToForm(design)));
      if (!again.ok) throw new Error("does not parse");
      const a = evaluateDesign(design);
      const b = evaluateDesign(again.design);
      expect(b.overall).toBe(a.overall);
      expect(b.service).toEqual(a.service);
      expect(b.criticalSpeedRpm).toBe(a.criticalSpeedRpm);
      expect(b.torsion).toEqual(a.torsion);
      expect(b.checks.map((c) => [c.id, c.status])).toEqual(a.checks.map((c) => [c.id, c.status]));
    },
  );

  test("every new input group: form → design file → form, in SI", () => {
    const form: BuilderForm = {
      ...defaultBuilderForm(),
      application: { description: "Lifted 4x4, towing a camper", use: "towing" },
      torque: {
        engineTorqueNm: 610,
        firstGearRatio: 4.03,
        transferCaseLowRatio: 2.72,
        converterStallRatio: 1.9,
        topGearRatio: 0.69,
        ratedShaftTorqueNm: 900,
      },
      speed: {
        topSpeedKmh: 140,
        tireDiameterMm: 889,
        axleRatio: 4.56,
        maxShaftRpm: null,
        maxEngineRpm: 5600,
        topGearRatio: 0.69,
      },
      traction: { drivenAxleLoadKg: 1800, tireLoadedRadiusMm: 420, adhesion: 0.85 },
      slip: {
        collapsedLengthMm: 1290,
        travelMm: 110,
        droopExtensionMm: 60,
        bumpCompressionMm: 20,
        slipYokeId: SLIP_YOKE_ID,
        sealOutsideCollapsedMm: 5,
      },
      interface: {
        transmissionOutput: { splineCount: 32, majorDiameterMm: 35.2 },
        front: {
          kind: "flange",
          jointSeriesId: "",
          capDiameterMm: null,
          capSpanMm: null,
          retention: "",
          flange: { boltCount: 4, boltCircleMm: 95.3, pilotMm: 57.2 },
        },
        pinion: {
          kind: "yoke",
          jointSeriesId: "",
          capDiameterMm: 28.6,
          capSpanMm: 92.1,
          retention: "u-bolt",
          flange: { boltCount: null, boltCircleMm: null, pilotMm: null },
        },
        lubrication: "greaseable",
      },
      frontJointType: "double-cardan",
      layout: "two-piece",
      centreBearing: { bearingId: BEARING_ID, fromFrontMm: 700, dropMm: 12 },
    };
    const file = formToDesignFile(form);
    const parsed = parseDesign(file);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const d = parsed.design;
    expect(d.use).toBe("towing");
    expect(d.traction).toEqual({ drivenAxleLoadKg: 1800, tireLoadedRadiusMm: 420, adhesion: 0.85 });
    expect(d.torque.topGearRatio).toBe(0.69);
    expect(d.torque.ratedShaftTorqueNm).toBe(900);
    expect(d.speed.maxEngineRpm).toBe(5600);
    expect(d.speed.topGearRatio).toBe(0.69);
    expect(d.slip?.slipYokeId).toBe(SLIP_YOKE_ID);
    expect(d.slip?.droopExtensionMm).toBe(60);
    expect(d.interface?.transmissionOutput).toEqual({ splineCount: 32, majorDiameterMm: 35.2 });
    // A flange end carries only its bolt pattern; a yoke only its caps.
    expect(d.interface?.front).toEqual({
      kind: "flange",
      flange: { boltCount: 4, boltCircleMm: 95.3, pilotMm: 57.2 },
    });
    expect(d.interface?.pinion?.retention).toBe("u-bolt");
    expect(d.interface?.pinion?.flange).toBeUndefined();
    expect(d.frontJointType).toBe("double-cardan");
    expect(d.layout).toBe("two-piece");
    expect(d.centreBearing).toEqual({ bearingId: BEARING_ID, fromFrontMm: 700, dropMm: 12 });
    expect(
      designFileToForm(d, { application: { description: form.application.description, use: "street" } }),
    ).toEqual(form);
  });

  test("a partly filled group is written whole, so the core names the missing field", () => {
    const form = defaultBuilderForm();
    form.slip.droopExtensionMm = 50;
    form.traction.drivenAxleLoadKg = 1500;
    const v = validateBuilderForm(form, defaultCatalogue);
    expect(v.design).toBeNull();
    expect(v.fieldErrors["slip.collapsedLengthMm"]).toMatch(
      /^slip\.collapsedLengthMm: must be a positive number/,
    );
    expect(v.fieldErrors["slip.travelMm"]).toMatch(/^slip\.travelMm: /);
    expect(v.fieldErrors["traction.tireLoadedRadiusMm"]).toMatch(/^traction\.tireLoadedRadiusMm: /);
  });

  test("a two-piece layout without a centre bearing is reported at the bearing select", () => {
    const form = defaultBuilderForm();
    form.layout = "two-piece";
    expect(validateBuilderForm(form, defaultCatalogue).fieldErrors["centreBearing.bearingId"]).toMatch(
      /^centreBearing: is required for a two-piece layout/,
    );
  });

  test("the engine-speed path reaches the core: an overdrive turns the shaft faster than the road speed does", () => {
    const form = defaultBuilderForm();
    // 6000 rpm through a 0.7 overdrive = 8571 rpm (n = engine rpm ÷ top gear, closed form);
    // the road path: 200 km/h on a 711 mm tire through 3.73 = 5566 rpm.
    form.speed.maxEngineRpm = 6000;
    form.speed.topGearRatio = 0.7;
    const v = validateBuilderForm(form, defaultCatalogue);
    if (!v.design) throw new Error(JSON.stringify(v.issues));
    const report = evaluateDesign(v.design);
    expect(report.service.governedBy).toBe("engine");
    expect(report.service.maxShaftRpm).toBeCloseTo(6000 / 0.7, 6);
    const road = (200_000 / 60 / (Math.PI * 0.711)) * 3.73;
    expect(report.service.vehicleRpm).toBeCloseTo(road, 6);
  });

  test("the customer's use comes back from a file; a file without one keeps the draft's", () => {
    const design = example("street-truck");
    const base = { application: { description: "", use: "race" as const } };
    expect(designFileToForm(design, base).application.use).toBe("race");
    expect(designFileToForm({ ...design, use: "industrial" }, base).application.use).toBe("industrial");
  });

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
      speed: {
        topSpeedKmh: null,
        tireDiameterMm: null,
        axleRatio: null,
        maxShaftRpm: 4200,
        maxEngineRpm: null,
        topGearRatio: null,
      },
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

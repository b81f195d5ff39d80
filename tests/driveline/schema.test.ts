import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { parseDesign } from "@/lib/driveline";

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- tests poke at arbitrary fields
const example = (): Record<string, any> => JSON.parse(readFileSync("examples/street-truck.json", "utf8"));
const messages = (input: unknown): string[] => {
  const r = parseDesign(input);
  return r.ok ? [] : r.issues.map((i) => i.message);
};

describe("design schema", () => {
  it("accepts the examples and the contract's sample", () => {
    for (const f of ["street-truck", "long-van-critical-speed-fail", "compound-offset"]) {
      expect(parseDesign(JSON.parse(readFileSync(`examples/${f}.json`, "utf8"))).ok).toBe(true);
    }
  });

  it.each([
    ["torque.engineTorqueNm", -5, "torque.engineTorqueNm: must be a positive number"],
    ["torque.engineTorqueNm", "550", "torque.engineTorqueNm: must be a positive number"],
    ["lengthMm", 0, "lengthMm: must be a positive number"],
    ["tube.odMm", null, "tube.odMm: must be a positive number"],
    [
      "geometry.pinion.verticalDeg",
      95,
      "geometry.pinion.verticalDeg: must be an angle in degrees between −40 and 40",
    ],
    ["tube.wallMm", 50, "tube.wallMm: must be less than half of odMm"],
  ])("%s = %j → a message naming the field", (path, value, expected) => {
    const d = example();
    const keys = path.split(".");
    let o = d;
    for (const k of keys.slice(0, -1)) o = o[k];
    o[keys[keys.length - 1]!] = value;
    expect(messages(d)).toContain(expected);
  });

  it("a missing field is named", () => {
    const d = example();
    delete d.torque.engineTorqueNm;
    expect(messages(d)).toEqual(["torque.engineTorqueNm: must be a positive number"]);
  });

  it("needs a speed: maxShaftRpm or all three vehicle fields", () => {
    const d = example();
    d.speed = { topSpeedKmh: 200 };
    expect(messages(d)[0]).toMatch(/^speed\.maxShaftRpm: must be a positive number unless/);
  });

  it("needs the driveshaft angles or both joint centres", () => {
    const d = example();
    delete d.geometry.driveshaft;
    expect(messages(d)[0]).toMatch(/^geometry\.driveshaft: is required unless/);
    d.geometry.frontJointCentreMm = { x: 0, y: 0, z: 0 };
    d.geometry.rearJointCentreMm = { x: 1320, y: 0, z: -115 };
    expect(parseDesign(d).ok).toBe(true);
  });

  it("an unknown material needs all three constants; an unknown fitting is named", () => {
    const d = example();
    d.tube.materialId = "titanium-grade-9";
    expect(messages(d)[0]).toMatch(/^tube\.materialId: must be a catalogue material/);
    d.material = { elasticModulusGPa: 105, densityKgM3: 4480, shearYieldMPa: 400 };
    expect(parseDesign(d).ok).toBe(true);
    d.ends.rear.fittingId = "NOPE";
    expect(messages(d)).toEqual([
      'ends.rear.fittingId: must be an end fitting in the catalogue (unknown "NOPE")',
    ]);
  });

  it("non-objects and nulls give one clear line, never a raw zod dump", () => {
    expect(messages(42)).toEqual(["design: must be an object"]);
    expect(messages(null)).toEqual(["design: must be an object"]);
    for (const m of messages({})) expect(m).toMatch(/^[a-zA-Z.]+: (must|is) /);
  });
});

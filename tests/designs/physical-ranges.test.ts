import { describe, expect, test } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { evaluateDesign, parseDesign } from "@/lib/driveline";
import { PHYSICAL_MAX } from "@/lib/driveline/schema";

const street = JSON.parse(readFileSync("examples/street-truck.json", "utf8")) as Record<string, never>;

/** The street truck with one field replaced (dot path). */
function withField(path: string, value: unknown): unknown {
  const copy = structuredClone(street) as Record<string, unknown>;
  const keys = path.split(".");
  let at = copy;
  for (const key of keys.slice(0, -1)) {
    at[key] ??= {};
    at = at[key] as Record<string, unknown>;
  }
  at[keys.at(-1)!] = value;
  return copy;
}

describe("numbers far outside the physical range are field errors naming the limit", () => {
  const cases: Array<[path: string, message: string]> = [
    ["lengthMm", `must be at most ${PHYSICAL_MAX.lengthMm} mm`],
    ["tube.odMm", `must be at most ${PHYSICAL_MAX.tubeOdMm} mm`],
    ["torque.engineTorqueNm", `must be at most ${PHYSICAL_MAX.torqueNm} N·m`],
    ["torque.firstGearRatio", `must be at most ${PHYSICAL_MAX.ratio}`],
    ["speed.topSpeedKmh", `must be at most ${PHYSICAL_MAX.topSpeedKmh} km/h`],
    ["speed.axleRatio", `must be at most ${PHYSICAL_MAX.ratio}`],
    ["speed.tireDiameterMm", `must be at most ${PHYSICAL_MAX.tireDiameterMm} mm`],
    ["speed.maxShaftRpm", `must be at most ${PHYSICAL_MAX.shaftRpm} rpm`],
    ["balanceGradeMmS", `must be at most ${PHYSICAL_MAX.balanceGradeMmS} mm/s`],
    ["material.densityKgM3", `must be at most ${PHYSICAL_MAX.densityKgM3} kg/m³`],
    ["geometry.frontJointCentreMm.x", `must be a number between −50000 and 50000 mm`],
    ["slip.travelMm", `must be at most ${PHYSICAL_MAX.slipMm} mm`],
  ];
  for (const [path, message] of cases) {
    test(`${path} = 1e308 → "${path}: ${message}"`, () => {
      const parsed = parseDesign(withField(path, 1e308));
      expect(parsed.ok).toBe(false);
      if (parsed.ok) return;
      expect(parsed.issues).toContainEqual({ path, message: `${path}: ${message}` });
    });
  }

  test("a value just inside a limit is accepted and evaluates to finite figures", () => {
    const parsed = parseDesign(withField("torque.engineTorqueNm", PHYSICAL_MAX.torqueNm));
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const report = evaluateDesign(parsed.design);
    expect(Number.isFinite(report.service.peakShaftTorqueNm)).toBe(true);
  });

  test("negative numbers keep their own message", () => {
    const parsed = parseDesign(withField("lengthMm", -1));
    expect(!parsed.ok && parsed.issues[0]?.message).toBe("lengthMm: must be a positive number");
  });

  test("every design in examples/ still parses within the limits", () => {
    for (const file of readdirSync("examples").filter((f) => f.endsWith(".json"))) {
      const parsed = parseDesign(JSON.parse(readFileSync(`examples/${file}`, "utf8")));
      expect(parsed.ok, file).toBe(true);
    }
  });
});

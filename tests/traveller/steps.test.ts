import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { evaluateDesign, parseDesign, resolveSettings, type EvaluationReport } from "@/lib/driveline";
import { inToMm } from "@/lib/driveline/units";
import { checkMeasurements, angularDeviationDeg } from "@/lib/traveller/measure";
import { resolveFloorSettings } from "@/lib/traveller/settings";
import { deriveSteps, runoutStations, type StepSpec } from "@/lib/traveller/steps";

function report(file: string, overrides: Record<string, number> = {}): EvaluationReport {
  const parsed = parseDesign(JSON.parse(readFileSync(`examples/${file}`, "utf8")));
  if (!parsed.ok) throw new Error("bad example");
  return evaluateDesign(parsed.design, { settings: resolveSettings(overrides) });
}

const street = report("street-truck.json");
const floor = resolveFloorSettings();
const steps = deriveSteps({ report: street, fulfilment: "ship", floor });
const step = (code: string): StepSpec => steps.find((s) => s.code === code)!;
const limitOf = (code: string, key: string) => {
  const f = step(code).fields.find((x) => x.key === key);
  if (!f || f.type !== "number") throw new Error(`no number field ${key}`);
  return f.limit!;
};

describe("routing and record sheets from the frozen report", () => {
  test("the default routing, in order", () => {
    expect(steps.map((s) => [s.position, s.code, s.name])).toEqual([
      [1, "CUT", "Cut tube"],
      [2, "WLD", "Weld and phase"],
      [3, "RUN", "Straighten and runout"],
      [4, "BAL", "Balance"],
      [5, "FIN", "Final inspection"],
      [6, "SHP", "Pack and ship"],
    ]);
    expect(
      deriveSteps({ report: street, fulfilment: "pickup", floor })
        .at(-1)!
        .fields.map((f) => f.key),
    ).toEqual(["pickedUpBy"]);
    expect(step("SHP").fields.map((f) => f.key)).toEqual(["carrier", "trackingNumber"]);
  });

  test("cut: heat/lot and the cut length (README: 1188.8 mm) ± 0.8 mm", () => {
    expect(step("CUT").fields.map((f) => f.key)).toEqual(["tubeHeatLot", "cutLengthMm"]);
    const cut = limitOf("CUT", "cutLengthMm");
    expect(cut.nominal).toBeCloseTo(1188.8, 6);
    expect(cut.min).toBeCloseTo(1188.0, 6);
    expect(cut.max).toBeCloseTo(1189.6, 6);
  });

  test("weld and phase: lots, length between joint centres 1320.8 ± 1.6 mm, phase 0 ± 1°", () => {
    expect(step("WLD").fields.map((f) => f.key)).toEqual([
      "frontYokeLot",
      "rearYokeLot",
      "frontJointLot",
      "rearJointLot",
      "weldedLengthMm",
      "phaseIndexDeg",
    ]);
    expect(limitOf("WLD", "weldedLengthMm")).toMatchObject({ nominal: 1320.8 });
    expect(limitOf("WLD", "weldedLengthMm").max).toBeCloseTo(1322.4, 6);
    expect(limitOf("WLD", "phaseIndexDeg")).toMatchObject({ nominal: 0, min: -1, max: 1, angular: true });
  });

  test("runout: 75 mm in from each weld and mid-span, 0.25 / 0.38 / 0.25 mm (engineering reference §9)", () => {
    const { stations, fast } = runoutStations({ report: street, fulfilment: "ship", floor });
    expect(fast).toBe(false); // 5566 rpm is below the 6000 rpm fast-shaft setting
    expect(stations.map(({ key, fromFrontWeldMm, limitMm }) => [key, fromFrontWeldMm, limitMm])).toEqual([
      ["runoutFrontMm", 75, 0.25],
      ["runoutMidMm", 1188.8 / 2, 0.38],
      ["runoutRearMm", 1188.8 - 75, 0.25],
    ]);
  });

  test("runout limits tighten for a fast shaft", () => {
    const slowLimit = runoutStations({
      report: street,
      fulfilment: "ship",
      floor: resolveFloorSettings({ limits: { fastShaftRpm: 5000 } }),
    });
    expect(slowLimit.fast).toBe(true);
    expect(slowLimit.stations.map((s) => s.limitMm)).toEqual([0.13, 0.25, 0.13]);
  });

  test("balance: residual per plane against the report's ISO 21940-11 per-plane limit", () => {
    // README street truck: G 16 at 5566 rpm, 9.78 kg → 268.38 g·mm, 134.19 g·mm per plane.
    expect(limitOf("BAL", "residualFrontGmm").max).toBeCloseTo(134.1908, 3);
    expect(limitOf("BAL", "residualRearGmm").source).toContain("ISO 21940-11");
    expect(step("BAL").fields.map((f) => f.key)).toContain("weights");
  });

  test("a shop's phasing tolerance replaces the report's", () => {
    const tight = deriveSteps({
      report: street,
      fulfilment: "ship",
      floor: resolveFloorSettings({ phasingToleranceDeg: 0.5 }),
    });
    const f = tight[1]!.fields.find((x) => x.key === "phaseIndexDeg");
    expect(f).toMatchObject({ limit: { min: -0.5, max: 0.5 } });
  });
});

describe("measurement check", () => {
  test("in-limit values pass and are stored in SI", () => {
    const r = checkMeasurements(step("CUT"), { tubeHeatLot: " H-2291 ", cutLengthMm: "1188.9" }, "mm");
    expect(r).toEqual({ outcome: "pass", values: { tubeHeatLot: "H-2291", cutLengthMm: 1188.9 } });
  });

  test("inches at the edge: 0.012 in runout near a weld is over 0.25 mm and holds, naming value and limit", () => {
    const r = checkMeasurements(
      step("RUN"),
      { runoutFrontMm: 0.012, runoutMidMm: 0.01, runoutRearMm: 0.005 },
      "in",
    );
    expect(r.outcome).toBe("hold");
    if (r.outcome !== "hold") return;
    expect(r.values.runoutFrontMm).toBeCloseTo(inToMm(0.012), 9);
    expect(r.failures).toHaveLength(1);
    expect(r.failures[0]).toMatchObject({ key: "runoutFrontMm", limit: { max: 0.25 } });
    expect(r.failures[0]!.message).toBe(
      "Runout near the front weld 0.0120 in is outside the limit at most 0.0098 in — common shop practice (0.010 in TIR near each end)",
    );
  });

  test("every failed value is listed", () => {
    const r = checkMeasurements(
      step("FIN"),
      { overallLengthMm: 1325, jointsFree: "no", phaseIndexDeg: 2.5, paintMarking: true },
      "mm",
    );
    expect(r.outcome === "hold" && r.failures.map((f) => f.key)).toEqual([
      "overallLengthMm",
      "jointsFree",
      "phaseIndexDeg",
    ]);
  });

  test("phase index compares modulo 180°: 179.5° is 0.5° from 0°", () => {
    expect(angularDeviationDeg(179.5, 0)).toBeCloseTo(-0.5, 9);
    const values = { overallLengthMm: 1320.8, jointsFree: true, paintMarking: "yes" };
    expect(checkMeasurements(step("FIN"), { ...values, phaseIndexDeg: 179.5 }, "mm").outcome).toBe("pass");
    expect(checkMeasurements(step("FIN"), { ...values, phaseIndexDeg: 91 }, "mm").outcome).toBe("hold");
  });

  test("missing or malformed values are invalid, not a hold", () => {
    const r = checkMeasurements(step("CUT"), { cutLengthMm: "long" }, "mm");
    expect(r).toEqual({
      outcome: "invalid",
      issues: [
        { path: "tubeHeatLot", message: "Tube heat / lot number: required" },
        { path: "cutLengthMm", message: "Cut length: must be a number" },
      ],
    });
  });

  test("balance weights convert from ounces", () => {
    const r = checkMeasurements(
      step("BAL"),
      {
        balanceSpeedRpm: 2500,
        residualFrontGmm: 0.1, // oz·in: 72.0 g·mm, within 134.19
        residualRearGmm: 0.2, // 144.0 g·mm, over
        weights: [{ plane: "rear", mass: 0.5, angleDeg: 270 }],
      },
      "in",
    );
    expect(r.outcome).toBe("hold");
    if (r.outcome !== "hold") return;
    // 1 oz·in = 28.349523125 g × 25.4 mm = 720.0779 g·mm (exact definitions of the ounce and the inch).
    expect(r.values.residualFrontGmm).toBeCloseTo(72.00779, 4);
    expect(r.failures.map((f) => f.key)).toEqual(["residualRearGmm"]);
    expect(r.values.weights).toEqual([{ plane: "rear", massG: 0.5 * 28.349523125, angleDeg: 270 }]);
  });
});

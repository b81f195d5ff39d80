import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import {
  bestPhaseIndicesRad,
  chainFromReport,
  chainResponse,
  evaluateDesign,
  makeChain,
  mphToKmh,
  parseDesign,
  phaseErrorDeg,
  triageVibration,
  type Complaint,
  type TriageShaft,
} from "@/lib/driveline";

const RAD = Math.PI / 180;
const omegaOf = (rpm: number) => (rpm * Math.PI) / 30;

/**
 * Demo data: a one-piece road shaft. Balance figures are the engineering reference's ISO 21940-11
 * check value (G 16, 12 kg, 4500 rpm → 407.4 g·mm, 203.7 g·mm per plane); limits are the shop's
 * defaults (runout 0.25 / 0.38 mm and phasing ±1°: common shop practice; critical-speed ratio 0.75:
 * common shop practice; 1000 rad/s²: commonly quoted per-joint limit, from memory).
 */
function shaft(overrides: Partial<TriageShaft> = {}): TriageShaft {
  return {
    serviceRpm: 4500,
    axleRatio: 3.73,
    tireDiameterMm: 711.2,
    joints: [
      { position: "front", workingAngleDeg: 2 },
      { position: "rear", workingAngleDeg: 2 },
    ],
    jointPlaneAngleDeg: 0,
    phase: { targetDeg: 0, toleranceDeg: 1, source: "common shop practice", measuredDeg: 0.3 },
    balance: { gradeMmS: 16, speedRpm: 4500, rotorMassKg: 12, perPlaneGmm: 203.7 },
    residuals: [
      { label: "Residual, front plane", value: 40, limit: 203.7, source: "ISO 21940-11" },
      { label: "Residual, rear plane", value: 50, limit: 203.7, source: "ISO 21940-11" },
    ],
    runout: [
      { label: "Runout near the front weld", value: 0.05, limit: 0.25, source: "common shop practice" },
      { label: "Runout at mid-span", value: 0.08, limit: 0.38, source: "common shop practice" },
      { label: "Runout near the rear weld", value: 0.05, limit: 0.25, source: "common shop practice" },
    ],
    criticalSpeedRpm: 8000,
    criticalSpeedRatioLimit: { value: 0.75, source: "common shop practice" },
    accelerationLimit: { value: 1000, source: "commonly quoted passenger-car limit (from memory)" },
    ...overrides,
  };
}

const atShaftRpm = (rpm: number, load: Complaint["load"] = "both"): Complaint => ({
  speed: { kind: "shaft", shaftRpm: rpm },
  load,
});

describe("shaft speed at the complaint", () => {
  it("road speed: rpm = mph × 336 × axle ratio / tire diameter in inches (US shop rule, engineering reference §7)", () => {
    const result = triageVibration(shaft(), {
      speed: { kind: "road", speedKmh: mphToKmh(60) },
      load: "both",
    });
    // 60 mph, 3.73 axle, 28 in tire: 60 × 336 × 3.73 / 28 = 2685.6 rpm; 336 ≈ 63 360/(60π) = 336.13.
    const rule = (60 * 336 * 3.73) / 28;
    expect(Math.abs(result.shaftRpm - rule) / rule).toBeLessThan(0.001);
    expect(result.shaftHz).toBeCloseTo(result.shaftRpm / 60, 9);
  });

  it("engine rpm ÷ gear ratio (engineering reference §7); an overdrive turns the shaft faster than the engine", () => {
    const result = triageVibration(shaft(), {
      speed: { kind: "engine", engineRpm: 3000, gearRatio: 0.7 },
      load: "load",
    });
    expect(result.shaftRpm).toBeCloseTo(4285.714, 2);
    expect(result.otherSources.find((o) => o.label.startsWith("Engine"))!.frequencyHz).toBeCloseTo(50, 9);
  });

  it("road speed needs the design's axle ratio and tire diameter", () => {
    expect(() =>
      triageVibration(shaft({ axleRatio: null, tireDiameterMm: null }), {
        speed: { kind: "road", speedKmh: 100 },
        load: "both",
      }),
    ).toThrow(/axle ratio/);
  });
});

describe("once per turn: unbalance", () => {
  it("a residual 3× the permissible ranks unbalance first, scored against ISO 21940-11 at the complaint speed", () => {
    const rpm = 3600;
    const s = shaft({
      residuals: [
        { label: "Residual, front plane", value: 3 * 203.7, limit: 203.7, source: "ISO 21940-11" },
        { label: "Residual, rear plane", value: 60, limit: 203.7, source: "ISO 21940-11" },
      ],
    });
    const result = triageVibration(s, atShaftRpm(rpm));
    const first = result.causes[0]!;
    expect(first.id).toBe("unbalance");
    // ISO 21940-11: U_per = 1000·G·m/Ω, half per plane, at 3600 rpm (12 kg, G 16).
    const perPlaneHere = (1000 * 16 * 12) / omegaOf(rpm) / 2;
    expect(perPlaneHere).toBeCloseTo(254.6, 1);
    expect(first.score).toBeCloseTo((3 * 203.7) / perPlaneHere, 2);
    expect(first.band).toBe("past-limit");
    expect(first.order).toBe(1);
    expect(first.frequencyHz).toBeCloseTo(60, 9);
    // Force F = U·ω² (U in kg·m), so it grows with speed²: 611.1 g·mm at 3600 rpm → 86.9 N.
    const force = first.figures.find((f) => f.quantity === "force")!;
    expect(force.value).toBeCloseTo(3 * 203.7 * 1e-6 * omegaOf(rpm) ** 2, 6);
    expect(force.value).toBeCloseTo(86.85, 1);
    expect(first.summary).toMatch(/grows with speed²/);
  });

  it("the same residual scores in proportion to speed (permissible ∝ 1/n at a fixed grade, ISO 21940-11)", () => {
    const at = (rpm: number) =>
      triageVibration(shaft(), atShaftRpm(rpm)).causes.find((c) => c.id === "unbalance")!.score!;
    expect(at(4500)).toBeCloseTo(50 / 203.7, 6);
    expect(at(2250)).toBeCloseTo(50 / 203.7 / 2, 6);
  });

  it("a shaft not yet balanced: unbalance is 'not measured' and ranked last", () => {
    const result = triageVibration(shaft({ residuals: null }), atShaftRpm(3000));
    expect(result.causes.at(-1)!).toMatchObject({ id: "unbalance", score: null, band: "not-measured" });
  });
});

describe("once per turn: runout", () => {
  it("the worst reading against its own limit (0.010 in ends, 0.015 in centre: common shop practice)", () => {
    const s = shaft({
      runout: [
        { label: "Runout near the front weld", value: 0.3, limit: 0.25, source: "common shop practice" },
        { label: "Runout at mid-span", value: 0.2, limit: 0.38, source: "common shop practice" },
      ],
    });
    const cause = triageVibration(s, atShaftRpm(2000)).causes[0]!;
    expect(cause.id).toBe("runout");
    expect(cause.score).toBeCloseTo(0.3 / 0.25, 9);
  });
});

describe("twice per turn: working angles and phasing", () => {
  it("a 6° working angle at 4000 rpm ranks angles first: peak α ≈ ω²β² (engineering reference §1)", () => {
    const s = shaft({
      joints: [
        { position: "front", workingAngleDeg: 6 },
        { position: "rear", workingAngleDeg: 6 },
      ],
    });
    const result = triageVibration(s, atShaftRpm(4000, "load"));
    const first = result.causes[0]!;
    expect(first.id).toBe("angles");
    expect(first.order).toBe(2);
    expect(first.frequencyHz).toBeCloseTo(133.33, 2);
    const smallAngle = omegaOf(4000) ** 2 * (6 * RAD) ** 2; // ≈ 1924 rad/s²
    expect(Math.abs(first.score! * 1000 - smallAngle) / smallAngle).toBeLessThan(0.01);
    expect(first.band).toBe("past-limit");
    expect(first.loadFit).toBe("fits");
    // Equal angles in one plane cancel in phase (§3); the as-built 0.3° error leaves a little:
    // each joint's ratio ≈ 1 + (β²/2)·cos 2θ (§1, peak-to-peak ≈ β²), so two joints δ apart give
    // peak-to-peak ≈ (β²/2)·|1 − e^{2iδ}|·2 = 2β²·|sin δ| ≈ 0.0115 %.
    const variation = first.figures.find((f) => f.quantity === "pct")!;
    const expected = 2 * (6 * RAD) ** 2 * Math.sin(0.3 * RAD) * 100;
    expect(Math.abs(variation.value - expected) / expected).toBeLessThan(0.02);
  });

  it("a rear yoke 90° out of phase adds the joints: equivalent angle √(β₁² + β₂²) (SAE AE-7 form, from memory)", () => {
    const s = shaft({
      joints: [
        { position: "front", workingAngleDeg: 3 },
        { position: "rear", workingAngleDeg: 3 },
      ],
      phase: { targetDeg: 0, toleranceDeg: 1, source: "common shop practice", measuredDeg: 90 },
    });
    const cause = triageVibration(s, atShaftRpm(3000)).causes.find((c) => c.id === "angles")!;
    const eq = cause.figures.find((f) => f.label.startsWith("Net output"))!.label;
    const deg = Number(/equivalent angle ([\d.]+)°/.exec(eq)![1]);
    expect(Math.abs(deg - Math.sqrt(3 ** 2 + 3 ** 2)) / Math.sqrt(18)).toBeLessThan(0.01);
    // 90° off a ±1° tolerance: the phase error alone scores 90.
    expect(cause.score).toBeCloseTo(90, 6);
  });

  it("the phase error is taken modulo 180° (the joint planes repeat every half turn)", () => {
    expect(phaseErrorDeg(179.5, 0)).toBeCloseTo(-0.5, 9);
    expect(phaseErrorDeg(30, -25)).toBeCloseTo(55, 9);
    expect(phaseErrorDeg(-80, 20)).toBeCloseTo(80, 9);
  });

  it("the chain built from the frozen report's angles and plane angle reproduces the report's phasing (compound offset example)", () => {
    const parsed = parseDesign(JSON.parse(readFileSync("examples/compound-offset.json", "utf8")));
    if (!parsed.ok) throw new Error("bad example");
    const report = evaluateDesign(parsed.design);
    const angles = report.joints.map((j) => j.workingAngleDeg);
    const shafts = chainFromReport(angles, report.phasing.jointPlaneAngleDeg);
    expect(bestPhaseIndicesRad(shafts)[0]! / RAD).toBeCloseTo(report.phasing.jointPlaneAngleDeg, 6);
    const best = chainResponse(makeChain(shafts, [report.phasing.phaseIndexDeg * RAD]));
    expect(best.outputPeakToPeak * 100).toBeCloseTo(report.phasing.outputSpeedVariationPct, 5);
    const inPhase = chainResponse(makeChain(shafts, [0]));
    expect(inPhase.outputPeakToPeak * 100).toBeCloseTo(report.phasing.inPhaseOutputSpeedVariationPct, 5);
  });
});

describe("critical speed", () => {
  it("a complaint at 90 % of the critical speed ranks it first: 0.90 ÷ 0.75 = 1.2 (0.75: common shop practice)", () => {
    const result = triageVibration(shaft(), atShaftRpm(7200));
    const first = result.causes[0]!;
    expect(first.id).toBe("critical-speed");
    expect(first.score).toBeCloseTo(0.9 / 0.75, 9);
    // Undamped single-mass rotor: magnification 1/(1 − r²) = 5.26 at r = 0.9.
    expect(first.figures.find((f) => f.label.startsWith("How much"))!.value).toBeCloseTo(1 / (1 - 0.81), 6);
    expect(result.notes[0]).toMatch(/above the service speed/);
  });
});

describe("ranking, load condition and what is not the shaft", () => {
  it("nothing points to the shaft: says so, with the wheel order = shaft rpm ÷ axle ratio", () => {
    const result = triageVibration(shaft(), atShaftRpm(1500));
    expect(Math.max(...result.causes.map((c) => c.score ?? 0))).toBeLessThan(0.5);
    expect(result.notTheShaft).toMatch(/Nothing in this shaft's record points to the shaft at 1500 rpm/);
    const wheel = result.otherSources[0]!;
    expect(wheel.frequencyHz).toBeCloseTo(1500 / 3.73 / 60, 9);
    expect(wheel.shaftOrder).toBeCloseTo(1 / 3.73, 9);
    expect(result.cautions[0]).toMatch(/should not be driven at speed until it has been checked/);
  });

  it("a shaft cause at half its limit or more: no 'not the shaft' statement", () => {
    expect(triageVibration(shaft(), atShaftRpm(7200)).notTheShaft).toBeNull();
  });

  it("near-equal scores: under load angles go first, coasting or both the speed-only cause does (common shop practice)", () => {
    // 4° joints at 4500 rpm → α ≈ ω²β² ≈ 1082 rad/s²; a residual that scores about the same.
    const rpm = 4500;
    const angleScore = triageVibration(
      shaft({
        joints: [
          { position: "front", workingAngleDeg: 4 },
          { position: "rear", workingAngleDeg: 4 },
        ],
      }),
      atShaftRpm(rpm),
    ).causes.find((c) => c.id === "angles")!.score!;
    const s = shaft({
      joints: [
        { position: "front", workingAngleDeg: 4 },
        { position: "rear", workingAngleDeg: 4 },
      ],
      residuals: [
        {
          label: "Residual, front plane",
          value: 203.7 * angleScore * 1.02,
          limit: 203.7,
          source: "ISO 21940-11",
        },
      ],
    });
    expect(triageVibration(s, atShaftRpm(rpm, "load")).causes[0]!.id).toBe("angles");
    expect(triageVibration(s, atShaftRpm(rpm, "coast")).causes[0]!.id).toBe("unbalance");
    expect(triageVibration(s, atShaftRpm(rpm, "both")).causes[0]!.id).toBe("unbalance");
  });
});

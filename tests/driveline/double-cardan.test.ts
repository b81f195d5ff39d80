import { describe, expect, it } from "vitest";
import {
  chainResponse,
  defaultCatalogue,
  evaluateDesign,
  makeChain,
  makeDoubleCardanChain,
  parseDesign,
  shaftDirection,
  type Catalogue,
  type DesignFile,
  type EvaluationReport,
} from "@/lib/driveline";
import { defaultPriceBook, quoteShaft } from "@/lib/pricing/price-book";

const RAD = Math.PI / 180;
const DEG = 180 / Math.PI;

/** Closed form (engineering reference §1): one Cardan joint's peak-to-peak speed ratio, tan β·sin β. */
const singleJointPeakToPeak = (betaDeg: number) => Math.tan(betaDeg * RAD) * Math.sin(betaDeg * RAD);

/**
 * Closed form (§1): output angular acceleration of one joint at constant input speed,
 * α = −ω²·sin²β·cos β·sin 2θ / (1 − sin²β·cos²θ)², its peak found here by a fine sweep of θ.
 */
function singleJointPeakAcceleration(betaDeg: number, omega: number): number {
  const b = betaDeg * RAD;
  const s2 = Math.sin(b) ** 2;
  let peak = 0;
  for (let k = 0; k <= 90_000; k++) {
    const t = (k / 90_000) * (Math.PI / 2);
    const a = (omega * omega * s2 * Math.cos(b) * Math.sin(2 * t)) / (1 - s2 * Math.cos(t) ** 2) ** 2;
    peak = Math.max(peak, Math.abs(a));
  }
  return peak;
}

describe("double-Cardan chain (phasing)", () => {
  it("a centred double-Cardan joint alone runs at constant speed: two equal angles in one plane, in phase (§3)", () => {
    for (const betaDeg of [8, 16, 30]) {
      const t = shaftDirection({ verticalDeg: 0, horizontalDeg: 0 });
      const d = shaftDirection({ verticalDeg: betaDeg, horizontalDeg: 0 });
      const p = shaftDirection({ verticalDeg: betaDeg, horizontalDeg: 0 }); // straight behind
      const chain = makeDoubleCardanChain([t, d, p]);
      expect(chain.workingAngleRad[0]! * DEG).toBeCloseTo(betaDeg / 2, 9);
      expect(chain.workingAngleRad[1]! * DEG).toBeCloseTo(betaDeg / 2, 9);
      expect(chain.phaseIndexRad[0]).toBe(0);
      expect(chainResponse(chain).outputPeakToPeak).toBeLessThan(1e-9);
      // The same angle through ONE cross varies by tan β·sin β.
      expect(chainResponse(makeChain([t, d])).outputPeakToPeak).toBeCloseTo(
        singleJointPeakToPeak(betaDeg),
        4,
      );
    }
  });

  it("in a compound (3-D) angle the crosses still share it and cancel", () => {
    const t = shaftDirection({ verticalDeg: 2, horizontalDeg: 0 });
    const d = shaftDirection({ verticalDeg: 14, horizontalDeg: 6 });
    const chain = makeDoubleCardanChain([t, d, d]);
    expect(chain.workingAngleRad[0]).toBeCloseTo(chain.workingAngleRad[1]!, 12);
    expect(chainResponse(chain).outputPeakToPeak).toBeLessThan(1e-9);
  });

  it("with the CV cancelled, the output varies as the axle joint alone (tan γ·sin γ)", () => {
    const t = shaftDirection({ verticalDeg: 0, horizontalDeg: 0 });
    const d = shaftDirection({ verticalDeg: 12, horizontalDeg: 0 });
    for (const gammaDeg of [0.7, 2, 5]) {
      const p = shaftDirection({ verticalDeg: 12 - gammaDeg, horizontalDeg: 0 });
      const r = chainResponse(makeDoubleCardanChain([t, d, p]));
      // The chain samples at 2° with parabolic refinement: about 1e-4 relative.
      expect(r.outputPeakToPeak).toBeCloseTo(singleJointPeakToPeak(gammaDeg), 6);
      expect(Math.abs(r.outputPeakToPeak / singleJointPeakToPeak(gammaDeg) - 1)).toBeLessThan(2e-3);
    }
  });
});

// Demo design (invented): a lifted 4×4 front shaft, 12° at the transfer case, pinion pointed at the shaft.
const lifted = {
  name: "Lifted 4x4 front shaft",
  lengthMm: 800,
  tube: { materialId: "steel-dom", odMm: 88.9, wallMm: 2.108 },
  geometry: {
    transmission: { verticalDeg: 2, horizontalDeg: 0 },
    driveshaft: { verticalDeg: 14, horizontalDeg: 0 },
    pinion: { verticalDeg: 13.3, horizontalDeg: 0 },
  },
  torque: { engineTorqueNm: 250, firstGearRatio: 3.06, converterStallRatio: 1.8 },
  speed: { maxShaftRpm: 2500 },
  frontJointType: "double-cardan",
};

function evaluate(
  extra: Record<string, unknown> = {},
  catalogue: Catalogue = defaultCatalogue,
): EvaluationReport {
  const merged = {
    ...lifted,
    ...extra,
    geometry: { ...lifted.geometry, ...((extra.geometry as object) ?? {}) },
  };
  const parsed = parseDesign(merged, { catalogue });
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("\n"));
  return evaluateDesign(parsed.design as DesignFile, { catalogue, curves: true });
}
const check = (r: EvaluationReport, id: string) => r.checks.find((c) => c.id === id);

describe("double-Cardan front joint in the evaluation", () => {
  it("each cross at half the front angle; the centre yoke's acceleration is one cross's at half angle", () => {
    const r = evaluate();
    expect(r.frontJointType).toBe("double-cardan");
    const dc = r.doubleCardan!;
    expect(dc.totalAngleDeg).toBeCloseTo(12, 9);
    expect(dc.crossAnglesDeg[0]).toBeCloseTo(6, 9);
    expect(dc.crossAnglesDeg[1]).toBeCloseTo(6, 9);
    expect(dc.speedVariationPct).toBeLessThan(1e-7);
    const omega = (2500 * Math.PI) / 30;
    const expected = singleJointPeakAcceleration(6, omega);
    expect(Math.abs(dc.centreYokePeakAngularAccelerationRadS2 / expected - 1)).toBeLessThan(2e-3);
    // The tube behind it turns at constant speed.
    expect(r.joints[0]!.peakAngularAccelerationRadS2).toBeLessThan(1e-6);
    expect(r.peakAngularAccelerationRadS2).toBeLessThan(1e-3 * expected);
    // Output varies as the 0.7° axle joint alone; its equivalent angle is 0.7°.
    expect(r.phasing.outputSpeedVariationPct / 100).toBeCloseTo(singleJointPeakToPeak(0.7), 6);
    expect(r.phasing.equivalentAngleDeg).toBeCloseTo(0.7, 2);
    expect(r.curves!.joints).toHaveLength(3);
  });

  it("the double-cardan checks replace the angle-difference rule; the catalogue joint is chosen and priced", () => {
    const r = evaluate();
    const ids = r.checks.map((c) => c.id);
    expect(ids).not.toContain("angle-difference");
    expect(ids).not.toContain("joint-max-angle.front");
    expect(ids).not.toContain("joint-acceleration.front");
    for (const id of ["double-cardan.max-angle", "double-cardan.acceleration", "double-cardan.rear-angle"])
      expect(check(r, id)!.status).toBe("pass");
    // 1377 N·m on a YL-X30 front fitting: the YL-DC30 joint (demo data: 1700 N·m, 32°).
    expect(r.doubleCardan!.seriesId).toBe("YL-DC30");
    expect(r.ends.front!.crossSeriesId).toBe("YL-DC30");
    expect(check(r, "double-cardan.max-angle")!.limit).toBe(32);
    const lines = quoteShaft(r, defaultPriceBook, 4000, defaultCatalogue.jointSeries);
    const dc = defaultCatalogue.jointSeries.find((s) => s.id === "YL-DC30")!;
    expect(lines.filter((l) => l.code === "joint")[0]!.unitCents).toBe(dc.priceCents);

    // The same shaft with a single cross: 12° against 0.7° warns (and the single cross's own checks apply).
    const single = evaluate({ frontJointType: "cross" });
    expect(check(single, "angle-difference")!.status).toBe("warn");
    expect(single.doubleCardan).toBeUndefined();
    expect(single.phasing.equivalentAngleDeg).toBeGreaterThan(11);
  });

  it("the axle joint must run near zero but not below 0.5°", () => {
    const steep = evaluate({ geometry: { pinion: { verticalDeg: 11.5, horizontalDeg: 0 } } });
    expect(check(steep, "double-cardan.rear-angle")!.status).toBe("warn");
    expect(check(steep, "double-cardan.rear-angle")!.message).toContain("point the pinion at the shaft");
    const flat = evaluate({ geometry: { pinion: { verticalDeg: 13.8, horizontalDeg: 0 } } });
    expect(check(flat, "double-cardan.rear-angle")!.status).toBe("pass");
    expect(check(flat, "working-angle-min.rear")!.status).toBe("warn");
  });

  it("the centre yoke's acceleration is held to the per-joint limit (n·β ≈ 17 300 deg·rpm per cross): warns above it", () => {
    // 6° per cross at 3000 rpm is above 17 300 / 3000 = 5.8° (engineering reference §4).
    const fast = evaluate({ speed: { maxShaftRpm: 3000 } });
    expect(check(fast, "double-cardan.acceleration")!.status).toBe("warn");
    expect(check(fast, "double-cardan.acceleration")!.value).toBeGreaterThan(1000);
  });

  it("beyond the joint's angle it fails; with no double-Cardan joint in the catalogue it fails", () => {
    const wild = evaluate({
      geometry: {
        driveshaft: { verticalDeg: 36, horizontalDeg: 0 },
        pinion: { verticalDeg: 35.3, horizontalDeg: 0 },
      },
    });
    expect(wild.doubleCardan!.totalAngleDeg).toBeCloseTo(34, 9);
    expect(check(wild, "double-cardan.max-angle")!.status).toBe("fail");

    const bare: Catalogue = {
      ...defaultCatalogue,
      jointSeries: defaultCatalogue.jointSeries.filter((s) => s.kind !== "double-cardan"),
    };
    const none = evaluate({}, bare);
    expect(check(none, "double-cardan.series")!.status).toBe("fail");
    expect(none.overall).toBe("fail");
    expect(none.doubleCardan!.seriesId).toBeNull();
  });
});

import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  cardanAngularAccelerationRadS2,
  cardanMaxAngularDeviationRad,
  cardanOutputAngleRad,
  cardanPeakAngularAccelerationRadS2,
  cardanSpeedRatio,
  cardanSpeedRatioExtremes,
  equivalentAngleRad,
} from "@/lib/driveline";

const RAD = Math.PI / 180;

describe("single Cardan joint", () => {
  it("speed-ratio extremes at 22° (Shigley & Uicker; Rattan, Theory of Machines)", () => {
    const e = cardanSpeedRatioExtremes(22 * RAD);
    expect(e.min).toBeCloseTo(0.92718, 5); // cos 22°
    expect(e.max).toBeCloseTo(1.07853, 5); // 1/cos 22°
    // Output leads/lags up to 2.165° (mechanism textbooks, values in the engineering reference §1).
    expect(cardanMaxAngularDeviationRad(22 * RAD) / RAD).toBeCloseTo(2.165, 3);
  });

  it("speed-ratio extremes at 45° (same textbooks)", () => {
    const e = cardanSpeedRatioExtremes(45 * RAD);
    expect(e.min).toBeCloseTo(0.70711, 5);
    expect(e.max).toBeCloseTo(1.41421, 5);
    expect(cardanMaxAngularDeviationRad(45 * RAD) / RAD).toBeCloseTo(9.879, 3);
  });

  it("closed-form extremes match a dense sweep of the speed ratio", () => {
    const beta = 22 * RAD;
    let lo = Infinity;
    let hi = -Infinity;
    let dev = 0;
    for (let i = 0; i <= 36000; i++) {
      const t = (i / 36000) * 2 * Math.PI;
      const r = cardanSpeedRatio(t, beta);
      lo = Math.min(lo, r);
      hi = Math.max(hi, r);
      dev = Math.max(dev, Math.abs(cardanOutputAngleRad(t, beta) - t));
    }
    expect(lo).toBeCloseTo(Math.cos(beta), 9);
    expect(hi).toBeCloseTo(1 / Math.cos(beta), 9);
    expect(dev).toBeCloseTo(cardanMaxAngularDeviationRad(beta), 7);
  });

  it("numerical derivative of the output angle equals the speed ratio, and of the ratio the acceleration", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 40, noNaN: true }),
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        (betaDeg, theta) => {
          const beta = betaDeg * RAD;
          const h = 1e-5;
          const dPhi =
            (cardanOutputAngleRad(theta + h, beta) - cardanOutputAngleRad(theta - h, beta)) / (2 * h);
          expect(dPhi).toBeCloseTo(cardanSpeedRatio(theta, beta), 6);
          const omega = 300;
          const dRatio = (cardanSpeedRatio(theta + h, beta) - cardanSpeedRatio(theta - h, beta)) / (2 * h);
          const alpha = cardanAngularAccelerationRadS2(theta, beta, omega);
          expect(Math.abs(omega * omega * dRatio - alpha)).toBeLessThan(1e-4 * Math.max(1, Math.abs(alpha)));
        },
      ),
      { numRuns: 200 },
    );
  });

  it("exact peak acceleration matches a sweep and ≈ ω²β² for small angles (reference §1)", () => {
    const omega = (5000 * Math.PI) / 30;
    for (const deg of [1, 3, 10, 30]) {
      const beta = deg * RAD;
      let peak = 0;
      for (let i = 0; i <= 20000; i++)
        peak = Math.max(peak, Math.abs(cardanAngularAccelerationRadS2((i / 20000) * Math.PI, beta, omega)));
      expect(cardanPeakAngularAccelerationRadS2(beta, omega) / peak).toBeCloseTo(1, 6);
    }
    expect(cardanPeakAngularAccelerationRadS2(1 * RAD, omega) / (omega * omega * (1 * RAD) ** 2)).toBeCloseTo(
      1,
      3,
    );
  });

  it("equivalent angle inverts the single-joint peak-to-peak tan β·sin β exactly", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 60, noNaN: true }), (deg) => {
        const b = deg * RAD;
        expect(equivalentAngleRad(Math.tan(b) * Math.sin(b)) / RAD).toBeCloseTo(deg, 7);
      }),
    );
  });
});

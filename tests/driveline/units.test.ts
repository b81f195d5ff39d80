import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  KG_PER_LB,
  KMH_PER_MPH,
  MM_PER_INCH,
  MPA_PER_PSI,
  NM_PER_LBFT,
  UNIT_CONVERSIONS,
  roundTripCustomary,
  roundTripSi,
  type Quantity,
} from "@/lib/driveline";

describe("units", () => {
  it("uses the exact definitions (NIST SP 811 Appendix B)", () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(KMH_PER_MPH).toBe(1.609344);
    expect(KG_PER_LB).toBe(0.45359237);
    expect(NM_PER_LBFT).toBeCloseTo(0.45359237 * 9.80665 * 0.3048, 15);
    expect(MPA_PER_PSI).toBeCloseTo((0.45359237 * 9.80665) / (25.4 * 25.4), 15);
  });

  it("round-trips every quantity to 1e-9 relative", () => {
    const quantities = Object.keys(UNIT_CONVERSIONS) as Quantity[];
    fc.assert(
      fc.property(fc.constantFrom(...quantities), fc.double({ min: -1e6, max: 1e6, noNaN: true }), (q, v) => {
        const tol = 1e-9 * Math.max(1, Math.abs(v));
        expect(Math.abs(roundTripCustomary(q, v) - v)).toBeLessThanOrEqual(tol);
        expect(Math.abs(roundTripSi(q, v) - v)).toBeLessThanOrEqual(tol);
      }),
      { numRuns: 500 },
    );
  });
});

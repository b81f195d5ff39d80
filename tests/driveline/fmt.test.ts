import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { fmt } from "@/lib/driveline/checks";

// Check messages format their figures with fmt (lib/driveline/checks.ts), which rounds itself in
// the common case for speed; the reference is the language's own Number.prototype.toFixed
// (ECMA-262 §21.1.3.3), which it must match character for character.
describe("fmt is toFixed, only faster", () => {
  test("values that sit on a rounding half, negatives, zeros, the very small and very large", () => {
    const values = [0, -0, 0.5, -0.5, 1.005, 1.255, 0.285, 2.5, -2.5, 0.045, 1.45, 8.345, 1e-7, -1e-7];
    values.push(999999.995, 123456.7865, 0.0049999999, 5e-324, 1e9, 1e10, -1e10, 1e21, Number.MAX_VALUE);
    values.push(NaN, Infinity, -Infinity, 2.0000000000000004, 5566.319153612468);
    for (const x of values) for (let d = 0; d <= 8; d++) expect(fmt(x, d), `${x} to ${d}`).toBe(x.toFixed(d));
  });

  test("any double, any digits 0–8", () => {
    fc.assert(
      fc.property(fc.double(), fc.integer({ min: 0, max: 8 }), (x, d) => fmt(x, d) === x.toFixed(d)),
      { numRuns: 20_000 },
    );
  });

  test("figures of the size checks show, including exact halves at the last digit", () => {
    const half = fc
      .tuple(fc.integer({ min: -10_000_000, max: 10_000_000 }), fc.integer({ min: 0, max: 6 }))
      .map(([n, d]) => [(n + 0.5) / 10 ** d, d] as const);
    fc.assert(
      fc.property(half, ([x, d]) => fmt(x, d) === x.toFixed(d)),
      { numRuns: 20_000 },
    );
    fc.assert(
      fc.property(
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.integer({ min: 0, max: 4 }),
        (x, d) => fmt(x, d) === x.toFixed(d),
      ),
      { numRuns: 20_000 },
    );
  });
});

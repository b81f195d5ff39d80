import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  angleBetweenRad,
  bestPhaseIndicesRad,
  chainOutputPeakToPeak,
  chainResponse,
  chainShaftAnglesRad,
  chainSpeedRatiosAt,
  equivalentAngleRad,
  makeChain,
  phaseIndexRad,
  shaftDirection,
  type Vec3,
} from "@/lib/driveline";

const RAD = Math.PI / 180;

/** Rodrigues rotation of v about unit axis a by angle g (right-hand). */
function rotate(v: Vec3, a: Vec3, g: number): Vec3 {
  const c = Math.cos(g);
  const s = Math.sin(g);
  const k = (a.x * v.x + a.y * v.y + a.z * v.z) * (1 - c);
  const x = { x: a.y * v.z - a.z * v.y, y: a.z * v.x - a.x * v.z, z: a.x * v.y - a.y * v.x };
  return { x: v.x * c + x.x * s + a.x * k, y: v.y * c + x.y * s + a.y * k, z: v.z * c + x.z * s + a.z * k };
}

const angleArb = fc.double({ min: -12, max: 12, noNaN: true });
const shaftArb = fc.record({ verticalDeg: angleArb, horizontalDeg: angleArb }).map(shaftDirection);

const variation = (shafts: Vec3[], phases?: number[]): number =>
  chainResponse(makeChain(shafts, phases)).outputPeakToPeak;

/** Unwrapped shaft angles over a small step, for numerical derivatives. */
function unwrapDiff(a: number, b: number): number {
  let d = b - a;
  while (d > Math.PI) d -= 2 * Math.PI;
  while (d < -Math.PI) d += 2 * Math.PI;
  return d;
}

describe("output speed variation alone", () => {
  it("one joint at β swings the output between cos β and 1/cos β (Cardan's law; SAE AE-7)", () => {
    const x: Vec3 = { x: 1, y: 0, z: 0 };
    for (const betaDeg of [1, 3, 7, 12]) {
      const b = betaDeg * RAD;
      const out = { x: Math.cos(b), y: Math.sin(b), z: 0 };
      expect(chainOutputPeakToPeak(makeChain([x, out], []))).toBeCloseTo(1 / Math.cos(b) - Math.cos(b), 5);
    }
  });

  it("gives the full response's spread for any 3-D chain and index", () => {
    fc.assert(
      fc.property(
        fc.tuple(shaftArb, shaftArb, shaftArb),
        fc.double({ min: -180, max: 180, noNaN: true }),
        (s, idx) => {
          const chain = makeChain(s, [idx * RAD]);
          expect(chainOutputPeakToPeak(chain)).toBe(chainResponse(chain).outputPeakToPeak);
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe("two-joint phasing", () => {
  it("parallel-offset (Z) and broken-back (W) with equal angles, in phase, give constant output", () => {
    const t = shaftDirection({ verticalDeg: 3, horizontalDeg: 0 });
    const d = shaftDirection({ verticalDeg: 5, horizontalDeg: 0 });
    const z = shaftDirection({ verticalDeg: 3, horizontalDeg: 0 });
    const w = shaftDirection({ verticalDeg: 7, horizontalDeg: 0 });
    expect(phaseIndexRad(t, d, z)).toBe(0);
    expect(phaseIndexRad(t, d, w)).toBe(0);
    expect(variation([t, d, z])).toBeLessThan(1e-12);
    expect(variation([t, d, w])).toBeLessThan(1e-12);
  });

  it("compound offset: indexing by the angle between the joint planes cancels; the opposite sign is worse", () => {
    fc.assert(
      fc.property(
        shaftArb,
        shaftArb,
        fc.double({ min: 5, max: 85, noNaN: true }),
        fc.boolean(),
        (t, d, planeDeg, negative) => {
          fc.pre(angleBetweenRad(t, d) > 1 * RAD);
          const g = (negative ? -1 : 1) * planeDeg * RAD;
          // Pinion: the transmission axis turned about the driveshaft → equal angles, rear plane turned by g.
          const p = rotate(t, d, g);
          const best = phaseIndexRad(t, d, p);
          expect(Math.abs(best - g)).toBeLessThan(1e-9); // the index is the plane angle, with its sign
          expect(variation([t, d, p], [best])).toBeLessThan(1e-9);
          const opposite = variation([t, d, p], [-best]);
          const inPhase = variation([t, d, p], [0]);
          expect(inPhase).toBeGreaterThan(1e-6);
          // Indexing the wrong way is worse than the right way, and (below 45°, where −g is
          // further from g than 0 is, modulo the half turn) worse than not indexing at all.
          expect(opposite).toBeGreaterThan(1e-6);
          if (planeDeg < 44) expect(opposite).toBeGreaterThan(inPhase);
        },
      ),
      { numRuns: 150 },
    );
  });

  it("the best index minimises the variation among all indices, for any geometry", () => {
    fc.assert(
      fc.property(shaftArb, shaftArb, shaftArb, (t, d, p) => {
        const best = bestPhaseIndicesRad([t, d, p])[0]!;
        const atBest = variation([t, d, p], [best]);
        // Tolerance: the 2° sampling with refined extremes is good to ~1e-6 relative.
        for (let k = -90; k < 90; k += 15) {
          const other = variation([t, d, p], [k * RAD]);
          expect(atBest).toBeLessThanOrEqual(other * (1 + 1e-5) + 1e-12);
        }
      }),
      { numRuns: 60 },
    );
  });

  it("equivalent angle of a 3°/1° chain in one plane is 2.83° (SAE AE-7, from memory)", () => {
    const t = shaftDirection({ verticalDeg: 0, horizontalDeg: 0 });
    const d = shaftDirection({ verticalDeg: 3, horizontalDeg: 0 });
    const p = shaftDirection({ verticalDeg: 2, horizontalDeg: 0 });
    const chain = makeChain([t, d, p]);
    expect(chain.workingAngleRad[0]! / RAD).toBeCloseTo(3, 9);
    expect(chain.workingAngleRad[1]! / RAD).toBeCloseTo(1, 9);
    const eq = equivalentAngleRad(chainResponse(chain).outputPeakToPeak) / RAD;
    expect(eq).toBeCloseTo(2.83, 2);
  });

  it("numerical derivative of the geometric composition equals the speed ratios (3-D, 2 and 3 joints)", () => {
    fc.assert(
      fc.property(
        fc.array(shaftArb, { minLength: 3, maxLength: 4 }),
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        fc.double({ min: -1.5, max: 1.5, noNaN: true }),
        (shafts, theta, phase) => {
          const chain = makeChain(
            shafts,
            Array.from({ length: shafts.length - 2 }, (_, i) => phase * (i + 1) * 0.5),
          );
          const h = 1e-6;
          const a0 = chainShaftAnglesRad(chain, theta - h);
          const a1 = chainShaftAnglesRad(chain, theta + h);
          const ratios = chainSpeedRatiosAt(chain, theta).shafts;
          for (let j = 1; j < shafts.length; j++) {
            expect(unwrapDiff(a0[j]!, a1[j]!) / (2 * h)).toBeCloseTo(ratios[j]!, 5);
          }
        },
      ),
      { numRuns: 150 },
    );
  });

  it("peak tube acceleration from the chain matches a numerical second derivative of its position", () => {
    const shafts = [
      shaftDirection({ verticalDeg: 2, horizontalDeg: 0 }),
      shaftDirection({ verticalDeg: 9, horizontalDeg: 4 }),
      shaftDirection({ verticalDeg: 1, horizontalDeg: 1 }),
    ];
    const chain = makeChain(shafts);
    const h = 1e-3;
    let peak = 0;
    for (let i = 0; i < 3600; i++) {
      const t = (i / 3600) * Math.PI;
      const r0 = chainSpeedRatiosAt(chain, t - h).shafts[1]!;
      const r1 = chainSpeedRatiosAt(chain, t + h).shafts[1]!;
      peak = Math.max(peak, Math.abs((r1 - r0) / (2 * h)));
    }
    expect(chainResponse(chain).tubePeakRatioDerivative[0]! / peak).toBeCloseTo(1, 4);
  });

  it("the 2° sampling with refined extremes agrees with a 0.05° sweep", () => {
    fc.assert(
      fc.property(
        shaftArb,
        shaftArb,
        shaftArb,
        fc.double({ min: -1.5, max: 1.5, noNaN: true }),
        (t, d, p, phase) => {
          const chain = makeChain([t, d, p], [phase]);
          let lo = Infinity;
          let hi = -Infinity;
          for (let i = 0; i < 3600; i++) {
            const out = chainSpeedRatiosAt(chain, (i / 3600) * Math.PI).shafts[2]!;
            lo = Math.min(lo, out);
            hi = Math.max(hi, out);
          }
          const v = chainResponse(chain).outputPeakToPeak;
          expect(Math.abs(v - (hi - lo))).toBeLessThan(1e-4 * Math.max(hi - lo, 1e-6) + 1e-9);
        },
      ),
      { numRuns: 40 },
    );
  });
});

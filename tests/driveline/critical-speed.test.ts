import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { lusolve, multiply, dot as mdot, zeros, type Matrix } from "mathjs";
import {
  criticalSpeedHandbookRpm,
  criticalSpeedRpm,
  inToMm,
  KGM3_PER_LBIN3,
  spanForCriticalSpeedMm,
} from "@/lib/driveline";

const TUBE_35_083 = { odMm: inToMm(3.5), wallMm: inToMm(0.083) };

/**
 * First natural frequency (rad/s) of a simply supported uniform beam by finite elements,
 * independent of the code under test: Euler–Bernoulli elements (Hermite cubics), the
 * standard element stiffness EI/l³·[12 6l −12 6l; …] and consistent mass ρAl/420·[156 22l 54 −13l; …],
 * transverse DOFs at both ends removed; lowest eigenvalue of K x = λ M x by inverse iteration.
 */
function feFirstOmega(EI: number, rhoA: number, spanM: number, elements: number): number {
  const nDof = 2 * (elements + 1);
  const K = zeros(nDof, nDof) as Matrix;
  const M = zeros(nDof, nDof) as Matrix;
  const l = spanM / elements;
  const ke = [
    [12, 6 * l, -12, 6 * l],
    [6 * l, 4 * l * l, -6 * l, 2 * l * l],
    [-12, -6 * l, 12, -6 * l],
    [6 * l, 2 * l * l, -6 * l, 4 * l * l],
  ].map((r) => r.map((v) => (v * EI) / l ** 3));
  const me = [
    [156, 22 * l, 54, -13 * l],
    [22 * l, 4 * l * l, 13 * l, -3 * l * l],
    [54, 13 * l, 156, -22 * l],
    [-13 * l, -3 * l * l, -22 * l, 4 * l * l],
  ].map((r) => r.map((v) => (v * rhoA * l) / 420));
  for (let e = 0; e < elements; e++) {
    for (let a = 0; a < 4; a++) {
      for (let b = 0; b < 4; b++) {
        const i = 2 * e + a;
        const j = 2 * e + b;
        K.set([i, j], (K.get([i, j]) as number) + ke[a]![b]!);
        M.set([i, j], (M.get([i, j]) as number) + me[a]![b]!);
      }
    }
  }
  // Simply supported: w = 0 at node 0 (dof 0) and at the last node (dof nDof − 2).
  const keep = Array.from({ length: nDof }, (_, i) => i).filter((i) => i !== 0 && i !== nDof - 2);
  const Kr = keep.map((i) => keep.map((j) => K.get([i, j]) as number));
  const Mr = keep.map((i) => keep.map((j) => M.get([i, j]) as number));
  let x: number[] = keep.map((_, i) => Math.sin((Math.PI * (i + 1)) / (keep.length + 1)) + 0.1);
  let lambda = 0;
  for (let it = 0; it < 30; it++) {
    const y = (lusolve(Kr, multiply(Mr, x)) as number[][]).map((r) => r[0]!);
    const norm = Math.sqrt(mdot(y, y));
    x = y.map((v) => v / norm);
    lambda = mdot(x, multiply(Kr, x) as number[]) / mdot(x, multiply(Mr, x) as number[]);
  }
  return Math.sqrt(lambda);
}

describe("critical speed", () => {
  it("3.5 × 0.083 in steel, 60 in span, E 200 GPa, ρ 7850 → 6287 rpm (engineering reference §5 check value)", () => {
    const nc = criticalSpeedRpm({
      ...TUBE_35_083,
      spanMm: inToMm(60),
      elasticModulusGPa: 200,
      densityKgM3: 7850,
    });
    expect(nc).toBeGreaterThan(6286.5);
    expect(nc).toBeLessThan(6287.5);
  });

  it("same tube with E = 29.0 Msi, 0.284 lb/in³ → 6282 rpm (reference §5)", () => {
    const eGPa = 29.0e6 * 0.006894757293168361; // psi → MPa → ×1e-3 GPa below
    const nc = criticalSpeedRpm({
      ...TUBE_35_083,
      spanMm: inToMm(60),
      elasticModulusGPa: eGPa / 1000,
      densityKgM3: 0.284 * KGM3_PER_LBIN3,
    });
    expect(Math.round(nc)).toBe(6282);
  });

  it("agrees with an independent finite-element eigenvalue (Euler–Bernoulli beam, mathjs)", () => {
    const D = TUBE_35_083.odMm / 1000;
    const d = (TUBE_35_083.odMm - 2 * TUBE_35_083.wallMm) / 1000;
    const E = 200e9;
    const rho = 7850;
    const I = (Math.PI * (D ** 4 - d ** 4)) / 64;
    const A = (Math.PI * (D ** 2 - d ** 2)) / 4;
    const span = inToMm(60) / 1000;
    const omega = feFirstOmega(E * I, rho * A, span, 12);
    const feRpm = (omega * 30) / Math.PI;
    const nc = criticalSpeedRpm({
      ...TUBE_35_083,
      spanMm: span * 1000,
      elasticModulusGPa: 200,
      densityKgM3: rho,
    });
    // Consistent-mass FE converges from above; 12 elements are within 1e-5 of the exact mode.
    expect(feRpm / nc).toBeGreaterThanOrEqual(1 - 1e-9);
    expect(feRpm / nc - 1).toBeLessThan(1e-4);
  });

  it("Machinery's Handbook form (inches) agrees within 2 % for a steel tube (its constant rounds E/ρ)", () => {
    const odIn = 3.5;
    const idIn = 3.5 - 2 * 0.083;
    const hb = criticalSpeedHandbookRpm(odIn, idIn, 60);
    const nc = criticalSpeedRpm({
      ...TUBE_35_083,
      spanMm: inToMm(60),
      elasticModulusGPa: 200,
      densityKgM3: 7850,
    });
    expect(Math.abs(hb / nc - 1)).toBeLessThan(0.02);
  });

  it("a longer span always has a lower critical speed, falling with L²", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 200, max: 3000, noNaN: true }),
        fc.double({ min: 1.01, max: 3, noNaN: true }),
        (span, k) => {
          const base = { ...TUBE_35_083, elasticModulusGPa: 200, densityKgM3: 7850 };
          const a = criticalSpeedRpm({ ...base, spanMm: span });
          const b = criticalSpeedRpm({ ...base, spanMm: span * k });
          expect(b).toBeLessThan(a);
          expect(a / b).toBeCloseTo(k * k, 9);
          expect(spanForCriticalSpeedMm(base, a)).toBeCloseTo(span, 6);
        },
      ),
    );
  });
});

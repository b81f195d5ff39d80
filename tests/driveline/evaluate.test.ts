import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  DISCLAIMER,
  SAFETY_CAUTION,
  defaultCatalogue,
  designFileSchema,
  evaluateDesign,
  parseAndEvaluate,
  rankTubes,
  resolveSettings,
  sampleCurves,
  type DesignFile,
  type EvaluationReport,
} from "@/lib/driveline";
import { loadExample } from "./fixtures";

const load = loadExample;

function expectConsistent(report: EvaluationReport): void {
  const statuses = report.checks.map((c) => c.status);
  const expected = statuses.includes("fail") ? "fail" : statuses.includes("warn") ? "warn" : "pass";
  expect(report.overall).toBe(expected);
  expect(report.cautions).toContain(DISCLAIMER);
  expect(report.cautions.includes(SAFETY_CAUTION)).toBe(report.overall !== "pass");
  for (const c of report.checks) {
    expect(c.source.length).toBeGreaterThan(0);
    expect(c.message).toContain(c.source.split(";")[0]!.trim());
  }
}

describe("evaluateDesign", () => {
  it("street truck passes and reports every contract field", () => {
    const r = evaluateDesign(load("street-truck"));
    expect(r.overall).toBe("pass");
    expect(r.joints.map((j) => j.workingAngleDeg)).toEqual([expect.closeTo(2, 9), expect.closeTo(2, 9)]);
    expect(r.joints[0]!.maxSpeedRatio).toBeCloseTo(1 / Math.cos((2 * Math.PI) / 180), 12);
    expect(r.phasing.phaseIndexDeg).toBe(0);
    expect(r.phasing.outputSpeedVariationPct).toBeLessThan(1e-9);
    expect(r.phasing.equivalentAngleDeg).toBeLessThan(1e-6);
    expect(r.service.maxShaftRpm).toBeCloseTo(((200 * 1000) / 60 / (Math.PI * 0.711)) * 3.73, 6);
    expect(r.service.peakShaftTorqueNm).toBeCloseTo(3366, 9);
    expect(r.criticalSpeedRatio).toBeCloseTo(r.service.maxShaftRpm / r.criticalSpeedRpm, 12);
    expect(r.torsion.safetyFactor).toBeGreaterThan(1.5);
    expect(r.cutLengthMm).toBeCloseTo(1320.8 - 2 * 66, 9);
    expect(r.balance.perPlaneGmm).toBeCloseTo(r.balance.permissibleUnbalanceGmm / 2, 12);
    expect(r.balance.rotorMassKg).toBeCloseTo(r.tube.massKg + 2 * 2.2, 9);
    expect(r.peakAngularAccelerationRadS2).toBeGreaterThan(0);
    expect(r.tube).toMatchObject({ materialId: "steel-dom", odMm: 88.9, wallMm: 2.108 });
    expectConsistent(r);
  });

  it("compound offset: best index cancels better than in phase; slip checked", () => {
    const r = evaluateDesign(load("compound-offset"));
    expect(Math.abs(r.phasing.phaseIndexDeg)).toBeGreaterThan(5);
    expect(r.phasing.outputSpeedVariationPct).toBeLessThan(r.phasing.inPhaseOutputSpeedVariationPct);
    expect(r.phasing.equivalentAngleDeg).toBeCloseTo(r.phasing.equivalentAngleSmallAngleDeg, 1);
    expect(r.slip?.outAtRideHeightMm).toBeCloseTo(22, 9);
    expect(r.checks.find((c) => c.id === "slip-position")?.status).toBe("pass");
    expectConsistent(r);
  });

  it("a specified phase index off the best by more than the tolerance warns", () => {
    const d = { ...load("compound-offset"), phaseIndexDeg: 10 };
    const r = evaluateDesign(d);
    expect(r.phasing.asSpecified?.outputSpeedVariationPct).toBeGreaterThan(r.phasing.outputSpeedVariationPct);
    expect(r.checks.find((c) => c.id === "phase-index")?.status).toBe("warn");
    expectConsistent(r);
  });

  it("long van fails critical speed and proposes a two-piece shaft with three joints", () => {
    const r = evaluateDesign(load("long-van-critical-speed-fail"));
    expect(r.overall).toBe("fail");
    expect(r.checks.find((c) => c.id === "critical-speed")?.status).toBe("fail");
    const tp = r.twoPiece!;
    expect(tp).not.toBeNull();
    expect(tp.joints).toHaveLength(3);
    expect(tp.pieces).toHaveLength(2);
    for (const p of tp.pieces) expect(p.tube.criticalSpeedRatio).toBeLessThanOrEqual(0.75);
    expect(tp.joints[1]!.workingAngleDeg).toBeCloseTo(1, 2);
    expect(tp.feasible).toBe(true);
    expect(r.tubeSelection?.anyPassesCriticalSpeed).toBe(false);
    expectConsistent(r);
  });

  it("never presents a failed check as a pass; tighter shop settings fail more", () => {
    const d = load("street-truck");
    const strict = resolveSettings({ minTorsionSafetyFactor: { value: 2.0, source: "our shop" } });
    const r = evaluateDesign(d, { settings: strict });
    const torsion = r.checks.find((c) => c.id === "torsion")!;
    expect(torsion.status).toBe("fail");
    expect(torsion.message).toContain("our shop");
    expect(r.overall).toBe("fail");
    expectConsistent(r);
  });

  it("picks the lightest passing tube when none is given and ranks the alternatives", () => {
    const { tube: _t, ...rest } = load("street-truck");
    const r = evaluateDesign(rest as DesignFile);
    const sel = r.tubeSelection!;
    expect(r.tube.origin).toBe("catalogue");
    expect(sel.byMass.length).toBeGreaterThan(0);
    for (let i = 1; i < sel.byMass.length; i++)
      expect(sel.byMass[i]!.massKg).toBeGreaterThanOrEqual(sel.byMass[i - 1]!.massKg);
    for (let i = 1; i < sel.byCost.length; i++)
      expect(sel.byCost[i]!.priceCents).toBeGreaterThanOrEqual(sel.byCost[i - 1]!.priceCents);
    expect(sel.byMass.length + sel.rejected.length).toBe(defaultCatalogue.tubes.length);
    for (const t of sel.rejected) expect(t.reasons.length).toBeGreaterThan(0);
    for (const t of sel.byMass) {
      expect(t.criticalSpeedRatio).toBeLessThanOrEqual(0.75);
      expect(t.torsionSafetyFactor).toBeGreaterThanOrEqual(1.5);
      expect(Number.isInteger(t.priceCents)).toBe(true);
    }
    expect(r.tube.tubeId).toBe(sel.byMass.find((c) => c.status === "pass")!.tubeId);
    // The fixed end fittings take 3.5 in steel only.
    for (const t of sel.byMass) expect(t.odMm).toBeCloseTo(88.9, 6);
    expectConsistent(r);
  });

  it("a shop that prefers the cheapest tube gets the cheapest that passes, never a failing one", () => {
    const { tube: _t, ends: _e, ...rest } = load("street-truck");
    const lightest = evaluateDesign(rest as DesignFile);
    const cheapest = evaluateDesign(rest as DesignFile, { tubePreference: "cheapest" });
    const sel = cheapest.tubeSelection!;
    expect(cheapest.tube.tubeId).toBe(sel.byCost.find((c) => c.status === "pass")!.tubeId);
    expect(cheapest.tube.priceCents!).toBeLessThanOrEqual(lightest.tube.priceCents!);
    expect(cheapest.tube.massKg).toBeGreaterThanOrEqual(lightest.tube.massKg);
    expect(cheapest.checks.find((c) => c.id === "critical-speed")!.status).not.toBe("fail");
    expectConsistent(cheapest);
  });

  it("rankTubes rejects tubes too long for stock, too weak or too whippy, with the reason", () => {
    const sel = rankTubes({ spanMm: 2000, maxShaftRpm: 4000, peakShaftTorqueNm: 3000 });
    const reasons = sel.rejected.flatMap((t) => t.reasons).join("\n");
    expect(reasons).toMatch(/critical-speed ratio/);
    expect(reasons).toMatch(/torsion safety factor/);
    expect(reasons).toMatch(/stock is/);
  });

  it("curves: 181 points over one turn, output flat when cancelled", () => {
    const c = sampleCurves(load("street-truck"));
    expect(c.angleDeg).toHaveLength(181);
    expect(c.angleDeg[180]).toBe(360);
    expect(c.joints).toHaveLength(2);
    for (const v of c.output) expect(v).toBeCloseTo(1, 12);
    const r = evaluateDesign(load("compound-offset"), { curves: true });
    expect(r.curves?.output).toHaveLength(181);
  });

  it("random valid designs never throw and stay consistent", () => {
    const angle = fc.double({ min: -40, max: 40, noNaN: true });
    const shaft = fc.record({ verticalDeg: angle, horizontalDeg: angle });
    const positive = (min: number, max: number) => fc.double({ min, max, noNaN: true });
    const design = fc.record({
      lengthMm: positive(100, 4000),
      tube: fc.option(
        fc.record({
          materialId: fc.constantFrom("steel-dom", "chromoly-4130", "aluminium-6061-t6"),
          odMm: positive(40, 130),
          wallMm: positive(1, 6),
        }),
        { nil: null },
      ),
      geometry: fc.record({ transmission: shaft, driveshaft: shaft, pinion: shaft }),
      torque: fc.record({
        engineTorqueNm: positive(10, 3000),
        firstGearRatio: fc.option(positive(0.5, 6), { nil: null }),
        converterStallRatio: fc.option(positive(1, 3)),
      }),
      speed: fc.oneof(
        fc.record({ maxShaftRpm: positive(100, 12000) }),
        fc.record({
          topSpeedKmh: positive(20, 400),
          axleRatio: positive(2, 6),
          tireDiameterMm: positive(400, 1100),
        }),
      ),
      balanceGradeMmS: fc.option(positive(1, 40)),
      phaseIndexDeg: fc.option(fc.double({ min: -89.9, max: 90, noNaN: true })),
      slip: fc.option(
        fc.record({
          collapsedLengthMm: positive(50, 100),
          travelMm: positive(20, 150),
          droopExtensionMm: positive(0, 80),
        }),
      ),
    });
    fc.assert(
      fc.property(design, (input) => {
        const parsed = designFileSchema.safeParse(input);
        fc.pre(parsed.success);
        const r = parseAndEvaluate(input);
        if (!r.ok) return;
        for (const j of r.report.joints) expect(Number.isFinite(j.workingAngleDeg)).toBe(true);
        expect(Number.isFinite(r.report.criticalSpeedRpm)).toBe(true);
        expect(r.report.phasing.phaseIndexDeg).toBeGreaterThan(-90);
        expect(r.report.phasing.phaseIndexDeg).toBeLessThanOrEqual(90);
        expectConsistent(r.report);
      }),
      { numRuns: 150 },
    );
  });
});

import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import {
  catalogueSchema,
  defaultCatalogue,
  defaultSettings,
  evaluateDesign,
  parseDesign,
  type DesignFile,
} from "@/lib/driveline";
import { twoPieceDesignFrom } from "@/lib/driveline/two-piece";

const IN = 25.4;

function load(name: string): DesignFile {
  const parsed = parseDesign(JSON.parse(readFileSync(`examples/${name}.json`, "utf8")));
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("; "));
  return parsed.design;
}

/**
 * First bending critical speed of a simply supported hollow tube, engineering reference §5
 * (Euler–Bernoulli; Blevins, simply supported beam, λ₁ = π): n = 30/π · (π/L)² · √(EI/ρA).
 */
function closedFormCriticalRpm(odMm: number, wallMm: number, spanMm: number, eGPa: number, rho: number) {
  const D = odMm / 1000;
  const d = (odMm - 2 * wallMm) / 1000;
  const I = (Math.PI * (D ** 4 - d ** 4)) / 64;
  const A = (Math.PI * (D ** 2 - d ** 2)) / 4;
  const L = spanMm / 1000;
  return (30 / Math.PI) * (Math.PI / L) ** 2 * Math.sqrt((eGPa * 1e9 * I) / (rho * A));
}

describe("two-piece shaft evaluation (examples/two-piece-van.json)", () => {
  const design = load("two-piece-van");
  const r = evaluateDesign(design);
  // The van: 1900 mm joint to joint, centre bearing half way, steel DOM 3.5 in × 0.083 in (88.9 × 2.108 mm).
  const half = 950;
  // Default drop gives the centre joint the shop's 1°: h = tan(1°) · L₁ · L₂ / L (apex of the dropped triangle).
  const dropMm = (Math.tan((1 * Math.PI) / 180) * half * half) / 1900;
  const span = Math.hypot(half, dropMm);

  it("is a two-piece report: three joints, two pieces, the centre bearing", () => {
    expect(r.layout).toBe("two-piece");
    expect(r.joints.map((j) => j.position)).toEqual(["front", "centre", "rear"]);
    expect(r.pieces!.map((p) => [p.piece, p.position])).toEqual([
      ["A", "front"],
      ["B", "rear"],
    ]);
    expect(r.centreBearing).toMatchObject({ bearingId: "YL-CB-X41-3500", jointSeriesId: "YL-X41" });
    expect(r.centreBearing!.dropMm).toBeCloseTo(dropMm, 6);
    // Geometry: the centre joint's angle is the apex angle 2·atan(h/L₁) = the shop's 1° (settings default).
    expect(2 * Math.atan(dropMm / half) * (180 / Math.PI)).toBeCloseTo(1, 3);
    expect(r.joints[1]!.workingAngleDeg).toBeCloseTo(1, 3);
    for (const p of r.pieces!) expect(p.spanMm).toBeCloseTo(span, 6);
    expect(r.overall).toBe("pass");
  });

  it("checks each piece's critical speed on its own span (engineering reference §5)", () => {
    // Closed form with the catalogue's steel-dom figures (E 200 GPa, ρ 7870 kg/m³).
    const expected = closedFormCriticalRpm(3.5 * IN, 0.083 * IN, span, 200, 7870);
    // §5 check value: 3.5 × 0.083 in, 60 in span, E 200 GPa, ρ 7850 → 6287 rpm; n_c ∝ 1/L² and ∝ 1/√ρ.
    const fromCheckValue = 6287 * ((60 * IN) / span) ** 2 * Math.sqrt(7850 / 7870);
    expect(expected).toBeCloseTo(fromCheckValue, -1);
    for (const p of r.pieces!) {
      expect(p.criticalSpeedRpm).toBeCloseTo(expected, 0);
      expect(p.criticalSpeedRatio).toBeCloseTo(r.service.maxShaftRpm / expected, 5);
    }
    // The same tube over the whole 1900 mm fails (the one-piece example): a quarter of the critical speed.
    const whole = closedFormCriticalRpm(3.5 * IN, 0.083 * IN, 1900, 200, 7870);
    expect(r.service.maxShaftRpm / whole).toBeGreaterThan(defaultSettings.maxCriticalSpeedRatio.value);
    expect(r.checks.find((c) => c.id === "critical-speed")).toBeUndefined();
    expect(r.checks.find((c) => c.id === "critical-speed.front-piece")?.status).toBe("pass");
    expect(r.checks.find((c) => c.id === "critical-speed.rear-piece")?.status).toBe("pass");
    expect(r.criticalSpeedRpm).toBeCloseTo(expected, 0);
  });

  it("gives each piece its ends, cut length and balance from the catalogue (ISO 21940-11)", () => {
    const [a, b] = r.pieces!;
    // Demo catalogue: YL-X41 weld yoke seat 66 mm, 2.2 kg; centre bearing YL-CB-X41-3500 seat round(66 × 2.2) = 145 mm,
    // mass 2.2 × 2.1 + 0.9 = 5.52 kg (demo data).
    expect(a!.ends.front?.fittingId).toBe("YL-WY-X41-3500");
    expect(a!.ends.rear).toMatchObject({ fittingId: "YL-CB-X41-3500", kind: "centre-bearing-stub" });
    expect(b!.ends.front).toMatchObject({ fittingId: "YL-WY-X41-3500", jointSeriesId: "YL-X41" });
    expect(b!.ends.rear?.fittingId).toBe("YL-WY-X41-3500");
    expect(a!.cutLengthMm).toBeCloseTo(span - 66 - 145, 6);
    expect(b!.cutLengthMm).toBeCloseTo(span - 66 - 66, 6);
    const kgPerMm = (Math.PI / 4) * ((88.9 ** 2 - (88.9 - 2 * 2.108) ** 2) / 1e6) * 7870 * 1e-3;
    const massA = kgPerMm * (span - 211) + 2.2 + 5.52;
    const massB = kgPerMm * (span - 132) + 2.2 + 2.2;
    expect(a!.balance.rotorMassKg).toBeCloseTo(massA, 2);
    expect(b!.balance.rotorMassKg).toBeCloseTo(massB, 2);
    // U_per = 9549 · G · m / n (ISO 21940-11), half per plane; G 16 by default.
    const n = r.service.maxShaftRpm;
    expect(a!.balance.perPlaneGmm).toBeCloseTo((9549 * 16 * massA) / n / 2, 0);
    expect(b!.balance.perPlaneGmm).toBeCloseTo((9549 * 16 * massB) / n / 2, 0);
    expect(r.tube.tubeLengthMm).toBeCloseTo(a!.tube.tubeLengthMm + b!.tube.tubeLengthMm, 6);
    expect(r.cutLengthMm).toBeNull();
  });

  it("phases the three joints as one chain and reports each piece's rear-yoke index", () => {
    // All in one vertical plane: every index 0, as for a one-piece shaft (reference §3).
    expect(r.phasing.phaseIndicesDeg).toEqual([0, 0]);
    expect(r.pieces!.map((p) => p.phaseIndexDeg)).toEqual([0, 0]);
    // A compound offset: the rear axle offset to the right turns the joint planes, so the indices are not zero
    // and phasing them beats leaving the yokes in phase.
    const offset = evaluateDesign({
      ...design,
      geometry: {
        transmission: { verticalDeg: 2.5, horizontalDeg: 0 },
        driveshaft: { verticalDeg: 4, horizontalDeg: 3 },
        pinion: { verticalDeg: 2.5, horizontalDeg: 0 },
      },
    });
    const idx = offset.phasing.phaseIndicesDeg!;
    expect(idx.some((d) => Math.abs(d) > 5)).toBe(true);
    expect(offset.pieces!.map((p) => p.phaseIndexDeg)).toEqual(idx);
    expect(offset.phasing.outputSpeedVariationPct).toBeLessThan(
      offset.phasing.inPhaseOutputSpeedVariationPct,
    );
    // The builder's plot gets one curve per joint of the chain.
    expect(evaluateDesign(design, { curves: { points: 37 } }).curves!.joints).toHaveLength(3);
  });

  it("fails, in words, a centre bearing whose stub does not take the tube", () => {
    const r2 = evaluateDesign({ ...design, centreBearing: { bearingId: "YL-CB-X41-4000" } });
    const fit = r2.checks.find((c) => c.id === "centre-bearing.fit")!;
    expect(fit.status).toBe("fail");
    expect(fit.message).toContain("101.6 mm");
    expect(r2.overall).toBe("fail");
  });

  it("picks a tube the bearing takes when the design leaves the tube to Yokeline", () => {
    const { tube: _t, ...rest } = design;
    const r2 = evaluateDesign(rest as DesignFile);
    expect(r2.tube.origin).toBe("catalogue");
    expect(r2.tube.odMm).toBeCloseTo(3.5 * IN, 1);
    expect(r2.tubeSelection?.spanMm).toBeCloseTo(span, 6);
    expect(r2.overall).toBe("pass");
  });
});

describe("the two-piece proposal becomes the design", () => {
  it("names a catalogue centre bearing, and twoPieceDesignFrom gives a design that passes", () => {
    const van = load("long-van-critical-speed-fail");
    const r = evaluateDesign(van);
    expect(r.overall).toBe("fail");
    const proposal = r.twoPiece!;
    expect(proposal.centreBearingId).toMatch(/^YL-CB-/);
    const next = twoPieceDesignFrom(van, r)!;
    expect(next.layout).toBe("two-piece");
    expect(next.centreBearing?.bearingId).toBe(proposal.centreBearingId);
    expect(parseDesign(next).ok).toBe(true);
    const r2 = evaluateDesign(next);
    expect(r2.overall).toBe("pass");
    // The evaluation checks the same tube on the same spans as the proposal.
    expect(r2.pieces![0]!.criticalSpeedRpm).toBeCloseTo(proposal.pieces[0]!.tube.criticalSpeedRpm, -1);
    // A design that needs no proposal has nothing to become.
    expect(twoPieceDesignFrom(load("street-truck"), evaluateDesign(load("street-truck")))).toBeNull();
  });
});

describe("two-piece input and catalogue validation", () => {
  it("names the field: an unknown bearing, a centre joint past the end, a missing bearing", () => {
    const base = JSON.parse(readFileSync("examples/two-piece-van.json", "utf8")) as Record<string, unknown>;
    const unknown = parseDesign({ ...base, centreBearing: { bearingId: "nope" } });
    expect(unknown.ok).toBe(false);
    if (!unknown.ok) expect(unknown.issues.map((i) => i.path)).toContain("centreBearing.bearingId");
    const past = parseDesign({ ...base, centreBearing: { bearingId: "YL-CB-X41-3500", fromFrontMm: 1900 } });
    expect(past.ok).toBe(false);
    if (!past.ok) expect(past.issues.map((i) => i.path)).toContain("centreBearing.fromFrontMm");
    const missing = parseDesign({ ...base, centreBearing: null });
    expect(missing.ok).toBe(false);
    if (!missing.ok) expect(missing.issues.map((i) => i.path)).toContain("centreBearing");
  });

  it("the catalogue schema keeps centre bearings and refuses repeated ids and unknown series", () => {
    const parsed = catalogueSchema.parse(defaultCatalogue);
    expect(parsed.centreBearings?.length).toBe(defaultCatalogue.centreBearings!.length);
    const first = defaultCatalogue.centreBearings![0]!;
    const bad = catalogueSchema.safeParse({
      ...defaultCatalogue,
      centreBearings: [
        first,
        { ...first },
        { ...first, id: "X", jointSeriesId: "YL-X99" },
        { ...first, id: "Y", source: " " },
      ],
    });
    expect(bad.success).toBe(false);
    const paths = bad.error!.issues.map((i) => i.path.join("."));
    expect(paths).toEqual(
      expect.arrayContaining([
        "centreBearings.1.id",
        "centreBearings.2.jointSeriesId",
        "centreBearings.3.source",
      ]),
    );
    // Catalogues saved before centre bearings existed stay valid.
    const { centreBearings: _c, ...older } = defaultCatalogue;
    expect(catalogueSchema.safeParse(older).success).toBe(true);
  });

  it("one-piece reports keep their shape (no pieces, two joints)", () => {
    for (const name of ["street-truck", "compound-offset", "long-van-critical-speed-fail"]) {
      const r = evaluateDesign(load(name));
      expect(r.layout).toBeUndefined();
      expect(r.pieces).toBeUndefined();
      expect(r.joints).toHaveLength(2);
    }
  });
});

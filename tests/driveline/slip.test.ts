import { describe, expect, it } from "vitest";
import {
  defaultCatalogue,
  defaultSettings,
  evaluateDesign,
  parseDesign,
  type DesignFile,
  type EvaluationReport,
} from "@/lib/driveline";
import { truckDesign } from "./fixtures";

// Demo design (invented): a street truck shaft with a slip yoke on the transmission output.
// Lengths joint centre to joint centre; ride height 22 mm out from fully collapsed, 40 mm more at droop.
const base = {
  name: "Slip test truck",
  ...truckDesign,
  slip: { collapsedLengthMm: 1298.8, travelMm: 90, droopExtensionMm: 40, bumpCompressionMm: 15 },
};

function evaluate(extra: Record<string, unknown>): EvaluationReport {
  const merged = { ...base, ...extra, slip: { ...base.slip, ...((extra.slip as object) ?? {}) } };
  const parsed = parseDesign(merged);
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("\n"));
  return evaluateDesign(parsed.design as DesignFile);
}
const check = (r: EvaluationReport, id: string) => r.checks.find((c) => c.id === id);

// Demo catalogue slip yoke (invented part): 27 splines 1.25 in, YL-X30 ears, 118 mm seal surface,
// 25 mm least engagement.
const YOKE = "YL-SY-27-1250-X30";

describe("slip yoke from the catalogue", () => {
  it("the yoke's least engagement replaces the shop's fixed minimum", () => {
    const yoke = defaultCatalogue.slipYokes!.find((y) => y.id === YOKE)!;
    expect(yoke.minEngagementMm).toBe(25); // demo data

    // travel 85 mm, out at droop 22 + 40 = 62 mm → 23 mm left engaged.
    const withYoke = evaluate({ slip: { travelMm: 85, slipYokeId: YOKE } });
    expect(withYoke.slip!.reserveAtFullDroopMm).toBeCloseTo(85 - 62, 9);
    expect(withYoke.slip!.minEngagementMm).toBe(25);
    expect(check(withYoke, "slip-reserve")!.status).toBe("fail");
    expect(check(withYoke, "slip-reserve")!.message).toContain(YOKE);

    // The same slip with no yoke known: the shop's 12.7 mm (1/2 in, common shop practice) → passes.
    const without = evaluate({ slip: { travelMm: 85 } });
    expect(without.slip!.minEngagementMm).toBe(12.7);
    expect(check(without, "slip-reserve")!.status).toBe("pass");
    expect(check(without, "slip-reserve")!.source).toBe(defaultSettings.slipMinReserveMm.source);
    // No yoke: no seal surface to check.
    expect(check(without, "slip-seal")).toBeUndefined();
    expect(without.slip!.sealLeftInBushingMm).toBeNull();
  });

  it("slip-seal: seal surface − outside when collapsed − out at full droop, against the shop's minimum", () => {
    // 118 mm seal surface (demo data), 10 mm outside collapsed, 62 mm out at droop → 46 mm left.
    const ok = evaluate({ slip: { slipYokeId: YOKE, sealOutsideCollapsedMm: 10 } });
    expect(ok.slip!.sealLeftInBushingMm).toBeCloseTo(118 - 10 - 62, 9);
    const seal = check(ok, "slip-seal")!;
    expect(seal.status).toBe("pass");
    expect(seal.limit).toBe(25.4); // about 1 in, common shop practice (from memory)
    expect(seal.message).toContain(
      "118.0 mm seal surface − 10.0 mm outside when collapsed − 62.0 mm out at full droop",
    );

    // 40 mm outside collapsed → 16 mm left: fails.
    const short = evaluate({ slip: { slipYokeId: YOKE, sealOutsideCollapsedMm: 40 } });
    expect(short.slip!.sealLeftInBushingMm).toBeCloseTo(16, 9);
    expect(check(short, "slip-seal")!.status).toBe("fail");
    expect(short.overall).toBe("fail");
  });

  it("matches the yoke to the output spline (count equal, diameter within 0.5 mm) and prices it", () => {
    const r = evaluate({ interface: { transmissionOutput: { splineCount: 27, majorDiameterMm: 31.6 } } });
    expect(r.slip!.slipYokeId).toBe(YOKE);
    expect(r.slip!.slipYoke!.origin).toBe("matched");
    expect(check(r, "interface.slip-yoke")!.status).toBe("pass");
    expect(r.interface!.parts).toEqual([
      { role: "slip-yoke", id: YOKE, name: expect.any(String), priceCents: 9800 }, // demo price
    ]);

    // 32.5 mm is 0.75 mm off: no match, a warning naming the field; the shop's minimum applies.
    const none = evaluate({ interface: { transmissionOutput: { splineCount: 27, majorDiameterMm: 32.5 } } });
    expect(none.slip!.slipYokeId).toBeNull();
    expect(check(none, "interface.slip-yoke")!.status).toBe("warn");
    expect(check(none, "interface.slip-yoke")!.message).toContain("interface.transmissionOutput");
    expect(none.slip!.minEngagementMm).toBe(12.7);
    expect(none.interface!.parts).toEqual([]);
  });

  it("between yokes for one spline, prefers the one whose ears take the front fitting's caps", () => {
    const output = { transmissionOutput: { splineCount: 32, majorDiameterMm: 38.1 } };
    const x41 = evaluate({ interface: output, ends: { front: { fittingId: "YL-WY-X41-3500" } } });
    expect(x41.slip!.slipYokeId).toBe("YL-SY-32-1500-X41");
    expect(x41.interface!.slipYokeCandidates).toEqual(["YL-SY-32-1500-X35", "YL-SY-32-1500-X41"]);
    const x35 = evaluate({ interface: output, ends: { front: { fittingId: "YL-WY-X35-3500" } } });
    expect(x35.slip!.slipYokeId).toBe("YL-SY-32-1500-X35");
  });

  it("a named yoke that does not fit the output fails; an unknown one is a field error", () => {
    const r = evaluate({
      slip: { slipYokeId: YOKE },
      interface: { transmissionOutput: { splineCount: 31, majorDiameterMm: 34.9 } },
    });
    expect(check(r, "interface.slip-yoke")!.status).toBe("fail");
    expect(check(r, "interface.slip-yoke")!.message).toContain("YL-SY-31-1375-X35 would");

    const bad = parseDesign({ ...base, slip: { ...base.slip, slipYokeId: "nope" } });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.issues[0]!.path).toBe("slip.slipYokeId");
  });
});

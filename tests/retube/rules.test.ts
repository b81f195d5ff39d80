import { describe, expect, test } from "vitest";
import { defaultCatalogue } from "@/lib/driveline/catalogue/default";
import { defaultPriceBook, priceBookSchema, quoteShaft } from "@/lib/pricing/price-book";
import {
  emptyIntake,
  repairIntakeSchema,
  retubeGeometryOf,
  retubeLengthCheck,
  reusedForPrice,
  saveRepairBodySchema,
  type RepairIntake,
} from "@/lib/retube/intake";
import { checkMeasurements } from "@/lib/traveller/measure";
import { resolveFloorSettings } from "@/lib/traveller/settings";
import { deriveSteps, runoutStations } from "@/lib/traveller/steps";
import { zodIssues } from "@/lib/validation";
import { exampleReport } from "../traveller/fixtures";

/** The README street truck: YL-WY-X41-3500 weld yokes both ends (joint centre to weld seat 66 mm, demo catalogue). */
const report = exampleReport();
const floor = resolveFloorSettings({ shopCode: "TGW", units: "mm" });

function intake(
  reuse: Partial<Record<keyof RepairIntake["parts"], string>>,
  weldToWeldMm = 1190,
): RepairIntake {
  const base = emptyIntake();
  for (const [part, note] of Object.entries(reuse))
    base.parts[part as keyof RepairIntake["parts"]] = { reuse: true, note };
  return { weldToWeldMm, parts: base.parts };
}

const fieldsOf = (input: unknown) => {
  const parsed = saveRepairBodySchema.safeParse(input);
  return parsed.success ? {} : Object.fromEntries(zodIssues(parsed.error).map((i) => [i.path, i.message]));
};

describe("re-tube intake schema", () => {
  test("names the field: weld-to-weld must be a positive number, a reused part needs its condition", () => {
    const parts = emptyIntake().parts;
    expect(fieldsOf({ job: "retube", repair: { weldToWeldMm: 0, parts } })).toEqual({
      "repair.weldToWeldMm": "must be a positive number",
    });
    expect(fieldsOf({ job: "retube", repair: { weldToWeldMm: "long", parts } })).toEqual({
      "repair.weldToWeldMm": "must be a positive number",
    });
    expect(
      fieldsOf({
        job: "retube",
        repair: { weldToWeldMm: 1190, parts: { ...parts, rearJoint: { reuse: true, note: " " } } },
      }),
    ).toEqual({ "repair.parts.rearJoint.note": "say what condition a reused part is in" });
    expect(fieldsOf({ job: "rebuild" })).toHaveProperty("job");
    expect(fieldsOf({ job: "new" })).toEqual({});
    expect(repairIntakeSchema.parse(intake({ frontEnd: "bores round" })).parts.frontEnd).toEqual({
      reuse: true,
      note: "bores round",
    });
  });
});

describe("re-tube price", () => {
  const tubePrice = defaultCatalogue.tubes.find((t) => t.id === report.tube.tubeId)!.pricePerMetreCents;
  const fitting = defaultCatalogue.endFittings.find((f) => f.id === "YL-WY-X41-3500")!;
  const joint = defaultCatalogue.jointSeries.find((j) => j.id === fitting.jointSeriesId)!;
  const total = (lines: { totalCents: number }[]) => lines.reduce((s, l) => s + l.totalCents, 0);

  test("reused parts are listed at no charge and the price book's teardown line is added", () => {
    const fresh = quoteShaft(report, defaultPriceBook, tubePrice, defaultCatalogue.jointSeries);
    const repair = intake({ frontEnd: "ok", frontJoint: "smooth", slipYoke: "no wear" });
    const retube = quoteShaft(
      report,
      defaultPriceBook,
      tubePrice,
      defaultCatalogue.jointSeries,
      reusedForPrice(repair),
    );
    // New shaft − the front yoke − the front joint + teardown (the slip yoke is not a priced line).
    expect(total(retube)).toBe(
      total(fresh) - fitting.priceCents - joint.priceCents + defaultPriceBook.teardownPerShaftCents,
    );
    expect(retube.filter((l) => l.totalCents === 0 && /reused \(not charged\)/.test(l.label))).toHaveLength(
      2,
    );
    expect(retube.find((l) => l.code === "teardown")).toMatchObject({
      label: "Re-tube: teardown and inspection",
      totalCents: 4500,
    });
    // A re-tube that reuses nothing still pays the teardown; a new shaft never does.
    const none = quoteShaft(
      report,
      defaultPriceBook,
      tubePrice,
      defaultCatalogue.jointSeries,
      reusedForPrice(intake({})),
    );
    expect(total(none)).toBe(total(fresh) + 4500);
    expect(fresh.some((l) => l.code === "teardown")).toBe(false);
  });

  test("a price book saved before re-tubes gets the demo teardown default; a negative one is refused", () => {
    const { teardownPerShaftCents: _drop, ...old } = defaultPriceBook;
    expect(priceBookSchema.parse(old).teardownPerShaftCents).toBe(4500);
    const bad = priceBookSchema.safeParse({ ...defaultPriceBook, teardownPerShaftCents: -1 });
    expect(bad.success).toBe(false);
    expect(zodIssues(bad.error!)).toEqual([
      { path: "teardownPerShaftCents", message: "must not be negative" },
    ]);
  });
});

describe("re-tube length rules", () => {
  test("joint-centre length cross-check: weld-to-weld + both catalogue seats (66 mm each, demo catalogue)", () => {
    const g = retubeGeometryOf(report);
    expect(g).toMatchObject({ lengthMm: 1320.8, frontSeatMm: 66, rearSeatMm: 66 });
    // 1188.8 + 66 + 66 = 1320.8: agrees.
    expect(retubeLengthCheck(1188.8, g)).toMatchObject({ disagrees: false });
    expect(retubeLengthCheck(1188.8, g).derivedMm).toBeCloseTo(1320.8, 6);
    // 1180 + 132 = 1312, 8.8 mm short: more than the as-welded tolerance.
    const off = retubeLengthCheck(1180, g);
    expect(off.differenceMm).toBeCloseTo(-8.8, 6);
    expect(off.disagrees).toBe(8.8 > report.shopFloor.lengthToleranceMm);
    expect(retubeLengthCheck(1180, { ...g, rearSeatMm: null })).toEqual({
      derivedMm: null,
      differenceMm: null,
      disagrees: false,
    });
  });
});

describe("re-tube routing", () => {
  const repair = intake({ rearEnd: "ears straight", rearJoint: "no notching" }, 1192.5);

  test("teardown and inspection come first, then the usual routing; a new shaft is unchanged", () => {
    const steps = deriveSteps({ report, fulfilment: "ship", floor, repair });
    expect(steps.map((s) => s.code)).toEqual(["TDN", "INS", "CUT", "WLD", "RUN", "BAL", "FIN", "SHP"]);
    expect(steps.map((s) => s.position)).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
    expect(deriveSteps({ report, fulfilment: "ship", floor }).map((s) => s.code)).toEqual([
      "CUT",
      "WLD",
      "RUN",
      "BAL",
      "FIN",
      "SHP",
    ]);
  });

  test("the cut length is the customer's weld-to-weld (common shop practice), and runout stations follow it", () => {
    const steps = deriveSteps({ report, fulfilment: "ship", floor, repair });
    const cut = steps.find((s) => s.code === "CUT")!.fields.find((f) => f.key === "cutLengthMm");
    expect(cut).toMatchObject({ limit: { nominal: 1192.5, min: 1192.5 - 0.8, max: 1192.5 + 0.8 } });
    const { stations } = runoutStations({ report, fulfilment: "ship", floor, repair });
    expect(stations.map((s) => s.fromFrontWeldMm)).toEqual([75, 1192.5 / 2, 1192.5 - 75]);
    // The teardown re-measures weld-to-weld against the counter's figure, ± the as-welded tolerance.
    const w2w = steps[0]!.fields.find((f) => f.key === "weldToWeldMm");
    const tol = report.shopFloor.lengthToleranceMm;
    expect(w2w).toMatchObject({ limit: { nominal: 1192.5, min: 1192.5 - tol, max: 1192.5 + tol } });
    expect(steps[0]!.fields.filter((f) => f.type === "text")).toHaveLength(5);
  });

  test("inspection asks only about the parts the counter meant to reuse; a failed part holds with what was found", () => {
    const ins = deriveSteps({ report, fulfilment: "ship", floor, repair })[1]!;
    expect(ins.fields.map((f) => f.key)).toEqual(["findings", "rearEndPasses", "rearJointPasses"]);
    const pass = checkMeasurements(
      ins,
      { findings: "all fine", rearEndPasses: "yes", rearJointPasses: true },
      "mm",
    );
    expect(pass.outcome).toBe("pass");
    const hold = checkMeasurements(
      ins,
      { findings: "rear joint: brinelled cap, rough", rearEndPasses: "yes", rearJointPasses: "no" },
      "mm",
    );
    expect(hold).toMatchObject({
      outcome: "hold",
      failures: [
        {
          key: "rearJointPasses",
          message: "Rear joint passes, reuse it: no — rear joint: brinelled cap, rough",
        },
      ],
    });
    // Without findings the step is not recorded at all (nothing is guessed).
    expect(checkMeasurements(ins, { rearEndPasses: "yes", rearJointPasses: "no" }, "mm").outcome).toBe(
      "invalid",
    );
    // Nothing reused: one confirmation that every part is new.
    const allNew = deriveSteps({ report, fulfilment: "ship", floor, repair: intake({}) })[1]!;
    expect(allNew.fields.map((f) => f.key)).toEqual(["allNewParts"]);
  });
});

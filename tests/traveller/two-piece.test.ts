import { describe, expect, test } from "vitest";
import { parseStepCode } from "@/lib/traveller/codes";
import { renderTraveller } from "@/lib/traveller/pdf";
import { defaultFloorSettings, resolveFloorSettings } from "@/lib/traveller/settings";
import { deriveSteps, type FieldSpec, type StepSpec } from "@/lib/traveller/steps";
import { scanPdf } from "../setup/scan-pdf";
import { exampleReport, exampleView, TWO_PIECE_STEP_CODES } from "./fixtures";

const report = exampleReport("two-piece-van.json");
const steps = deriveSteps({ report, fulfilment: "ship", floor: defaultFloorSettings });
const field = (s: StepSpec | undefined, key: string) =>
  s?.fields.find((f): f is Extract<FieldSpec, { type: "number" }> => f.key === key && f.type === "number")
    ?.limit;
const step = (code: string) => steps.find((s) => s.code === code);

describe("a two-piece shaft's routing", () => {
  test("each piece has its own cut, weld/phase, runout and balance steps, then assembly, inspection, dispatch", () => {
    expect(steps.map((s) => s.code)).toEqual(TWO_PIECE_STEP_CODES);
    expect(steps.map((s) => s.position)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11]);
    expect(steps.filter((s) => s.piece === "A").map((s) => s.kind)).toEqual([
      "cut",
      "weld-phase",
      "runout",
      "balance",
    ]);
    expect(step("ASM")).toMatchObject({ kind: "assembly" });
    expect(step("ASM")!.piece).toBeUndefined();
  });

  test("each piece's record sheet uses that piece's limits", () => {
    const [a, b] = report.pieces!;
    const cutTol = defaultFloorSettings.limits.cutLengthToleranceMm.value; // 0.8 mm, common shop practice
    expect(field(step("CUA"), "cutLengthMm")).toMatchObject({
      nominal: a!.cutLengthMm,
      max: a!.cutLengthMm! + cutTol,
    });
    expect(field(step("CUB"), "cutLengthMm")).toMatchObject({ nominal: b!.cutLengthMm });
    expect(a!.cutLengthMm).not.toBeCloseTo(b!.cutLengthMm!, 0);
    // As-welded length: the piece's own span joint centre to joint centre, ±1.6 mm (reference §9).
    expect(field(step("WLA"), "weldedLengthMm")).toMatchObject({ nominal: a!.spanMm, max: a!.spanMm + 1.6 });
    // Runout mid-span station at half the piece's own cut length.
    const mid = step("RUB")!.fields.find((f) => f.key === "runoutMidMm") as { stationMm?: number };
    expect(mid.stationMm).toBeCloseTo(b!.cutLengthMm! / 2, 6);
    // Per-plane residual from each piece's own mass: U = 9549 · G · m / n / 2 (ISO 21940-11).
    const n = report.service.maxShaftRpm;
    expect(field(step("BAA"), "residualFrontGmm")?.max).toBeCloseTo(
      (9549 * 16 * a!.balance.rotorMassKg) / n / 2,
      0,
    );
    expect(field(step("BAB"), "residualRearGmm")?.max).toBeCloseTo(
      (9549 * 16 * b!.balance.rotorMassKg) / n / 2,
      0,
    );
    expect(a!.balance.rotorMassKg).toBeGreaterThan(b!.balance.rotorMassKg);
    // Piece A ends in the centre bearing's stub: no rear joint at its weld step.
    expect(step("WLA")!.fields.map((f) => f.key)).not.toContain("rearJointLot");
    expect(step("WLB")!.fields.map((f) => f.key)).not.toContain("frontJointLot");
  });

  test("assembly and final inspection phase the three joints and measure the assembled length", () => {
    const asm = step("ASM")!;
    expect(asm.fields.map((f) => f.key)).toEqual([
      "centreBearingLot",
      "centreJointLot",
      "phaseIndexADeg",
      "phaseIndexBDeg",
      "overallLengthMm",
      "centreBearingSecured",
    ]);
    const straight = report.pieces!.reduce((s, p) => s + p.spanMm, 0);
    expect(field(asm, "overallLengthMm")).toMatchObject({ nominal: straight, min: straight - 1.6 });
    expect(field(asm, "phaseIndexBDeg")).toMatchObject({
      nominal: report.pieces![1]!.phaseIndexDeg,
      angular: true,
    });
    expect(step("FIN")!.fields.map((f) => f.key)).toEqual([
      "overallLengthMm",
      "jointsFree",
      "phaseIndexADeg",
      "phaseIndexBDeg",
      "paintMarking",
    ]);
  });

  test("piece codes stay unique when the routing already uses one; a one-piece shaft skips an assembly step", () => {
    const floor = resolveFloorSettings({
      routing: [
        { code: "CUA", kind: "sign-off", name: "Check the order" },
        { code: "CUT", kind: "cut", name: "Cut tube" },
        { code: "ASY", kind: "assembly", name: "Assemble" },
        { code: "FIN", kind: "final-inspection", name: "Final inspection" },
        { code: "SHP", kind: "dispatch", name: "Ship" },
      ],
    });
    const codes = deriveSteps({ report, fulfilment: "ship", floor }).map((s) => s.code);
    expect(codes).toEqual(["CUA", "CTA", "CUB", "ASY", "FIN", "SHP"]);
    const one = deriveSteps({ report: exampleReport(), fulfilment: "ship", floor }).map((s) => s.code);
    expect(one).toEqual(["CUA", "CUT", "FIN", "SHP"]);
  });
});

describe("a two-piece shaft's traveller PDF", () => {
  test(
    "a cover with the assembly steps, then one page per piece, every code scannable",
    { timeout: 90_000 },
    async () => {
      const view = exampleView({ file: "two-piece-van.json" });
      const pages = scanPdf(await renderTraveller(view));
      expect(pages).toHaveLength(3);
      const codesOn = (page: string[] | undefined) =>
        (page ?? [])
          .filter((s) => s.startsWith("CODE-128:"))
          .map((s) => parseStepCode(s.slice(9)))
          .map((p) => (p.ok ? p.step : "?"));
      expect(codesOn(pages[0]).sort()).toEqual(["ASM", "FIN", "SHP"]);
      expect(codesOn(pages[1]).sort()).toEqual(["BAA", "CUA", "RUA", "WLA"]);
      expect(codesOn(pages[2]).sort()).toEqual(["BAB", "CUB", "RUB", "WLB"]);
      for (const page of pages) expect(page).toContain(`QR-Code:${view.serial}`);
      const all = pages
        .flat()
        .filter((s) => s.startsWith("CODE-128:"))
        .map((s) => s.slice(9))
        .sort();
      expect(all).toEqual(view.steps.map((s) => s.barcodeText).sort());
    },
  );
});

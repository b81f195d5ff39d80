import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, test } from "vitest";
import { emptyIntake, type RepairIntake } from "@/lib/retube/intake";
import { parseStepCode } from "@/lib/traveller/codes";
import { renderTraveller } from "@/lib/traveller/pdf";
import { deriveSteps } from "@/lib/traveller/steps";
import { buildTravellerView } from "@/lib/traveller/view";
import { scanPdf } from "../setup/scan-pdf";
import { exampleView } from "../traveller/fixtures";

const work = process.env.KEEP_RETUBE_PDF ?? mkdtempSync(path.join(tmpdir(), "retube-pdf-"));
afterAll(() => {
  if (!process.env.KEEP_RETUBE_PDF) rmSync(work, { recursive: true, force: true });
});

/** The README street truck as a re-tube: weld-to-weld 1188.8 mm, the rear yoke and both joints reused. */
function retubeView() {
  const base = exampleView();
  const parts = emptyIntake().parts;
  parts.rearEnd = { reuse: true, note: "ears straight" };
  parts.frontJoint = { reuse: true, note: "smooth" };
  parts.rearJoint = { reuse: true, note: "smooth" };
  const repair: RepairIntake = { weldToWeldMm: 1188.8, parts };
  return buildTravellerView({
    ...base,
    retube: {
      weldToWeldMm: 1188.8,
      reused: ["Rear end fitting / yoke (ears straight)", "Front joint (smooth)"],
    },
    steps: deriveSteps({ report: base.report, fulfilment: "ship", floor: base.floor, repair }),
  });
}

describe("re-tube traveller PDF", () => {
  test(
    "prints RE-TUBE, the cut length from weld-to-weld, and every step's Code 128 decodes",
    { timeout: 60_000 },
    async () => {
      const view = retubeView();
      const pdf = await renderTraveller(view);
      const file = path.join(work, "retube.pdf");
      writeFileSync(file, pdf);
      const text = execFileSync("pdftotext", ["-raw", file, "-"], { encoding: "utf8" });
      expect(text).toMatch(/TRAVELLER · RE-TUBE/);
      expect(text).toMatch(/CUT LENGTH \(RE-TUBE: THE CUSTOMER'S WELD-TO-WELD\)\s+46\.803 in/);
      const codes = scanPdf(pdf)
        .flat()
        .filter((l) => l.startsWith("CODE-128:"))
        .map((l) => l.slice(9));
      expect(codes.sort()).toEqual(view.steps.map((s) => s.barcodeText).sort());
      expect(codes.map((c) => (parseStepCode(c) as { step: string }).step).sort()).toEqual(
        ["TDN", "INS", "CUT", "WLD", "RUN", "BAL", "FIN", "SHP"].sort(),
      );
    },
  );
});

import { readFileSync } from "node:fs";
import { evaluateDesign, parseDesign, type EvaluationReport } from "@/lib/driveline";
import { formatSerial } from "@/lib/traveller/codes";
import { resolveFloorSettings, type FloorSettingsDocument } from "@/lib/traveller/settings";
import { deriveSteps } from "@/lib/traveller/steps";
import { buildTravellerView, type TravellerView } from "@/lib/traveller/view";

export function exampleReport(file = "street-truck.json"): EvaluationReport {
  const parsed = parseDesign(JSON.parse(readFileSync(`examples/${file}`, "utf8")));
  if (!parsed.ok) throw new Error("bad example");
  return evaluateDesign(parsed.design);
}

/** A traveller for the README's street truck (demo data: shop, customer, dates). */
export function exampleView(
  options: { floor?: FloorSettingsDocument; revision?: number; voidedBy?: number; file?: string } = {},
): TravellerView {
  const report = exampleReport(options.file);
  const floor = resolveFloorSettings({ shopCode: "TGW", ...options.floor });
  return buildTravellerView({
    shop: { name: "Tallgrass Driveline Works", phone: "555-0100" },
    serial: formatSerial({ shopCode: "TGW", year: 2026, sequence: 42 }),
    revision: options.revision ?? 1,
    voidedBy: options.voidedBy ?? null,
    order: { number: "Y26-0042", customerName: "Bea Buyer", promisedDate: "2026-12-24", fulfilment: "ship" },
    shaft: {
      name: report.designName ?? "Shaft",
      position: 1,
      count: 1,
      application: { description: "Half-ton pickup, daily driver", use: "street" },
    },
    floor,
    report,
    steps: deriveSteps({ report, fulfilment: "ship", floor }),
  });
}

/** A two-piece shaft's routing, in order: each piece's cut, weld/phase, runout and balance, then assembly, inspection, dispatch. */
export const TWO_PIECE_STEP_CODES = [
  "CUA",
  "CUB",
  "WLA",
  "WLB",
  "RUA",
  "RUB",
  "BAA",
  "BAB",
  "ASM",
  "FIN",
  "SHP",
];

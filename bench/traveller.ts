/** Traveller PDF time per shaft, beside a floor measured in the same run (same fonts, nothing drawn). */
import { readFileSync } from "node:fs";
import fontkit from "@pdf-lib/fontkit";
import { PDFDocument } from "pdf-lib";
import { evaluateDesign, parseDesign } from "../lib/driveline";
import { formatSerial } from "../lib/traveller/codes";
import { renderTravellers } from "../lib/traveller/pdf";
import { resolveFloorSettings } from "../lib/traveller/settings";
import { deriveSteps } from "../lib/traveller/steps";
import { buildTravellerView, type TravellerView } from "../lib/traveller/view";
import { addRow } from "./table";

const TARGET_MS = 200;

function view(sequence: number): TravellerView {
  const parsed = parseDesign(
    JSON.parse(readFileSync(new URL("../examples/street-truck.json", import.meta.url), "utf8")),
  );
  if (!parsed.ok) throw new Error("bad example");
  const report = evaluateDesign(parsed.design);
  const floor = resolveFloorSettings({ shopCode: "TGW" });
  return buildTravellerView({
    shop: { name: "Tallgrass Driveline Works", phone: null },
    serial: formatSerial({ shopCode: "TGW", year: 2026, sequence }),
    revision: 1,
    order: {
      number: "Y26-0042",
      customerName: "Demo Customer",
      promisedDate: "2026-12-24",
      fulfilment: "ship",
    },
    shaft: {
      name: "Street truck",
      position: 1,
      count: 1,
      application: { description: "Demo", use: "street" },
    },
    floor,
    report,
    steps: deriveSteps({ report, fulfilment: "ship", floor }),
  });
}

async function medianMs(fn: () => Promise<unknown>, rounds: number): Promise<number> {
  await fn(); // warm-up (font parsing, JIT)
  const times: number[] = [];
  for (let i = 0; i < rounds; i++) {
    const t0 = performance.now();
    await fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)]!;
}

export async function benchTraveller(): Promise<void> {
  const fonts = ["inter-latin-400-normal.ttf", "inter-latin-700-normal.ttf", "JetBrainsMono-Bold.ttf"].map(
    (f) => readFileSync(new URL(`../lib/traveller/fonts/${f}`, import.meta.url)),
  );
  const floorMs = await medianMs(async () => {
    const doc = await PDFDocument.create();
    doc.registerFontkit(fontkit);
    for (const f of fonts) await doc.embedFont(f, { subset: true });
    doc.addPage();
    return doc.save();
  }, 15);
  const one = [view(1)];
  const four = [1, 2, 3, 4].map(view);
  const oneMs = await medianMs(() => renderTravellers(one), 15);
  const fourMs = (await medianMs(() => renderTravellers(four), 7)) / 4;
  console.log("\ntraveller PDF (one core)");
  const floor = `blank page, same fonts: ${floorMs.toFixed(1)} ms`;
  addRow({
    what: "traveller PDF, one shaft",
    figure: `${oneMs.toFixed(1)} ms/shaft`,
    floor,
    target: `< ${TARGET_MS} ms`,
    met: oneMs < TARGET_MS,
  });
  addRow({
    what: "traveller PDF, four shafts in one PDF",
    figure: `${fourMs.toFixed(1)} ms/shaft`,
    floor,
    target: `< ${TARGET_MS} ms`,
    met: fourMs < TARGET_MS,
  });
}

/**
 * The invented shafts the demo data and the data generator order (demo data): a few designs
 * varied in length from the example files, each evaluated and priced once with the shop's real
 * engine and price book, and each routing step's record sheet derived for pickup and shipping.
 */
import streetTruck from "@/examples/street-truck.json";
import compoundOffset from "@/examples/compound-offset.json";
import { quoteDesigns } from "@/lib/orders/place-order";
import type { ShopEngineering } from "@/lib/shop/config";
import type { QuoteLine } from "@/lib/pricing/price-book";
import { deriveSteps, type StepSpec } from "@/lib/traveller/steps";
import type { Fulfilment } from "@/lib/orders/states";

export interface DemoDesign {
  key: number;
  name: string;
  application: { description: string; use: string };
  design: Record<string, unknown>;
  evaluation: Record<string, unknown>;
  overall: string;
  lines: QuoteLine[];
  priceCents: number;
  steps: { pickup: StepSpec[]; ship: StepSpec[] };
}

/** Invented uses (demo data). */
const VARIANTS = [
  {
    base: streetTruck,
    factor: 1,
    name: "Rear shaft, 1979 pickup",
    use: "street",
    what: "Half-ton pickup, V8, 3-speed automatic",
  },
  {
    base: streetTruck,
    factor: 0.92,
    name: "Rear shaft, short-bed pickup",
    use: "street",
    what: "Short-bed pickup, V8 swap",
  },
  {
    base: streetTruck,
    factor: 1.06,
    name: "Rear shaft, tow rig",
    use: "towing",
    what: "Three-quarter-ton tow rig, stock engine",
  },
  {
    base: streetTruck,
    factor: 0.85,
    name: "Rear shaft, muscle coupe",
    use: "street",
    what: "Coupe, manual 4-speed",
  },
  {
    base: compoundOffset,
    factor: 1,
    name: "Rear shaft, lifted 4x4",
    use: "off-road",
    what: "Lifted 4x4, offset pinion",
  },
  {
    base: compoundOffset,
    factor: 0.9,
    name: "Front shaft, lifted 4x4",
    use: "off-road",
    what: "Lifted 4x4, front axle",
  },
  {
    base: compoundOffset,
    factor: 1.08,
    name: "Feed-mixer drive",
    use: "industrial",
    what: "Feed mixer, offset gearbox",
  },
  {
    base: compoundOffset,
    factor: 0.95,
    name: "Rock crawler rear",
    use: "off-road",
    what: "Trail buggy, slip in the shaft",
  },
] as const;

function scaled(base: Record<string, unknown>, factor: number): Record<string, unknown> {
  const d = JSON.parse(JSON.stringify(base)) as Record<string, unknown> & {
    lengthMm: number;
    slip?: { collapsedLengthMm: number };
  };
  d.lengthMm = Math.round(d.lengthMm * factor * 10) / 10;
  if (d.slip) d.slip.collapsedLengthMm = Math.round(d.slip.collapsedLengthMm * factor * 10) / 10;
  return d;
}

/** The demo designs that the shop's engine passes (warnings allowed, failures left out). */
export function demoDesigns(shop: ShopEngineering): DemoDesign[] {
  const out: DemoDesign[] = [];
  for (const v of VARIANTS) {
    const design = scaled(v.base as unknown as Record<string, unknown>, v.factor);
    let quoted;
    try {
      quoted = quoteDesigns([{ name: v.name, design }], shop, "pickup").shafts[0]!;
    } catch {
      continue; // a variant the shop's current catalogue cannot price is left out
    }
    if (quoted.report.overall === "fail") continue;
    const evaluation = JSON.parse(JSON.stringify(quoted.report)) as Record<string, unknown>;
    const steps = (fulfilment: Fulfilment) =>
      deriveSteps({ report: quoted.report, fulfilment, floor: shop.floor });
    out.push({
      key: out.length,
      name: v.name,
      application: { description: v.what, use: v.use },
      design,
      evaluation,
      overall: quoted.report.overall,
      lines: quoted.lines,
      priceCents: quoted.priceCents,
      steps: { pickup: steps("pickup"), ship: steps("ship") },
    });
  }
  if (!out.length) throw new Error("No demo design passes the shop's checks; the demo data needs one.");
  return out;
}

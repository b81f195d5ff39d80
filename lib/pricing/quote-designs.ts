import type { Design } from "@/entities";
import { evaluateDesign, parseDesign, type EvaluationReport } from "@/lib/driveline";
import { USES, type Use } from "@/lib/driveline/schema";
import { AppError } from "@/lib/http/errors";
import { retubeCutLengthMm, reusedForPrice } from "@/lib/retube/intake";
import type { ShopEngineering } from "@/lib/shop/config";
import { quoteOrder, quoteShaft, type OrderQuote, type QuoteLine } from "./price-book";

// Pure: the design worker (lib/designs/worker.ts) prices with it too, so nothing here reaches the
// database or the framework (types excepted).

/** What a quote is made from: a saved design, or a design file sent as is. */
export type QuoteSource = Pick<Design, "name" | "design"> &
  Partial<Pick<Design, "id" | "application" | "repair">>;

export interface QuotedShaft<S extends QuoteSource = QuoteSource> {
  design: S;
  report: EvaluationReport;
  lines: QuoteLine[];
  priceCents: number;
}

/**
 * Re-evaluates and prices saved designs with the shop's current catalogue, limits and price
 * book. The browser's own evaluation is never trusted for money or safety.
 */
export function quoteDesigns<S extends QuoteSource>(
  designs: S[],
  shop: Pick<ShopEngineering, "catalogue" | "settings" | "priceBook">,
  fulfilment: "pickup" | "ship",
): { shafts: QuotedShaft<S>[]; quote: OrderQuote } {
  const shafts = designs.map((design) => {
    const parsed = parseDesign(design.design, { catalogue: shop.catalogue });
    if (!parsed.ok) {
      throw new AppError(
        "invalid",
        `"${design.name}" has fields to fix: ${parsed.issues.map((i) => `${i.path}: ${i.message}`).join("; ")}`,
      );
    }
    // A draft saved before the design file carried `use` still has it on its application.
    const applicationUse = design.application?.use;
    const report = evaluateDesign(parsed.design, {
      catalogue: shop.catalogue,
      settings: shop.settings,
      tubePreference: shop.priceBook.tubePreference,
      ...((USES as readonly string[]).includes(applicationUse ?? "") ? { use: applicationUse as Use } : {}),
    });
    const tubePrice = shop.catalogue.tubes.find((t) => t.id === report.tube.tubeId)?.pricePerMetreCents;
    if (tubePrice === undefined) {
      throw new AppError(
        "invalid",
        `"${design.name}" uses a tube the shop does not stock; the counter will price it by phone.`,
      );
    }
    // A re-tube (the counter's intake on the draft) does not charge the parts reused and adds teardown.
    // Its new tube is cut to the customer's weld-to-weld, so that is the length charged.
    const reused = design.repair ? reusedForPrice(design.repair) : null;
    const priced = design.repair
      ? { ...report, tube: { ...report.tube, tubeLengthMm: retubeCutLengthMm(design.repair) } }
      : report;
    const lines = quoteShaft(priced, shop.priceBook, tubePrice, shop.catalogue.jointSeries, reused);
    return { design, report, lines, priceCents: lines.reduce((s, l) => s + l.totalCents, 0) };
  });
  return {
    shafts,
    quote: quoteOrder(
      shafts.map((s) => s.lines),
      fulfilment,
      shop.priceBook,
    ),
  };
}

import { z } from "zod";
import { evaluateDesign, parseDesign } from "@/lib/driveline";
import { errorAnswer } from "@/lib/http/error-body";
import { parseJsonText } from "@/lib/http/body";
import { AppError, fieldsFromIssues } from "@/lib/http/errors";
import { quoteDesigns } from "@/lib/pricing/quote-designs";
import type { ShopEngineering } from "@/lib/shop/config";
import { evaluateDesignBodySchema } from "./schemas";

/** What the design routes need of the shop: its catalogue, limits and price book. */
export type DesignShop = Pick<ShopEngineering, "catalogue" | "settings" | "priceBook">;

export type DesignRoute = "evaluate" | "quote";

/** A route's whole answer: its status and its JSON text. */
export interface DesignAnswer {
  status: number;
  json: string;
}

const quoteDesignBodySchema = z.object({
  design: z.record(z.string(), z.unknown(), { error: "design: send the design file as an object." }),
  fulfilment: z.enum(["pickup", "ship"]).default("pickup"),
});

/** POST /api/designs/evaluate: a design file, or { design, curves }, in; the evaluation report out. */
function evaluateAnswer(text: string, shop: DesignShop): unknown {
  const body = parseJsonText(text);
  const { design: input, curves } = evaluateDesignBodySchema.parse(
    body && typeof body === "object" && "design" in body ? body : { design: body },
  );
  const parsed = parseDesign(input, { catalogue: shop.catalogue });
  if (!parsed.ok) {
    throw new AppError(
      "invalid",
      parsed.issues.map((i) => `${i.path}: ${i.message}`).join("\n"),
      Object.fromEntries(parsed.issues.map((i) => [i.path, i.message])),
    );
  }
  return evaluateDesign(parsed.design, {
    catalogue: shop.catalogue,
    settings: shop.settings,
    tubePreference: shop.priceBook.tubePreference,
    curves,
  });
}

/** POST /api/designs/quote: { design, fulfilment } in; the price, the overall verdict and whether it can be ordered out. */
function quoteAnswer(text: string, shop: DesignShop): unknown {
  const { design, fulfilment } = quoteDesignBodySchema.parse(parseJsonText(text));
  // Checked here first so each bad field is named (design.lengthMm: must be at most …).
  const parsed = parseDesign(design, { catalogue: shop.catalogue });
  if (!parsed.ok) {
    throw new AppError(
      "invalid",
      parsed.issues.map((i) => i.message).join("\n"),
      fieldsFromIssues(parsed.issues.map((i) => ({ path: `design.${i.path}`, message: i.message }))),
    );
  }
  const { shafts, quote } = quoteDesigns(
    [{ name: String(design.name ?? "Shaft"), design }],
    shop,
    fulfilment,
  );
  const shaft = shafts[0]!;
  return { ...quote, overall: shaft.report.overall, orderable: shaft.report.overall !== "fail" };
}

/**
 * Answers a design route's body text, bad input included (4xx naming the field), exactly as the
 * route would. Pure: it runs in the design worker (lib/designs/worker.ts). Anything unexpected is
 * thrown for the caller to log and answer as a 500.
 */
export function answerDesignRoute(route: DesignRoute, text: string, shop: DesignShop): DesignAnswer {
  try {
    const body = route === "evaluate" ? evaluateAnswer(text, shop) : quoteAnswer(text, shop);
    return { status: 200, json: JSON.stringify(body) };
  } catch (error) {
    const answer = errorAnswer(error);
    if (!answer) throw error;
    return { status: answer.status, json: JSON.stringify(answer.body) };
  }
}

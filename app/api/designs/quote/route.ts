import { z } from "zod";
import { parseDesign } from "@/lib/driveline";
import { AppError, fieldsFromIssues } from "@/lib/http/errors";
import { json, parseJson, route } from "@/lib/http/route";
import { quoteDesigns } from "@/lib/orders/place-order";
import { getShopEngineering } from "@/lib/shop/config";

const quoteDesignBodySchema = z.object({
  design: z.record(z.string(), z.unknown(), { error: "design: send the design file as an object." }),
  fulfilment: z.enum(["pickup", "ship"]).default("pickup"),
});

// POST /api/designs/quote — price one design file with the shop's catalogue and price book
export const POST = route("public", async ({ req }) => {
  const { design, fulfilment } = await parseJson(req, quoteDesignBodySchema);
  const shop = await getShopEngineering();
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
  return json({ ...quote, overall: shaft.report.overall, orderable: shaft.report.overall !== "fail" });
});

import { z } from "zod";
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
  const { shafts, quote } = quoteDesigns(
    [{ name: String(design.name ?? "Shaft"), design }],
    shop,
    fulfilment,
  );
  const shaft = shafts[0]!;
  return json({ ...quote, overall: shaft.report.overall, orderable: shaft.report.overall !== "fail" });
});

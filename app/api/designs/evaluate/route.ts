import { parseDesign, evaluateDesign } from "@/lib/driveline";
import { readJson } from "@/lib/http/body";
import { json, route } from "@/lib/http/route";
import { AppError } from "@/lib/http/errors";
import { getShopEngineering } from "@/lib/shop/config";
import { evaluateDesignBodySchema } from "@/lib/designs/schemas";

// POST /api/designs/evaluate — evaluate a design file with the shop's catalogue and limits
export const POST = route("public", async ({ req }) => {
  const body = await readJson(req);
  const { design: input, curves } = evaluateDesignBodySchema.parse(
    body && typeof body === "object" && "design" in body ? body : { design: body },
  );
  const shop = await getShopEngineering();
  const parsed = parseDesign(input, { catalogue: shop.catalogue });
  if (!parsed.ok) {
    throw new AppError(
      "invalid",
      parsed.issues.map((i) => `${i.path}: ${i.message}`).join("\n"),
      Object.fromEntries(parsed.issues.map((i) => [i.path, i.message])),
    );
  }
  const report = evaluateDesign(parsed.design, {
    catalogue: shop.catalogue,
    settings: shop.settings,
    tubePreference: shop.priceBook.tubePreference,
    curves,
  });
  return json(report);
});

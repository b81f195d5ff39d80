import { defaultCatalogue, resolveSettings } from "@/lib/driveline";
import type { generateShop } from "@/lib/demo/generate";
import { defaultPriceBook } from "@/lib/pricing/price-book";
import { defaultFloorSettings } from "@/lib/traveller/settings";

/** What generated shop history is engineered and priced with: the shipped defaults, version 1, no staff. */
export const defaultGeneration = {
  staff: { ownerId: null, counterId: null, floorId: null },
  shop: {
    catalogue: defaultCatalogue,
    settings: resolveSettings({}),
    settingOverrides: {},
    version: 1,
    priceBook: defaultPriceBook,
    floor: defaultFloorSettings,
  },
} satisfies Pick<Parameters<typeof generateShop>[1], "staff" | "shop">;

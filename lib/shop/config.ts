import "server-only";
import { ShopConfig } from "@/entities";
import { getEm } from "@/lib/db/orm";
import {
  defaultCatalogue,
  resolveSettings,
  type Catalogue,
  type Limit,
  type ShopSettings,
} from "@/lib/driveline";
import { defaultPriceBook, priceBookSchema, type PriceBook } from "@/lib/pricing/price-book";
import { resolveFloorSettings, type FloorSettings } from "@/lib/traveller/settings";

export interface ShopEngineering {
  catalogue: Catalogue;
  settings: ShopSettings;
  /** The raw overrides, as stored (for screens that show what the shop changed). */
  settingOverrides: Record<string, number | Limit>;
  priceBook: PriceBook;
  /** The shop floor's routing, tolerances, paper size and units. */
  floor: FloorSettings;
  /** Which saved version this is (1: the starting configuration); orders record it when placed. */
  version: number;
}

const CACHE_MS = 5_000;
let cached: { at: number; value: Promise<ShopEngineering> } | null = null;

/**
 * The shop's catalogue, engineering limits and price book, falling back to the built-in
 * defaults. Cached for a few seconds: it is read on every evaluation and changes rarely. One read
 * at a time: requests arriving while it is being read wait for that read (not one read each);
 * a failed read is not kept.
 */
export async function getShopEngineering(): Promise<ShopEngineering> {
  if (cached && Date.now() - cached.at < CACHE_MS) return cached.value;
  const entry = { at: Date.now(), value: readShopEngineering() };
  cached = entry;
  entry.value.catch(() => {
    if (cached === entry) cached = null;
  });
  return entry.value;
}

async function readShopEngineering(): Promise<ShopEngineering> {
  const em = await getEm();
  const row = await em.findOne(ShopConfig, { id: 1 });
  return {
    catalogue: row?.catalogue ?? defaultCatalogue,
    settings: resolveSettings(row?.settings ?? {}),
    settingOverrides: (row?.settings ?? {}) as Record<string, number | Limit>,
    priceBook: row ? priceBookSchema.parse(row.priceBook) : defaultPriceBook,
    floor: resolveFloorSettings(row?.floor),
    version: row?.version ?? 1,
  };
}

/** Forget the cached configuration (after an owner edits it, and in tests). */
export function invalidateShopEngineering(): void {
  cached = null;
}

/**
 * Between what is stored (the catalogue, limit overrides, the price book, the floor document) and
 * what the owner edits (every limit resolved with its value and source). Pure.
 */
import {
  defaultSettings,
  resolveSettings,
  type Catalogue,
  type Limit,
  type SettingKey,
} from "@/lib/driveline";
import { priceBookSchema, type PriceBook } from "@/lib/pricing/price-book";
import {
  defaultFloorLimits,
  resolveFloorSettings,
  type FloorLimitKey,
  type FloorSettingsDocument,
} from "@/lib/traveller/settings";
import type { ShopConfigDocument } from "./schemas";

/** The documents as the shop_config row (and each version) keeps them. */
export interface StoredShopConfig {
  catalogue: Catalogue;
  /** Only the limits the shop changed (value or source); the rest follow the reference defaults. */
  settings: Partial<Record<SettingKey, number | Limit>>;
  priceBook: PriceBook;
  floor: FloorSettingsDocument;
}

const limitCopy = (l: Limit): Limit => ({ value: l.value, source: l.source });

/** Everything resolved, as plain JSON (what the editor shows and a save is compared with). */
export function toEditable(stored: StoredShopConfig): ShopConfigDocument {
  const settings = resolveSettings(stored.settings);
  const floor = resolveFloorSettings(stored.floor);
  return JSON.parse(
    JSON.stringify({
      catalogue: stored.catalogue,
      settings: Object.fromEntries(Object.entries(settings).map(([k, l]) => [k, limitCopy(l)])),
      priceBook: priceBookSchema.parse(stored.priceBook),
      floor: {
        ...floor,
        limits: Object.fromEntries(Object.entries(floor.limits).map(([k, l]) => [k, limitCopy(l)])),
      },
    }),
  ) as ShopConfigDocument;
}

/** Only what differs from a default (value or source) is kept as an override. */
function overrides<K extends string>(
  all: Record<K, Limit>,
  defaults: Record<K, Limit>,
): Partial<Record<K, Limit>> {
  const out: Partial<Record<K, Limit>> = {};
  for (const key of Object.keys(all) as K[]) {
    const l = all[key];
    const d = defaults[key];
    if (!d || l.value !== d.value || l.source.trim() !== d.source)
      out[key] = { value: l.value, source: l.source.trim() };
  }
  return out;
}

/** What is stored for an edited configuration. */
export function toStored(doc: ShopConfigDocument): StoredShopConfig {
  return {
    catalogue: doc.catalogue,
    settings: overrides<SettingKey>(doc.settings, defaultSettings),
    priceBook: doc.priceBook,
    floor: {
      shopCode: doc.floor.shopCode,
      paperSize: doc.floor.paperSize,
      units: doc.floor.units,
      routing: doc.floor.routing,
      limits: overrides<FloorLimitKey>(doc.floor.limits, defaultFloorLimits),
      phasingToleranceDeg: doc.floor.phasingToleranceDeg,
    },
  };
}

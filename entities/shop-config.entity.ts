import { Entity, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import type { Catalogue, Limit, SettingKey } from "../lib/driveline";
import type { PriceBook } from "../lib/pricing/price-book";
import type { FloorSettingsDocument } from "../lib/traveller/settings";

/**
 * The shop's engineering catalogue, its limits and its price book (one row). Kept as
 * documents: the engineering core validates them with its own schemas when they are read.
 */
@Entity({ tableName: "shop_config" })
export class ShopConfig {
  [OptionalProps]?: "updatedAt" | "settings" | "floor" | "version";

  @PrimaryKey({ type: "integer", autoincrement: false })
  id: number = 1;

  @Property({ type: "json" })
  catalogue!: Catalogue;

  /** Overrides of the engineering limits (missing keys use the reference defaults). */
  @Property({ type: "json" })
  settings: Partial<Record<SettingKey, number | Limit>> = {};

  @Property({ type: "json" })
  priceBook!: PriceBook;

  /** The shop floor's routing, tolerances, paper size and units (lib/traveller/settings.ts fills in missing keys). */
  @Property({ type: "json", defaultRaw: `'{}'` })
  floor: FloorSettingsDocument = {};

  /** The version these documents are (shop_config_version keeps every one; 1 is the starting configuration). */
  @Property({ type: "integer", default: 1 })
  version: number = 1;

  @Property({ type: "Date", defaultRaw: "now()", onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}

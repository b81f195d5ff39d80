import { Entity, ManyToOne, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import type { Catalogue, Limit, SettingKey } from "../lib/driveline";
import type { PriceBook } from "../lib/pricing/price-book";
import type { FloorSettingsDocument } from "../lib/traveller/settings";
import { User } from "./user.entity";

/**
 * One saved version of the shop's configuration (catalogue, limits, price book, floor settings):
 * the full documents, who saved it, when and why. Rows are only ever added; the shop_config row
 * holds the current one. Orders record the version they were priced with (`Order.configVersion`).
 */
@Entity({ tableName: "shop_config_version" })
export class ShopConfigVersion {
  [OptionalProps]?: "createdAt";

  @PrimaryKey({ type: "integer", autoincrement: false })
  version!: number;

  @Property({ type: "json" })
  catalogue!: Catalogue;

  @Property({ type: "json" })
  settings!: Partial<Record<SettingKey, number | Limit>>;

  @Property({ type: "json" })
  priceBook!: PriceBook;

  @Property({ type: "json" })
  floor!: FloorSettingsDocument;

  /** Why it was saved, in the owner's words. */
  @Property({ type: "text" })
  note!: string;

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  createdBy?: User | null;

  /** The name shown in the history (kept if the account goes). */
  @Property({ type: "text" })
  createdByName!: string;

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();
}

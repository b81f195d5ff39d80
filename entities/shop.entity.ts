import { Entity, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";

/** The shop that runs this Yokeline: its name and contact details for screens, e-mails and travellers. */
@Entity({ tableName: "shop" })
export class Shop {
  [OptionalProps]?: "updatedAt" | "currency";

  @PrimaryKey({ type: "integer", autoincrement: false })
  id: number = 1;

  @Property({ type: "text" })
  name!: string;

  @Property({ type: "text" })
  addressLines!: string;

  @Property({ type: "text" })
  phone!: string;

  @Property({ type: "text" })
  email!: string;

  @Property({ type: "text", default: "USD" })
  currency: string = "USD";

  @Property({ type: "Date", defaultRaw: "now()", onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}

import { Check, Entity, Index, ManyToOne, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import type { Order } from "./order.entity";
import type { QuoteLine } from "../lib/pricing/price-book";

/** One shaft of an order, with frozen copies of its design, its evaluation and its price. */
@Entity({ tableName: "order_shaft" })
@Check({ name: "order_shaft_price_nonnegative_check", expression: "price_cents >= 0" })
export class OrderShaft {
  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Index()
  @ManyToOne("Order", { deleteRule: "cascade" })
  order!: Order;

  @Property({ type: "integer" })
  position!: number;

  @Property({ type: "text" })
  name!: string;

  @Property({ type: "json", nullable: true })
  application?: { description: string; use: string } | null;

  @Property({ type: "json" })
  design!: Record<string, unknown>;

  @Property({ type: "json" })
  evaluation!: Record<string, unknown>;

  /** pass / warn / fail of the frozen evaluation. */
  @Property({ type: "text" })
  overall!: string;

  @Property({ type: "json" })
  priceLines!: QuoteLine[];

  @Property({ type: "integer" })
  priceCents!: number;
}

import { Check, Entity, ManyToOne, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import type { Order } from "./order.entity";
import type { QuoteLine } from "../lib/pricing/price-book";

/** An owner's acceptance of one failed engineering check, for this one order shaft only. */
export interface FailedCheckAcceptance {
  checkId: string;
  reason: string;
  byUserId: string;
  byName: string;
  /** ISO date-time. */
  at: string;
}

/** One shaft of an order, with frozen copies of its design, its evaluation and its price. */
@Entity({ tableName: "order_shaft" })
@Check({ name: "order_shaft_price_nonnegative_check", expression: "price_cents >= 0" })
export class OrderShaft {
  [OptionalProps]?: "failedCheckAcceptances";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

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

  /**
   * Failed checks an owner accepted for this shaft (lib/orders/engineering-signoff.ts). The shop's
   * limits are unchanged; the frozen evaluation still says "fail".
   */
  @Property({ type: "json", defaultRaw: `'[]'` })
  failedCheckAcceptances: FailedCheckAcceptance[] = [];
}

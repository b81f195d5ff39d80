import { Entity, Index, ManyToOne, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import type { Order } from "./order.entity";
import { User } from "./user.entity";
import type { OrderEventKind } from "../lib/orders/states";

/** One entry of an order's timeline, as the customer sees it. */
@Entity({ tableName: "order_event" })
export class OrderEvent {
  [OptionalProps]?: "public" | "at";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Index()
  @ManyToOne("Order", { deleteRule: "cascade" })
  order!: Order;

  @Property({ type: "text" })
  kind!: OrderEventKind;

  @Property({ type: "text" })
  label!: string;

  /** Shown to the customer too (internal notes are not). */
  @Property({ type: "boolean", default: true })
  public: boolean = true;

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  actor?: User | null;

  @Property({ type: "Date", defaultRaw: "now()" })
  at: Date = new Date();
}

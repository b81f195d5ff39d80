import { Entity, Enum, Index, ManyToOne, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import type { Order } from "./order.entity";
import { User } from "./user.entity";
// State unions live in lib/orders/states.ts, so screens and client code name them without the ORM.
import { NOTE_VISIBILITIES, type NoteVisibility } from "../lib/orders/states";

/** A note on an order by the shop: staff-only, or shown to the customer on their order page. */
@Entity({ tableName: "order_note" })
export class OrderNote {
  [OptionalProps]?: "createdAt";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Index()
  @ManyToOne("Order", { deleteRule: "cascade" })
  order!: Order;

  @Enum({ items: () => NOTE_VISIBILITIES, nativeEnumName: "note_visibility" })
  visibility!: NoteVisibility;

  @Property({ type: "text" })
  body!: string;

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  author?: User | null;

  /** The author's name when written (kept if the account goes). */
  @Property({ type: "text" })
  authorName!: string;

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();
}

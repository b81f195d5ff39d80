import { Entity, Index, ManyToOne, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import type { Order } from "./order.entity";
import { User } from "./user.entity";

/** A photo or measurement sheet attached to an order; the bytes live in storage, not here. */
@Entity({ tableName: "upload" })
export class Upload {
  [OptionalProps]?: "createdAt";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Index()
  @ManyToOne("Order", { deleteRule: "cascade" })
  order!: Order;

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  uploadedBy?: User | null;

  /** The name it had on the uploader's machine (shown, never used as a path). */
  @Property({ type: "text" })
  filename!: string;

  /** Sniffed from the content, not taken from the browser. */
  @Property({ type: "text" })
  contentType!: string;

  @Property({ type: "integer" })
  sizeBytes!: number;

  @Property({ type: "text", unique: true })
  storageKey!: string;

  @Property({ type: "text" })
  sha256!: string;

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();
}

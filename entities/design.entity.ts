import { Entity, Index, ManyToOne, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import { Customer } from "./customer.entity";
import { User } from "./user.entity";

/** A saved shaft design (a draft until it is ordered; the order keeps its own frozen copy). */
@Entity({ tableName: "design" })
export class Design {
  [OptionalProps]?: "createdAt" | "updatedAt";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Property({ type: "text" })
  name!: string;

  /** The design file (see the engineering contract), SI units. */
  @Property({ type: "json" })
  design!: Record<string, unknown>;

  /** What the shaft goes in and how it is used, for the shop. */
  @Property({ type: "json", nullable: true })
  application?: { description: string; use: string } | null;

  @Index()
  @ManyToOne(() => Customer, { nullable: true, deleteRule: "set null" })
  customer?: Customer | null;

  @ManyToOne(() => User, { deleteRule: "cascade" })
  createdBy!: User;

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();

  @Property({ type: "Date", defaultRaw: "now()", onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}

import { Entity, Index, ManyToOne, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import { Customer } from "./customer.entity";
import { User } from "./user.entity";
import type { RepairBlock } from "../lib/retube/intake";

/** A saved shaft design (a draft until it is ordered; the order keeps its own frozen copy). */
@Entity({ tableName: "design" })
export class Design {
  [OptionalProps]?: "createdAt" | "updatedAt" | "repair";

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

  /**
   * The counter's re-tube intake for this draft (null: a new shaft). Quoted and copied to the order
   * shaft when ordered (lib/retube/intake-service.ts, Migration20261205110000).
   */
  @Property({ type: "json", nullable: true })
  repair?: RepairBlock | null = null;

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

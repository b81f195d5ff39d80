import {
  Collection,
  Entity,
  Enum,
  Index,
  ManyToOne,
  OneToMany,
  OneToOne,
  OptionalProps,
  PrimaryKey,
  Property,
  Unique,
} from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import type { Order } from "./order.entity";
import type { OrderShaft } from "./order-shaft.entity";
import { User } from "./user.entity";
import { WorkOrderStep } from "./work-order-step.entity";
// State unions live in lib/floor/states.ts, so screens and client code name them without the ORM.
import { WORK_ORDER_STATES, type WorkOrderState } from "../lib/floor/states";

/** One shaft of a released order on the shop floor: its serial for life, its traveller revision, where it is. */
@Entity({ tableName: "work_order" })
@Unique({ properties: ["serialYear", "serialSequence"] })
// The orders table's "on hold" filter (Migration20261204150300).
@Index({
  name: "work_order_on_hold_order_index",
  expression: `create index "work_order_on_hold_order_index" on "work_order" ("order_id") where state = 'on_hold'`,
})
export class WorkOrder {
  [OptionalProps]?: "revision" | "state" | "currentPosition" | "releaseReason" | "createdAt" | "updatedAt";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Index()
  @ManyToOne("Order", { deleteRule: "restrict" })
  order!: Order;

  @OneToOne("OrderShaft", { owner: true, unique: true, deleteRule: "restrict" })
  orderShaft!: OrderShaft;

  /** e.g. "TGW-26-00042-7" (lib/traveller/codes.ts). */
  @Property({ type: "text", unique: true })
  serial!: string;

  @Property({ type: "integer" })
  serialYear!: number;

  @Property({ type: "integer" })
  serialSequence!: number;

  /** The traveller revision in force; codes of earlier revisions are void. */
  @Property({ type: "integer", default: 1 })
  revision: number = 1;

  @Index()
  @Enum({ items: () => WORK_ORDER_STATES, nativeEnumName: "work_order_state" })
  state: WorkOrderState = "released";

  /** 1-based routing position of the next step; stepCount + 1 once every step is done. */
  @Property({ type: "integer", default: 1 })
  currentPosition: number = 1;

  @Property({ type: "integer" })
  stepCount!: number;

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  releasedBy?: User | null;

  @Property({ type: "text", nullable: true })
  releaseReason?: string | null;

  /** Set when the order was cancelled after release: every code of this traveller is refused. */
  @Property({ type: "Date", nullable: true })
  voidedAt?: Date | null;

  @Property({ type: "text", nullable: true })
  voidReason?: string | null;

  @OneToMany(() => WorkOrderStep, (s) => s.workOrder, { orderBy: { revision: "asc", position: "asc" } })
  steps = new Collection<WorkOrderStep>(this);

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();

  @Property({ type: "Date", defaultRaw: "now()", onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}

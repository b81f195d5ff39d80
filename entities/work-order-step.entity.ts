import { Entity, Enum, ManyToOne, OptionalProps, PrimaryKey, Property, Unique, Index } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import type { StepSpec } from "../lib/traveller/steps";
import { User } from "./user.entity";
import type { WorkOrder } from "./work-order.entity";
// State unions live in lib/floor/states.ts, so screens and client code name them without the ORM.
import { STEP_STATES, type StepCompletion, type StepState } from "../lib/floor/states";

/** One routing step of one traveller revision, with its record sheet and limits frozen. */
@Entity({ tableName: "work_order_step" })
@Unique({ properties: ["workOrder", "revision", "position"] })
// Throughput, time per step and days to ship on the owner's overview (Migration20261204150200).
@Index({
  name: "work_order_step_done_code_index",
  expression: `create index "work_order_step_done_code_index" on "work_order_step" ("code", "completed_at") include ("work_order_id", "revision", "position") where state = 'done'`,
})
export class WorkOrderStep {
  [OptionalProps]?: "state" | "completion" | "completedAt" | "completedBy";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @ManyToOne("WorkOrder", { deleteRule: "cascade" })
  workOrder!: WorkOrder;

  @Property({ type: "integer" })
  revision!: number;

  @Property({ type: "integer" })
  position!: number;

  /** Three letters, as in the step's barcode. */
  @Property({ type: "text" })
  code!: string;

  @Property({ type: "json" })
  spec!: StepSpec;

  @Enum({ items: () => STEP_STATES, nativeEnumName: "work_order_step_state" })
  state: StepState = "pending";

  /** How the step was completed (a pass, a pass after rework, or an owner's concession). */
  @Property({ type: "text", nullable: true })
  completion?: StepCompletion | null;

  @Property({ type: "Date", nullable: true })
  completedAt?: Date | null;

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  completedBy?: User | null;
}

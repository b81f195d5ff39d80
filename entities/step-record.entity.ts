import { Entity, Enum, Index, ManyToOne, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import type { Failure, SiValues } from "../lib/traveller/measure";
import { User } from "./user.entity";
import type { WorkOrder } from "./work-order.entity";
import type { WorkOrderStep } from "./work-order-step.entity";
// State unions live in lib/floor/states.ts, so screens and client code name them without the ORM.
import { STEP_OUTCOMES, type StepOutcome } from "../lib/floor/states";

/** One submission at a station (or an owner's concession): who, when, what was measured, the outcome. Rows are only added. */
@Entity({ tableName: "step_record" })
// The step records table: newest first, and by who signed (Migration20261204150300).
@Index({ properties: ["by", "at"] })
export class StepRecord {
  [OptionalProps]?: "at" | "failures" | "reason" | "completionOf";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Index()
  @ManyToOne("WorkOrder", { deleteRule: "cascade" })
  workOrder!: WorkOrder;

  @Index()
  @ManyToOne("WorkOrderStep", { deleteRule: "cascade" })
  step!: WorkOrderStep;

  @Property({ type: "integer" })
  revision!: number;

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  by?: User | null;

  @Index()
  @Property({ type: "Date", defaultRaw: "now()" })
  at: Date = new Date();

  /** Measured values in SI (lib/traveller/measure.ts). */
  @Property({ type: "json" })
  values!: SiValues;

  @Enum({ items: () => STEP_OUTCOMES, nativeEnumName: "step_outcome" })
  outcome!: StepOutcome;

  @Property({ type: "json", nullable: true })
  failures?: Failure[] | null;

  /** The owner's reason for a concession. */
  @Property({ type: "text", nullable: true })
  reason?: string | null;

  /** The station's key for this submission: the same submission never records twice. */
  @Property({ type: "text", unique: true })
  idempotencyKey!: string;

  /**
   * The step this record completed (null for holds). Unique, so a step is completed once even if
   * two stations submit at the same instant.
   */
  @Property({ type: "uuid", nullable: true, unique: true })
  completionOf?: string | null;
}

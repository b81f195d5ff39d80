import { Entity, Index, ManyToOne, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import { User } from "./user.entity";

/** Who did what to a shop record, and when. Rows are only ever added. */
@Entity({ tableName: "audit_event" })
@Index({ properties: ["subjectType", "subjectId"] })
export class AuditEvent {
  [OptionalProps]?: "at";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Index()
  @Property({ type: "Date", defaultRaw: "now()" })
  at: Date = new Date();

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  actor?: User | null;

  /** e.g. "user.sign-up", "staff.create", "order.refund" */
  @Property({ type: "text" })
  action!: string;

  @Property({ type: "text" })
  subjectType!: string;

  @Property({ type: "text" })
  subjectId!: string;

  @Property({ type: "json", nullable: true })
  details?: Record<string, unknown> | null;
}

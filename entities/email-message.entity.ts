import { Entity, Enum, Index, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
// State unions live in lib/mail/states.ts, so screens and client code name them without the ORM.
import { EMAIL_STATUSES, type EmailStatus } from "../lib/mail/states";

/**
 * Every e-mail the app sends, kept as an outbox: written with the change that causes it,
 * then delivered (and retried) by a background job, so a failed send never loses or blocks an order.
 */
@Entity({ tableName: "email_message" })
export class EmailMessage {
  [OptionalProps]?: "status" | "attempts" | "createdAt";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Property({ type: "text" })
  template!: string;

  @Property({ type: "text" })
  to!: string;

  @Property({ type: "text" })
  subject!: string;

  @Property({ type: "text" })
  html!: string;

  @Property({ type: "text" })
  text!: string;

  @Index()
  @Property({ type: "uuid", nullable: true })
  orderId?: string | null;

  @Index()
  @Enum({ items: () => EMAIL_STATUSES, nativeEnumName: "email_status" })
  status: EmailStatus = "queued";

  @Property({ type: "integer", default: 0 })
  attempts: number = 0;

  @Property({ type: "text", nullable: true })
  lastError?: string | null;

  @Property({ type: "text", nullable: true })
  provider?: string | null;

  @Property({ type: "text", nullable: true })
  providerMessageId?: string | null;

  @Index()
  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();

  @Property({ type: "Date", nullable: true })
  sentAt?: Date | null;
}

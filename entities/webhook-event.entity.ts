import { Entity, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";

/** A payment provider event, stored by its id so each one is applied exactly once. */
@Entity({ tableName: "webhook_event" })
export class WebhookEvent {
  [OptionalProps]?: "receivedAt" | "deliveries";

  @PrimaryKey({ type: "text" })
  id!: string;

  @Property({ type: "text" })
  type!: string;

  @Property({ type: "json" })
  payload!: Record<string, unknown>;

  @Property({ type: "Date", defaultRaw: "now()" })
  receivedAt: Date = new Date();

  @Property({ type: "integer", default: 1 })
  deliveries: number = 1;
}

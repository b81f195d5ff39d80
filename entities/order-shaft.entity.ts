import { Check, Entity, Index, ManyToOne, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import type { Order } from "./order.entity";
import type { QuoteLine } from "../lib/pricing/price-book";
import type { RepairBlock, ShaftJob } from "../lib/retube/intake";

/** Who acknowledged one warning of the frozen evaluation before the order was placed, and how. */
export interface WarningAcknowledgement {
  checkId: string;
  /** The warning's text as it was shown when acknowledged. */
  message: string;
  byUserId: string | null;
  byName: string;
  channel: "online" | "counter";
  /** ISO date-time. */
  at: string;
}

/** An owner's acceptance of one failed engineering check, for this one order shaft only. */
export interface FailedCheckAcceptance {
  checkId: string;
  reason: string;
  byUserId: string;
  byName: string;
  /** ISO date-time. */
  at: string;
}

/** One shaft of an order, with frozen copies of its design, its evaluation and its price. */
@Entity({ tableName: "order_shaft" })
@Check({ name: "order_shaft_price_nonnegative_check", expression: "price_cents >= 0" })
@Check({ name: "order_shaft_job_kind_check", expression: "job = 'new' or job = 'retube'" })
@Check({ name: "order_shaft_repair_check", expression: "(job = 'retube') = (repair is not null)" })
export class OrderShaft {
  [OptionalProps]?: "warningAcknowledgements" | "failedCheckAcceptances" | "job" | "repair";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Index()
  @ManyToOne("Order", { deleteRule: "cascade" })
  order!: Order;

  @Property({ type: "integer" })
  position!: number;

  @Property({ type: "text" })
  name!: string;

  @Property({ type: "json", nullable: true })
  application?: { description: string; use: string } | null;

  @Property({ type: "json" })
  design!: Record<string, unknown>;

  @Property({ type: "json" })
  evaluation!: Record<string, unknown>;

  /** pass / warn / fail of the frozen evaluation. */
  @Property({ type: "text" })
  overall!: string;

  @Property({ type: "json" })
  priceLines!: QuoteLine[];

  @Property({ type: "integer" })
  priceCents!: number;

  /** Each warning of the frozen evaluation, acknowledged by the customer (online) or the counter (Migration20261204150500). */
  @Property({ type: "json", defaultRaw: `'[]'` })
  warningAcknowledgements: WarningAcknowledgement[] = [];

  /**
   * Failed checks an owner accepted for this shaft (lib/orders/engineering-signoff.ts). The shop's
   * limits are unchanged; the frozen evaluation still says "fail".
   */
  @Property({ type: "json", defaultRaw: `'[]'` })
  failedCheckAcceptances: FailedCheckAcceptance[] = [];

  /** A new shaft, or a re-tube of the customer's own shaft (Migration20261205110000, lib/retube/intake.ts). */
  @Property({ type: "text", default: "new" })
  job: ShaftJob = "new";

  /** A re-tube's intake as the counter recorded it (weld-to-weld, parts reused, who and when); null for a new shaft. */
  @Property({ type: "json", nullable: true })
  repair: RepairBlock | null = null;
}

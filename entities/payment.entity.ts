import { Check, Entity, Enum, Index, ManyToOne, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import type { Order } from "./order.entity";
import { User } from "./user.entity";
// State unions live in lib/orders/states.ts, so screens and client code name them without the ORM.
import {
  PAYMENT_KINDS,
  PAYMENT_METHODS,
  PAYMENT_STATUSES,
  type PaymentKind,
  type PaymentMethod,
  type PaymentStatus,
} from "../lib/orders/states";

/**
 * Money on an order (deposit, balance or full): a request through a hosted checkout, or a payment
 * the counter took in person (recorded as succeeded, with its reference; no provider involved).
 */
@Entity({ tableName: "payment" })
@Check({
  name: "payment_checkout_has_session_check",
  expression: "method <> 'checkout' or (checkout_session_id is not null and checkout_url is not null)",
})
@Check({ name: "payment_amount_positive_check", expression: "amount_cents > 0" })
@Check({
  name: "payment_refunded_within_amount_check",
  expression: "refunded_cents >= 0 and refunded_cents <= amount_cents",
})
// Money taken by week on the owner's overview (Migration20261204150200).
@Index({
  name: "payment_succeeded_paid_at_index",
  expression: `create index "payment_succeeded_paid_at_index" on "payment" ("paid_at") include ("kind", "amount_cents") where status = 'succeeded'`,
})
export class Payment {
  [OptionalProps]?: "status" | "refundedCents" | "createdAt" | "method";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Index()
  @ManyToOne("Order", { deleteRule: "restrict" })
  order!: Order;

  @Enum({ items: () => PAYMENT_KINDS, nativeEnumName: "payment_kind" })
  kind!: PaymentKind;

  @Property({ type: "integer" })
  amountCents!: number;

  @Property({ type: "text" })
  currency!: string;

  @Enum({ items: () => PAYMENT_STATUSES, nativeEnumName: "payment_status" })
  status: PaymentStatus = "open";

  @Enum({ items: () => PAYMENT_METHODS, nativeEnumName: "payment_method", default: "checkout" })
  method: PaymentMethod = "checkout";

  /** Counter payments: the cheque number or the terminal's receipt reference (cash: optional). */
  @Property({ type: "text", nullable: true })
  reference?: string | null;

  /** Hosted checkout only (null for a payment taken at the counter). */
  @Property({ type: "text", unique: true, nullable: true })
  checkoutSessionId?: string | null;

  @Property({ type: "text", nullable: true })
  checkoutUrl?: string | null;

  @Property({ type: "text", nullable: true })
  paymentIntentId?: string | null;

  @Property({ type: "integer", default: 0 })
  refundedCents: number = 0;

  @Property({ type: "text", nullable: true })
  failureMessage?: string | null;

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  requestedBy?: User | null;

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();

  @Property({ type: "Date", nullable: true })
  paidAt?: Date | null;
}

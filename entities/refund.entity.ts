import { Check, Entity, ManyToOne, OptionalProps, PrimaryKey, Property, Index } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import { Payment } from "./payment.entity";
import { User } from "./user.entity";

/** Money given back on a payment, by an owner (at the provider, or by hand for a counter payment). */
@Entity({ tableName: "refund" })
@Check({ name: "refund_amount_positive_check", expression: "amount_cents > 0" })
// Refunds by week on the owner's overview (Migration20261204150200).
@Index({
  name: "refund_created_at_index",
  expression: `create index "refund_created_at_index" on "refund" ("created_at") include ("amount_cents")`,
})
export class Refund {
  [OptionalProps]?: "createdAt";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @ManyToOne(() => Payment, { deleteRule: "restrict" })
  payment!: Payment;

  @Property({ type: "integer" })
  amountCents!: number;

  /** The provider's refund id; null when a counter payment was given back by hand (cash, cheque, terminal). */
  @Property({ type: "text", unique: true, nullable: true })
  providerRefundId?: string | null;

  @Property({ type: "text" })
  reason!: string;

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  by?: User | null;

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();
}

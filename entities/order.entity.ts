import {
  Check,
  Collection,
  Entity,
  Enum,
  Index,
  ManyToOne,
  OneToMany,
  OptionalProps,
  PrimaryKey,
  Property,
} from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import { Customer } from "./customer.entity";
import { User } from "./user.entity";
import { OrderShaft } from "./order-shaft.entity";
import { Payment } from "./payment.entity";
import { OrderEvent } from "./order-event.entity";
import { WorkOrder } from "./work-order.entity";
import { OrderNote } from "./order-note.entity";
// State unions live in lib/orders/states.ts, so screens and client code name them without the ORM.
import {
  FULFILMENTS,
  ORDER_CHANNELS,
  ORDER_STATUSES,
  PAYMENT_STATES,
  type Fulfilment,
  type OrderChannel,
  type OrderStatus,
  type PaymentState,
} from "../lib/orders/states";

/** One customer order: one or more shafts, a price, a promised date, its payments and timeline. */
@Entity({ tableName: "shop_order" })
// Money the database itself refuses (Migration20261204110000): see lib/orders/payments.ts.
@Check({
  name: "shop_order_money_nonnegative_check",
  expression:
    "subtotal_cents >= 0 and tax_cents >= 0 and shipping_cents >= 0 and total_cents >= 0 and deposit_cents >= 0 and paid_cents >= 0 and refunded_cents >= 0",
})
@Check({ name: "shop_order_deposit_within_total_check", expression: "deposit_cents <= total_cents" })
@Check({ name: "shop_order_paid_within_total_check", expression: "paid_cents <= total_cents" })
@Check({ name: "shop_order_refunded_within_paid_check", expression: "refunded_cents <= paid_cents" })
// The owner's overview (Migration20261204150200, lib/shop/overview-queries.ts); the open-orders index also
// serves the staff tables' "late" and "open" filters.
// The orders table's search: the order number by substring (Migration20261206100000), with no pending
// list that every search would read through after many inserts (fastupdate off: Migration20261207100000).
@Index({
  name: "shop_order_number_trgm_index",
  expression: `create index "shop_order_number_trgm_index" on "shop_order" using gin ("number" gin_trgm_ops) with (fastupdate = off)`,
})
@Index({
  name: "shop_order_status_money_index",
  expression: `create index "shop_order_status_money_index" on "shop_order" ("status") include ("total_cents")`,
})
@Index({
  name: "shop_order_open_promised_index",
  expression: `create index "shop_order_open_promised_index" on "shop_order" ("promised_date") include ("status", "customer_id", "total_cents", "paid_cents", "refunded_cents") where status not in ('shipped', 'cancelled')`,
})
@Index({
  name: "shop_order_shipped_at_index",
  expression: `create index "shop_order_shipped_at_index" on "shop_order" ("shipped_at") include ("created_at") where shipped_at is not null`,
})
@Index({
  name: "shop_order_owed_index",
  expression: `create index "shop_order_owed_index" on "shop_order" ("status") include ("total_cents", "paid_cents") where paid_cents < total_cents and status <> 'cancelled'`,
})
// The orders table's sorts by total and by balance due: the page is read off an index, not a sort of
// every order (Migration20261207100000, lib/tables/orders.ts).
@Index({
  name: "shop_order_total_cents_index",
  expression: `create index "shop_order_total_cents_index" on "shop_order" ("total_cents")`,
})
@Index({
  name: "shop_order_balance_index",
  expression: `create index "shop_order_balance_index" on "shop_order" (("total_cents" - "paid_cents"))`,
})
export class Order {
  [OptionalProps]?:
    "status" | "paymentState" | "paidCents" | "refundedCents" | "createdAt" | "updatedAt" | "version";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  /** The number people say on the phone, e.g. "Y26-0007". */
  @Property({ type: "text", unique: true })
  number!: string;

  @Index()
  @ManyToOne(() => Customer, { deleteRule: "restrict" })
  customer!: Customer;

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  placedBy?: User | null;

  @Enum({ items: () => ORDER_CHANNELS, nativeEnumName: "order_channel" })
  channel!: OrderChannel;

  @Index()
  @Enum({ items: () => ORDER_STATUSES, nativeEnumName: "order_status" })
  status: OrderStatus = "awaiting_payment";

  @Enum({ items: () => PAYMENT_STATES, nativeEnumName: "payment_state" })
  paymentState: PaymentState = "unpaid";

  @Enum({ items: () => FULFILMENTS, nativeEnumName: "fulfilment" })
  fulfilment!: Fulfilment;

  @Property({ type: "text", nullable: true })
  shipTo?: string | null;

  @Property({ type: "text" })
  currency!: string;

  @Property({ type: "integer" })
  subtotalCents!: number;

  @Property({ type: "integer" })
  taxCents!: number;

  @Property({ type: "integer" })
  shippingCents!: number;

  @Property({ type: "integer" })
  totalCents!: number;

  /** What the shop's policy asks up front (deposit, or the total). */
  @Property({ type: "integer" })
  depositCents!: number;

  /** Money credited to the order, never more than its total (any excess is refunded on its payment). */
  @Property({ type: "integer", default: 0 })
  paidCents: number = 0;

  @Property({ type: "integer", default: 0 })
  refundedCents: number = 0;

  @Index()
  @Property({ type: "date" })
  promisedDate!: string;

  /** When the last shaft left the shop (shipped or picked up); the overview's days to ship read it. */
  @Property({ type: "Date", nullable: true })
  shippedAt?: Date | null;

  /** Bumped by each save of the desk's details form (lib/orders/details.ts): a stale save is refused. */
  @Property({ type: "integer", default: 1 })
  version: number = 1;

  /** The shop configuration version (catalogue, limits, price book) it was priced and engineered with. */
  @Property({ type: "integer", nullable: true })
  configVersion?: number | null;

  @Property({ type: "text", nullable: true })
  notes?: string | null;

  @OneToMany(() => OrderShaft, (s) => s.order, { orderBy: { position: "asc" } })
  shafts = new Collection<OrderShaft>(this);

  @OneToMany(() => Payment, (p) => p.order, { orderBy: { createdAt: "asc" } })
  payments = new Collection<Payment>(this);

  @OneToMany(() => OrderEvent, (e) => e.order, { orderBy: { at: "asc" } })
  events = new Collection<OrderEvent>(this);

  /** Notes from the shop: staff-only or shown to the customer (lib/orders/notes.ts). */
  @OneToMany(() => OrderNote, (n) => n.order, { orderBy: { createdAt: "asc" } })
  orderNotes = new Collection<OrderNote>(this);

  /** Set when the order is cancelled (lib/orders/cancel.ts), with the reason given. */
  @Property({ type: "Date", nullable: true })
  cancelledAt?: Date | null;

  @Property({ type: "text", nullable: true })
  cancelReason?: string | null;

  /** One per shaft once released to the shop (lib/floor). */
  @OneToMany(() => WorkOrder, (w) => w.order)
  workOrders = new Collection<WorkOrder>(this);

  @Index()
  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();

  @Property({ type: "Date", defaultRaw: "now()", onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}

/**
 * An order's states, outside the entity files so that screens (client components included) can
 * name them without importing the ORM. entities/order.entity.ts uses these for its columns.
 */
export const ORDER_STATUSES = [
  "awaiting_payment",
  "received",
  "in_shop",
  "ready",
  "shipped",
  "cancelled",
] as const;
export type OrderStatus = (typeof ORDER_STATUSES)[number];

export const PAYMENT_STATES = ["unpaid", "deposit_paid", "paid", "partially_refunded", "refunded"] as const;
export type PaymentState = (typeof PAYMENT_STATES)[number];

export const PAYMENT_METHODS = ["checkout", "cash", "cheque", "terminal"] as const;
/** How the money came in: the hosted card checkout, or at the counter (cash, cheque, card terminal). */
export type PaymentMethod = (typeof PAYMENT_METHODS)[number];

export const NOTE_VISIBILITIES = ["staff", "customer"] as const;
/** Who may read an order note: staff only, or the customer too. */
export type NoteVisibility = (typeof NOTE_VISIBILITIES)[number];

export const ORDER_EVENT_KINDS = [
  "received",
  "paid",
  "payment_failed",
  "step",
  "ready",
  "shipped",
  "refunded",
  "note",
  "file",
  "cancelled",
] as const;
/** What one entry of an order's timeline records. */
export type OrderEventKind = (typeof ORDER_EVENT_KINDS)[number];

export const ORDER_CHANNELS = ["online", "counter"] as const;
/** Where the order was placed: by the customer online, or by the counter (phone or walk-in). */
export type OrderChannel = (typeof ORDER_CHANNELS)[number];

export const FULFILMENTS = ["pickup", "ship"] as const;
/** How the shafts leave the shop: picked up at the shop, or shipped. */
export type Fulfilment = (typeof FULFILMENTS)[number];

export const PAYMENT_KINDS = ["deposit", "balance", "full"] as const;
/** What a payment is for: the deposit, the balance after it, or the whole order at once. */
export type PaymentKind = (typeof PAYMENT_KINDS)[number];

export const PAYMENT_STATUSES = ["open", "succeeded", "failed", "expired"] as const;
/** One payment's state: requested (a checkout is open), taken, failed, or its checkout expired. */
export type PaymentStatus = (typeof PAYMENT_STATUSES)[number];

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

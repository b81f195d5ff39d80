import type { OrderStatus, PaymentState } from "@/entities";

export const ORDER_STATUS_LABEL: Record<OrderStatus, string> = {
  awaiting_payment: "Awaiting payment",
  received: "Received",
  in_shop: "In the shop",
  ready: "Ready",
  shipped: "Shipped",
  cancelled: "Cancelled",
};

export const PAYMENT_STATE_LABEL: Record<PaymentState, string> = {
  unpaid: "Unpaid",
  deposit_paid: "Deposit paid",
  paid: "Paid in full",
  partially_refunded: "Partly refunded",
  refunded: "Refunded",
};

export const USE_LABEL: Record<string, string> = {
  street: "Street",
  towing: "Towing",
  "off-road": "Off-road",
  race: "Race",
  industrial: "Industrial",
};

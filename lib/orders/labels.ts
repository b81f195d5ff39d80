import type { OrderStatus, PaymentState, Fulfilment } from "./states";

export const ORDER_STATUS_LABEL: Record<OrderStatus, string> = {
  awaiting_payment: "Awaiting payment",
  received: "Received",
  in_shop: "In the shop",
  ready: "Ready",
  shipped: "Shipped",
  cancelled: "Cancelled",
};

/** Where the floor's work has the order: the least advanced shaft's step, and whether one is on hold. */
export interface FloorProgress {
  k: number;
  n: number;
  onHold: boolean;
}

/**
 * The order's status in words: "In the shop — step k of n" while it is worked on, "On hold" for
 * staff only (customers never see internal holds), and ready / shipped in the order's fulfilment.
 */
export function orderStatusLabel(
  status: OrderStatus,
  fulfilment: Fulfilment,
  floor: FloorProgress | null,
  staff: boolean,
): string {
  if (status === "in_shop" && floor) {
    const where = `step ${floor.k} of ${floor.n}`;
    return staff && floor.onHold ? `On hold — ${where}` : `In the shop — ${where}`;
  }
  if (status === "ready") return fulfilment === "ship" ? "Ready to ship" : "Ready for pickup";
  if (status === "shipped") return fulfilment === "ship" ? "Shipped" : "Picked up";
  return ORDER_STATUS_LABEL[status];
}

export const PAYMENT_STATE_LABEL: Record<PaymentState, string> = {
  unpaid: "Unpaid",
  deposit_paid: "Deposit paid",
  paid: "Paid in full",
  partially_refunded: "Partly refunded",
  refunded: "Refunded",
};

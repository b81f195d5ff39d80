import type { OrderStatus, PaymentState } from "@/lib/orders/states";
import { ORDER_STATUS_LABEL, PAYMENT_STATE_LABEL } from "@/lib/orders/labels";

const ORDER_TONE: Record<OrderStatus, string> = {
  awaiting_payment: "bg-warn-soft text-warn",
  received: "bg-steel-50 text-steel-700",
  in_shop: "bg-brass-50 text-brass-700",
  ready: "bg-pass-soft text-pass",
  shipped: "bg-pass-soft text-pass",
  cancelled: "bg-paper-sunk text-ink-muted",
};

const PAYMENT_TONE: Record<PaymentState, string> = {
  unpaid: "bg-warn-soft text-warn",
  deposit_paid: "bg-steel-50 text-steel-700",
  paid: "bg-pass-soft text-pass",
  partially_refunded: "bg-paper-sunk text-ink",
  refunded: "bg-paper-sunk text-ink",
};

const pill = "inline-flex items-center rounded-full px-2.5 py-0.5 text-xs font-semibold whitespace-nowrap";

/** `label` (an order row's statusLabel) says more than the status, e.g. "In the shop — step 3 of 6". */
export function OrderStatusBadge({
  status,
  label,
  onHold = false,
}: {
  status: OrderStatus;
  label?: string;
  onHold?: boolean;
}) {
  const tone = onHold ? "bg-warn-soft text-warn" : ORDER_TONE[status];
  return <span className={`${pill} ${tone}`}>{label ?? ORDER_STATUS_LABEL[status]}</span>;
}

export function PaymentBadge({ state }: { state: PaymentState }) {
  return <span className={`${pill} ${PAYMENT_TONE[state]}`}>{PAYMENT_STATE_LABEL[state]}</span>;
}

/** pass / warn / fail with a word and an icon-like mark, never colour alone. */
export function CheckBadge({ status }: { status: string }) {
  const map: Record<string, [string, string]> = {
    pass: ["✓ Pass", "bg-pass-soft text-pass"],
    warn: ["! Warning", "bg-warn-soft text-warn"],
    fail: ["✕ Fail", "bg-fail-soft text-fail"],
  };
  const [label, tone] = map[status] ?? [status, "bg-paper-sunk text-ink"];
  return <span className={`${pill} ${tone}`}>{label}</span>;
}

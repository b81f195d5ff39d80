import {
  Ban,
  CircleCheck,
  CircleDot,
  CreditCard,
  FileImage,
  PackageCheck,
  RotateCcw,
  Truck,
  TriangleAlert,
  Wrench,
} from "lucide-react";
import type { OrderView } from "@/lib/orders/views";
import { ShopTime } from "@/components/shop-locale";

const ICON = {
  received: CircleDot,
  paid: CreditCard,
  payment_failed: TriangleAlert,
  step: Wrench,
  ready: PackageCheck,
  shipped: Truck,
  refunded: RotateCcw,
  file: FileImage,
  note: CircleCheck,
  cancelled: Ban,
} as const;

/** The order's story so far, oldest first, with what is still to come greyed at the end. */
export function OrderTimeline({ order }: { order: OrderView }) {
  // A cancelled order has nothing to come.
  const upcoming = [
    order.status !== "cancelled" && !order.events.some((e) => e.kind === "paid") && "Paid",
    !["in_shop", "ready", "shipped", "cancelled"].includes(order.status) &&
      "In the shop: cut, weld and phase, balance, inspect",
    !["ready", "shipped", "cancelled"].includes(order.status) &&
      (order.fulfilment === "ship" ? "Ready to ship" : "Ready for pickup"),
    !["shipped", "cancelled"].includes(order.status) &&
      (order.fulfilment === "ship" ? "Shipped" : "Picked up"),
  ].filter((x): x is string => Boolean(x));
  return (
    <ol className="relative space-y-4 border-l-2 border-line pl-6" aria-label="Order timeline">
      {order.events.map((e) => {
        const Icon = ICON[e.kind as keyof typeof ICON] ?? CircleCheck;
        return (
          <li key={e.id} className="relative">
            <span className="absolute -left-[2.05rem] flex size-7 items-center justify-center rounded-full bg-paper-raised ring-2 ring-steel-500">
              <Icon className="size-4 text-steel-700" aria-hidden="true" />
            </span>
            <p className="font-medium">{e.label}</p>
            <ShopTime at={e.at} className="text-sm text-ink-muted" />
          </li>
        );
      })}
      {order.status !== "cancelled" &&
        upcoming.map((label) => (
          <li key={label} className="relative text-ink-muted">
            <span
              className="absolute -left-[2.05rem] flex size-7 items-center justify-center rounded-full bg-paper ring-2 ring-line"
              aria-hidden="true"
            />
            <p>
              {label} <span className="sr-only">(still to come)</span>
            </p>
          </li>
        ))}
    </ol>
  );
}

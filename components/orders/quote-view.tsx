import type { QuotePageData } from "@/lib/orders/quote-page";
import { Alert } from "@/components/ui/alert";
import { ShaftSummary } from "./shaft-summary";
import { PlaceOrderForm } from "./place-order-form";

/** A quote: each shaft with its checks and price, and the box that places the order. */
export function QuoteView({ data, counter = false }: { data: QuotePageData; counter?: boolean }) {
  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_24rem]">
      <div className="space-y-4">
        {data.shafts.map((s) => (
          <ShaftSummary key={s.id} shaft={s} currency={data.pickup.currency} />
        ))}
      </div>
      <aside className="h-fit space-y-5 card p-5" aria-labelledby="order-box">
        <h2 id="order-box" className="text-lg font-semibold">
          Order
        </h2>
        {data.failing.length > 0 ? (
          <Alert tone="error" title="This shaft cannot be ordered yet">
            {data.failing.join(", ")} fails a check.{" "}
            {counter
              ? "Change the design before ordering."
              : "Fix it in the shaft builder, or phone the shop."}
          </Alert>
        ) : (
          <PlaceOrderForm
            designIds={data.designIds}
            customerId={counter ? data.customer.id : undefined}
            quotes={{ pickup: data.pickup, ship: data.ship }}
            depositPercent={data.depositPercent}
            counter={counter}
          />
        )}
        <p className="text-xs text-ink-muted">
          Engineering results are estimates for the shop’s use and do not replace a qualified engineer or the
          rules that apply where the vehicle runs.
        </p>
      </aside>
    </div>
  );
}

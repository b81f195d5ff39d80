import Link from "next/link";
import type { QuotePageData } from "@/lib/orders/quote-page";
import { Alert } from "@/components/ui/alert";
import { failedChecks, warningsToAcknowledge } from "@/lib/orders/acknowledgements";
import { ShaftSummary } from "./shaft-summary";
import { PlaceOrderForm } from "./place-order-form";

/** A quote: each shaft with its checks and price, and the box that places the order. */
export function QuoteView({
  data,
  counter = false,
  hrefFor,
}: {
  data: QuotePageData;
  counter?: boolean;
  /** The quote page's address for another set of designs. */
  hrefFor: (designIds: string[]) => string;
}) {
  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_24rem]">
      <div className="space-y-4">
        {data.shafts.map((s) => (
          <div key={s.id}>
            <ShaftSummary shaft={s} currency={data.pickup.currency} />
            {data.shafts.length > 1 && (
              <Link
                href={hrefFor(data.designIds.filter((id) => id !== s.id))}
                className="no-print mt-1 inline-block text-sm text-steel-600 underline"
              >
                Remove {s.name} from this order
              </Link>
            )}
          </div>
        ))}
        {data.others.length > 0 && (
          <section className="no-print card p-5" aria-labelledby="add-shaft">
            <h2 id="add-shaft" className="font-semibold">
              Add another shaft to this order
            </h2>
            <ul className="mt-2 flex flex-wrap gap-2">
              {data.others.map((d) => (
                <li key={d.id}>
                  <Link
                    href={hrefFor([...data.designIds, d.id])}
                    className="btn-quiet px-3 py-1.5 no-underline"
                  >
                    + {d.name}
                  </Link>
                </li>
              ))}
            </ul>
          </section>
        )}
      </div>
      <aside className="h-fit space-y-5 card p-5" aria-labelledby="order-box">
        <h2 id="order-box" className="text-lg font-semibold">
          Order
        </h2>
        {data.failing.length > 0 && !counter ? (
          <Alert tone="error" title="This shaft cannot be ordered online">
            {data.failing.join(", ")} fails a check. Fix it in the shaft builder, or phone the shop: the
            counter can take the order for the owner&apos;s engineering review.
          </Alert>
        ) : (
          <>
            {data.failing.length > 0 && (
              <Alert tone="error" title="A check fails">
                {data.failing.join(", ")} fails a check. This is a failure, not a pass: the order can be
                placed, but it waits for the owner&apos;s engineering sign-off before it is paid for or built.
                Tell the customer so.
              </Alert>
            )}
            <PlaceOrderForm
              designIds={data.designIds}
              customerId={counter ? data.customer.id : undefined}
              quotes={{ pickup: data.pickup, ship: data.ship }}
              depositPercent={data.depositPercent}
              counter={counter}
              acknowledge={data.shafts.map((s) => ({
                name: s.name,
                items: [...(counter ? failedChecks(s.checks) : []), ...warningsToAcknowledge(s.checks)],
              }))}
            />
          </>
        )}
        <p className="text-xs text-ink-muted">
          Engineering results are estimates for the shop’s use and do not replace a qualified engineer or the
          rules that apply where the vehicle runs.
        </p>
      </aside>
    </div>
  );
}

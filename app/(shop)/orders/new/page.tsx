import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePermission } from "@/lib/auth/guard";
import { quoteForDesigns } from "@/lib/orders/quote-page";
import { AppError } from "@/lib/http/errors";
import { PageHeader } from "@/components/ui/page-header";
import { Alert } from "@/components/ui/alert";
import { ShaftSummary } from "@/components/orders/shaft-summary";
import { PlaceOrderForm } from "@/components/orders/place-order-form";

export const metadata: Metadata = { title: "Your quote" };

export default async function QuotePage({ searchParams }: PageProps<"/orders/new">) {
  const user = await requirePermission("orders.own", "/orders/new");
  const { design } = await searchParams;
  const designIds = (Array.isArray(design) ? design : design ? [design] : []).filter((id) =>
    /^[0-9a-f-]{36}$/i.test(id),
  );
  if (designIds.length === 0) notFound();
  const data = await quoteForDesigns(user, designIds).catch((e: unknown) => {
    if (e instanceof AppError && e.code === "not_found") notFound();
    throw e;
  });
  return (
    <>
      <PageHeader
        title="Your quote"
        description={`Priced from the shop's current catalogue. Promised about ${data.leadTimeWorkingDays} working days after your order.`}
        actions={
          <Link href={`/build?draft=${designIds[0]}`} className="btn-quiet no-underline">
            Back to the design
          </Link>
        }
      />
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
              {data.failing.join(", ")} fails a check. Fix it in the shaft builder, or phone the shop.
            </Alert>
          ) : (
            <PlaceOrderForm
              designIds={data.designIds}
              quotes={{ pickup: data.pickup, ship: data.ship }}
              depositPercent={data.depositPercent}
            />
          )}
          <p className="text-xs text-ink-muted">
            Engineering results are estimates for the shop’s use and do not replace a qualified engineer or
            the rules that apply where the vehicle runs.
          </p>
        </aside>
      </div>
    </>
  );
}

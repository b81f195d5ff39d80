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

export const metadata: Metadata = { title: "Phone order quote" };

export default async function CounterQuotePage({ searchParams }: PageProps<"/desk/new/quote">) {
  const user = await requirePermission("orders.desk", "/desk/new/quote");
  const { design, customer } = await searchParams;
  const designIds = (Array.isArray(design) ? design : design ? [design] : []).filter((id) =>
    /^[0-9a-f-]{36}$/i.test(id),
  );
  if (designIds.length === 0 || typeof customer !== "string") notFound();
  const data = await quoteForDesigns(user, designIds, customer).catch((e: unknown) => {
    if (e instanceof AppError && e.code === "not_found") notFound();
    throw e;
  });
  return (
    <>
      <PageHeader
        title={`Quote for ${data.customer.name}`}
        description={`Read the price to the customer; placing the order e-mails them the confirmation at ${data.customer.email}.`}
        actions={
          <Link
            href={`/desk/new?customer=${data.customer.id}&draft=${designIds[0]}`}
            className="btn-quiet no-underline"
          >
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
              {data.failing.join(", ")} fails a check. Change the design before ordering.
            </Alert>
          ) : (
            <PlaceOrderForm
              designIds={data.designIds}
              customerId={data.customer.id}
              quotes={{ pickup: data.pickup, ship: data.ship }}
              depositPercent={data.depositPercent}
              counter
            />
          )}
        </aside>
      </div>
    </>
  );
}

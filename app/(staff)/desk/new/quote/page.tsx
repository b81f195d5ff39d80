import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { isUuid } from "@/lib/http/known-errors";
import { requirePermission } from "@/lib/auth/guard";
import { quoteForDesigns } from "@/lib/orders/quote-page";
import { AppError } from "@/lib/http/errors";
import { PageHeader } from "@/components/ui/page-header";
import { QuoteView } from "@/components/orders/quote-view";
import { getShopEngineering } from "@/lib/shop/config";
import type { RepairIntake } from "@/lib/retube/intake";
import { RetubeIntake } from "./_components/retube-intake";

export const metadata: Metadata = { title: "Phone order quote" };

export default async function CounterQuotePage({ searchParams }: PageProps<"/desk/new/quote">) {
  const user = await requirePermission("orders.desk", "/desk/new/quote");
  const { design, customer } = await searchParams;
  const designIds = (Array.isArray(design) ? design : design ? [design] : []).filter(isUuid);
  if (designIds.length === 0 || !isUuid(customer)) notFound();
  const [data, { floor }] = await Promise.all([
    quoteForDesigns(user, designIds, customer).catch((e: unknown) => {
      if (e instanceof AppError && e.code === "not_found") notFound();
      throw e;
    }),
    getShopEngineering(),
  ]);
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
      <div className="mb-6 space-y-4">
        {data.shafts.map((s, i) => (
          <RetubeIntake
            key={s.id}
            designId={s.id}
            shaftName={s.name}
            job={s.retube ? "retube" : "new"}
            initial={
              s.retube
                ? {
                    weldToWeldMm: s.retube.weldToWeldMm,
                    parts: Object.fromEntries(
                      s.retube.parts.map((p) => [p.part, { reuse: p.reuse, note: p.note }]),
                    ) as RepairIntake["parts"],
                  }
                : null
            }
            geometry={data.retubeGeometries[i]!}
            units={floor.units}
          />
        ))}
      </div>
      <QuoteView
        data={data}
        counter
        hrefFor={(ids) =>
          `/desk/new/quote?customer=${data.customer.id}&${ids.map((id) => `design=${id}`).join("&")}`
        }
      />
    </>
  );
}

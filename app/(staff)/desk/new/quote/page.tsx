import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { isUuid } from "@/lib/http/known-errors";
import { requirePermission } from "@/lib/auth/guard";
import { quoteForDesigns } from "@/lib/orders/quote-page";
import { AppError } from "@/lib/http/errors";
import { PageHeader } from "@/components/ui/page-header";
import { QuoteView } from "@/components/orders/quote-view";

export const metadata: Metadata = { title: "Phone order quote" };

export default async function CounterQuotePage({ searchParams }: PageProps<"/desk/new/quote">) {
  const user = await requirePermission("orders.desk", "/desk/new/quote");
  const { design, customer } = await searchParams;
  const designIds = (Array.isArray(design) ? design : design ? [design] : []).filter(isUuid);
  if (designIds.length === 0 || !isUuid(customer)) notFound();
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

import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { isUuid } from "@/lib/http/known-errors";
import { requirePermission } from "@/lib/auth/guard";
import { quoteForDesigns } from "@/lib/orders/quote-page";
import { AppError } from "@/lib/http/errors";
import { PageHeader } from "@/components/ui/page-header";
import { QuoteView } from "@/components/orders/quote-view";

export const metadata: Metadata = { title: "Your quote" };

export default async function QuotePage({ searchParams }: PageProps<"/orders/new">) {
  const user = await requirePermission("orders.own", "/orders/new");
  const { design } = await searchParams;
  const designIds = (Array.isArray(design) ? design : design ? [design] : []).filter(isUuid);
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
      <QuoteView data={data} hrefFor={(ids) => `/orders/new?${ids.map((id) => `design=${id}`).join("&")}`} />
    </>
  );
}

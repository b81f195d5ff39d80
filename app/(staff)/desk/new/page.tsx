import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { isUuid } from "@/lib/http/known-errors";
import { requirePermission } from "@/lib/auth/guard";
import { customerRow } from "@/lib/customers";
import { findDraft, listDrafts } from "@/lib/designs/drafts";
import { getShopEngineering } from "@/lib/shop/config";
import { PageHeader } from "@/components/ui/page-header";
import { InviteButton } from "@/components/customers/invite-button";
import { CustomerPicker } from "./_components/customer-picker";
import { builderShopOf, builderStart } from "@/components/shaft-builder/builder-core";
import { CounterBuilder } from "./_components/counter-builder";

export const metadata: Metadata = { title: "New phone order" };

export default async function NewPhoneOrderPage({ searchParams }: PageProps<"/desk/new">) {
  const user = await requirePermission("orders.desk", "/desk/new");
  const { customer: customerParam, draft: draftParam } = await searchParams;
  const customerId = isUuid(customerParam) ? customerParam : null;

  if (!customerId) {
    return (
      <>
        <PageHeader
          title="New phone order"
          description="Who is the order for? Find them as you type, or enter a new customer; then take their measurements in the order of the measuring sheet."
        />
        <CustomerPicker />
      </>
    );
  }

  const customer = await customerRow(customerId);
  if (!customer) notFound();
  const draftId = typeof draftParam === "string" ? draftParam : undefined;
  const [shop, drafts, draft] = await Promise.all([
    getShopEngineering(),
    listDrafts(user, { customerId }),
    findDraft(user, draftId),
  ]);
  // What the builder's engineering reads from the shop, for its first results and for the browser.
  const builderShop = builderShopOf(shop);
  return (
    <>
      <PageHeader
        title={`Phone order for ${customer.name}`}
        description={[customer.company, customer.email, customer.phone].filter(Boolean).join(" · ")}
        actions={
          <>
            {!customer.hasAccount && <InviteButton customerId={customer.id} />}
            <Link href="/desk/new" className="btn-quiet no-underline">
              Change customer
            </Link>
          </>
        }
      />
      <p className="no-print mb-3 text-sm text-ink-soft" data-testid="retube-hint">
        <strong>Re-tube or repair?</strong> Build the shaft as usual, with the joint-centre length measured on
        the customer&apos;s shaft (front cross centre to rear cross centre). The quote then asks for the
        weld-to-weld and the parts reused.
      </p>
      <CounterBuilder
        key={draft?.id ?? "new"}
        shop={builderShop}
        initialDraft={draft}
        start={builderStart(draft, builderShop)}
        drafts={drafts}
        customerId={customerId}
      />
    </>
  );
}

import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { PageHeader } from "@/components/ui/page-header";
import { Alert } from "@/components/ui/alert";
import { findDraft, listDrafts } from "@/lib/designs/drafts";
import { getShopEngineering } from "@/lib/shop/config";
import { builderShopOf, builderStart } from "@/components/shaft-builder/builder-core";
import { CustomerBuilder } from "./_components/customer-builder";

export const metadata: Metadata = { title: "Design a shaft" };

export default async function BuildPage({
  searchParams,
}: {
  searchParams: Promise<{ draft?: string | string[] }>;
}) {
  const user = await requirePermission("orders.own", "/build");
  const { draft: draftParam } = await searchParams;
  const draftId = typeof draftParam === "string" ? draftParam : undefined;
  const [shop, drafts, draft] = await Promise.all([
    getShopEngineering(),
    listDrafts(user),
    findDraft(user, draftId),
  ]);
  // What the builder's engineering reads from the shop, for its first results and for the browser.
  const builderShop = builderShopOf(shop);
  return (
    <>
      <PageHeader
        title="Design a shaft"
        description="Enter what you measured. The shaft is engineered as you type, with the shop's own parts and limits."
      />
      {draftId && !draft && (
        <div className="mb-4">
          <Alert tone="warning" title="That saved design was not found.">
            You are starting a new design instead.
          </Alert>
        </div>
      )}
      <CustomerBuilder
        key={draft?.id ?? "new"}
        shop={builderShop}
        initialDraft={draft}
        start={builderStart(draft, builderShop)}
        drafts={drafts}
      />
    </>
  );
}

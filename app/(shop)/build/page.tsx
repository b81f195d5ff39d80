import type { Metadata } from "next";
import { Ruler } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "Design a shaft" };

export default async function BuildPage() {
  await requirePermission("orders.own", "/build");
  return (
    <>
      <PageHeader title="Design a shaft" description="Enter your measurements; the shaft is engineered as you type." />
      <EmptyState icon={Ruler} title="The shaft builder is being set up">
        Until it opens, phone the shop with your measurements and the counter will build the order with you.
      </EmptyState>
    </>
  );
}

import type { Metadata } from "next";
import { Boxes } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "Catalogue & prices" };

export default async function CataloguePage() {
  await requirePermission("shop.manage", "/overview/catalogue");
  return (
    <>
      <PageHeader title="Catalogue & prices" description="Tubes, end fittings, joints and the price book." />
      <EmptyState icon={Boxes} title="The catalogue arrives with the engineering core">
        Tube sizes, materials and end fittings, with their prices, will be kept here.
      </EmptyState>
    </>
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { PackageOpen } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";
import { Alert } from "@/components/ui/alert";

export const metadata: Metadata = { title: "My orders" };

export default async function MyOrdersPage({ searchParams }: PageProps<"/orders">) {
  const user = await requirePermission("orders.own", "/orders");
  const { welcome } = await searchParams;
  return (
    <>
      <PageHeader
        title="My orders"
        description="Every shaft you have ordered, and where it is in the shop."
        actions={
          <Link href="/build" className="btn-accent no-underline">
            Design a shaft
          </Link>
        }
      />
      {welcome && (
        <div className="mb-4">
          <Alert tone="success" title={`Welcome, ${user.name}.`}>
            Your account is ready. Design your first shaft to get a price.
          </Alert>
        </div>
      )}
      <EmptyState icon={PackageOpen} title="No orders yet">
        When you order a shaft it appears here with its timeline: received, paid, each step in the shop, ready and
        shipped.
      </EmptyState>
    </>
  );
}

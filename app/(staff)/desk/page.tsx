import type { Metadata } from "next";
import Link from "next/link";
import { ClipboardList } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "Order desk" };

export default async function OrderDeskPage() {
  await requirePermission("orders.desk", "/desk");
  return (
    <>
      <PageHeader
        title="Order desk"
        description="Orders waiting on the counter: quotes to confirm, payments to take, travellers to print."
        actions={
          <Link href="/desk/new" className="btn-accent no-underline">
            New phone order
          </Link>
        }
      />
      <EmptyState icon={ClipboardList} title="No open orders">
        Orders placed online and by phone will be listed here, oldest promise date first.
      </EmptyState>
    </>
  );
}

import type { Metadata } from "next";
import { PhoneCall } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "New phone order" };

export default async function NewPhoneOrderPage() {
  await requirePermission("orders.desk", "/desk/new");
  return (
    <>
      <PageHeader title="New phone order" description="Enter a customer's measurements with the same shaft builder they use online." />
      <EmptyState icon={PhoneCall} title="Phone orders open with the shaft builder">
        The counter's order form arrives with the shaft builder.
      </EmptyState>
    </>
  );
}

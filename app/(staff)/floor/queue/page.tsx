import type { Metadata } from "next";
import { Wrench } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "Work queue" };

export default async function WorkQueuePage() {
  await requirePermission("floor.scan", "/floor/queue");
  return (
    <>
      <PageHeader
        title="Work queue"
        description="Shafts in the shop by next step: cut, weld and phase, balance, inspect, ship."
      />
      <EmptyState icon={Wrench} title="Nothing in the shop yet">
        Paid orders join this queue with their travellers.
      </EmptyState>
    </>
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { PackageOpen } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { getEm } from "@/lib/db/orm";
import { listOrders } from "@/lib/orders/queries";
import { formatMoney } from "@/lib/money";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";
import { Alert } from "@/components/ui/alert";
import { OrderStatusBadge, PaymentBadge } from "@/components/orders/status-badge";

export const metadata: Metadata = { title: "My orders" };

export default async function MyOrdersPage({ searchParams }: PageProps<"/orders">) {
  const user = await requirePermission("orders.own", "/orders");
  const [{ welcome }, orders] = await Promise.all([searchParams, listOrders(await getEm(), user)]);
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
      {orders.length === 0 ? (
        <EmptyState icon={PackageOpen} title="No orders yet">
          When you order a shaft it appears here with its timeline: received, paid, each step in the shop,
          ready and shipped.
        </EmptyState>
      ) : (
        <ul className="space-y-3">
          {orders.map((o) => (
            <li key={o.id}>
              <Link
                href={`/orders/${o.id}`}
                className="flex flex-wrap items-center gap-x-6 gap-y-2 card p-4 text-ink no-underline hover:border-steel-500"
              >
                <span className="font-mono font-semibold">{o.number}</span>
                <span className="min-w-0 basis-full truncate sm:flex-1 sm:basis-0">
                  {o.shafts.join(", ")}
                </span>
                <OrderStatusBadge status={o.status} label={o.statusLabel} />
                <PaymentBadge state={o.paymentState} />
                <span className="tabular-nums">{formatMoney(o.totalCents, o.currency)}</span>
                <span className="text-sm text-ink-muted">promised {o.promisedDate}</span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}

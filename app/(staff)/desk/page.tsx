import type { Metadata } from "next";
import Link from "next/link";
import { ClipboardList } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { getEm } from "@/lib/db/orm";
import { listOrders } from "@/lib/orders/queries";
import { formatMoney } from "@/lib/pricing/price-book";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";
import { OrderStatusBadge, PaymentBadge } from "@/components/orders/status-badge";

export const metadata: Metadata = { title: "Order desk" };

export default async function OrderDeskPage() {
  const user = await requirePermission("orders.desk", "/desk");
  const orders = await listOrders(await getEm(), user, { open: true });
  return (
    <>
      <PageHeader
        title="Order desk"
        description="Open orders, the soonest promise first: payments to take, balances to ask for, travellers to print."
        actions={
          <Link href="/desk/new" className="btn-accent no-underline">
            New phone order
          </Link>
        }
      />
      {orders.length === 0 ? (
        <EmptyState icon={ClipboardList} title="No open orders">
          Orders placed online and by phone are listed here, oldest promise date first.
        </EmptyState>
      ) : (
        <div className="relative overflow-x-auto card">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Open orders</caption>
            <thead className="border-b border-line bg-paper-sunk text-xs tracking-wide text-ink-muted uppercase">
              <tr>
                <th scope="col" className="px-4 py-2">
                  Order
                </th>
                <th scope="col" className="px-4 py-2">
                  Customer
                </th>
                <th scope="col" className="px-4 py-2">
                  Shafts
                </th>
                <th scope="col" className="px-4 py-2">
                  Status
                </th>
                <th scope="col" className="px-4 py-2">
                  Payment
                </th>
                <th scope="col" className="px-4 py-2 text-right">
                  Total
                </th>
                <th scope="col" className="px-4 py-2">
                  Promised
                </th>
              </tr>
            </thead>
            <tbody className="divide-y divide-line">
              {orders.map((o) => (
                <tr key={o.id} className={o.late ? "bg-fail-soft/40" : undefined}>
                  <td className="px-4 py-2 font-mono font-semibold">
                    <Link href={`/desk/orders/${o.id}`}>{o.number}</Link>
                  </td>
                  <td className="px-4 py-2">{o.customerName}</td>
                  <td className="px-4 py-2">{o.shafts.join(", ")}</td>
                  <td className="px-4 py-2">
                    <OrderStatusBadge status={o.status} />
                  </td>
                  <td className="px-4 py-2">
                    <PaymentBadge state={o.paymentState} />
                  </td>
                  <td className="px-4 py-2 text-right tabular-nums">
                    {formatMoney(o.totalCents, o.currency)}
                  </td>
                  <td className="px-4 py-2 whitespace-nowrap">
                    {o.promisedDate} {o.late && <span className="font-semibold text-fail">late</span>}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </>
  );
}

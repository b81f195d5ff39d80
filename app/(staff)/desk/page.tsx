import type { Metadata } from "next";
import Link from "next/link";
import { ClipboardList } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { getEm } from "@/lib/db/orm";
import { listOrders } from "@/lib/orders/queries";
import { formatMoney } from "@/lib/money";
import { CELL, TableCard } from "@/components/ui/table-card";
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
          <>
            <Link href="/desk/orders?late=1" className="btn-quiet no-underline">
              Late orders
            </Link>
            <Link href="/desk/orders" className="btn-quiet no-underline">
              All orders
            </Link>
            <Link href="/desk/new" className="btn-accent no-underline">
              New phone order
            </Link>
          </>
        }
      />
      {orders.length === 0 ? (
        <EmptyState icon={ClipboardList} title="No open orders">
          Orders placed online and by phone are listed here, oldest promise date first.
        </EmptyState>
      ) : (
        <>
          <p className="no-print mb-2 text-sm text-ink-muted">
            To sort, filter, search past orders or export a file, open{" "}
            <Link href="/desk/orders">the orders table</Link>.
          </p>
          <TableCard
            caption="Open orders"
            headings={[
              "Order",
              "Customer",
              "Shafts",
              "Status",
              "Payment",
              { label: "Total", align: "right" },
              "Promised",
            ]}
          >
            {orders.map((o) => (
              <tr key={o.id} className={o.late ? "bg-fail-soft/40" : undefined}>
                <td className={`${CELL} font-mono font-semibold whitespace-nowrap`}>
                  <Link href={`/desk/orders/${o.id}`}>{o.number}</Link>
                </td>
                <td className={CELL}>{o.customerName}</td>
                <td className={CELL}>{o.shafts.join(", ")}</td>
                <td className={CELL}>
                  <OrderStatusBadge status={o.status} label={o.statusLabel} onHold={o.onHold} />
                </td>
                <td className={CELL}>
                  <PaymentBadge state={o.paymentState} />
                </td>
                <td className={`${CELL} text-right tabular-nums`}>{formatMoney(o.totalCents, o.currency)}</td>
                <td className={`${CELL} whitespace-nowrap`}>
                  {o.promisedDate} {o.late && <span className="font-semibold text-fail">late</span>}
                </td>
              </tr>
            ))}
          </TableCard>
        </>
      )}
    </>
  );
}

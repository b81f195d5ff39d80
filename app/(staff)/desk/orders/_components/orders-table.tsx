"use client";
import Link from "next/link";
import { DataTable, type TablePage } from "@/components/data-table/data-table";
import { tableColumns } from "@/components/data-table/columns";
import { OrderStatusBadge, PaymentBadge } from "@/components/orders/status-badge";
import { formatMoney } from "@/lib/money";
import { ShopTime } from "@/components/shop-locale";
import { ORDER_COLUMNS, type OrderTableRow } from "@/lib/tables/orders-spec";

const columns = tableColumns<OrderTableRow>(ORDER_COLUMNS, {
  number: (r) => (
    <Link href={`/desk/orders/${r.id}`} className="font-mono font-semibold whitespace-nowrap">
      {r.number}
    </Link>
  ),
  customer: (r) => <span className="whitespace-nowrap">{r.customerName}</span>,
  company: (r) => (r.customerCompany ? <span className="whitespace-nowrap">{r.customerCompany}</span> : "—"),
  email: (r) => <span className="whitespace-nowrap">{r.customerEmail}</span>,
  shafts: (r) => <span className="block min-w-48">{r.shafts || "—"}</span>,
  status: (r) => <OrderStatusBadge status={r.status} label={r.statusLabel} onHold={r.onHold} />,
  payment: (r) => <PaymentBadge state={r.paymentState} />,
  total: (r) => formatMoney(r.totalCents, r.currency),
  balance: (r) => (r.balanceCents ? formatMoney(r.balanceCents, r.currency) : "—"),
  created: (r) => <ShopTime at={r.createdAt} format="isoDate" className="whitespace-nowrap" />,
  promised: (r) => <span className="whitespace-nowrap">{r.promisedDate}</span>,
  late: (r) => (r.late ? <span className="font-semibold text-fail">Late</span> : ""),
});

export function OrdersTable(props: TablePage<OrderTableRow>) {
  return (
    <DataTable
      caption="Orders"
      columns={columns}
      page={props}
      defaults={{ sort: "created", dir: "desc" }}
      getRowId={(r) => r.id}
      exportHref="/api/exports/orders"
      rowClassName={(r) => (r.late ? "bg-fail-soft/40" : undefined)}
      empty={{
        none: { title: "No orders yet", text: "Orders placed online and by phone are listed here." },
        noMatch: { title: "No orders match these filters" },
      }}
    />
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { getEm } from "@/lib/db/orm";
import { PAYMENT_STATE_LABEL, ORDER_STATUS_LABEL } from "@/lib/orders/labels";
import { parseTableQuery } from "@/lib/tables/params";
import { orderTablePage } from "@/lib/tables/orders";
import { listOrdersQuerySchema, ORDER_STATUS_VALUES, PAYMENT_STATE_VALUES } from "@/lib/tables/orders-spec";
import { PageHeader } from "@/components/ui/page-header";
import { FilterBar } from "@/components/data-table/filter-bar";
import { filterNames, type FilterSpec } from "@/lib/tables/filters";
import { QueryNotice } from "@/components/data-table/query-notice";
import { TableLinks } from "@/components/data-table/table-links";
import { OrdersTable } from "./_components/orders-table";

export const metadata: Metadata = { title: "Orders" };

const FILTERS: FilterSpec[] = [
  {
    kind: "search",
    name: "q",
    label: "Search",
    hint: "order number, customer, e-mail, company or phone",
    placeholder: "e.g. Y26-0042 or a name",
  },
  {
    kind: "select",
    name: "status",
    label: "Status",
    allLabel: "Any status",
    options: [
      { value: "open", label: "Open (not shipped or cancelled)" },
      ...ORDER_STATUS_VALUES.map((s) => ({ value: s, label: ORDER_STATUS_LABEL[s] })),
    ],
  },
  {
    kind: "select",
    name: "payment",
    label: "Payment",
    allLabel: "Any payment",
    options: PAYMENT_STATE_VALUES.map((s) => ({ value: s, label: PAYMENT_STATE_LABEL[s] })),
  },
  {
    kind: "select",
    name: "channel",
    label: "Channel",
    allLabel: "Online and counter",
    options: [
      { value: "online", label: "Online" },
      { value: "counter", label: "Counter" },
    ],
  },
  { kind: "date-range", label: "Promised between", from: "from", to: "to" },
  { kind: "flag", name: "late", label: "Late only" },
  { kind: "flag", name: "hold", label: "On hold only" },
];

export default async function OrdersTablePage({ searchParams }: PageProps<"/desk/orders">) {
  const user = await requirePermission("orders.desk", "/desk/orders");
  const raw = await searchParams;
  const { query, problems } = parseTableQuery(listOrdersQuerySchema, raw);
  const page = await orderTablePage(await getEm(), query);
  const filtered = filterNames(FILTERS).some((n) => n in query);
  return (
    <>
      <PageHeader
        title="Orders"
        description="Every order, sorted and filtered on the server; the link keeps your filters, so it can be shared or bookmarked."
        actions={
          <Link href="/desk/new" className="btn-accent no-underline">
            New phone order
          </Link>
        }
      />
      <TableLinks current="/desk/orders" owner={can(user.role, "shop.overview")} />
      <QueryNotice problems={problems} />
      <FilterBar filters={FILTERS} idPrefix="orders" />
      <OrdersTable rows={page.rows} total={page.total} query={query} filtered={filtered} />
    </>
  );
}

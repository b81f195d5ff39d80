"use client";
import { ShopTime } from "@/components/shop-locale";
import Link from "next/link";
import { DataTable, type TablePage } from "@/components/data-table/data-table";
import { tableColumns } from "@/components/data-table/columns";
import { InviteButton } from "@/components/customers/invite-button";
import { CUSTOMER_COLUMNS, type CustomerTableRow } from "@/lib/tables/customers-spec";

const columns = tableColumns<CustomerTableRow>(CUSTOMER_COLUMNS, {
  email: (r) => <a href={`mailto:${r.email}`}>{r.email}</a>,
  phone: (r) =>
    r.phone ? (
      <a href={`tel:${r.phone.replace(/[^\d+]/g, "")}`} className="whitespace-nowrap">
        {r.phone}
      </a>
    ) : (
      "—"
    ),
  account: (r) =>
    r.hasAccount ? (
      "Yes"
    ) : (
      <span className="inline-flex flex-wrap items-center gap-2">
        By phone <InviteButton customerId={r.id} />
      </span>
    ),
  orders: (r) =>
    r.orderCount ? <Link href={`/desk/orders?q=${encodeURIComponent(r.email)}`}>{r.orderCount}</Link> : "0",
  created: (r) => <ShopTime at={r.createdAt} format="isoDate" className="whitespace-nowrap" />,
  last: (r) => <span className="whitespace-nowrap">{r.lastOrderOn ?? "—"}</span>,
});

export function CustomersTable(props: TablePage<CustomerTableRow>) {
  return (
    <DataTable
      caption="Customers"
      columns={columns}
      page={props}
      defaults={{ sort: "created", dir: "desc" }}
      getRowId={(r) => r.id}
      exportHref="/api/exports/customers"
      empty={{
        none: {
          title: "No customers yet",
          text: "Customers appear here when they sign up online or the counter enters a phone order.",
        },
        noMatch: {
          title: "No customers match",
          text: "Try part of the name, the phone number's digits, the e-mail or the company.",
        },
      }}
    />
  );
}

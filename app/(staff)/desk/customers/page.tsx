import type { Metadata } from "next";
import Link from "next/link";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { getEm } from "@/lib/db/orm";
import { parseTableQuery } from "@/lib/tables/params";
import { customerTablePage } from "@/lib/tables/customers";
import { listCustomersQuerySchema } from "@/lib/tables/customers-spec";
import { PageHeader } from "@/components/ui/page-header";
import { FilterBar } from "@/components/data-table/filter-bar";
import { filterNames, type FilterSpec } from "@/lib/tables/filters";
import { QueryNotice } from "@/components/data-table/query-notice";
import { TableLinks } from "@/components/data-table/table-links";
import { CustomersTable } from "./_components/customers-table";

export const metadata: Metadata = { title: "Customers" };

const FILTERS: FilterSpec[] = [
  { kind: "search", name: "q", label: "Search", placeholder: "Name, phone, e-mail or company" },
  {
    kind: "select",
    name: "account",
    label: "Orders online",
    allLabel: "Online and by phone",
    options: [
      { value: "yes", label: "Has an account" },
      { value: "no", label: "By phone only" },
    ],
  },
];

export default async function CustomersPage({ searchParams }: PageProps<"/desk/customers">) {
  const user = await requirePermission("orders.desk", "/desk/customers");
  const { query, problems } = parseTableQuery(listCustomersQuerySchema, await searchParams);
  const page = await customerTablePage(await getEm(), query);
  return (
    <>
      <PageHeader
        title="Customers"
        description="People and businesses the shop builds for, online and by phone; the newest first."
        actions={
          <Link href="/desk/new" className="btn-accent no-underline">
            New phone order
          </Link>
        }
      />
      <TableLinks current="/desk/customers" owner={can(user.role, "shop.overview")} />
      <QueryNotice problems={problems} />
      <FilterBar filters={FILTERS} idPrefix="customers" />
      <CustomersTable
        rows={page.rows}
        total={page.total}
        query={query}
        filtered={filterNames(FILTERS).some((n) => n in query)}
      />
    </>
  );
}

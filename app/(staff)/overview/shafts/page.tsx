import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { getEm } from "@/lib/db/orm";
import { getShopEngineering } from "@/lib/shop/config";
import { parseTableQuery } from "@/lib/tables/params";
import { shaftTablePage } from "@/lib/tables/shafts";
import {
  listShaftsQuerySchema,
  WORK_ORDER_STATE_LABEL,
  WORK_ORDER_STATE_VALUES,
} from "@/lib/tables/shafts-spec";
import { PageHeader } from "@/components/ui/page-header";
import { FilterBar } from "@/components/data-table/filter-bar";
import { filterNames, type FilterSpec } from "@/lib/tables/filters";
import { QueryNotice } from "@/components/data-table/query-notice";
import { TableLinks } from "@/components/data-table/table-links";
import { ShaftsTable } from "./_components/shafts-table";

export const metadata: Metadata = { title: "Shafts" };

// The owner's page: every shaft's place on the floor, holds and tubes, across orders. The counter
// answers "where is my shaft?" from the order page and the orders table's status ("step 3 of 6").
export default async function ShaftsTablePage({ searchParams }: PageProps<"/overview/shafts">) {
  const user = await requirePermission("shop.overview", "/overview/shafts");
  const { query, problems } = parseTableQuery(listShaftsQuerySchema, await searchParams);
  const [page, { floor }] = await Promise.all([
    getEm().then((em) => shaftTablePage(em, query)),
    getShopEngineering(),
  ]);
  const filters: FilterSpec[] = [
    { kind: "search", name: "q", label: "Serial or order", placeholder: "e.g. TGW-26-00042 or Y26-0007" },
    {
      kind: "select",
      name: "step",
      label: "Waiting for step",
      allLabel: "Any step",
      options: [
        ...floor.routing.map((r, i) => ({ value: r.code, label: `${i + 1}. ${r.code} ${r.name}` })),
        { value: "DONE", label: "All steps done" },
      ],
    },
    {
      kind: "select",
      name: "state",
      label: "State",
      allLabel: "Any state",
      options: [
        { value: "open", label: "Still in the shop" },
        ...WORK_ORDER_STATE_VALUES.map((s) => ({ value: s, label: WORK_ORDER_STATE_LABEL[s] })),
      ],
    },
    { kind: "flag", name: "hold", label: "On hold only" },
  ];
  return (
    <>
      <PageHeader
        title="Shafts"
        description="Every shaft released to the shop: the step it waits for, holds, its tube and promise."
      />
      <TableLinks current="/overview/shafts" owner={user.role === "owner"} />
      <QueryNotice problems={problems} />
      <FilterBar filters={filters} idPrefix="shafts" />
      <ShaftsTable
        rows={page.rows}
        total={page.total}
        query={query}
        filtered={filterNames(filters).some((n) => n in query)}
      />
    </>
  );
}

import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { getEm } from "@/lib/db/orm";
import { getShopEngineering } from "@/lib/shop/config";
import { parseTableQuery } from "@/lib/tables/params";
import { stepTablePage, stepUserOptions } from "@/lib/tables/steps";
import { listStepsQuerySchema, STEP_OUTCOME_LABEL, STEP_OUTCOME_VALUES } from "@/lib/tables/steps-spec";
import { PageHeader } from "@/components/ui/page-header";
import { FilterBar } from "@/components/data-table/filter-bar";
import { filterNames, type FilterSpec } from "@/lib/tables/filters";
import { QueryNotice } from "@/components/data-table/query-notice";
import { TableLinks } from "@/components/data-table/table-links";
import { StepsTable } from "./_components/steps-table";

export const metadata: Metadata = { title: "Step records" };

export default async function StepsTablePage({ searchParams }: PageProps<"/overview/steps">) {
  const user = await requirePermission("shop.overview", "/overview/steps");
  const { query, problems } = parseTableQuery(listStepsQuerySchema, await searchParams);
  const em = await getEm();
  const [page, users, { floor }] = await Promise.all([
    stepTablePage(em, query),
    stepUserOptions(em),
    getShopEngineering(),
  ]);
  const filters: FilterSpec[] = [
    {
      kind: "select",
      name: "step",
      label: "Step",
      allLabel: "Every step",
      options: floor.routing.map((r, i) => ({ value: r.code, label: `${i + 1}. ${r.code} ${r.name}` })),
    },
    {
      kind: "select",
      name: "result",
      label: "Result",
      allLabel: "Any result",
      options: STEP_OUTCOME_VALUES.map((o) => ({ value: o, label: STEP_OUTCOME_LABEL[o] })),
    },
    { kind: "select", name: "user", label: "Signed by", allLabel: "Anyone", options: users },
    { kind: "date-range", label: "Signed between", from: "from", to: "to" },
  ];
  return (
    <>
      <PageHeader
        title="Step records"
        description="Who signed which step of which shaft, when, and with what result — the newest first."
      />
      <TableLinks current="/overview/steps" owner={user.role === "owner"} />
      <QueryNotice problems={problems} />
      <FilterBar filters={filters} idPrefix="steps" />
      <StepsTable
        rows={page.rows}
        total={page.total}
        query={query}
        filtered={filterNames(filters).some((n) => n in query)}
      />
    </>
  );
}

"use client";
import Link from "next/link";
import { DataTable, type TablePage } from "@/components/data-table/data-table";
import { tableColumns } from "@/components/data-table/columns";
import { ShopTime } from "@/components/shop-locale";
import { STEP_COLUMNS, STEP_OUTCOME_LABEL, type StepTableRow } from "@/lib/tables/steps-spec";

const pill = "inline-flex items-center rounded-full px-2.5 py-0.5 text-xs font-semibold whitespace-nowrap";
const TONE: Record<StepTableRow["outcome"], string> = {
  pass: "bg-pass-soft text-pass",
  rework: "bg-pass-soft text-pass",
  hold: "bg-warn-soft text-warn",
  concession: "bg-steel-50 text-steel-700",
};

const columns = tableColumns<StepTableRow>(STEP_COLUMNS, {
  at: (r) => <ShopTime at={r.at} format="timestamp" className="whitespace-nowrap tabular-nums" />,
  serial: (r) => (
    <Link href={`/floor/shafts/${r.serial}`} className="font-mono whitespace-nowrap">
      {r.serial}
    </Link>
  ),
  order: (r) => (
    <Link href={`/desk/orders/${r.orderId}`} className="font-mono whitespace-nowrap">
      {r.orderNumber}
    </Link>
  ),
  step: (r) => (
    <span className="whitespace-nowrap">
      <span className="font-mono">{r.stepCode}</span> {r.stepName}
    </span>
  ),
  result: (r) => <span className={`${pill} ${TONE[r.outcome]}`}>{STEP_OUTCOME_LABEL[r.outcome]}</span>,
  user: (r) => r.byName ?? <span className="text-ink-muted">(removed user)</span>,
  notes: (r) => (r.notes ? <span className="block max-w-md text-xs">{r.notes}</span> : ""),
});

export function StepsTable(props: TablePage<StepTableRow>) {
  return (
    <DataTable
      caption="Step records"
      columns={columns}
      page={props}
      defaults={{ sort: "at", dir: "desc" }}
      getRowId={(r) => r.id}
      exportHref="/api/exports/steps"
      empty={{
        none: {
          title: "No steps signed yet",
          text: "Each step the floor signs off (and each hold) is recorded here.",
        },
        noMatch: { title: "No step records match these filters" },
      }}
    />
  );
}

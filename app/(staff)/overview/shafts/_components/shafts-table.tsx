"use client";
import Link from "next/link";
import { DataTable, type TablePage } from "@/components/data-table/data-table";
import { tableColumns } from "@/components/data-table/columns";
import { ShopTime } from "@/components/shop-locale";
import { SHAFT_COLUMNS, WORK_ORDER_STATE_LABEL, type ShaftTableRow } from "@/lib/tables/shafts-spec";

const pill = "inline-flex items-center rounded-full px-2.5 py-0.5 text-xs font-semibold whitespace-nowrap";

const columns = tableColumns<ShaftTableRow>(SHAFT_COLUMNS, {
  serial: (r) => (
    <Link href={`/floor/shafts/${r.serial}`} className="font-mono font-semibold whitespace-nowrap">
      {r.serial}
    </Link>
  ),
  order: (r) => (
    <Link href={`/desk/orders/${r.orderId}`} className="font-mono whitespace-nowrap">
      {r.orderNumber}
    </Link>
  ),
  step: (r) =>
    r.stepCode ? (
      <span className="whitespace-nowrap">
        <span className="font-mono">{r.stepCode}</span> {r.stepName}{" "}
        <span className="text-ink-muted">
          ({r.position} of {r.stepCount})
        </span>
      </span>
    ) : (
      <span className="text-ink-muted">All steps done</span>
    ),
  state: (r) => (
    <span className={`${pill} ${r.onHold ? "bg-warn-soft text-warn" : "bg-steel-50 text-steel-700"}`}>
      {WORK_ORDER_STATE_LABEL[r.state]}
    </span>
  ),
  hold: (r) =>
    r.onHold ? (
      <span className="font-semibold text-warn">
        At {r.holdStep ?? "a step"}
        {r.holdSince && (
          <span className="block text-xs font-normal">
            since <ShopTime at={r.holdSince} format="timestamp" />
          </span>
        )}
      </span>
    ) : (
      ""
    ),
  tube: (r) => <span className="font-mono text-xs whitespace-nowrap">{r.tube}</span>,
  promised: (r) => (
    <span className={`whitespace-nowrap ${r.late ? "font-semibold text-fail" : ""}`}>
      {r.promisedDate}
      {r.late && " late"}
    </span>
  ),
  released: (r) => <ShopTime at={r.releasedAt} format="isoDate" className="whitespace-nowrap" />,
});

export function ShaftsTable(props: TablePage<ShaftTableRow>) {
  return (
    <DataTable
      caption="Shafts"
      columns={columns}
      page={props}
      defaults={{ sort: "promised", dir: "asc" }}
      getRowId={(r) => r.workOrderId}
      exportHref="/api/exports/shafts"
      empty={{
        none: {
          title: "No shafts on the floor yet",
          text: "A shaft gets its serial when its order is released to the shop.",
        },
        noMatch: { title: "No shafts match these filters" },
      }}
    />
  );
}

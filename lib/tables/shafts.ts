import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { WorkOrderState } from "@/lib/floor/states";
import type { ListShaftsQuery, ShaftTableRow } from "./shafts-spec";
import { containsPattern } from "./params";
import { shopToday } from "@/lib/shop/locale";
import { pagedSelect, type Page } from "./sql";

const ORDER_BY: Record<ListShaftsQuery["sort"], string[]> = {
  serial: ["w.serial_year", "w.serial_sequence"],
  order: ["o.number"],
  customer: ["lower(c.name)"],
  promised: ["o.promised_date"],
  state: ["w.state"],
  step: ["w.current_position"],
  released: ["w.created_at"],
};

interface RawShaftRow {
  id: string;
  serial: string;
  revision: number;
  order_id: string;
  order_number: string;
  customer_name: string;
  state: WorkOrderState;
  current_position: number;
  step_count: number;
  step_code: string | null;
  step_name: string | null;
  promised_date: string;
  created_at: Date;
  order_status: string;
  shaft_name: string;
  tube_id: string | null;
  tube_od: string | null;
  tube_wall: string | null;
  hold_step: string | null;
  hold_since: Date | null;
}

function tubeText(r: RawShaftRow): string {
  const size =
    r.tube_od && r.tube_wall ? `${Number(r.tube_od).toFixed(1)} × ${Number(r.tube_wall).toFixed(2)} mm` : "";
  if (r.tube_id && size) return `${r.tube_id} (${size})`;
  return r.tube_id ?? (size || "—");
}

/**
 * One page of shafts on the floor (work orders) with the step each waits for, its hold and its
 * tube, and how many match: one statement (the tube and hold are read for the page's rows only).
 */
export async function shaftTablePage(
  em: EntityManager,
  q: ListShaftsQuery,
  options: { limit?: number; offset?: number; today?: string } = {},
): Promise<Page<ShaftTableRow>> {
  const today = options.today ?? (await shopToday());
  const knex = em.getKnex();
  const base = knex
    .select(
      "w.id",
      "w.serial",
      "w.revision",
      "w.order_id",
      "w.order_shaft_id",
      "o.number as order_number",
      "c.name as customer_name",
      "w.state",
      "w.current_position",
      "w.step_count",
      "cs.id as step_id",
      "cs.code as step_code",
      knex.raw("o.promised_date::text as promised_date"),
      "o.status as order_status",
      "w.created_at",
    )
    .from("work_order as w")
    .join("shop_order as o", "o.id", "w.order_id")
    .join("customer as c", "c.id", "o.customer_id")
    .leftJoin("work_order_step as cs", (j) =>
      j
        .on("cs.work_order_id", "w.id")
        .andOn("cs.revision", "w.revision")
        .andOn("cs.position", "w.current_position"),
    );
  if (q.step === "DONE") base.whereNull("cs.id");
  else if (q.step) base.where("cs.code", q.step);
  if (q.hold) base.where("w.state", "on_hold");
  if (q.state === "open") base.whereNotIn("w.state", ["shipped", "picked_up"]);
  else if (q.state) base.where("w.state", q.state);
  if (q.q) {
    const like = containsPattern(q.q);
    base.where((w) => w.whereRaw("w.serial ilike ?", [like]).orWhereRaw("o.number ilike ?", [like]));
  }
  const page = await pagedSelect<RawShaftRow>(em, {
    base,
    idColumn: "w.id",
    sortKeys: ORDER_BY[q.sort],
    dir: q.dir,
    limit: options.limit ?? q.size,
    offset: options.offset ?? (q.page - 1) * q.size,
    enrich: `
      join order_shaft os on os.id = p.order_shaft_id
      left join work_order_step cs2 on cs2.id = p.step_id
      left join lateral (
        select hs.spec ->> 'name' as hold_step,
               (select max(r.at) from step_record r where r.step_id = hs.id and r.outcome = 'hold') as hold_since
        from work_order_step hs
        where hs.work_order_id = p.id and hs.revision = p.revision and hs.state = 'on_hold'
        order by hs.position limit 1
      ) h on true`,
    enrichColumns: `os.name as shaft_name, cs2.spec ->> 'name' as step_name,
      os.evaluation #>> '{tube,tubeId}' as tube_id, os.evaluation #>> '{tube,odMm}' as tube_od,
      os.evaluation #>> '{tube,wallMm}' as tube_wall, h.hold_step, h.hold_since`,
  });
  return {
    total: page.total,
    rows: page.rows.map((r) => ({
      workOrderId: r.id,
      serial: r.serial,
      revision: r.revision,
      orderId: r.order_id,
      orderNumber: r.order_number,
      customerName: r.customer_name,
      shaftName: r.shaft_name,
      state: r.state,
      stepCode: r.step_code,
      stepName: r.step_name,
      position: Math.min(r.current_position, r.step_count),
      stepCount: r.step_count,
      onHold: r.state === "on_hold",
      holdStep: r.hold_step,
      holdSince: r.hold_since ? new Date(r.hold_since).toISOString() : null,
      tube: tubeText(r),
      promisedDate: r.promised_date,
      late:
        !["shipped", "picked_up"].includes(r.state) &&
        !["shipped", "cancelled"].includes(r.order_status) &&
        r.promised_date < today,
      releasedAt: new Date(r.created_at).toISOString(),
    })),
  };
}

import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { StepOutcome } from "@/lib/floor/states";
import type { ListStepsQuery, StepTableRow } from "./steps-spec";
import { getShopLocale } from "@/lib/shop/locale";
import { pagedSelect, type Page } from "./sql";

const ORDER_BY: Record<ListStepsQuery["sort"], string[]> = {
  at: ["r.at"],
  serial: ["w.serial_year", "w.serial_sequence", "r.at"],
  step: ["s.position", "r.at"],
  result: ["r.outcome", "r.at"],
  user: ["lower(u.name)", "r.at"],
};

interface RawStepRow {
  id: string;
  at: Date;
  serial: string;
  revision: number;
  order_id: string;
  order_number: string;
  step_code: string;
  step_name: string | null;
  position: number;
  outcome: StepOutcome;
  by_name: string | null;
  notes: string | null;
}

/** One page of step records and how many match (one statement; names and failures for the page only). */
export async function stepTablePage(
  em: EntityManager,
  q: ListStepsQuery,
  options: { limit?: number; offset?: number } = {},
): Promise<Page<StepTableRow>> {
  const knex = em.getKnex();
  const base = knex
    .select(
      "r.id",
      "r.at",
      "w.serial",
      "r.revision",
      "w.order_id",
      "o.number as order_number",
      "r.step_id",
      "s.code as step_code",
      "s.position",
      "r.outcome",
      "u.name as by_name",
    )
    .from("step_record as r")
    .join("work_order as w", "w.id", "r.work_order_id")
    .join("work_order_step as s", "s.id", "r.step_id")
    .join("shop_order as o", "o.id", "w.order_id")
    .leftJoin("app_user as u", "u.id", "r.by_id");
  if (q.step) base.where("s.code", q.step);
  if (q.result) base.where("r.outcome", q.result);
  if (q.user) base.where("r.by_id", q.user);
  // Whole days in the shop's time zone (its midnight to midnight), the `to` day included.
  if (q.from || q.to) {
    const { timeZone } = await getShopLocale();
    if (q.from) base.where("r.at", ">=", knex.raw("(?::date)::timestamp at time zone ?", [q.from, timeZone]));
    if (q.to) base.where("r.at", "<", knex.raw("(?::date + 1)::timestamp at time zone ?", [q.to, timeZone]));
  }
  const page = await pagedSelect<RawStepRow>(em, {
    base,
    idColumn: "r.id",
    sortKeys: ORDER_BY[q.sort],
    dir: q.dir,
    nullsLast: q.sort === "user",
    limit: options.limit ?? q.size,
    offset: options.offset ?? (q.page - 1) * q.size,
    enrich: `
      join work_order_step s2 on s2.id = p.step_id
      join step_record r2 on r2.id = p.id`,
    enrichColumns: `s2.spec ->> 'name' as step_name,
      coalesce(r2.reason, (select string_agg(f ->> 'message', '; ') from jsonb_array_elements(coalesce(r2.failures, '[]'::jsonb)) f)) as notes`,
  });
  return {
    total: page.total,
    rows: page.rows.map((r) => ({
      id: r.id,
      at: new Date(r.at).toISOString(),
      serial: r.serial,
      revision: r.revision,
      orderId: r.order_id,
      orderNumber: r.order_number,
      stepCode: r.step_code,
      stepName: r.step_name ?? r.step_code,
      position: r.position,
      outcome: r.outcome,
      byName: r.by_name,
      notes: r.notes ?? "",
    })),
  };
}

/** The staff who may appear in the "signed by" filter (floor and owners), by name. */
export async function stepUserOptions(em: EntityManager): Promise<{ value: string; label: string }[]> {
  const rows = await em.execute<{ id: string; name: string }[]>(
    em.getKnex().select("id", "name").from("app_user").whereIn("role", ["floor", "owner"]).orderBy("name"),
  );
  return rows.map((r) => ({ value: r.id, label: r.name }));
}

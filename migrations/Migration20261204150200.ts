import { Migration } from "@mikro-orm/migrations";

/**
 * Indexes the owner's overview reads (lib/shop/overview-queries.ts): orders by state with their
 * value, open orders by promised date, money still owed, payments taken and refunds by date, and
 * signed-off steps by code and by time (throughput, time per step, days to ship).
 */
export const OVERVIEW_INDEXES = {
  shop_order_status_money_index: `create index "shop_order_status_money_index" on "shop_order" ("status") include ("total_cents")`,
  shop_order_open_promised_index: `create index "shop_order_open_promised_index" on "shop_order" ("promised_date") include ("status", "customer_id", "total_cents", "paid_cents", "refunded_cents") where status not in ('shipped', 'cancelled')`,
  shop_order_owed_index: `create index "shop_order_owed_index" on "shop_order" ("status") include ("total_cents", "paid_cents") where paid_cents < total_cents and status <> 'cancelled'`,
  payment_succeeded_paid_at_index: `create index "payment_succeeded_paid_at_index" on "payment" ("paid_at") include ("kind", "amount_cents") where status = 'succeeded'`,
  refund_created_at_index: `create index "refund_created_at_index" on "refund" ("created_at") include ("amount_cents")`,
  work_order_step_done_code_index: `create index "work_order_step_done_code_index" on "work_order_step" ("code", "completed_at") include ("work_order_id", "revision", "position") where state = 'done'`,
} as const;

export class Migration20261204150200 extends Migration {
  override async up(): Promise<void> {
    for (const sql of Object.values(OVERVIEW_INDEXES)) this.addSql(`${sql};`);
  }

  override async down(): Promise<void> {
    for (const name of Object.keys(OVERVIEW_INDEXES)) this.addSql(`drop index if exists "${name}";`);
  }
}

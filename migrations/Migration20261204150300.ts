import { Migration } from "@mikro-orm/migrations";

/**
 * Indexes for the staff tables' filters and sorts (lib/tables): an order's shafts by order, orders
 * by promised date (the open ones that "late" and "open" look at use the overview's index), customers by name,
 * shafts on hold per order, step records by time and by who signed them.
 */
export class Migration20261204150300 extends Migration {
  override async up(): Promise<void> {
    // An order's shafts are looked up by order on every listing (there was no index on it).
    this.addSql(`create index if not exists "order_shaft_order_id_index" on "order_shaft" ("order_id");`);
    this.addSql(`create index "shop_order_promised_date_index" on "shop_order" ("promised_date");`);
    this.addSql(`create index "customer_lower_name_index" on "customer" (lower(name));`);
    this.addSql(
      `create index "work_order_on_hold_order_index" on "work_order" ("order_id") where state = 'on_hold';`,
    );
    this.addSql(`create index "step_record_at_index" on "step_record" ("at");`);
    this.addSql(`create index "step_record_by_id_at_index" on "step_record" ("by_id", "at");`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop index if exists "step_record_by_id_at_index";`);
    this.addSql(`drop index if exists "step_record_at_index";`);
    this.addSql(`drop index if exists "work_order_on_hold_order_index";`);
    this.addSql(`drop index if exists "customer_lower_name_index";`);
    this.addSql(`drop index if exists "shop_order_promised_date_index";`);
    this.addSql(`drop index if exists "order_shaft_order_id_index";`);
  }
}

import { Migration } from "@mikro-orm/migrations";

/**
 * The orders table (lib/tables/orders.ts) sorted by total or by balance due: an index on each, so
 * its page is the first rows of an index instead of a sort of every order.
 */
export class Migration20261207100000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create index "shop_order_total_cents_index" on "shop_order" ("total_cents");`);
    this.addSql(`create index "shop_order_balance_index" on "shop_order" (("total_cents" - "paid_cents"));`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop index if exists "shop_order_balance_index";`);
    this.addSql(`drop index if exists "shop_order_total_cents_index";`);
  }
}

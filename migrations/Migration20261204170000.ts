import { Migration } from "@mikro-orm/migrations";

/**
 * When an order left the shop, stored on the order (set by the floor when the last shaft ships or
 * is picked up), so the owner's "days from order to ship" reads one index range instead of joining
 * every step. Orders already shipped get the time of their last sign-off (the dispatch step is last).
 */
export class Migration20261204170000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "shop_order" add column "shipped_at" timestamptz null;`);
    this.addSql(
      `update "shop_order" o set "shipped_at" = coalesce(
         (select max(s.completed_at) from "work_order_step" s join "work_order" w on w.id = s.work_order_id
          where w.order_id = o.id and s.state = 'done'),
         o.updated_at)
       where o.status = 'shipped';`,
    );
    this.addSql(
      `create index "shop_order_shipped_at_index" on "shop_order" ("shipped_at") include ("created_at") where shipped_at is not null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop index if exists "shop_order_shipped_at_index";`);
    this.addSql(`alter table "shop_order" drop column "shipped_at";`);
  }
}

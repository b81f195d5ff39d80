import { Migration } from "@mikro-orm/migrations";

/**
 * The orders table's search (lib/tables/orders.ts): "contains" on the order's number and on its
 * customer's name, e-mail and company, served by trigram indexes instead of an ILIKE over every
 * order (pg_trgm is already there: Migration20261204150500: the customer search).
 */
export class Migration20261206100000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create extension if not exists pg_trgm;`);
    this.addSql(
      `create index "shop_order_number_trgm_index" on "shop_order" using gin ("number" gin_trgm_ops);`,
    );
    this.addSql(`create index "customer_name_trgm_index" on "customer" using gin ("name" gin_trgm_ops);`);
    this.addSql(`create index "customer_email_trgm_index" on "customer" using gin ("email" gin_trgm_ops);`);
    this.addSql(
      `create index "customer_company_trgm_index" on "customer" using gin ("company" gin_trgm_ops);`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop index if exists "customer_company_trgm_index";`);
    this.addSql(`drop index if exists "customer_email_trgm_index";`);
    this.addSql(`drop index if exists "customer_name_trgm_index";`);
    this.addSql(`drop index if exists "shop_order_number_trgm_index";`);
  }
}

import { Migration } from "@mikro-orm/migrations";

/**
 * The counter's phone orders: each ordered shaft keeps who acknowledged each of its warnings, and
 * the counter finds customers on the server by any part of their name, e-mail, company or phone
 * (trigram indexes; the phone also by its digits alone).
 */
export class Migration20261204150500 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `alter table "order_shaft" add column "warning_acknowledgements" jsonb not null default '[]';`,
    );
    this.addSql(`create extension if not exists pg_trgm;`);
    this.addSql(
      `create index "customer_search_trgm_index" on "customer" using gin ((lower(name || ' ' || email || ' ' || coalesce(company, '') || ' ' || coalesce(phone, ''))) gin_trgm_ops);`,
    );
    this.addSql(
      `create index "customer_phone_digits_trgm_index" on "customer" using gin ((regexp_replace(coalesce(phone, ''), '[^0-9]', '', 'g')) gin_trgm_ops);`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop index if exists "customer_phone_digits_trgm_index";`);
    this.addSql(`drop index if exists "customer_search_trgm_index";`);
    this.addSql(`alter table "order_shaft" drop column "warning_acknowledgements";`);
  }
}

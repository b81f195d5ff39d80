import { Migration } from "@mikro-orm/migrations";

/** Versions of the shop's configuration (each save a new one, kept), and the version each order was priced with. */
export class Migration20261204150100 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "shop_config" add column "version" int not null default 1;`);
    this.addSql(
      `create table "shop_config_version" ("version" int not null, "catalogue" jsonb not null, "settings" jsonb not null, "price_book" jsonb not null, "floor" jsonb not null, "note" text not null, "created_by_id" text null, "created_by_name" text not null, "created_at" timestamptz not null default now(), constraint "shop_config_version_pkey" primary key ("version"));`,
    );
    this.addSql(
      `alter table "shop_config_version" add constraint "shop_config_version_created_by_id_foreign" foreign key ("created_by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );
    this.addSql(`alter table "shop_order" add column "config_version" int null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "shop_order" drop column "config_version";`);
    this.addSql(`drop table if exists "shop_config_version" cascade;`);
    this.addSql(`alter table "shop_config" drop column "version";`);
  }
}

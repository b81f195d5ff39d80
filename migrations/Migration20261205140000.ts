import { Migration } from "@mikro-orm/migrations";

/** Orders carry a version for the desk's details form: a save based on an older one is refused. */
export class Migration20261205140000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "shop_order" add column "version" integer not null default 1;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "shop_order" drop column "version";`);
  }
}

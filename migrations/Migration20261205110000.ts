import { Migration } from "@mikro-orm/migrations";

/**
 * Re-tube / repair orders: a draft can carry the counter's intake of the customer's shaft
 * (weld-to-weld, parts reused), and each ordered shaft is a new shaft or a re-tube with that
 * intake frozen on it. Existing shafts are new shafts.
 */
export class Migration20261205110000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "design" add column "repair" jsonb null;`);
    this.addSql(`alter table "order_shaft" add column "job" text not null default 'new';`);
    this.addSql(`alter table "order_shaft" add column "repair" jsonb null;`);
    this.addSql(
      `alter table "order_shaft" add constraint "order_shaft_job_kind_check" check (job = 'new' or job = 'retube');`,
    );
    this.addSql(
      `alter table "order_shaft" add constraint "order_shaft_repair_check" check ((job = 'retube') = (repair is not null));`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "order_shaft" drop constraint if exists "order_shaft_repair_check";`);
    this.addSql(`alter table "order_shaft" drop constraint if exists "order_shaft_job_kind_check";`);
    this.addSql(`alter table "order_shaft" drop column "repair";`);
    this.addSql(`alter table "order_shaft" drop column "job";`);
    this.addSql(`alter table "design" drop column "repair";`);
  }
}

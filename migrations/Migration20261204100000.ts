import { Migration } from "@mikro-orm/migrations";

/** Failed sign-in attempts per account (the per-account lock beside the per-address rate limit). */
export class Migration20261204100000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "auth_sign_in_failure" ("email" text not null, "failures" int not null, "first_failed_at" timestamptz not null, "locked_until" timestamptz null, constraint "auth_sign_in_failure_pkey" primary key ("email"));`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "auth_sign_in_failure" cascade;`);
  }
}

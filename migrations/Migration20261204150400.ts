import { Migration } from "@mikro-orm/migrations";

/**
 * The desk's order page: payments taken at the counter (method and reference; no checkout session),
 * refunds given back by hand (no provider id), notes on an order (staff-only or for the customer),
 * cancellation (when and why; the floor's work orders voided), and the owner's acceptance of a
 * failed engineering check for one order shaft.
 */
export class Migration20261204150400 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create type "payment_method" as enum ('checkout', 'cash', 'cheque', 'terminal');`);
    this.addSql(`create type "note_visibility" as enum ('staff', 'customer');`);
    this.addSql(
      `create table "order_note" ("id" uuid not null, "order_id" uuid not null, "visibility" "note_visibility" not null, "body" text not null, "author_id" text null, "author_name" text not null, "created_at" timestamptz not null default now(), constraint "order_note_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "order_note_order_id_index" on "order_note" ("order_id");`);
    this.addSql(
      `alter table "order_note" add constraint "order_note_order_id_foreign" foreign key ("order_id") references "shop_order" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "order_note" add constraint "order_note_author_id_foreign" foreign key ("author_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "shop_order" add column "cancelled_at" timestamptz null, add column "cancel_reason" text null;`,
    );

    this.addSql(
      `alter table "payment" add column "method" "payment_method" not null default 'checkout', add column "reference" text null;`,
    );
    this.addSql(`alter table "payment" alter column "checkout_session_id" drop not null;`);
    this.addSql(`alter table "payment" alter column "checkout_url" drop not null;`);
    this.addSql(
      `alter table "payment" add constraint payment_checkout_has_session_check check(method <> 'checkout' or (checkout_session_id is not null and checkout_url is not null));`,
    );

    this.addSql(`alter table "refund" alter column "provider_refund_id" drop not null;`);

    this.addSql(
      `alter table "order_shaft" add column "failed_check_acceptances" jsonb not null default '[]';`,
    );

    this.addSql(
      `alter table "work_order" add column "voided_at" timestamptz null, add column "void_reason" text null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "order_note" cascade;`);
    this.addSql(`alter table "order_shaft" drop column "failed_check_acceptances";`);
    this.addSql(`alter table "payment" drop constraint payment_checkout_has_session_check;`);
    this.addSql(`alter table "payment" drop column "method", drop column "reference";`);
    this.addSql(`alter table "payment" alter column "checkout_session_id" set not null;`);
    this.addSql(`alter table "payment" alter column "checkout_url" set not null;`);
    this.addSql(`alter table "refund" alter column "provider_refund_id" set not null;`);
    this.addSql(`alter table "shop_order" drop column "cancelled_at", drop column "cancel_reason";`);
    this.addSql(`alter table "work_order" drop column "voided_at", drop column "void_reason";`);
    this.addSql(`drop type "payment_method";`);
    this.addSql(`drop type "note_visibility";`);
  }
}

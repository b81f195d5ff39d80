import { Migration } from "@mikro-orm/migrations";

export class Migration20261202070021 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create type "email_status" as enum ('queued', 'sent', 'failed');`);
    this.addSql(`create type "order_channel" as enum ('online', 'counter');`);
    this.addSql(
      `create type "order_status" as enum ('awaiting_payment', 'received', 'in_shop', 'ready', 'shipped', 'cancelled');`,
    );
    this.addSql(
      `create type "payment_state" as enum ('unpaid', 'deposit_paid', 'paid', 'partially_refunded', 'refunded');`,
    );
    this.addSql(`create type "fulfilment" as enum ('pickup', 'ship');`);
    this.addSql(`create type "payment_kind" as enum ('deposit', 'balance', 'full');`);
    this.addSql(`create type "payment_status" as enum ('open', 'succeeded', 'failed', 'expired');`);
    this.addSql(
      `create table "email_message" ("id" uuid not null, "template" text not null, "to" text not null, "subject" text not null, "html" text not null, "text" text not null, "order_id" uuid null, "status" "email_status" not null default 'queued', "attempts" int not null default 0, "last_error" text null, "provider" text null, "provider_message_id" text null, "created_at" timestamptz not null default now(), "sent_at" timestamptz null, constraint "email_message_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "email_message_order_id_index" on "email_message" ("order_id");`);
    this.addSql(`create index "email_message_status_index" on "email_message" ("status");`);
    this.addSql(`create index "email_message_created_at_index" on "email_message" ("created_at");`);

    this.addSql(
      `create table "shop_config" ("id" int not null default 1, "catalogue" jsonb not null, "settings" jsonb not null, "price_book" jsonb not null, "updated_at" timestamptz not null default now(), constraint "shop_config_pkey" primary key ("id"));`,
    );

    this.addSql(
      `create table "shop_order" ("id" uuid not null, "number" text not null, "customer_id" uuid not null, "placed_by_id" text null, "channel" "order_channel" not null, "status" "order_status" not null default 'awaiting_payment', "payment_state" "payment_state" not null default 'unpaid', "fulfilment" "fulfilment" not null, "ship_to" text null, "currency" text not null, "subtotal_cents" int not null, "tax_cents" int not null, "shipping_cents" int not null, "total_cents" int not null, "deposit_cents" int not null, "paid_cents" int not null default 0, "refunded_cents" int not null default 0, "promised_date" date not null, "notes" text null, "created_at" timestamptz not null default now(), "updated_at" timestamptz not null default now(), constraint "shop_order_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "shop_order" add constraint "shop_order_number_unique" unique ("number");`);
    this.addSql(`create index "shop_order_customer_id_index" on "shop_order" ("customer_id");`);
    this.addSql(`create index "shop_order_status_index" on "shop_order" ("status");`);
    this.addSql(`create index "shop_order_created_at_index" on "shop_order" ("created_at");`);

    this.addSql(
      `create table "upload" ("id" uuid not null, "order_id" uuid not null, "uploaded_by_id" text null, "filename" text not null, "content_type" text not null, "size_bytes" int not null, "storage_key" text not null, "sha256" text not null, "created_at" timestamptz not null default now(), constraint "upload_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "upload_order_id_index" on "upload" ("order_id");`);
    this.addSql(`alter table "upload" add constraint "upload_storage_key_unique" unique ("storage_key");`);

    this.addSql(
      `create table "payment" ("id" uuid not null, "order_id" uuid not null, "kind" "payment_kind" not null, "amount_cents" int not null, "currency" text not null, "status" "payment_status" not null default 'open', "checkout_session_id" text not null, "checkout_url" text not null, "payment_intent_id" text null, "refunded_cents" int not null default 0, "failure_message" text null, "requested_by_id" text null, "created_at" timestamptz not null default now(), "paid_at" timestamptz null, constraint "payment_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "payment_order_id_index" on "payment" ("order_id");`);
    this.addSql(
      `alter table "payment" add constraint "payment_checkout_session_id_unique" unique ("checkout_session_id");`,
    );

    this.addSql(
      `create table "refund" ("id" uuid not null, "payment_id" uuid not null, "amount_cents" int not null, "provider_refund_id" text not null, "reason" text not null, "by_id" text null, "created_at" timestamptz not null default now(), constraint "refund_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "refund" add constraint "refund_provider_refund_id_unique" unique ("provider_refund_id");`,
    );

    this.addSql(
      `create table "order_shaft" ("id" uuid not null, "order_id" uuid not null, "position" int not null, "name" text not null, "application" jsonb null, "design" jsonb not null, "evaluation" jsonb not null, "overall" text not null, "price_lines" jsonb not null, "price_cents" int not null, constraint "order_shaft_pkey" primary key ("id"));`,
    );

    this.addSql(
      `create table "order_event" ("id" uuid not null, "order_id" uuid not null, "kind" text not null, "label" text not null, "public" boolean not null default true, "actor_id" text null, "at" timestamptz not null default now(), constraint "order_event_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "order_event_order_id_index" on "order_event" ("order_id");`);

    this.addSql(
      `create table "design" ("id" uuid not null, "name" text not null, "design" jsonb not null, "application" jsonb null, "customer_id" uuid null, "created_by_id" text not null, "created_at" timestamptz not null default now(), "updated_at" timestamptz not null default now(), constraint "design_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "design_customer_id_index" on "design" ("customer_id");`);

    this.addSql(
      `create table "webhook_event" ("id" text not null, "type" text not null, "payload" jsonb not null, "received_at" timestamptz not null default now(), "deliveries" int not null default 1, constraint "webhook_event_pkey" primary key ("id"));`,
    );

    this.addSql(
      `alter table "shop_order" add constraint "shop_order_customer_id_foreign" foreign key ("customer_id") references "customer" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "shop_order" add constraint "shop_order_placed_by_id_foreign" foreign key ("placed_by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "upload" add constraint "upload_order_id_foreign" foreign key ("order_id") references "shop_order" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "upload" add constraint "upload_uploaded_by_id_foreign" foreign key ("uploaded_by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "payment" add constraint "payment_order_id_foreign" foreign key ("order_id") references "shop_order" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "payment" add constraint "payment_requested_by_id_foreign" foreign key ("requested_by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "refund" add constraint "refund_payment_id_foreign" foreign key ("payment_id") references "payment" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "refund" add constraint "refund_by_id_foreign" foreign key ("by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "order_shaft" add constraint "order_shaft_order_id_foreign" foreign key ("order_id") references "shop_order" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `alter table "order_event" add constraint "order_event_order_id_foreign" foreign key ("order_id") references "shop_order" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "order_event" add constraint "order_event_actor_id_foreign" foreign key ("actor_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "design" add constraint "design_customer_id_foreign" foreign key ("customer_id") references "customer" ("id") on update cascade on delete set null;`,
    );
    this.addSql(
      `alter table "design" add constraint "design_created_by_id_foreign" foreign key ("created_by_id") references "app_user" ("id") on update cascade on delete cascade;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "upload" drop constraint "upload_order_id_foreign";`);

    this.addSql(`alter table "payment" drop constraint "payment_order_id_foreign";`);

    this.addSql(`alter table "order_shaft" drop constraint "order_shaft_order_id_foreign";`);

    this.addSql(`alter table "order_event" drop constraint "order_event_order_id_foreign";`);

    this.addSql(`alter table "refund" drop constraint "refund_payment_id_foreign";`);

    this.addSql(`drop table if exists "email_message" cascade;`);

    this.addSql(`drop table if exists "shop_config" cascade;`);

    this.addSql(`drop table if exists "shop_order" cascade;`);

    this.addSql(`drop table if exists "upload" cascade;`);

    this.addSql(`drop table if exists "payment" cascade;`);

    this.addSql(`drop table if exists "refund" cascade;`);

    this.addSql(`drop table if exists "order_shaft" cascade;`);

    this.addSql(`drop table if exists "order_event" cascade;`);

    this.addSql(`drop table if exists "design" cascade;`);

    this.addSql(`drop table if exists "webhook_event" cascade;`);

    this.addSql(`drop type "email_status";`);
    this.addSql(`drop type "order_channel";`);
    this.addSql(`drop type "order_status";`);
    this.addSql(`drop type "payment_state";`);
    this.addSql(`drop type "fulfilment";`);
    this.addSql(`drop type "payment_kind";`);
    this.addSql(`drop type "payment_status";`);
  }
}

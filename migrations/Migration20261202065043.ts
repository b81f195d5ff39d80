import { Migration } from "@mikro-orm/migrations";

export class Migration20261202065043 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create type "user_role" as enum ('customer', 'counter', 'floor', 'owner');`);
    this.addSql(
      `create table "auth_rate_limit" ("id" text not null, "key" text not null, "count" int not null, "last_request" bigint not null, constraint "auth_rate_limit_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "auth_rate_limit" add constraint "auth_rate_limit_key_unique" unique ("key");`);

    this.addSql(
      `create table "shop" ("id" int not null default 1, "name" text not null, "address_lines" text not null, "phone" text not null, "email" text not null, "currency" text not null default 'USD', "updated_at" timestamptz not null default now(), constraint "shop_pkey" primary key ("id"));`,
    );

    this.addSql(
      `create table "app_user" ("id" text not null, "name" text not null, "email" text not null, "email_verified" boolean not null default false, "image" text null, "role" "user_role" not null default 'customer', "created_at" timestamptz not null default now(), "updated_at" timestamptz not null default now(), constraint "app_user_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "app_user" add constraint "app_user_email_unique" unique ("email");`);

    this.addSql(
      `create table "auth_session" ("id" text not null, "expires_at" timestamptz not null, "token" text not null, "created_at" timestamptz not null default now(), "updated_at" timestamptz not null default now(), "ip_address" text null, "user_agent" text null, "user_id" text not null, constraint "auth_session_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "auth_session" add constraint "auth_session_token_unique" unique ("token");`);
    this.addSql(`create index "auth_session_user_id_index" on "auth_session" ("user_id");`);

    this.addSql(
      `create table "customer" ("id" uuid not null, "name" text not null, "email" text not null, "phone" text null, "company" text null, "address_lines" text null, "user_id" text null, "created_at" timestamptz not null default now(), constraint "customer_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "customer_email_index" on "customer" ("email");`);
    this.addSql(`alter table "customer" add constraint "customer_user_id_unique" unique ("user_id");`);

    this.addSql(
      `create table "audit_event" ("id" uuid not null, "at" timestamptz not null default now(), "actor_id" text null, "action" text not null, "subject_type" text not null, "subject_id" text not null, "details" jsonb null, constraint "audit_event_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "audit_event_at_index" on "audit_event" ("at");`);
    this.addSql(
      `create index "audit_event_subject_type_subject_id_index" on "audit_event" ("subject_type", "subject_id");`,
    );

    this.addSql(
      `create table "auth_account" ("id" text not null, "account_id" text not null, "provider_id" text not null, "user_id" text not null, "access_token" text null, "refresh_token" text null, "id_token" text null, "access_token_expires_at" timestamptz null, "refresh_token_expires_at" timestamptz null, "scope" text null, "password" text null, "created_at" timestamptz not null default now(), "updated_at" timestamptz not null default now(), constraint "auth_account_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "auth_account_user_id_index" on "auth_account" ("user_id");`);

    this.addSql(
      `create table "auth_verification" ("id" text not null, "identifier" text not null, "value" text not null, "expires_at" timestamptz not null, "created_at" timestamptz not null default now(), "updated_at" timestamptz not null default now(), constraint "auth_verification_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "auth_verification_identifier_index" on "auth_verification" ("identifier");`);

    this.addSql(
      `alter table "auth_session" add constraint "auth_session_user_id_foreign" foreign key ("user_id") references "app_user" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `alter table "customer" add constraint "customer_user_id_foreign" foreign key ("user_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "audit_event" add constraint "audit_event_actor_id_foreign" foreign key ("actor_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "auth_account" add constraint "auth_account_user_id_foreign" foreign key ("user_id") references "app_user" ("id") on update cascade on delete cascade;`,
    );
  }
}

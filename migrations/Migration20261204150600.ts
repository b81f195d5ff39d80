import { Migration } from "@mikro-orm/migrations";

/** Staff: owners' invitations (hashed one-time links), deactivated accounts, the last sign-in. */
export class Migration20261204150600 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `alter table "app_user" add column "deactivated_at" timestamptz null, add column "last_sign_in_at" timestamptz null;`,
    );
    this.addSql(
      `create table "staff_invitation" ("id" uuid not null, "email" text not null, "name" text not null, "role" "user_role" not null, "token_hash" text not null, "invited_by_id" text null, "created_at" timestamptz not null default now(), "sent_at" timestamptz not null, "send_count" int not null default 1, "expires_at" timestamptz not null, "accepted_at" timestamptz null, "user_id" text null, "revoked_at" timestamptz null, "revoked_by_id" text null, constraint "staff_invitation_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "staff_invitation" add constraint "staff_invitation_token_hash_unique" unique ("token_hash");`,
    );
    this.addSql(`create index "staff_invitation_expires_at_index" on "staff_invitation" ("expires_at");`);
    this.addSql(
      `create unique index "staff_invitation_open_email_unique" on "staff_invitation" (lower(email)) where accepted_at is null and revoked_at is null;`,
    );
    for (const column of ["invited_by_id", "user_id", "revoked_by_id"]) {
      this.addSql(
        `alter table "staff_invitation" add constraint "staff_invitation_${column}_foreign" foreign key ("${column}") references "app_user" ("id") on update cascade on delete set null;`,
      );
    }
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "staff_invitation" cascade;`);
    this.addSql(`alter table "app_user" drop column "deactivated_at", drop column "last_sign_in_at";`);
  }
}

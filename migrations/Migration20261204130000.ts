import { Migration } from "@mikro-orm/migrations";

/** The shop floor: work orders (one per order shaft), their steps per traveller revision, each station's records; the shop's floor settings. */
export class Migration20261204130000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create type "work_order_state" as enum ('released', 'in_shop', 'on_hold', 'ready', 'shipped', 'picked_up');`,
    );
    this.addSql(`create type "work_order_step_state" as enum ('pending', 'on_hold', 'done');`);
    this.addSql(`create type "step_outcome" as enum ('pass', 'hold', 'rework', 'concession');`);
    this.addSql(
      `create table "work_order" ("id" uuid not null, "order_id" uuid not null, "order_shaft_id" uuid not null, "serial" text not null, "serial_year" int not null, "serial_sequence" int not null, "revision" int not null default 1, "state" "work_order_state" not null default 'released', "current_position" int not null default 1, "step_count" int not null, "released_by_id" text null, "release_reason" text null, "created_at" timestamptz not null default now(), "updated_at" timestamptz not null default now(), constraint "work_order_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "work_order_order_id_index" on "work_order" ("order_id");`);
    this.addSql(
      `alter table "work_order" add constraint "work_order_order_shaft_id_unique" unique ("order_shaft_id");`,
    );
    this.addSql(`alter table "work_order" add constraint "work_order_serial_unique" unique ("serial");`);
    this.addSql(`create index "work_order_state_index" on "work_order" ("state");`);
    this.addSql(
      `alter table "work_order" add constraint "work_order_serial_year_serial_sequence_unique" unique ("serial_year", "serial_sequence");`,
    );

    this.addSql(
      `create table "work_order_step" ("id" uuid not null, "work_order_id" uuid not null, "revision" int not null, "position" int not null, "code" text not null, "spec" jsonb not null, "state" "work_order_step_state" not null default 'pending', "completion" text null, "completed_at" timestamptz null, "completed_by_id" text null, constraint "work_order_step_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "work_order_step" add constraint "work_order_step_work_order_id_revision_position_unique" unique ("work_order_id", "revision", "position");`,
    );

    this.addSql(
      `create table "step_record" ("id" uuid not null, "work_order_id" uuid not null, "step_id" uuid not null, "revision" int not null, "by_id" text null, "at" timestamptz not null default now(), "values" jsonb not null, "outcome" "step_outcome" not null, "failures" jsonb null, "reason" text null, "idempotency_key" text not null, "completion_of" uuid null, constraint "step_record_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "step_record_work_order_id_index" on "step_record" ("work_order_id");`);
    this.addSql(`create index "step_record_step_id_index" on "step_record" ("step_id");`);
    this.addSql(
      `alter table "step_record" add constraint "step_record_idempotency_key_unique" unique ("idempotency_key");`,
    );
    this.addSql(
      `alter table "step_record" add constraint "step_record_completion_of_unique" unique ("completion_of");`,
    );

    this.addSql(
      `alter table "work_order" add constraint "work_order_order_id_foreign" foreign key ("order_id") references "shop_order" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "work_order" add constraint "work_order_order_shaft_id_foreign" foreign key ("order_shaft_id") references "order_shaft" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "work_order" add constraint "work_order_released_by_id_foreign" foreign key ("released_by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "work_order_step" add constraint "work_order_step_work_order_id_foreign" foreign key ("work_order_id") references "work_order" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "work_order_step" add constraint "work_order_step_completed_by_id_foreign" foreign key ("completed_by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "step_record" add constraint "step_record_work_order_id_foreign" foreign key ("work_order_id") references "work_order" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "step_record" add constraint "step_record_step_id_foreign" foreign key ("step_id") references "work_order_step" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "step_record" add constraint "step_record_by_id_foreign" foreign key ("by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(`alter table "shop_config" add column "floor" jsonb not null default '{}';`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "work_order_step" drop constraint "work_order_step_work_order_id_foreign";`);

    this.addSql(`alter table "step_record" drop constraint "step_record_work_order_id_foreign";`);

    this.addSql(`alter table "step_record" drop constraint "step_record_step_id_foreign";`);

    this.addSql(`drop table if exists "work_order" cascade;`);

    this.addSql(`drop table if exists "work_order_step" cascade;`);

    this.addSql(`drop table if exists "step_record" cascade;`);

    this.addSql(`alter table "shop_config" drop column "floor";`);

    this.addSql(`drop type "work_order_state";`);
    this.addSql(`drop type "work_order_step_state";`);
    this.addSql(`drop type "step_outcome";`);
  }
}

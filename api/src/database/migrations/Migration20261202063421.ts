import { Migration } from '@mikro-orm/migrations';

export class Migration20261202063421 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "bay" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "name" varchar(60) not null, "kind" text check ("kind" in ('hoist', 'alignment', 'tyre')) not null, "position" smallint not null, "active" boolean not null, constraint "bay_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "bay" add constraint "bay_name_unique" unique ("name");`);

    this.addSql(
      `create table "closure" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "start_date" varchar(10) not null, "end_date" varchar(10) not null, "reason" varchar(120) not null, constraint "closure_pkey" primary key ("id"), constraint closure_dates_check check (end_date >= start_date));`,
    );
    this.addSql(`create index "closure_start_date_index" on "closure" ("start_date");`);

    this.addSql(
      `create table "holiday_override" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "date" varchar(10) not null, "note" varchar(120) null, constraint "holiday_override_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "holiday_override" add constraint "holiday_override_date_unique" unique ("date");`,
    );

    this.addSql(
      `create table "opening_hours" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "weekday" smallint not null, "opens_at" varchar(5) not null, "closes_at" varchar(5) not null, "break_starts_at" varchar(5) null, "break_ends_at" varchar(5) null, constraint "opening_hours_pkey" primary key ("id"), constraint opening_hours_weekday_max_check check (weekday <= 7), constraint opening_hours_weekday_min_check check (weekday >= 1));`,
    );
    this.addSql(
      `alter table "opening_hours" add constraint "opening_hours_weekday_unique" unique ("weekday");`,
    );

    this.addSql(
      `create table "booking" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "number" serial, "customer_id" uuid not null, "quote_version_id" uuid not null, "created_by_id" uuid not null, "state" text check ("state" in ('held', 'requested', 'confirmed', 'in-progress', 'completed', 'cancelled', 'expired')) not null, "state_changed_at" timestamptz not null, "starts_at" timestamptz not null, "ends_at" timestamptz not null, "hold_expires_at" timestamptz null, "plan" jsonb not null, "cancelled_at" timestamptz null, "move_request_note" text null, "move_requested_at" timestamptz null, constraint "booking_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "booking" add constraint "booking_number_unique" unique ("number");`);
    this.addSql(`create index "booking_customer_id_index" on "booking" ("customer_id");`);
    this.addSql(`create index "booking_quote_version_id_index" on "booking" ("quote_version_id");`);
    this.addSql(`create index "booking_state_index" on "booking" ("state");`);
    this.addSql(`create index "booking_starts_at_index" on "booking" ("starts_at");`);
    this.addSql(`create index "booking_hold_expires_at_index" on "booking" ("hold_expires_at");`);

    this.addSql(
      `create table "reservation" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "booking_id" uuid not null, "bay_id" uuid not null, "starts_at" timestamptz not null, "ends_at" timestamptz not null, "active" boolean not null, "during" tstzrange generated always as (tstzrange(starts_at, ends_at, '[)')) stored null, constraint "reservation_pkey" primary key ("id"), constraint reservation_interval_check check (ends_at > starts_at));`,
    );
    this.addSql(`create index "reservation_booking_id_index" on "reservation" ("booking_id");`);
    // The database itself refuses two active reservations of one bay whose times overlap. btree_gist
    // gives GiST the uuid equality; the range is the generated "during" column ('[)': a booking
    // ending at 10:00 and one starting at 10:00 do not overlap).
    this.addSql(`create extension if not exists btree_gist;`);
    this.addSql(
      `alter table "reservation" add constraint "reservation_no_overlap" exclude using gist ("bay_id" with =, "during" with &&) where ("active");`,
    );
    this.addSql(
      `create index "reservation_bay_starts_at_index" on "reservation" ("bay_id", "starts_at");`,
    );

    this.addSql(
      `alter table "booking" add constraint "booking_customer_id_foreign" foreign key ("customer_id") references "user" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "booking" add constraint "booking_quote_version_id_foreign" foreign key ("quote_version_id") references "quote_version" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "booking" add constraint "booking_created_by_id_foreign" foreign key ("created_by_id") references "user" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "reservation" add constraint "reservation_booking_id_foreign" foreign key ("booking_id") references "booking" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "reservation" add constraint "reservation_bay_id_foreign" foreign key ("bay_id") references "bay" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "workshop" add column "holiday_region" varchar(20) not null default 'AU-NSW', add column "slot_step_minutes" smallint not null default 30, add column "hold_minutes" smallint not null default 15, add column "lead_time_buffer_days" smallint not null default 1, add column "fitting_minutes_per_wheel" smallint not null default 15;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "reservation" drop constraint "reservation_bay_id_foreign";`);

    this.addSql(`alter table "reservation" drop constraint "reservation_booking_id_foreign";`);

    this.addSql(`drop table if exists "bay" cascade;`);

    this.addSql(`drop table if exists "closure" cascade;`);

    this.addSql(`drop table if exists "holiday_override" cascade;`);

    this.addSql(`drop table if exists "opening_hours" cascade;`);

    this.addSql(`drop table if exists "booking" cascade;`);

    this.addSql(`drop table if exists "reservation" cascade;`);

    this.addSql(
      `alter table "workshop" drop column "holiday_region", drop column "slot_step_minutes", drop column "hold_minutes", drop column "lead_time_buffer_days", drop column "fitting_minutes_per_wheel";`,
    );
  }
}

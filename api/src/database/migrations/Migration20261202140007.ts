import { Migration } from '@mikro-orm/migrations';

export class Migration20261202140007 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "booking_event" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "booking_id" uuid not null, "number" serial, "at" timestamptz not null, "kind" text check ("kind" in ('held', 'deposit-paid', 'requested', 'confirmed', 'moved', 'move-requested', 'started', 'completed', 'cancelled', 'expired', 'top-up-paid', 're-planned', 'needs-move')) not null, "actor_id" uuid null, "detail" text not null, constraint "booking_event_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "booking_event_booking_id_index" on "booking_event" ("booking_id");`);
    this.addSql(
      `alter table "booking_event" add constraint "booking_event_number_unique" unique ("number");`,
    );

    this.addSql(
      `alter table "booking_event" add constraint "booking_event_booking_id_foreign" foreign key ("booking_id") references "booking" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "booking_event" add constraint "booking_event_actor_id_foreign" foreign key ("actor_id") references "user" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "booking" add column "needs_move_reason" text null, add column "needs_move_since" timestamptz null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "booking_event" cascade;`);

    this.addSql(
      `alter table "booking" drop column "needs_move_reason", drop column "needs_move_since";`,
    );
  }
}

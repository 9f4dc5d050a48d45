import { Migration } from '@mikro-orm/migrations';

export class Migration20261202070312 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "processed_webhook_event" ("event_id" varchar(255) not null, "type" varchar(100) not null, "received_at" timestamptz not null, constraint "processed_webhook_event_pkey" primary key ("event_id"));`,
    );

    this.addSql(
      `create table "payment" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "booking_id" uuid not null, "kind" text check ("kind" in ('deposit', 'top-up')) not null, "checkout_session_id" varchar(255) not null, "payment_intent_id" varchar(255) null, "amount_cents" int not null, "currency" varchar(3) not null, "status" text check ("status" in ('open', 'paid', 'expired', 'failed')) not null, "paid_at" timestamptz null, "refunded_cents" int not null default 0, "attempt" smallint not null, "checkout_url" text not null, "expires_at" timestamptz not null, constraint "payment_pkey" primary key ("id"), constraint payment_refunded_cents_check check (refunded_cents >= 0 and refunded_cents <= amount_cents), constraint payment_amount_cents_check check (amount_cents > 0));`,
    );
    this.addSql(`create index "payment_booking_id_index" on "payment" ("booking_id");`);
    this.addSql(
      `alter table "payment" add constraint "payment_checkout_session_id_unique" unique ("checkout_session_id");`,
    );
    this.addSql(
      `alter table "payment" add constraint "payment_payment_intent_id_unique" unique ("payment_intent_id");`,
    );
    this.addSql(`create index "payment_status_index" on "payment" ("status");`);
    this.addSql(
      `alter table "payment" add constraint "payment_booking_attempt_unique" unique ("booking_id", "attempt");`,
    );

    this.addSql(
      `create table "refund" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "payment_id" uuid not null, "provider_refund_id" varchar(255) not null, "amount_cents" int not null, "status" varchar(40) not null, "reason" text not null, constraint "refund_pkey" primary key ("id"), constraint refund_amount_cents_check check (amount_cents > 0));`,
    );
    this.addSql(`create index "refund_payment_id_index" on "refund" ("payment_id");`);
    this.addSql(
      `alter table "refund" add constraint "refund_provider_refund_id_unique" unique ("provider_refund_id");`,
    );

    this.addSql(
      `alter table "payment" add constraint "payment_booking_id_foreign" foreign key ("booking_id") references "booking" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "refund" add constraint "refund_payment_id_foreign" foreign key ("payment_id") references "payment" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "workshop" add column "full_refund_hours_before" smallint not null default 48, add column "late_cancel_refund_percent" smallint not null default 0;`,
    );
    this.addSql(
      `alter table "workshop" add constraint workshop_late_cancel_refund_percent_check check(late_cancel_refund_percent >= 0 and late_cancel_refund_percent <= 100);`,
    );
    this.addSql(
      `alter table "workshop" add constraint workshop_full_refund_hours_before_check check(full_refund_hours_before >= 0);`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "refund" drop constraint "refund_payment_id_foreign";`);

    this.addSql(`drop table if exists "processed_webhook_event" cascade;`);

    this.addSql(`drop table if exists "payment" cascade;`);

    this.addSql(`drop table if exists "refund" cascade;`);

    this.addSql(
      `alter table "workshop" drop constraint workshop_late_cancel_refund_percent_check;`,
    );
    this.addSql(`alter table "workshop" drop constraint workshop_full_refund_hours_before_check;`);
    this.addSql(
      `alter table "workshop" drop column "full_refund_hours_before", drop column "late_cancel_refund_percent";`,
    );
  }
}

import { Migration } from '@mikro-orm/migrations';

export class Migration20261202142024 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `alter table "booking_event" drop constraint if exists "booking_event_kind_check";`,
    );

    this.addSql(`alter table "booking" add column "arrived_at" timestamptz null;`);

    this.addSql(
      `alter table "booking_event" add constraint "booking_event_kind_check" check("kind" in ('held', 'deposit-paid', 'requested', 'confirmed', 'moved', 'move-requested', 'arrived', 'started', 'completed', 'cancelled', 'expired', 'top-up-paid', 're-planned', 'needs-move'));`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(
      `alter table "booking_event" drop constraint if exists "booking_event_kind_check";`,
    );

    this.addSql(`alter table "booking" drop column "arrived_at";`);

    this.addSql(
      `alter table "booking_event" add constraint "booking_event_kind_check" check("kind" in ('held', 'deposit-paid', 'requested', 'confirmed', 'moved', 'move-requested', 'started', 'completed', 'cancelled', 'expired', 'top-up-paid', 're-planned', 'needs-move'));`,
    );
  }
}

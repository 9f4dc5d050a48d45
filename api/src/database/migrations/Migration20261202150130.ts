import { Migration } from '@mikro-orm/migrations';

export class Migration20261202150130 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `alter table "booking_event" drop constraint if exists "booking_event_kind_check";`,
    );

    this.addSql(
      `alter table "booking_event" add constraint "booking_event_kind_check" check("kind" in ('held', 'deposit-paid', 'requested', 'confirmed', 'moved', 'move-requested', 'arrived', 'started', 'completed', 'cancelled', 'expired', 'top-up-paid', 'revision-sent', 'revision-declined', 're-planned', 'needs-move'));`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(
      `alter table "booking_event" drop constraint if exists "booking_event_kind_check";`,
    );

    this.addSql(
      `alter table "booking_event" add constraint "booking_event_kind_check" check("kind" in ('held', 'deposit-paid', 'requested', 'confirmed', 'moved', 'move-requested', 'arrived', 'started', 'completed', 'cancelled', 'expired', 'top-up-paid', 're-planned', 'needs-move'));`,
    );
  }
}

import { Migration } from '@mikro-orm/migrations';

export class Migration20261202072618 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "booking" add column "calendar_sequence" int not null default 0;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "booking" drop column "calendar_sequence";`);
  }
}

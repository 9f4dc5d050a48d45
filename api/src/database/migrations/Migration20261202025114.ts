import { Migration } from '@mikro-orm/migrations';

/** The tables a price preview reads; a write to any of them raises the catalogue revision. */
const WATCHED_TABLES = [
  'product',
  'product_fits_vehicle_model',
  'vehicle_model',
  'rule_set',
  'workshop',
];

export class Migration20261202025114 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "catalogue_revision" ("id" smallint not null default 1, "revision" bigint not null default '0', constraint "catalogue_revision_pkey" primary key ("id"));`,
    );
    this.addSql(`insert into "catalogue_revision" ("id", "revision") values (1, 0);`);
    this.addSql(`create function "bump_catalogue_revision"() returns trigger language plpgsql as $$
begin
  update "catalogue_revision" set "revision" = "revision" + 1 where "id" = 1;
  return null;
end
$$;`);
    for (const table of WATCHED_TABLES) {
      this.addSql(
        `create trigger "${table}_catalogue_revision" after insert or update or delete or truncate on "${table}" for each statement execute function "bump_catalogue_revision"();`,
      );
    }
  }

  override async down(): Promise<void> {
    for (const table of WATCHED_TABLES) {
      this.addSql(`drop trigger if exists "${table}_catalogue_revision" on "${table}";`);
    }
    this.addSql(`drop function if exists "bump_catalogue_revision"();`);
    this.addSql(`drop table if exists "catalogue_revision" cascade;`);
  }
}

import { MikroORM } from '@mikro-orm/postgresql';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DatabaseSeeder } from '../src/database/seeders/database.seeder';
import { DEMO_USERS } from '../src/database/seeders/demo-users.seeder';
import { createOrmConfig } from '../src/mikro-orm.config';
import { testDatabaseUrl } from './support/test-database';

describe('migrations and seeder (against the migrated test database)', () => {
  let orm: MikroORM;

  beforeAll(async () => {
    orm = await MikroORM.init(createOrmConfig(testDatabaseUrl()));
  });

  afterAll(async () => {
    await orm.close(true);
  });

  it('has no pending migration', async () => {
    expect(await orm.getMigrator().getPendingMigrations()).toEqual([]);
  });

  it('has entities that agree with the committed migrations and snapshot (cli.js check)', async () => {
    expect(await orm.getMigrator().checkMigrationNeeded()).toBe(false);
  });

  it('has a migrated database whose schema matches the entities exactly', async () => {
    const diff = await orm
      .getSchemaGenerator()
      .getUpdateSchemaSQL({ dropTables: true, wrap: false });
    expect(diff.trim()).toBe('');
  });

  it('seeds idempotently: a second run changes nothing', async () => {
    const snapshot = async () =>
      (
        await orm.em
          .getConnection()
          .execute<Array<{ email: string; password_hash: string; updated_at: Date }>>(
            'select email, password_hash, updated_at from "user" where email in (?, ?, ?, ?) order by email',
            DEMO_USERS.map((user) => user.email),
          )
      ).map((row) => ({ ...row, updated_at: new Date(row.updated_at).toISOString() }));
    const before = await snapshot();
    expect(before).toHaveLength(DEMO_USERS.length);
    await orm.getSeeder().seed(DatabaseSeeder);
    expect(await snapshot()).toEqual(before);
  });
});

import { MikroORM } from '@mikro-orm/postgresql';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DatabaseSeeder } from '../src/database/seeders/database.seeder';
import { DEMO_PRODUCTS } from '../src/database/seeders/demo-products.data';
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

  it('seeds the demo catalogue idempotently: a second run writes no row', async () => {
    const tables = [
      'rule_set',
      'vehicle_model',
      'product',
      'product_fits_vehicle_model',
      'customer_vehicle',
    ];
    // xmin is the transaction that last wrote a row: an unchanged value written again moves it.
    const snapshot = async () => {
      const connection = orm.em.getConnection();
      const rows: Record<string, unknown> = {};
      for (const table of tables) {
        rows[table] = await connection.execute(
          `select xmin::text as xmin, * from "${table}" order by 2, 3`,
        );
      }
      return JSON.stringify(rows);
    };
    // Earlier suites may have edited demo rows; the first run puts the demo values back.
    await orm.getSeeder().seed(DatabaseSeeder);
    const before = await snapshot();
    await orm.getSeeder().seed(DatabaseSeeder);
    expect(await snapshot()).toBe(before);

    const counts = await orm.em.getConnection().execute<Array<{ kind: string; count: string }>>(
      `select kind, count(*) from product where sku in (${DEMO_PRODUCTS.map(() => '?').join(',')}) group by kind order by kind`,
      DEMO_PRODUCTS.map((product) => product.sku),
    );
    expect(Object.fromEntries(counts.map((row) => [row.kind, Number(row.count)]))).toEqual({
      component: 7,
      service: 5,
      'suspension-kit': 18,
      tyre: 15,
      wheel: 10,
    });
    const ruleSets = await orm.em
      .getConnection()
      .execute<Array<{ name: string; is_default: boolean }>>(
        'select name, is_default from rule_set order by name',
      );
    expect(ruleSets).toEqual([
      { name: 'National code defaults', is_default: true },
      { name: 'Stricter example', is_default: false },
    ]);
  });

  it('allows only one default rule set (partial unique index)', async () => {
    await expect(
      orm.em.getConnection().execute('update rule_set set is_default = true'),
    ).rejects.toThrow(/rule_set_single_default_index/);
  });
});

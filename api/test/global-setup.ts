import { MikroORM } from '@mikro-orm/postgresql';
import { Client } from 'pg';
import { DatabaseSeeder } from '../src/database/seeders/database.seeder';
import { createOrmConfig } from '../src/mikro-orm.config';
import { testDatabaseUrl } from './support/test-database';

/**
 * Drops and recreates the database named in DATABASE_URL, then runs the migrations and the
 * seeder, as `cli.js migrate` and `cli.js seed` do. Refuses any database whose name does not say
 * it is for tests.
 */
export default async function setup(): Promise<void> {
  const url = new URL(testDatabaseUrl());
  const databaseName = decodeURIComponent(url.pathname.replace(/^\//, ''));
  if (!/test/i.test(databaseName)) {
    throw new Error(
      `Refusing to drop "${databaseName}": the test database's name must contain "test".`,
    );
  }
  const maintenanceUrl = new URL(url);
  maintenanceUrl.pathname = '/postgres';
  const client = new Client({ connectionString: maintenanceUrl.toString() });
  await client.connect();
  try {
    const quoted = `"${databaseName.replace(/"/g, '""')}"`;
    await client.query(`drop database if exists ${quoted} with (force)`);
    await client.query(`create database ${quoted}`);
  } finally {
    await client.end();
  }

  const orm = await MikroORM.init(createOrmConfig(url.toString(), { writeSnapshot: false }));
  try {
    await orm.getMigrator().up();
    await orm.getSeeder().seed(DatabaseSeeder);
  } finally {
    await orm.close(true);
  }
}

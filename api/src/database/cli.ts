import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/postgresql';
import { validateDatabaseEnvironment } from '../config/environment';
import { createOrmConfig } from '../mikro-orm.config';
import { DatabaseSeeder } from './seeders/database.seeder';

const USAGE = 'Usage: node dist/database/cli.js <migrate|seed|check>';

interface Command {
  run: (orm: MikroORM) => Promise<number>;
  /** Only commands that compare against the snapshot read it; migrate must not rewrite it. */
  usesSnapshot: boolean;
}

const commands: Record<string, Command> = {
  /** Runs every pending migration, all in one transaction. */
  migrate: {
    usesSnapshot: false,
    async run(orm) {
      const applied = await orm.getMigrator().up();
      process.stdout.write(
        applied.length === 0
          ? 'Database is up to date.\n'
          : `Applied ${applied.length} migration(s): ${applied.map((migration) => migration.name).join(', ')}\n`,
      );
      return 0;
    },
  },

  /** Loads the demo data; safe to run again. */
  seed: {
    usesSnapshot: false,
    async run(orm) {
      await orm.getSeeder().seed(DatabaseSeeder);
      process.stdout.write('Demo data is in place.\n');
      return 0;
    },
  },

  /** Fails when the entities describe a schema that the migrations do not create. */
  check: {
    usesSnapshot: true,
    async run(orm) {
      if (await orm.getMigrator().checkMigrationNeeded()) {
        process.stderr.write(
          'The entities differ from the migrations: create a migration (npx mikro-orm migration:create).\n',
        );
        return 1;
      }
      process.stdout.write('Entities and migrations agree.\n');
      return 0;
    },
  },
};

async function main(): Promise<number> {
  const name = process.argv[2] ?? '';
  const command = Object.hasOwn(commands, name) ? commands[name] : undefined;
  if (!command) {
    process.stderr.write(`${USAGE}\n`);
    return 2;
  }
  const { DATABASE_URL } = validateDatabaseEnvironment(process.env);
  const orm = await MikroORM.init(
    createOrmConfig(DATABASE_URL, { writeSnapshot: command.usesSnapshot }),
  );
  try {
    return await command.run(orm);
  } finally {
    await orm.close(true);
  }
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
    process.exit(1);
  },
);

import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { MIGRATIONS } from './migrations-list';

describe('MIGRATIONS', () => {
  it('lists every migration file, oldest first, under its class name', () => {
    const files = readdirSync(join(__dirname, 'migrations'))
      .filter((file) => /^Migration\d{14}.*\.ts$/.test(file))
      .map((file) => file.replace(/\.ts$/, ''))
      .sort();
    expect(files.length).toBeGreaterThan(0);
    expect(MIGRATIONS.map((migration) => migration.name)).toEqual(files);
    for (const migration of MIGRATIONS) expect(migration.class.name).toBe(migration.name);
  });
});

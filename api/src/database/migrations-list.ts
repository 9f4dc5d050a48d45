import type { MigrationObject } from '@mikro-orm/core';
import { Migration20261201220656 } from './migrations/Migration20261201220656';
import { Migration20261201225254 } from './migrations/Migration20261201225254';
import { Migration20261202014939 } from './migrations/Migration20261202014939';
import { Migration20261202025114 } from './migrations/Migration20261202025114';
import { Migration20261202063421 } from './migrations/Migration20261202063421';
import { Migration20261202070312 } from './migrations/Migration20261202070312';
import { Migration20261202072618 } from './migrations/Migration20261202072618';
import { Migration20261202140007 } from './migrations/Migration20261202140007';
import { Migration20261202142024 } from './migrations/Migration20261202142024';
import { Migration20261202150130 } from './migrations/Migration20261202150130';

/**
 * Every migration, oldest first. Listed explicitly (rather than found by a file glob) so the same
 * list runs from dist, from the TypeScript sources under Vitest and from the CLI; a unit test
 * fails when a file in migrations/ is missing here.
 */
export const MIGRATIONS: MigrationObject[] = [
  { name: 'Migration20261201220656', class: Migration20261201220656 },
  { name: 'Migration20261201225254', class: Migration20261201225254 },
  { name: 'Migration20261202014939', class: Migration20261202014939 },
  { name: 'Migration20261202025114', class: Migration20261202025114 },
  { name: 'Migration20261202063421', class: Migration20261202063421 },
  { name: 'Migration20261202070312', class: Migration20261202070312 },
  { name: 'Migration20261202072618', class: Migration20261202072618 },
  { name: 'Migration20261202140007', class: Migration20261202140007 },
  { name: 'Migration20261202142024', class: Migration20261202142024 },
  { name: 'Migration20261202150130', class: Migration20261202150130 },
];

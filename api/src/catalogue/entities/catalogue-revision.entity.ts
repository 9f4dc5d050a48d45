import { Entity, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * One row whose `revision` goes up, through statement-level triggers (see the migration), with
 * every write to the tables a price preview reads: product, its vehicle links, vehicle_model,
 * rule_set and workshop. An API process keeps a read-only copy of those tables and checks this
 * number (one indexed read) before each use, so a change made through any process is seen by the
 * next request of every process.
 */
@Entity({ tableName: 'catalogue_revision' })
export class CatalogueRevision {
  @PrimaryKey({ type: 'smallint', autoincrement: false })
  id: number = 1;

  /** bigint, read as a string. */
  @Property({ type: 'bigint' })
  revision: string = '0';
}

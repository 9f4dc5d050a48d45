import { randomUUID } from 'node:crypto';
import { OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';

/** Shared columns of every table: a UUID key and UTC creation and change times. */
export abstract class BaseEntity<Optional = never> {
  [OptionalProps]?: 'createdAt' | 'updatedAt' | Optional;

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'datetime', columnType: 'timestamptz' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', columnType: 'timestamptz', onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}

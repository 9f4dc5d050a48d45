import { Entity, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';

/** A public holiday of the region that the workshop opens on anyway (its usual hours). */
@Entity()
@Unique({ name: 'holiday_override_date_unique', properties: ['date'] })
export class HolidayOverride extends BaseEntity<'note'> {
  /** Local date, YYYY-MM-DD. */
  @Property({ type: 'string', length: 10 })
  date: string;

  @Property({ type: 'string', length: 120, nullable: true })
  note: string | null = null;

  constructor(date: string, note: string | null) {
    super();
    this.date = date;
    this.note = note;
  }
}

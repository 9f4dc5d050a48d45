import { Check, Entity, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';

/** Local clock times, 'HH:mm'. */
export interface OpeningHoursFields {
  /** ISO weekday: 1 = Monday … 7 = Sunday. */
  weekday: number;
  opensAt: string;
  closesAt: string;
  breakStartsAt: string | null;
  breakEndsAt: string | null;
}

/** The hours of one weekday, in the workshop's time zone. No row for a weekday: closed. */
@Entity()
@Unique({ name: 'opening_hours_weekday_unique', properties: ['weekday'] })
@Check({ name: 'opening_hours_weekday_min_check', expression: 'weekday >= 1' })
@Check({ name: 'opening_hours_weekday_max_check', expression: 'weekday <= 7' })
export class OpeningHours extends BaseEntity<'breakStartsAt' | 'breakEndsAt'> {
  @Property({ type: 'smallint' })
  weekday: number;

  @Property({ type: 'string', length: 5 })
  opensAt: string;

  @Property({ type: 'string', length: 5 })
  closesAt: string;

  @Property({ type: 'string', length: 5, nullable: true })
  breakStartsAt: string | null = null;

  @Property({ type: 'string', length: 5, nullable: true })
  breakEndsAt: string | null = null;

  constructor(fields: OpeningHoursFields) {
    super();
    this.weekday = fields.weekday;
    this.opensAt = fields.opensAt;
    this.closesAt = fields.closesAt;
    this.breakStartsAt = fields.breakStartsAt;
    this.breakEndsAt = fields.breakEndsAt;
  }
}

import { Check, Entity, Property } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';

/** Days the workshop is shut (local dates, both ends included), with the reason shown. */
@Entity()
@Check({ name: 'closure_dates_check', expression: 'end_date >= start_date' })
export class Closure extends BaseEntity {
  @Property({ type: 'string', length: 10, index: true })
  startDate: string;

  @Property({ type: 'string', length: 10 })
  endDate: string;

  @Property({ type: 'string', length: 120 })
  reason: string;

  constructor(fields: { startDate: string; endDate: string; reason: string }) {
    super();
    this.startDate = fields.startDate;
    this.endDate = fields.endDate;
    this.reason = fields.reason;
  }
}

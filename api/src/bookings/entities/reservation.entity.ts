import { Check, Entity, Index, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';
import { Bay } from '../../workshop/entities/bay.entity';
import { Booking } from './booking.entity';

/**
 * One bay taken from `startsAt` to `endsAt` (half-open, UTC) for one segment of a booking.
 * `during` is the same interval as a tstzrange, computed by PostgreSQL; the exclusion constraint
 * `reservation_no_overlap` (migration, btree_gist) refuses two active reservations of a bay
 * whose ranges overlap. Released reservations stay as history with `active = false`.
 */
@Entity()
@Check({ name: 'reservation_interval_check', expression: 'ends_at > starts_at' })
@Index({ name: 'reservation_bay_starts_at_index', properties: ['bay', 'startsAt'] })
// The guard against double booking. Declared here so the schema diff knows it by name; created by
// the migration together with the btree_gist extension it needs.
@Index({
  name: 'reservation_no_overlap',
  expression:
    'alter table "reservation" add constraint "reservation_no_overlap" exclude using gist ("bay_id" with =, "during" with &&) where ("active")',
})
export class Reservation extends BaseEntity<'active' | 'during'> {
  @ManyToOne(() => Booking, { deleteRule: 'cascade', index: true })
  booking: Booking;

  @ManyToOne(() => Bay, { deleteRule: 'restrict' })
  bay: Bay;

  @Property({ type: 'datetime', columnType: 'timestamptz' })
  startsAt: Date;

  @Property({ type: 'datetime', columnType: 'timestamptz' })
  endsAt: Date;

  @Property({ type: 'boolean' })
  active = true;

  /** Read-only: tstzrange(starts_at, ends_at, '[)'), kept by PostgreSQL. */
  @Property({
    columnType: 'tstzrange',
    generated: "(tstzrange(starts_at, ends_at, '[)')) stored",
    lazy: true,
    hidden: true,
    nullable: true,
  })
  during?: string;

  constructor(fields: { booking: Booking; bay: Bay; startsAt: Date; endsAt: Date }) {
    super();
    this.booking = fields.booking;
    this.bay = fields.bay;
    this.startsAt = fields.startsAt;
    this.endsAt = fields.endsAt;
  }
}

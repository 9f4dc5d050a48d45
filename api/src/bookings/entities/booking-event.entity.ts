import { Entity, Enum, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';
import { User } from '../../users/entities/user.entity';
import { BOOKING_EVENT_KINDS, type BookingEventKind } from '../booking-event-kinds';
import { Booking } from './booking.entity';

/**
 * One line of a booking's audit trail, written in the same transaction as the change it
 * records. `actor` is null for the system (the hold sweep) and the payment provider; `detail`
 * is plain words for the desk and the customer, without internal ids.
 */
@Entity()
export class BookingEvent extends BaseEntity {
  @ManyToOne(() => Booking, { deleteRule: 'cascade', index: true })
  booking: Booking;

  /** Orders events written at the same instant (in one transaction) as they were written. */
  @Property({ type: 'integer', autoincrement: true, unique: true })
  number!: number;

  @Property({ type: 'datetime', columnType: 'timestamptz' })
  at: Date;

  @Enum({ items: () => [...BOOKING_EVENT_KINDS], type: 'string' })
  kind: BookingEventKind;

  @ManyToOne(() => User, { deleteRule: 'set null', nullable: true })
  actor: User | null;

  @Property({ type: 'text' })
  detail: string;

  constructor(fields: {
    booking: Booking;
    at: Date;
    kind: BookingEventKind;
    actor: User | null;
    detail: string;
  }) {
    super();
    this.booking = fields.booking;
    this.at = fields.at;
    this.kind = fields.kind;
    this.actor = fields.actor;
    this.detail = fields.detail;
  }
}

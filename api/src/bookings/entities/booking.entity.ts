import { Collection, Entity, Enum, ManyToOne, OneToMany, Property } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';
import { QuoteVersion } from '../../quotes/entities/quote-version.entity';
import type { BayKind } from '../../catalogue/product-kinds';
import { Payment } from '../../payments/entities/payment.entity';
import { User } from '../../users/entities/user.entity';
import { BOOKING_STATES, type BookingState } from '../booking-states';
import { BookingEvent } from './booking-event.entity';
import { Reservation } from './reservation.entity';

/** The job plan a booking's time was found for, as it was then (a snapshot). */
export interface BookingPlanSnapshot {
  segments: { bayKind: BayKind; minutes: number; descriptions: string[] }[];
  totalMinutes: number;
  longestLeadDays: number;
  earliestStartDate: string;
}

/**
 * Bay time for one quote version. Its reservations (one per segment) hold the bays; the
 * database refuses two active reservations of one bay that overlap.
 */
@Entity()
export class Booking extends BaseEntity<
  | 'holdExpiresAt'
  | 'cancelledAt'
  | 'moveRequestNote'
  | 'moveRequestedAt'
  | 'stateChangedAt'
  | 'calendarSequence'
  | 'needsMoveReason'
  | 'needsMoveSince'
  | 'arrivedAt'
> {
  /** Shown as B-000042; from a sequence. */
  @Property({ type: 'integer', autoincrement: true, unique: true })
  number!: number;

  @ManyToOne(() => User, { deleteRule: 'cascade', index: true })
  customer: User;

  @ManyToOne(() => QuoteVersion, { deleteRule: 'restrict', index: true })
  quoteVersion: QuoteVersion;

  @ManyToOne(() => User, { deleteRule: 'restrict' })
  createdBy: User;

  @Enum({ items: () => [...BOOKING_STATES], type: 'string', index: true })
  state: BookingState;

  @Property({ type: 'datetime', columnType: 'timestamptz' })
  stateChangedAt: Date = new Date();

  /** The first segment's start (UTC). */
  @Property({ type: 'datetime', columnType: 'timestamptz', index: true })
  startsAt: Date;

  /** The last segment's end (UTC). */
  @Property({ type: 'datetime', columnType: 'timestamptz' })
  endsAt: Date;

  /** While `held`: when the hold lapses. */
  @Property({ type: 'datetime', columnType: 'timestamptz', nullable: true, index: true })
  holdExpiresAt: Date | null = null;

  /** The job plan the time was found for (segments and their minutes), as it was then. */
  @Property({ type: 'json' })
  plan: BookingPlanSnapshot;

  @Property({ type: 'datetime', columnType: 'timestamptz', nullable: true })
  cancelledAt: Date | null = null;

  /** The customer asked the workshop to move it (a note for the desk). */
  @Property({ type: 'text', nullable: true })
  moveRequestNote: string | null = null;

  @Property({ type: 'datetime', columnType: 'timestamptz', nullable: true })
  moveRequestedAt: Date | null = null;

  /**
   * The SEQUENCE of the booking's calendar event (RFC 5545 §3.8.7.4): 0 when first sent, raised
   * by one on every move and on cancellation, so the customer's calendar takes the latest.
   */
  @Property({ type: 'integer', default: 0 })
  calendarSequence = 0;

  /**
   * Set when an accepted revision of the quote needs bay time that no longer fits the booked
   * start: the desk must move it. A successful move clears both.
   */
  @Property({ type: 'text', nullable: true })
  needsMoveReason: string | null = null;

  @Property({ type: 'datetime', columnType: 'timestamptz', nullable: true })
  needsMoveSince: Date | null = null;

  /** When the desk marked the vehicle as arrived (on site, keys in), before or as work starts. */
  @Property({ type: 'datetime', columnType: 'timestamptz', nullable: true })
  arrivedAt: Date | null = null;

  @OneToMany(() => Reservation, (reservation) => reservation.booking, {
    orderBy: { startsAt: 'asc' },
  })
  reservations = new Collection<Reservation>(this);

  /** Checkout sessions of the booking (deposit and top-ups), in order of attempt. */
  @OneToMany(() => Payment, (payment) => payment.booking, { orderBy: { attempt: 'asc' } })
  payments = new Collection<Payment>(this);

  /** The audit trail, oldest first. */
  @OneToMany(() => BookingEvent, (event) => event.booking, {
    orderBy: { at: 'asc', number: 'asc' },
  })
  events = new Collection<BookingEvent>(this);

  constructor(fields: {
    customer: User;
    quoteVersion: QuoteVersion;
    createdBy: User;
    state: BookingState;
    startsAt: Date;
    endsAt: Date;
    holdExpiresAt: Date | null;
    plan: BookingPlanSnapshot;
  }) {
    super();
    this.customer = fields.customer;
    this.quoteVersion = fields.quoteVersion;
    this.createdBy = fields.createdBy;
    this.state = fields.state;
    this.startsAt = fields.startsAt;
    this.endsAt = fields.endsAt;
    this.holdExpiresAt = fields.holdExpiresAt;
    this.plan = fields.plan;
  }
}

import {
  Check,
  Collection,
  Entity,
  Enum,
  ManyToOne,
  OneToMany,
  Property,
  Unique,
} from '@mikro-orm/core';
import { Booking } from '../../bookings/entities/booking.entity';
import { BaseEntity } from '../../database/base.entity';
import {
  PAYMENT_KINDS,
  PAYMENT_STATUSES,
  type PaymentKind,
  type PaymentStatus,
} from '../payment-states';
import { Refund } from './refund.entity';

/**
 * One checkout session at the payment provider for a booking, and what became of it. Amounts
 * are integer cents of `currency` (ISO 4217, lower case as the provider writes it). A payment is
 * never deleted: it is the record of money taken and given back.
 */
@Entity()
@Unique({ name: 'payment_booking_attempt_unique', properties: ['booking', 'attempt'] })
@Check({ name: 'payment_amount_cents_check', expression: 'amount_cents > 0' })
@Check({
  name: 'payment_refunded_cents_check',
  expression: 'refunded_cents >= 0 and refunded_cents <= amount_cents',
})
export class Payment extends BaseEntity<'paymentIntentId' | 'paidAt' | 'refundedCents' | 'status'> {
  @ManyToOne(() => Booking, { deleteRule: 'restrict', index: true })
  booking: Booking;

  @Enum({ items: () => [...PAYMENT_KINDS], type: 'string' })
  kind: PaymentKind;

  /** The provider's checkout session id (cs_…). */
  @Property({ type: 'string', length: 255, unique: true })
  checkoutSessionId: string;

  /** The provider's payment intent id (pi_…), known once the customer has paid. */
  @Property({ type: 'string', length: 255, unique: true, nullable: true })
  paymentIntentId: string | null = null;

  @Property({ type: 'integer' })
  amountCents: number;

  @Property({ type: 'string', length: 3 })
  currency: string;

  @Enum({ items: () => [...PAYMENT_STATUSES], type: 'string', index: true })
  status: PaymentStatus = 'open';

  @Property({ type: 'datetime', columnType: 'timestamptz', nullable: true })
  paidAt: Date | null = null;

  /** What has been given back so far (the provider's `amount_refunded` of the charge). */
  @Property({ type: 'integer', default: 0 })
  refundedCents: number = 0;

  /** 1, 2, … per booking: each new checkout session of the booking is the next attempt. */
  @Property({ type: 'smallint' })
  attempt: number;

  /** The provider's hosted page for this session. */
  @Property({ type: 'text' })
  checkoutUrl: string;

  /** When the session stops taking payment (UTC). */
  @Property({ type: 'datetime', columnType: 'timestamptz' })
  expiresAt: Date;

  @OneToMany(() => Refund, (refund) => refund.payment, { orderBy: { createdAt: 'asc' } })
  refunds = new Collection<Refund>(this);

  constructor(fields: {
    id?: string;
    booking: Booking;
    kind: PaymentKind;
    checkoutSessionId: string;
    amountCents: number;
    currency: string;
    attempt: number;
    checkoutUrl: string;
    expiresAt: Date;
  }) {
    super();
    if (fields.id) this.id = fields.id;
    this.booking = fields.booking;
    this.kind = fields.kind;
    this.checkoutSessionId = fields.checkoutSessionId;
    this.amountCents = fields.amountCents;
    this.currency = fields.currency;
    this.attempt = fields.attempt;
    this.checkoutUrl = fields.checkoutUrl;
    this.expiresAt = fields.expiresAt;
  }
}

import { Check, Entity, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';
import { Payment } from './payment.entity';

/** Money given back on a payment, as the provider recorded it (one row per provider refund). */
@Entity()
@Check({ name: 'refund_amount_cents_check', expression: 'amount_cents > 0' })
export class Refund extends BaseEntity {
  @ManyToOne(() => Payment, { deleteRule: 'restrict', index: true })
  payment: Payment;

  /** The provider's refund id (re_…). */
  @Property({ type: 'string', length: 255, unique: true })
  providerRefundId: string;

  @Property({ type: 'integer' })
  amountCents: number;

  /** The provider's status of the refund: succeeded, pending, failed, canceled… */
  @Property({ type: 'string', length: 40 })
  status: string;

  /** Why it was given, in words (the cancellation policy applied, a payment that came too late). */
  @Property({ type: 'text' })
  reason: string;

  constructor(fields: {
    payment: Payment;
    providerRefundId: string;
    amountCents: number;
    status: string;
    reason: string;
  }) {
    super();
    this.payment = fields.payment;
    this.providerRefundId = fields.providerRefundId;
    this.amountCents = fields.amountCents;
    this.status = fields.status;
    this.reason = fields.reason;
  }
}

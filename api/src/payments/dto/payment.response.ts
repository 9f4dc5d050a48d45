import { ApiProperty } from '@nestjs/swagger';
import {
  PAYMENT_KINDS,
  PAYMENT_STATUSES,
  type PaymentKind,
  type PaymentStatus,
} from '../payment-states';

/** One checkout session of a booking and what became of it (amounts in integer cents). */
export class BookingPaymentResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ enum: PAYMENT_KINDS, enumName: 'PaymentKind' })
  kind!: PaymentKind;

  @ApiProperty({ enum: PAYMENT_STATUSES, enumName: 'PaymentStatus' })
  status!: PaymentStatus;

  @ApiProperty({ example: 100000, description: 'Integer cents' })
  amountCents!: number;

  @ApiProperty({ example: 'aud', description: 'ISO 4217, lower case' })
  currency!: string;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  paidAt!: string | null;

  @ApiProperty({ example: 0, description: 'Integer cents given back so far' })
  refundedCents!: number;
}

/** The workshop's cancellation policy, and what it gives back if the booking is cancelled now. */
export class CancellationPolicyResponse {
  @ApiProperty({
    example: 48,
    description: 'Cancelled at least this many hours before the start: the whole deposit back',
  })
  fullRefundHoursBefore!: number;

  @ApiProperty({
    example: 0,
    minimum: 0,
    maximum: 100,
    description: 'Cancelled later: this percentage of the deposit back (rounded down to the cent)',
  })
  lateCancelRefundPercent!: number;

  @ApiProperty({
    example: 100000,
    description:
      'Integer cents the customer would get back if the booking were cancelled at this moment (0 when nothing is paid or it cannot be cancelled)',
  })
  refundIfCancelledNowCents!: number;
}

/** Answer of the provider's webhook. */
export class WebhookReceivedResponse {
  @ApiProperty({ example: true })
  received!: boolean;

  @ApiProperty({
    example: false,
    description: 'True: this event had been handled before; nothing changed',
  })
  duplicate!: boolean;
}

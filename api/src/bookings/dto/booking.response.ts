import { ApiProperty } from '@nestjs/swagger';
import { BAY_KINDS, type BayKind } from '../../catalogue/product-kinds';
import {
  BookingPaymentResponse,
  CancellationPolicyResponse,
} from '../../payments/dto/payment.response';
import { QUOTE_VERSION_STATES, type QuoteVersionState } from '../../quotes/quote-states';
import { ROLES, type Role } from '../../users/user-role';
import { BOOKING_EVENT_KINDS, type BookingEventKind } from '../booking-event-kinds';
import { BOOKING_STATES, type BookingState } from '../booking-states';

/** One stay in one bay: in UTC and in the workshop's zone. */
export class PlannedSegmentResponse {
  @ApiProperty({ format: 'uuid' })
  bayId!: string;

  @ApiProperty({ example: 'Hoist 1' })
  bayName!: string;

  @ApiProperty({ enum: BAY_KINDS, enumName: 'BayKind' })
  bayKind!: BayKind;

  @ApiProperty({
    description: 'Working minutes in the bay (the stay may be longer: breaks, nights)',
  })
  minutes!: number;

  @ApiProperty({ example: '2026-12-03T07:30:00+11:00', description: "In the workshop's zone" })
  start!: string;

  @ApiProperty({ example: '2026-12-02T20:30:00.000Z' })
  startUtc!: string;

  @ApiProperty({ example: '2026-12-03T11:00:00+11:00' })
  end!: string;

  @ApiProperty({ example: '2026-12-03T00:00:00.000Z' })
  endUtc!: string;
}

/** A booked segment: the bay's time and the work done in it. */
export class BookingSegmentResponse extends PlannedSegmentResponse {
  @ApiProperty({
    type: [String],
    example: ['Fit lift kit', 'Fitting and balancing, 4 wheels'],
    description: 'The work done in this bay, in plain words',
  })
  work!: string[];
}

export class BookingQuoteSummaryResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ example: 'Q-000123' })
  reference!: string;

  @ApiProperty({ format: 'uuid' })
  versionId!: string;

  @ApiProperty()
  versionNumber!: number;

  @ApiProperty({ description: 'Integer cents' })
  totalCents!: number;

  @ApiProperty({ description: 'Integer cents' })
  depositCents!: number;

  @ApiProperty({ example: 'Oskerra Barrow GLX dual cab' })
  vehicleName!: string;

  @ApiProperty({
    example: 'Fit lift kit · Fitting and balancing, 4 wheels · Wheel alignment',
    description: 'The package in a line: the work of every segment',
  })
  packageSummary!: string;

  @ApiProperty({ description: "The quote's latest version (a revision may follow the booked one)" })
  latestVersionNumber!: number;

  @ApiProperty({ enum: QUOTE_VERSION_STATES, enumName: 'QuoteVersionState' })
  latestVersionState!: QuoteVersionState;
}

export class BookingCustomerResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty()
  name!: string;

  @ApiProperty()
  email!: string;
}

export class NeedsMoveResponse {
  @ApiProperty({ description: 'Why the desk must move it, in plain words' })
  reason!: string;

  @ApiProperty({ format: 'date-time' })
  since!: string;
}

export class BookingEventActorResponse {
  @ApiProperty()
  name!: string;

  @ApiProperty({ enum: ROLES, enumName: 'Role' })
  role!: Role;
}

/** One line of the booking's audit trail. */
export class BookingEventResponse {
  @ApiProperty({ format: 'date-time', description: 'UTC' })
  at!: string;

  @ApiProperty({ enum: BOOKING_EVENT_KINDS, enumName: 'BookingEventKind' })
  kind!: BookingEventKind;

  @ApiProperty({
    type: BookingEventActorResponse,
    nullable: true,
    description: 'Null: the system (hold sweep) or the payment provider',
  })
  actor!: BookingEventActorResponse | null;

  @ApiProperty({ example: 'Moved from Thursday 3 December 2026, 7:30 am AEDT to …' })
  detail!: string;
}

export class MoveRequestResponse {
  @ApiProperty()
  note!: string;

  @ApiProperty({ format: 'date-time' })
  requestedAt!: string;
}

export class BookingResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ example: 'B-000042' })
  reference!: string;

  @ApiProperty({ enum: BOOKING_STATES, enumName: 'BookingState' })
  state!: BookingState;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  holdExpiresAt!: string | null;

  @ApiProperty({ example: '2026-12-03T07:30:00+11:00' })
  start!: string;

  @ApiProperty({ format: 'date-time' })
  startUtc!: string;

  @ApiProperty()
  end!: string;

  @ApiProperty({ format: 'date-time' })
  endUtc!: string;

  @ApiProperty({ example: 'Australia/Sydney' })
  timeZone!: string;

  @ApiProperty({ type: [BookingSegmentResponse] })
  segments!: BookingSegmentResponse[];

  @ApiProperty({ type: BookingQuoteSummaryResponse })
  quote!: BookingQuoteSummaryResponse;

  @ApiProperty({ type: BookingCustomerResponse })
  customer!: BookingCustomerResponse;

  @ApiProperty({
    type: String,
    nullable: true,
    example: 'ABC123',
    description: "The customer's vehicle on the quote",
  })
  rego!: string | null;

  @ApiProperty({
    type: NeedsMoveResponse,
    nullable: true,
    description:
      'Set when an accepted revision no longer fits the booked time; cleared by a successful move',
  })
  needsMove!: NeedsMoveResponse | null;

  @ApiProperty({ type: [BookingEventResponse], description: 'The audit trail, oldest first' })
  events!: BookingEventResponse[];

  @ApiProperty({ type: MoveRequestResponse, nullable: true })
  moveRequest!: MoveRequestResponse | null;

  @ApiProperty({
    type: String,
    nullable: true,
    description: 'When the desk marked the vehicle as arrived (UTC); null until then',
  })
  arrivedAt!: string | null;

  @ApiProperty({
    type: [BookingPaymentResponse],
    description: 'Checkout sessions of the booking, oldest first (open, paid, expired, failed)',
  })
  payments!: BookingPaymentResponse[];

  @ApiProperty({ example: 100000, description: "Integer cents: the quote version's deposit" })
  depositDueCents!: number;

  @ApiProperty({
    example: 0,
    description: 'Integer cents: deposit payments received, top-ups included',
  })
  depositPaidCents!: number;

  @ApiProperty({
    example: 0,
    description:
      "Integer cents a top-up checkout would charge now: the version's deposit minus what the deposit and top-ups paid and still hold; 0 when none is due or the state does not allow one",
  })
  depositTopUpCents!: number;

  @ApiProperty({ example: 0, description: 'Integer cents: given back, all payments together' })
  refundedCents!: number;

  @ApiProperty({
    example: 412345,
    description:
      'Integer cents still to pay: the total minus (paid minus refunded); 0 for a cancelled or expired booking',
  })
  balanceDueCents!: number;

  @ApiProperty({ type: CancellationPolicyResponse })
  cancellationPolicy!: CancellationPolicyResponse;

  @ApiProperty({ format: 'date-time' })
  createdAt!: string;
}

/** POST /api/bookings/:id/deposit-checkout: where to send the customer to pay. */
export class DepositCheckoutResponse {
  @ApiProperty({
    example: 'https://pay.example/pay/cs_test_…',
    description: "The payment provider's hosted page for this booking's deposit",
  })
  checkoutUrl!: string;

  @ApiProperty({ format: 'date-time', description: 'The page stops taking payment then' })
  expiresAt!: string;

  @ApiProperty({ type: () => BookingResponse })
  booking!: BookingResponse;
}

export class BookingListResponse {
  @ApiProperty({ type: [BookingResponse] })
  items!: BookingResponse[];
}

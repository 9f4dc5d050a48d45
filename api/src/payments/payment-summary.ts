/**
 * What a booking's payments add up to, for its response: the deposit due and paid, what came
 * back, the balance still to pay and what a cancellation now would give back. Pure: the booking
 * service passes the rows it loaded and the moment to judge by.
 */
import type { BookingState } from '../bookings/booking-states';
import { type CancellationPolicy, cancellationRefund } from '../pricing/cancellation-refund';
import type { PaymentKind, PaymentStatus } from './payment-states';

export interface PaymentFacts {
  id: string;
  kind: PaymentKind;
  status: PaymentStatus;
  amountCents: number;
  currency: string;
  paidAt: Date | null;
  refundedCents: number;
}

export interface PaymentSummaryInput {
  state: BookingState;
  startsAtMs: number;
  totalCents: number;
  depositCents: number;
  payments: readonly PaymentFacts[];
  policy: CancellationPolicy;
  nowMs: number;
}

export interface PaymentSummary {
  payments: {
    id: string;
    kind: PaymentKind;
    status: PaymentStatus;
    amountCents: number;
    currency: string;
    paidAt: string | null;
    refundedCents: number;
  }[];
  depositDueCents: number;
  depositPaidCents: number;
  depositTopUpCents: number;
  refundedCents: number;
  balanceDueCents: number;
  cancellationPolicy: CancellationPolicy & { refundIfCancelledNowCents: number };
}

/** States a booking can still be cancelled from (by someone). */
const CANCELLABLE: readonly BookingState[] = ['held', 'requested', 'confirmed', 'in-progress'];
/** States in which nothing more is owed: the work will not be done. */
const CLOSED_WITHOUT_WORK: readonly BookingState[] = ['cancelled', 'expired'];

/** States in which a higher deposit (after an accepted revision) can be topped up. */
export const TOP_UP_STATES: readonly BookingState[] = ['requested', 'confirmed'];

/** What is still held of a paid payment: paid minus refunded. */
export function heldCents(payment: Pick<PaymentFacts, 'status' | 'amountCents' | 'refundedCents'>) {
  return payment.status === 'paid' ? Math.max(0, payment.amountCents - payment.refundedCents) : 0;
}

/**
 * What a top-up checkout would charge now: the version's deposit minus what the deposit and
 * earlier top-ups paid and still hold; 0 when none is due or the state does not allow one.
 */
export function topUpDueCents(input: {
  state: BookingState;
  depositCents: number;
  payments: readonly Pick<PaymentFacts, 'kind' | 'status' | 'amountCents' | 'refundedCents'>[];
}): number {
  if (!TOP_UP_STATES.includes(input.state)) return 0;
  const held = input.payments.reduce((sum, payment) => sum + heldCents(payment), 0);
  return Math.max(0, input.depositCents - held);
}

export function paymentSummary(input: PaymentSummaryInput): PaymentSummary {
  const paid = input.payments.filter((payment) => payment.status === 'paid');
  const paidCents = paid.reduce((sum, payment) => sum + payment.amountCents, 0);
  const refundedCents = input.payments.reduce((sum, payment) => sum + payment.refundedCents, 0);
  const refundIfCancelledNowCents = CANCELLABLE.includes(input.state)
    ? paid.reduce(
        (sum, payment) =>
          sum +
          cancellationRefund({
            depositHeldCents: heldCents(payment),
            startsAtMs: input.startsAtMs,
            cancelledAtMs: input.nowMs,
            policy: input.policy,
          }).refundCents,
        0,
      )
    : 0;
  return {
    payments: input.payments.map((payment) => ({
      id: payment.id,
      kind: payment.kind,
      status: payment.status,
      amountCents: payment.amountCents,
      currency: payment.currency,
      paidAt: payment.paidAt ? payment.paidAt.toISOString() : null,
      refundedCents: payment.refundedCents,
    })),
    depositDueCents: input.depositCents,
    // The deposit and its top-ups together: what was paid towards the deposit.
    depositPaidCents: paid.reduce((sum, payment) => sum + payment.amountCents, 0),
    depositTopUpCents: topUpDueCents(input),
    refundedCents,
    balanceDueCents: CLOSED_WITHOUT_WORK.includes(input.state)
      ? 0
      : Math.max(0, input.totalCents - (paidCents - refundedCents)),
    cancellationPolicy: {
      fullRefundHoursBefore: input.policy.fullRefundHoursBefore,
      lateCancelRefundPercent: input.policy.lateCancelRefundPercent,
      refundIfCancelledNowCents,
    },
  };
}

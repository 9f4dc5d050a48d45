/**
 * Cancellation policy: how much of a paid deposit comes back when a booking is cancelled. At
 * least `fullRefundHoursBefore` hours before the booking's start, all of it; any later
 * (including after the start), `lateCancelRefundPercent` % of it, rounded down to a whole cent
 * (0 % gives nothing back). The two numbers are the workshop's own policy (Manage → Workshop).
 */
import { type Cents, assertCents, assertWholeNumber } from './cents';

export interface CancellationPolicy {
  /** Whole hours, 0 or more. */
  fullRefundHoursBefore: number;
  /** Whole percent, 0 to 100. */
  lateCancelRefundPercent: number;
}

export interface CancellationRefundInput {
  /** What is left of the deposit to give back: paid minus already refunded. */
  depositHeldCents: Cents;
  /** The booking's start (UTC milliseconds). */
  startsAtMs: number;
  /** The moment of cancelling (UTC milliseconds). */
  cancelledAtMs: number;
  policy: CancellationPolicy;
}

export type CancellationRefundBasis = 'full' | 'late' | 'nothing-paid';

export interface CancellationRefund {
  refundCents: Cents;
  basis: CancellationRefundBasis;
  /** The percentage of the deposit given back (100 for a full refund). */
  percentApplied: number;
}

const MS_PER_HOUR = 3_600_000;

export function assertCancellationPolicy(policy: CancellationPolicy): CancellationPolicy {
  assertWholeNumber(policy.fullRefundHoursBefore, 'fullRefundHoursBefore');
  assertWholeNumber(policy.lateCancelRefundPercent, 'lateCancelRefundPercent');
  if (policy.fullRefundHoursBefore < 0) {
    throw new RangeError(
      `fullRefundHoursBefore must be 0 or more, got ${policy.fullRefundHoursBefore}`,
    );
  }
  if (policy.lateCancelRefundPercent < 0 || policy.lateCancelRefundPercent > 100) {
    throw new RangeError(
      `lateCancelRefundPercent must be from 0 to 100, got ${policy.lateCancelRefundPercent}`,
    );
  }
  return policy;
}

/** The refund owed for a cancellation at `cancelledAtMs` under the policy. */
export function cancellationRefund(input: CancellationRefundInput): CancellationRefund {
  const held = assertCents(input.depositHeldCents, 'depositHeldCents');
  if (held < 0) throw new RangeError(`depositHeldCents must be 0 or more, got ${held}`);
  assertWholeNumber(input.startsAtMs, 'startsAtMs');
  assertWholeNumber(input.cancelledAtMs, 'cancelledAtMs');
  const policy = assertCancellationPolicy(input.policy);

  const early =
    input.startsAtMs - input.cancelledAtMs >= policy.fullRefundHoursBefore * MS_PER_HOUR;
  if (held === 0) {
    return {
      refundCents: 0,
      basis: 'nothing-paid',
      percentApplied: early ? 100 : policy.lateCancelRefundPercent,
    };
  }
  if (early) return { refundCents: held, basis: 'full', percentApplied: 100 };
  // Whole cents × whole percent stays exact well inside the safe integers; Math.floor rounds down.
  return {
    refundCents: Math.floor((held * policy.lateCancelRefundPercent) / 100),
    basis: 'late',
    percentApplied: policy.lateCancelRefundPercent,
  };
}

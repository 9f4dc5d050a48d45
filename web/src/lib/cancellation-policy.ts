import { formatCents } from './money';

/**
 * The workshop's cancellation rule in words, as the customer reads it before cancelling and the
 * manager sees it while setting it. The refund itself is computed by the API (rounded down to
 * whole cents); these only say what it is.
 */
export interface CancellationRule {
  /** A cancellation at least this many hours before the start refunds the whole deposit. */
  fullRefundHoursBefore: number;
  /** The share of the deposit a later cancellation refunds, 0 to 100 (0: none). */
  lateCancelRefundPercent: number;
}

function hoursText(hours: number): string {
  return `${hours} hour${hours === 1 ? '' : 's'}`;
}

/**
 * "Cancel at least 48 hours before the start for a full refund of the deposit; later, 50 % of
 * it." (or "…; later, no refund."). A rule that refunds everything either way says so once.
 */
export function cancellationPolicyText(rule: CancellationRule): string {
  const percent = Math.min(100, Math.max(0, rule.lateCancelRefundPercent));
  if (percent === 100) return 'The deposit is refunded in full whenever you cancel.';
  const later = percent === 0 ? 'no refund' : `${percent} % of it`;
  const until =
    rule.fullRefundHoursBefore <= 0
      ? 'Cancel any time before the start'
      : `Cancel at least ${hoursText(rule.fullRefundHoursBefore)} before the start`;
  return `${until} for a full refund of the deposit; later, ${later}.`;
}

export interface RefundNow {
  /** What the API would refund if the booking were cancelled at this moment. */
  refundIfCancelledNowCents: number;
  /** Deposit paid and not yet refunded. */
  heldCents: number;
}

/** "Cancelling now refunds $500.00 of the $1,000.00 deposit.", or why nothing is refunded. */
export function refundNowText({ refundIfCancelledNowCents, heldCents }: RefundNow): string {
  if (heldCents <= 0) return 'Nothing has been paid, so there is nothing to refund.';
  if (refundIfCancelledNowCents <= 0) return 'Cancelling now refunds nothing.';
  if (refundIfCancelledNowCents >= heldCents) {
    return `Cancelling now refunds ${formatCents(refundIfCancelledNowCents)}, the whole deposit.`;
  }
  return `Cancelling now refunds ${formatCents(refundIfCancelledNowCents)} of the ${formatCents(heldCents)} deposit.`;
}

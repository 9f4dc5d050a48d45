import { describe, expect, it } from 'vitest';
import { type PaymentFacts, paymentSummary } from './payment-summary';

const HOUR = 3_600_000;
const NOW = Date.UTC(2027, 2, 1, 0, 0);
// The policy values are a workshop's own (the defaults: 48 h, 0 %); the amounts are invented.
const policy = { fullRefundHoursBefore: 48, lateCancelRefundPercent: 0 };

function payment(fields: Partial<PaymentFacts>): PaymentFacts {
  return {
    id: 'p1',
    kind: 'deposit',
    status: 'paid',
    amountCents: 100000,
    currency: 'aud',
    paidAt: new Date(NOW - HOUR),
    refundedCents: 0,
    ...fields,
  };
}

function summary(
  state: Parameters<typeof paymentSummary>[0]['state'],
  payments: PaymentFacts[],
  depositCents = 100000,
) {
  return paymentSummary({
    state,
    startsAtMs: NOW + 72 * HOUR,
    totalCents: 500000,
    depositCents,
    payments,
    policy,
    nowMs: NOW,
  });
}

describe('paymentSummary', () => {
  it('owes the whole total before anything is paid; an open session pays nothing', () => {
    expect(summary('held', [payment({ status: 'open', paidAt: null })])).toMatchObject({
      depositDueCents: 100000,
      depositPaidCents: 0,
      refundedCents: 0,
      balanceDueCents: 500000,
      cancellationPolicy: { ...policy, refundIfCancelledNowCents: 0 },
    });
  });

  it('takes the paid deposit off the balance and would refund it in full 72 h ahead', () => {
    const paid = summary('requested', [
      payment({ status: 'expired', paidAt: null, id: 'p0' }),
      payment({}),
    ]);
    expect(paid).toMatchObject({
      depositPaidCents: 100000,
      balanceDueCents: 400000,
      cancellationPolicy: { refundIfCancelledNowCents: 100000 },
    });
    expect(paid.payments.map((row) => [row.id, row.status, row.paidAt])).toEqual([
      ['p0', 'expired', null],
      ['p1', 'paid', new Date(NOW - HOUR).toISOString()],
    ]);
  });

  it('defines the balance as total − (paid − refunded), and nothing is owed once cancelled', () => {
    const partly = summary('confirmed', [payment({ refundedCents: 25000 })]);
    expect(partly).toMatchObject({ refundedCents: 25000, balanceDueCents: 425000 });
    // What is still held (75 000 c) is what a cancellation could give back.
    expect(partly.cancellationPolicy.refundIfCancelledNowCents).toBe(75000);
    expect(summary('cancelled', [payment({ refundedCents: 100000 })])).toMatchObject({
      refundedCents: 100000,
      balanceDueCents: 0,
      cancellationPolicy: { refundIfCancelledNowCents: 0 },
    });
    expect(summary('expired', []).balanceDueCents).toBe(0);
  });

  it('tops up a higher deposit by the difference and counts the top-up as deposit paid', () => {
    // A revision raised the deposit from 100 000 c to 130 000 c: 30 000 c is due.
    expect(summary('requested', [payment({})], 130000)).toMatchObject({
      depositDueCents: 130000,
      depositPaidCents: 100000,
      depositTopUpCents: 30000,
      balanceDueCents: 400000,
    });
    const toppedUp = summary(
      'confirmed',
      [payment({}), payment({ id: 'p2', kind: 'top-up', amountCents: 30000 })],
      130000,
    );
    expect(toppedUp).toMatchObject({
      depositPaidCents: 130000,
      depositTopUpCents: 0,
      // total − (paid − refunded) = 500 000 − 130 000.
      balanceDueCents: 370000,
      cancellationPolicy: { refundIfCancelledNowCents: 130000 },
    });
    // A part refunded is no longer held: it is due again.
    expect(summary('confirmed', [payment({ refundedCents: 10000 })]).depositTopUpCents).toBe(10000);
    // Not while held (the deposit itself is paid then), nor once the work has started.
    expect(summary('held', [], 130000).depositTopUpCents).toBe(0);
    expect(summary('in-progress', [payment({})], 130000).depositTopUpCents).toBe(0);
    // A lower deposit owes nothing and gives nothing back by itself.
    expect(summary('requested', [payment({})], 80000).depositTopUpCents).toBe(0);
  });
});

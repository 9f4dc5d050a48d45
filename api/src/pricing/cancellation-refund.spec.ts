import { describe, expect, it } from 'vitest';
import { type CancellationPolicy, cancellationRefund } from './cancellation-refund';

// The rule's shape (a full refund up to a number of hours before the start, a percentage after)
// is common practice for workshop and service bookings; the hours and percentages below are a
// workshop's own policy values (48 h and 0 % are the defaults), not published figures.
const HOUR = 3_600_000;
const MINUTE = 60_000;
const START = Date.UTC(2027, 2, 10, 20, 30); // Thursday 11 March 2027, 7:30 in Sydney
const policy: CancellationPolicy = { fullRefundHoursBefore: 48, lateCancelRefundPercent: 0 };

function refundAt(cancelledAtMs: number, held = 100000, p: CancellationPolicy = policy) {
  return cancellationRefund({
    depositHeldCents: held,
    startsAtMs: START,
    cancelledAtMs,
    policy: p,
  });
}

describe('cancellationRefund', () => {
  it('gives the whole deposit back exactly fullRefundHoursBefore hours before the start', () => {
    // Common practice (no published source): "at least 48 hours before" includes 48 h exactly.
    expect(refundAt(START - 48 * HOUR)).toEqual({
      refundCents: 100000,
      basis: 'full',
      percentApplied: 100,
    });
    // Common practice (no published source): earlier than that is a full refund too.
    expect(refundAt(START - 30 * 24 * HOUR).refundCents).toBe(100000);
  });

  it('applies the late percentage one minute inside the window', () => {
    // Common practice (no published source): 47 h 59 min before is late.
    expect(refundAt(START - 48 * HOUR + MINUTE)).toEqual({
      refundCents: 0,
      basis: 'late',
      percentApplied: 0,
    });
    // Common practice (no published source): one millisecond inside the window is late too.
    expect(refundAt(START - 48 * HOUR + 1).basis).toBe('late');
  });

  it('gives nothing back late with a 0 % policy, and the percentage with another', () => {
    // Common practice (no published source): 0 % late refund = nothing.
    expect(refundAt(START - HOUR).refundCents).toBe(0);
    // Common practice (no published source): a 50 % late refund of $1,000.00 is $500.00.
    expect(
      refundAt(START - HOUR, 100000, { fullRefundHoursBefore: 48, lateCancelRefundPercent: 50 }),
    ).toEqual({ refundCents: 50000, basis: 'late', percentApplied: 50 });
    // Common practice (no published source): 100 % late is a full refund at any time.
    expect(
      refundAt(START + HOUR, 100000, { fullRefundHoursBefore: 48, lateCancelRefundPercent: 100 })
        .refundCents,
    ).toBe(100000);
  });

  it('rounds a late refund down to whole cents', () => {
    const thirtyThree = { fullRefundHoursBefore: 24, lateCancelRefundPercent: 33 };
    // Common practice (no published source): a part refund is rounded down to the whole cent.
    // Worked by hand: 33 % of 12 345 c = 4 073.85 c → 4 073 c (down, not half-up).
    expect(refundAt(START - HOUR, 12345, thirtyThree).refundCents).toBe(4073);
    // Worked by hand: 33 % of 1 c = 0.33 c → 0 c.
    expect(refundAt(START - HOUR, 1, thirtyThree).refundCents).toBe(0);
    // Worked by hand: 99 % of 99 999 c = 98 999.01 c → 98 999 c.
    expect(
      refundAt(START - HOUR, 99999, { fullRefundHoursBefore: 24, lateCancelRefundPercent: 99 })
        .refundCents,
    ).toBe(98999);
  });

  it('is late after the start, and a 0 h policy refunds in full until the start', () => {
    // Common practice (no published source): cancelling after the start is late.
    expect(refundAt(START + MINUTE).basis).toBe('late');
    const zeroHours = { fullRefundHoursBefore: 0, lateCancelRefundPercent: 0 };
    // Common practice (no published source): with 0 h, cancelling at the start is still in time.
    expect(refundAt(START, 100000, zeroHours).refundCents).toBe(100000);
    expect(refundAt(START + 1, 100000, zeroHours).refundCents).toBe(0);
  });

  it('gives nothing when nothing is held, and refuses impossible input', () => {
    expect(refundAt(START - 72 * HOUR, 0)).toMatchObject({
      refundCents: 0,
      basis: 'nothing-paid',
    });
    expect(() => refundAt(START, 10.5)).toThrow(RangeError);
    expect(() => refundAt(START, -1)).toThrow(RangeError);
    expect(() =>
      refundAt(START, 100, { fullRefundHoursBefore: 48, lateCancelRefundPercent: 101 }),
    ).toThrow(/lateCancelRefundPercent/);
    expect(() =>
      refundAt(START, 100, { fullRefundHoursBefore: -1, lateCancelRefundPercent: 0 }),
    ).toThrow(/fullRefundHoursBefore/);
  });
});

import { describe, expect, it } from 'vitest';
import { cancellationPolicyText, refundNowText } from './cancellation-policy';

describe('the cancellation rule in words', () => {
  it('names the hours of the full refund and the share refunded later', () => {
    expect(cancellationPolicyText({ fullRefundHoursBefore: 48, lateCancelRefundPercent: 0 })).toBe(
      'Cancel at least 48 hours before the start for a full refund of the deposit; later, no refund.',
    );
    expect(cancellationPolicyText({ fullRefundHoursBefore: 48, lateCancelRefundPercent: 50 })).toBe(
      'Cancel at least 48 hours before the start for a full refund of the deposit; later, 50 % of it.',
    );
    expect(cancellationPolicyText({ fullRefundHoursBefore: 1, lateCancelRefundPercent: 25 })).toBe(
      'Cancel at least 1 hour before the start for a full refund of the deposit; later, 25 % of it.',
    );
  });

  it('says plainly when the rule refunds everything, or sets no notice', () => {
    expect(
      cancellationPolicyText({ fullRefundHoursBefore: 720, lateCancelRefundPercent: 100 }),
    ).toBe('The deposit is refunded in full whenever you cancel.');
    expect(cancellationPolicyText({ fullRefundHoursBefore: 0, lateCancelRefundPercent: 0 })).toBe(
      'Cancel any time before the start for a full refund of the deposit; later, no refund.',
    );
  });
});

describe('what cancelling now refunds', () => {
  it('states the amount the API would refund, against the deposit paid', () => {
    // Source: ISO 4217, AUD has 2 minor units; Unicode CLDR en-AU currency format ¤#,##0.00
    // with the narrow symbol "$": 100000 cents is $1,000.00.
    expect(refundNowText({ refundIfCancelledNowCents: 100_000, heldCents: 100_000 })).toBe(
      'Cancelling now refunds $1,000.00, the whole deposit.',
    );
    // Source: ISO 4217, AUD has 2 minor units; Unicode CLDR en-AU currency format ¤#,##0.00.
    expect(refundNowText({ refundIfCancelledNowCents: 33_333, heldCents: 66_667 })).toBe(
      'Cancelling now refunds $333.33 of the $666.67 deposit.',
    );
  });

  it('says when nothing would come back, and why', () => {
    expect(refundNowText({ refundIfCancelledNowCents: 0, heldCents: 100_000 })).toBe(
      'Cancelling now refunds nothing.',
    );
    expect(refundNowText({ refundIfCancelledNowCents: 0, heldCents: 0 })).toBe(
      'Nothing has been paid, so there is nothing to refund.',
    );
  });
});

import { describe, expect, it } from 'vitest';
import type { BookingPayment } from '@/types/api';
import {
  checkoutAddress,
  depositHeldCents,
  depositPaidAt,
  openPayment,
  payDepositLabel,
  latestPaidPayment,
  paymentCheckPhase,
  paymentLines,
  paymentRows,
  payTopUpLabel,
  paymentStatusNote,
  topUpDue,
} from './payment-text';

const payment = (changes: Partial<BookingPayment>): BookingPayment => ({
  id: '5d7c1d0e-8a59-4c59-9a53-2f1f0d1c8a01',
  kind: 'deposit',
  status: 'open',
  amountCents: 100_000,
  currency: 'aud',
  paidAt: null,
  refundedCents: 0,
  ...changes,
});

const held = {
  state: 'held' as const,
  timeZone: 'Australia/Sydney',
  payments: [] as BookingPayment[],
  depositDueCents: 100_000,
  depositPaidCents: 0,
  refundedCents: 0,
  balanceDueCents: 424_950,
};

const paidAt = '2026-12-02T23:15:00.000Z';
const requested = {
  ...held,
  state: 'requested' as const,
  payments: [payment({ status: 'expired' }), payment({ status: 'paid', paidAt })],
  depositPaidCents: 100_000,
  balanceDueCents: 324_950,
};

describe('the Payments section', () => {
  it('shows the deposit due and the balance while nothing is paid', () => {
    // Source: ISO 4217, AUD has 2 minor units; Unicode CLDR en-AU currency format ¤#,##0.00.
    expect(paymentRows(held)).toEqual([
      { label: 'Deposit due', value: '$1,000.00' },
      { label: 'Balance due', value: '$4,249.50' },
    ]);
  });

  it('dates the paid deposit on the workshop’s clock', () => {
    // Source: IANA tz database (australasia), read through Python's zoneinfo: 23:15Z on
    // 2 December 2026 is 10:15 on Thursday 3 December in Australia/Sydney (+11:00).
    expect(paymentRows(requested)).toEqual([
      { label: 'Deposit paid', value: '$1,000.00 on Thursday 3 December, 10:15 am' },
      { label: 'Balance due', value: '$3,249.50' },
    ]);
  });

  it('shows a refund, and no balance once the booking has ended', () => {
    const cancelled = { ...requested, state: 'cancelled' as const, refundedCents: 50_000 };
    expect(paymentRows(cancelled).map((row) => row.label)).toEqual(['Deposit paid', 'Refunded']);
    // Source: ISO 4217, AUD has 2 minor units; Unicode CLDR en-AU currency format ¤#,##0.00.
    expect(paymentRows(cancelled)[1].value).toBe('$500.00');
    expect(depositHeldCents(cancelled)).toBe(50_000);
    expect(paymentRows({ ...held, state: 'expired' })).toEqual([
      { label: 'Deposit', value: 'Not paid' },
    ]);
  });

  it('asks for the difference when a revised quote’s deposit is higher than what was paid', () => {
    const revised = { ...requested, state: 'confirmed' as const, depositTopUpCents: 20_000 };
    // Source: ISO 4217, AUD has 2 minor units; Unicode CLDR en-AU currency format ¤#,##0.00.
    expect(paymentRows(revised)).toContainEqual({
      label: 'Deposit top-up due',
      value: '$200.00',
    });
    expect(payTopUpLabel(20_000)).toBe('Pay the difference ($200.00)');
    // Nothing due: no row, and none once the booking has ended.
    expect(paymentRows({ ...revised, depositTopUpCents: 0 }).map((row) => row.label)).toEqual([
      'Deposit paid',
      'Balance due',
    ]);
    expect(
      paymentRows({ ...revised, state: 'cancelled' }).some((row) => row.label.includes('top-up')),
    ).toBe(false);
  });

  it('lists each payment, the deposit and its top-ups, with what became of it', () => {
    const topUpAt = '2026-12-03T01:00:00.000Z';
    const booking = {
      ...requested,
      payments: [
        payment({ status: 'expired' }),
        payment({ status: 'paid', paidAt, refundedCents: 25_000 }),
        payment({ kind: 'top-up', status: 'paid', amountCents: 20_000, paidAt: topUpAt }),
        payment({ kind: 'top-up', status: 'failed', amountCents: 20_000 }),
      ],
    };
    // Source: IANA tz database, Australia/Sydney AEDT (+11:00) in December: 23:15Z on 2 Dec is
    // 10:15 am on Thu 3 Dec; 01:00Z on 3 Dec is 12:00 pm that day. ISO 4217 / CLDR as above.
    const lines = paymentLines(booking).map(({ label, amount, status, refunded }) => [
      label,
      amount,
      status.replace(/\u202f/g, ' '),
      refunded,
    ]);
    expect(lines).toEqual([
      ['Deposit', '$1,000.00', 'Payment page closed unpaid', null],
      ['Deposit', '$1,000.00', 'Paid Thu 3 Dec 2026, 10:15 am', '$250.00 refunded'],
      ['Deposit top-up', '$200.00', 'Paid Thu 3 Dec 2026, 12:00 pm', null],
      ['Deposit top-up', '$200.00', 'Payment did not go through', null],
    ]);
    expect(paymentLines(booking, { paidOnly: true }).map((line) => line.label)).toEqual([
      'Deposit',
      'Deposit top-up',
    ]);
  });

  it('says what became of a payment page that was not completed', () => {
    expect(paymentStatusNote({ ...held, payments: [payment({ status: 'open' })] })).toBe(
      'A payment page was opened for this deposit; the payment is not complete.',
    );
    expect(paymentStatusNote({ ...held, payments: [payment({ status: 'failed' })] })).toBe(
      'A payment for this deposit did not go through.',
    );
    expect(paymentStatusNote({ ...held, payments: [payment({ status: 'expired' })] })).toBe(
      'A payment page closed before the deposit was paid.',
    );
    expect(paymentStatusNote(held)).toBeNull();
    expect(paymentStatusNote(requested)).toBeNull();
  });

  it('finds the open payment page and the paid deposit’s time, in any order', () => {
    const open = payment({ id: 'b', status: 'open' });
    expect(openPayment([payment({ status: 'expired' }), open])).toBe(open);
    expect(openPayment(requested.payments)).toBeNull();
    const earlier = '2026-12-01T23:15:00.000Z';
    expect(
      depositPaidAt([
        payment({ status: 'paid', paidAt }),
        payment({ status: 'paid', paidAt: earlier }),
      ]),
    ).toBe(paidAt);
    expect(depositPaidAt([payment({ status: 'open' })])).toBeNull();
    expect(depositPaidAt([payment({ kind: 'top-up', status: 'paid', paidAt })])).toBeNull();
  });

  it('labels the button with the deposit', () => {
    // Source: ISO 4217, AUD has 2 minor units; Unicode CLDR en-AU currency format ¤#,##0.00.
    expect(payDepositLabel(100_000)).toBe('Pay the deposit ($1,000.00)');
  });
});

describe('the success page reads the booking, not the address it was sent to', () => {
  const open = { ...held, payments: [payment({ status: 'open' })] };

  it('waits while the booking is held with its payment open, then says it has not heard', () => {
    expect(paymentCheckPhase(open, false)).toBe('waiting');
    expect(paymentCheckPhase(open, true)).toBe('not-heard');
  });

  it('reports the payment once the booking has moved on from held', () => {
    expect(paymentCheckPhase(requested, false)).toBe('received');
    expect(paymentCheckPhase({ ...requested, state: 'confirmed' }, true)).toBe('received');
  });

  it('follows a top-up: waits while its page is open, then received, or not complete', () => {
    const deposit = payment({ status: 'paid', paidAt });
    const confirmed = { ...requested, state: 'confirmed' as const, depositTopUpCents: 20_000 };
    const topUpOpen = {
      ...confirmed,
      payments: [deposit, payment({ kind: 'top-up', status: 'open', amountCents: 20_000 })],
    };
    expect(paymentCheckPhase(topUpOpen, false)).toBe('waiting');
    expect(paymentCheckPhase(topUpOpen, true)).toBe('not-heard');
    // The page closed unpaid and the difference is still due.
    const lapsed = {
      ...confirmed,
      payments: [deposit, payment({ kind: 'top-up', status: 'expired', amountCents: 20_000 })],
    };
    expect(paymentCheckPhase(lapsed, false)).toBe('not-complete');
    expect(topUpDue(lapsed)).toBe(true);
    // Paid: nothing more is due.
    const topUp = payment({
      kind: 'top-up',
      status: 'paid',
      amountCents: 20_000,
      paidAt: '2026-12-03T01:00:00.000Z',
    });
    const paidUp = { ...confirmed, depositTopUpCents: 0, payments: [deposit, topUp] };
    expect(paymentCheckPhase(paidUp, false)).toBe('received');
    expect(topUpDue(paidUp)).toBe(false);
    expect(latestPaidPayment(paidUp.payments)).toBe(topUp);
    expect(latestPaidPayment([deposit])).toBe(deposit);
    // A cancelled booking owes no top-up, whatever the field says.
    expect(topUpDue({ ...confirmed, state: 'cancelled' })).toBe(false);
  });

  it('offers to try again when no payment page is open: it failed or lapsed, or none was made', () => {
    expect(paymentCheckPhase({ ...held, payments: [payment({ status: 'failed' })] }, false)).toBe(
      'not-complete',
    );
    expect(
      paymentCheckPhase(
        { ...held, payments: [payment({ status: 'failed' }), payment({ status: 'expired' })] },
        false,
      ),
    ).toBe('not-complete');
    // A failed attempt, then a new page still open: wait for that one.
    expect(
      paymentCheckPhase(
        { ...held, payments: [payment({ status: 'failed' }), payment({ status: 'open' })] },
        false,
      ),
    ).toBe('waiting');
    expect(paymentCheckPhase(held, false)).toBe('not-complete');
  });

  it('says so when the booking was cancelled or its hold ran out', () => {
    expect(paymentCheckPhase({ ...open, state: 'expired' }, false)).toBe('ended');
    expect(paymentCheckPhase({ ...open, state: 'cancelled' }, true)).toBe('ended');
  });
});

describe('the payment page address', () => {
  it('is followed only when it is a web address', () => {
    expect(checkoutAddress('http://127.0.0.1:12112/pay/cs_test_1')).toBe(
      'http://127.0.0.1:12112/pay/cs_test_1',
    );
    expect(checkoutAddress('https://pay.example.test/c/cs_test_1#x')).toBe(
      'https://pay.example.test/c/cs_test_1#x',
    );
    expect(checkoutAddress('javascript:alert(1)')).toBeNull();
    expect(checkoutAddress('/account/bookings')).toBeNull();
    expect(checkoutAddress(undefined)).toBeNull();
  });
});

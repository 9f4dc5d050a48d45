import { formatCents } from '@/lib/money';
import type { Booking, BookingPayment } from '@/types/api';
import { formatEventTime } from './booking-history';
import { formatLocalDateTime } from './booking-text';

/**
 * Words for a booking's deposit and payments. Amounts come from the API in integer cents
 * (deposit due, paid, refunded, balance); nothing here adds money up.
 */

type PaymentFields = Pick<
  Booking,
  | 'state'
  | 'timeZone'
  | 'payments'
  | 'depositDueCents'
  | 'depositPaidCents'
  | 'refundedCents'
  | 'balanceDueCents'
> &
  Partial<Pick<Booking, 'depositTopUpCents'>>;

/** States a booking reaches once its deposit is paid. */
const PAID_STATES: ReadonlySet<Booking['state']> = new Set([
  'requested',
  'confirmed',
  'in-progress',
  'completed',
]);

/** A booking that ended without work: nothing more is due on it. */
export function bookingEnded(state: Booking['state']): boolean {
  return state === 'cancelled' || state === 'expired';
}

/**
 * The payment page still open for this booking, if any. The API answers the same open page
 * again rather than making a second, so there is at most one; nothing here depends on the
 * order the payments are listed in.
 */
export function openPayment(payments: readonly BookingPayment[]): BookingPayment | null {
  return payments.find((payment) => payment.status === 'open') ?? null;
}

/** When the deposit was paid: the latest paid deposit's time, or null. */
export function depositPaidAt(payments: readonly BookingPayment[]): string | null {
  let latest: string | null = null;
  for (const payment of payments) {
    if (payment.kind !== 'deposit' || payment.status !== 'paid' || !payment.paidAt) continue;
    if (latest === null || Date.parse(payment.paidAt) > Date.parse(latest)) latest = payment.paidAt;
  }
  return latest;
}

/** Deposit paid and not refunded: what a cancellation could give back. */
export function depositHeldCents(
  booking: Pick<PaymentFields, 'depositPaidCents' | 'refundedCents'>,
) {
  return Math.max(0, booking.depositPaidCents - booking.refundedCents);
}

/** "Pay the deposit ($1,000.00)". */
export function payDepositLabel(depositDueCents: number): string {
  return `Pay the deposit (${formatCents(depositDueCents)})`;
}

export interface PaymentRow {
  label: string;
  value: string;
}

/**
 * The Payments section: the deposit (due, or paid with its date on the workshop's clock), any
 * refund, and the balance still due while the booking goes ahead.
 */
export function paymentRows(booking: PaymentFields): PaymentRow[] {
  const rows: PaymentRow[] = [];
  const ended = bookingEnded(booking.state);
  if (booking.depositPaidCents > 0) {
    const paidAt = depositPaidAt(booking.payments);
    const amount = formatCents(booking.depositPaidCents);
    rows.push({
      label: 'Deposit paid',
      value: paidAt ? `${amount} on ${formatLocalDateTime(paidAt, booking.timeZone)}` : amount,
    });
  } else if (ended) {
    rows.push({ label: 'Deposit', value: 'Not paid' });
  } else {
    rows.push({ label: 'Deposit due', value: formatCents(booking.depositDueCents) });
  }
  const topUpCents = booking.depositTopUpCents ?? 0;
  if (!ended && topUpCents > 0) {
    rows.push({ label: 'Deposit top-up due', value: formatCents(topUpCents) });
  }
  if (booking.refundedCents > 0) {
    rows.push({ label: 'Refunded', value: formatCents(booking.refundedCents) });
  }
  if (!ended) rows.push({ label: 'Balance due', value: formatCents(booking.balanceDueCents) });
  return rows;
}

/** A top-up is due: the revised quote's deposit is higher than what the booking holds. */
export function topUpDue(booking: Pick<PaymentFields, 'state' | 'depositTopUpCents'>): boolean {
  return (
    booking.state !== 'held' && !bookingEnded(booking.state) && (booking.depositTopUpCents ?? 0) > 0
  );
}

/** The payment paid last (by its time), or null: tells a top-up's return from a deposit's. */
export function latestPaidPayment(payments: readonly BookingPayment[]): BookingPayment | null {
  let latest: BookingPayment | null = null;
  for (const payment of payments) {
    if (payment.status !== 'paid' || !payment.paidAt) continue;
    if (latest === null || Date.parse(payment.paidAt) > Date.parse(latest.paidAt ?? '')) {
      latest = payment;
    }
  }
  return latest;
}

/** "Pay the difference ($200.00)": the top-up a revised quote's higher deposit asks for. */
export function payTopUpLabel(depositTopUpCents: number): string {
  return `Pay the difference (${formatCents(depositTopUpCents)})`;
}

const paymentKindLabels: Record<BookingPayment['kind'], string> = {
  deposit: 'Deposit',
  'top-up': 'Deposit top-up',
};

/** One payment (checkout) of a booking, in words. */
export interface PaymentLine {
  id: string;
  label: string;
  amount: string;
  /** "Paid Thu 3 Dec 2026, 10:15 am", "Payment page open", … */
  status: string;
  /** "$500.00 refunded", or null. */
  refunded: string | null;
}

const unpaidStatusWords: Record<Exclude<BookingPayment['status'], 'paid'>, string> = {
  open: 'Payment page open, not paid yet',
  expired: 'Payment page closed unpaid',
  failed: 'Payment did not go through',
};

/**
 * Each payment of the booking, oldest first as the API lists them: the deposit and any
 * top-ups, what each was for, whether it was paid (when, on the workshop's clock) and what was
 * given back. `paidOnly` leaves out the pages that were never paid.
 */
export function paymentLines(
  booking: Pick<Booking, 'payments' | 'timeZone'>,
  { paidOnly = false }: { paidOnly?: boolean } = {},
): PaymentLine[] {
  return booking.payments
    .filter((payment) => !paidOnly || payment.status === 'paid')
    .map((payment) => ({
      id: payment.id,
      label: paymentKindLabels[payment.kind],
      amount: formatCents(payment.amountCents),
      status:
        payment.status === 'paid'
          ? payment.paidAt
            ? `Paid ${formatEventTime(payment.paidAt, booking.timeZone)}`
            : 'Paid'
          : unpaidStatusWords[payment.status],
      refunded: payment.refundedCents > 0 ? `${formatCents(payment.refundedCents)} refunded` : null,
    }));
}

/** A held booking whose payment has not gone through: what became of it. */
export function paymentStatusNote(booking: Pick<PaymentFields, 'state' | 'payments'>) {
  if (booking.state !== 'held') return null;
  const statuses = new Set(booking.payments.map((payment) => payment.status));
  if (statuses.has('open')) {
    return 'A payment page was opened for this deposit; the payment is not complete.';
  }
  if (statuses.has('failed')) return 'A payment for this deposit did not go through.';
  if (statuses.has('expired')) return 'A payment page closed before the deposit was paid.';
  return null;
}

/**
 * Where the success page stands, from the booking as the API answers it (never from the
 * address the provider sent the customer back to). The same page follows a deposit top-up (the
 * difference a revised quote's higher deposit asks), on a booking past `held`:
 * - `received`: the deposit is recorded, the booking has moved on from `held` (and no top-up
 *   is open or still due);
 * - `waiting`: still held with its payment page open, or a top-up page open (its outcome not
 *   heard yet), and time to wait;
 * - `not-heard`: the same, once the wait is over;
 * - `not-complete`: still held, and no payment page is open (the payment failed or lapsed, or
 *   none was started); or a top-up still due with no page open;
 * - `ended`: the booking was cancelled or its hold ran out.
 */
export type PaymentCheckPhase = 'received' | 'waiting' | 'not-heard' | 'not-complete' | 'ended';

export function paymentCheckPhase(
  booking: Pick<PaymentFields, 'state' | 'payments' | 'depositTopUpCents'>,
  waitOver: boolean,
): PaymentCheckPhase {
  if (PAID_STATES.has(booking.state)) {
    // Back from paying the difference a revised quote asks: the top-up is what is awaited.
    const topUpOpen = booking.payments.some(
      (payment) => payment.kind === 'top-up' && payment.status === 'open',
    );
    if (topUpOpen) return waitOver ? 'not-heard' : 'waiting';
    if (topUpDue(booking)) return 'not-complete';
    return 'received';
  }
  if (bookingEnded(booking.state)) return 'ended';
  if (!openPayment(booking.payments)) return 'not-complete';
  return waitOver ? 'not-heard' : 'waiting';
}

/**
 * The provider's payment page address from the API, only when it is a web address (never a
 * `javascript:` or other scheme); null otherwise.
 */
export function checkoutAddress(url: unknown): string | null {
  if (typeof url !== 'string') return null;
  try {
    const parsed = new URL(url);
    return parsed.protocol === 'https:' || parsed.protocol === 'http:' ? parsed.href : null;
  } catch {
    return null;
  }
}

import escapeHtml from 'escape-html';
import { type CustomerMessage, amount, workshopDateTime } from './customer-message';

export { workshopDateTime };

export interface DepositReceiptMailInput {
  customerName: string;
  workshop: { name: string; addressLine: string; town: string; phone: string; email: string };
  /** B-000042 */
  bookingReference: string;
  /** Q-000123 v1 */
  quoteReference: string;
  vehicleName: string;
  /** The booking's start (UTC) and the workshop's IANA zone it is shown in. */
  startsAt: Date;
  timeZone: string;
  /** ISO 4217 code, any case. */
  currency: string;
  amountPaidCents: number;
  paidAt: Date;
  balanceDueCents: number;
  /** A deposit (the default) or a top-up of it after a revised quote was accepted. */
  kind?: 'deposit' | 'top-up';
  /**
   * Set when the payment reached the workshop after the held time had been let go (cancelled or
   * run out): it was refunded in full at once and the booking stays as it is.
   */
  refundedInFullCents?: number;
}

/**
 * The receipt for a deposit, as plain text and HTML: the workshop's card, the booking, when it
 * starts (workshop time), what was paid and what is left to pay. References only, never internal
 * ids.
 */
export function depositReceiptMail(input: DepositReceiptMailInput): CustomerMessage {
  const refunded = input.refundedInFullCents !== undefined;
  const topUp = input.kind === 'top-up';
  const what = topUp ? 'deposit top-up' : 'deposit';
  const subject = refunded
    ? `Your payment for booking ${input.bookingReference} has been refunded`
    : `Receipt: ${what} for booking ${input.bookingReference}`;
  const start = workshopDateTime(input.startsAt, input.timeZone);
  const paid = amount(input.amountPaidCents, input.currency);
  const paidOn = workshopDateTime(input.paidAt, input.timeZone);
  const summary: [string, string][] = [
    ['Booking', input.bookingReference],
    ['Quote', input.quoteReference],
    ['Vehicle', input.vehicleName],
    ['Start', start],
    ['Amount paid', paid],
    ['Paid on', paidOn],
    refunded
      ? ['Refunded', amount(input.refundedInFullCents ?? 0, input.currency)]
      : ['Balance due', amount(input.balanceDueCents, input.currency)],
  ];
  const lead = refunded
    ? topUp
      ? `Your deposit top-up of ${paid} for booking ${input.bookingReference} was not needed (the booking is no longer going ahead, or its deposit was already paid in full). We have refunded the whole amount to your card; it can take a few business days to show on your statement.`
      : `Your payment of ${paid} reached us after the time held for booking ${input.bookingReference} had been released, so the booking could not go ahead. We have refunded the whole amount to your card; it can take a few business days to show on your statement.`
    : topUp
      ? `Thank you: we have received your deposit top-up of ${paid} for booking ${input.bookingReference}, for the revised quote you accepted. The booking's time is unchanged.`
      : `Thank you: we have received your deposit of ${paid} for booking ${input.bookingReference}. The workshop will confirm the booking with you.`;
  const card = [
    input.workshop.name,
    input.workshop.addressLine,
    input.workshop.town,
    `Phone ${input.workshop.phone}`,
    input.workshop.email,
  ];
  const width = Math.max(...summary.map(([label]) => label.length));
  const text = [
    `Hello ${input.customerName},`,
    '',
    lead,
    '',
    ...summary.map(([label, value]) => `${`${label}:`.padEnd(width + 2)}${value}`),
    '',
    refunded
      ? 'To book another time, open your quote and pick a new start.'
      : 'The balance is due when the work is done.',
    '',
    ...card,
  ].join('\n');
  const rows = summary
    .map(
      ([label, value]) =>
        `<tr><th align="left" style="padding: 2px 12px 2px 0;">${escapeHtml(label)}</th><td>${escapeHtml(value)}</td></tr>`,
    )
    .join('\n        ');
  const html = `<!doctype html>
<html lang="en">
  <body style="font-family: sans-serif; line-height: 1.5; color: #1f2328;">
    <p>Hello ${escapeHtml(input.customerName)},</p>
    <p>${escapeHtml(lead)}</p>
    <table style="border-collapse: collapse;">
        ${rows}
    </table>
    <p>${
      refunded
        ? 'To book another time, open your quote and pick a new start.'
        : 'The balance is due when the work is done.'
    }</p>
    <p>${card.map((line) => escapeHtml(line)).join('<br>')}</p>
  </body>
</html>`;
  return { subject, text, html, attachments: [] };
}

import { longDate } from '../../workshop/workshop-time';
import { DateTime } from 'luxon';
import { bookingCalendar } from './booking-calendar';
import {
  type CustomerMessage,
  type WorkshopCard,
  amount,
  layoutMessage,
  workshopDateTime,
} from './customer-message';

/** What every booking message shows: references, never internal ids (the UID aside). */
export interface BookingMessageInput {
  customer: { name: string; email: string };
  workshop: WorkshopCard;
  timeZone: string;
  /** Makes the calendar event's UID; never shown. */
  bookingId: string;
  /** B-000042 */
  bookingReference: string;
  /** Q-000123 v1 */
  quoteReference: string;
  vehicleName: string;
  startsAt: Date;
  endsAt: Date;
  /** The booking's calendar SEQUENCE after this change. */
  calendarSequence: number;
  /** When the message was made (the event's DTSTAMP). */
  now: Date;
}

function facts(input: BookingMessageInput): [string, string][] {
  return [
    ['Booking', input.bookingReference],
    ['Quote', input.quoteReference],
    ['Vehicle', input.vehicleName],
    ['Start', workshopDateTime(input.startsAt, input.timeZone)],
    ['Finish', workshopDateTime(input.endsAt, input.timeZone)],
  ];
}

function calendarFor(input: BookingMessageInput, method: 'REQUEST' | 'CANCEL') {
  return bookingCalendar({
    method,
    bookingId: input.bookingId,
    sequence: input.calendarSequence,
    stamp: input.now,
    startsAt: input.startsAt,
    endsAt: input.endsAt,
    timeZone: input.timeZone,
    summary: `${input.workshop.name}: booking ${input.bookingReference} (${input.vehicleName})`,
    description: `Booking ${input.bookingReference}, quote ${input.quoteReference}. Phone ${input.workshop.phone} to change it.`,
    workshop: input.workshop,
    customer: input.customer,
  });
}

const CHANGE = (input: BookingMessageInput) =>
  `To change or cancel, reply to this e-mail or phone ${input.workshop.phone}.`;

/** The deposit is in: the booking waits for the workshop to confirm it. */
export function bookingRequestedMessage(input: BookingMessageInput): CustomerMessage {
  return layoutMessage({
    subject: `Booking ${input.bookingReference} requested: we will confirm it shortly`,
    customerName: input.customer.name,
    lead: [
      `We have your request for booking ${input.bookingReference}. The workshop checks the time and confirms it with you, usually within one working day.`,
    ],
    facts: facts(input),
    closing: [CHANGE(input)],
    workshop: input.workshop,
  });
}

/** The workshop confirmed the time: a calendar invitation (METHOD:REQUEST) is attached. */
export function bookingConfirmedMessage(input: BookingMessageInput): CustomerMessage {
  return layoutMessage({
    subject: `Booking ${input.bookingReference} confirmed`,
    customerName: input.customer.name,
    lead: [
      `Your booking ${input.bookingReference} is confirmed. The attached calendar event has the time; please bring the vehicle a few minutes before the start.`,
    ],
    facts: facts(input),
    closing: [CHANGE(input)],
    workshop: input.workshop,
    attachments: [calendarFor(input, 'REQUEST')],
  });
}

/**
 * The booking has a new time. With `withCalendar` (the customer had a confirmed event) the
 * attached event is the same UID with the raised SEQUENCE, so calendars replace the old time.
 */
export function bookingMovedMessage(
  input: BookingMessageInput & { previousStartsAt: Date; withCalendar: boolean },
): CustomerMessage {
  return layoutMessage({
    subject: `Booking ${input.bookingReference} moved to ${workshopDateTime(input.startsAt, input.timeZone)}`,
    customerName: input.customer.name,
    lead: [
      `Your booking ${input.bookingReference} has moved. It was ${workshopDateTime(input.previousStartsAt, input.timeZone)}; the new time is below.`,
    ],
    facts: facts(input),
    closing: [CHANGE(input)],
    workshop: input.workshop,
    attachments: input.withCalendar ? [calendarFor(input, 'REQUEST')] : [],
  });
}

/**
 * The day before a confirmed booking: when and where, what to bring, and the cautions of the
 * work (the fitment is checked by a licensed technician; wheel nuts are re-checked after the
 * first drive).
 */
export function bookingReminderMessage(input: BookingMessageInput): CustomerMessage {
  const start = DateTime.fromJSDate(input.startsAt, { zone: input.timeZone })
    .setLocale('en-AU')
    .toFormat('h:mm a');
  return layoutMessage({
    subject: `Reminder: booking ${input.bookingReference} tomorrow at ${start}`,
    customerName: input.customer.name,
    lead: [
      `A reminder that your ${input.vehicleName} is booked in at ${input.workshop.name} tomorrow, ${workshopDateTime(input.startsAt, input.timeZone)}. Please bring it to ${input.workshop.addressLine}, ${input.workshop.town} a few minutes before the start.`,
      'Bring the key or adaptor for any locking wheel nuts, and take valuables and loose loads out of the vehicle.',
    ],
    facts: facts(input),
    closing: [
      'Fitment is checked again by a licensed technician before any work; local vehicle codes apply.',
      'After new wheels or tyres are fitted, have the wheel nuts re-checked to the maker’s torque after the first 50–100 km.',
      CHANGE(input),
    ],
    workshop: input.workshop,
  });
}

/** The booking is cancelled; with `withCalendar` a METHOD:CANCEL event removes it from calendars. */
export function bookingCancelledMessage(
  input: BookingMessageInput & { withCalendar: boolean },
): CustomerMessage {
  return layoutMessage({
    subject: `Booking ${input.bookingReference} cancelled`,
    customerName: input.customer.name,
    lead: [
      `Your booking ${input.bookingReference} is cancelled and its time released. Any refund of your deposit follows in a separate e-mail.`,
    ],
    facts: facts(input),
    closing: [`To book another time, open your quote and pick a new start.`],
    workshop: input.workshop,
    attachments: input.withCalendar ? [calendarFor(input, 'CANCEL')] : [],
  });
}

export interface RefundIssuedInput {
  customer: { name: string; email: string };
  workshop: WorkshopCard;
  timeZone: string;
  bookingReference: string;
  currency: string;
  refundCents: number;
  paidCents: number;
  reason: string;
  refundedAt: Date;
}

/** Money going back to the customer's card. */
export function refundIssuedMessage(input: RefundIssuedInput): CustomerMessage {
  const refund = amount(input.refundCents, input.currency);
  return layoutMessage({
    subject: `Refund of ${refund} for booking ${input.bookingReference}`,
    customerName: input.customer.name,
    lead: [
      `We have refunded ${refund} to your card for booking ${input.bookingReference}. It can take a few business days to show on your statement.`,
    ],
    facts: [
      ['Booking', input.bookingReference],
      ['Paid', amount(input.paidCents, input.currency)],
      ['Refunded', refund],
      ['Why', input.reason],
      ['Refunded on', workshopDateTime(input.refundedAt, input.timeZone)],
    ],
    closing: [],
    workshop: input.workshop,
  });
}

export interface QuoteSavedInput {
  customer: { name: string; email: string };
  workshop: WorkshopCard;
  timeZone: string;
  quoteReference: string;
  vehicleName: string;
  currency: string;
  totalCents: number;
  depositCents: number;
  /** The local date the price holds to, YYYY-MM-DD. */
  validUntilDate: string;
  quoteUrl: string;
}

/** The customer's quote is saved: the total, the deposit and the link to book. */
export function quoteSavedMessage(input: QuoteSavedInput): CustomerMessage {
  return layoutMessage({
    subject: `Your quote ${input.quoteReference} from ${input.workshop.name}`,
    customerName: input.customer.name,
    lead: [
      `Your quote ${input.quoteReference} for the ${input.vehicleName} is saved. Open it to see the fit report and book a time:`,
      input.quoteUrl,
    ],
    facts: [
      ['Quote', input.quoteReference],
      ['Vehicle', input.vehicleName],
      ['Total', amount(input.totalCents, input.currency)],
      ['Deposit to book', amount(input.depositCents, input.currency)],
      ['Price valid until', longDate(input.validUntilDate)],
    ],
    closing: [
      'Fitment is checked again by a licensed technician before any work; local vehicle codes apply.',
    ],
    workshop: input.workshop,
  });
}

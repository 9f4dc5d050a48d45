import { formatDate, formatDateTime } from '@/lib/format';
import type { Booking } from '@/types/api';

/** What accepting a revision did to the quote's booking. */
export type BookingOutcome = 'kept' | 're-planned' | 'moved' | 'needs-move' | 'updating';

type BookingTimes = Pick<Booking, 'startUtc' | 'endUtc' | 'needsMove' | 'quote'>;

/**
 * The booking after the revision was accepted, against how it was just before (when known):
 * flagged for the desk to move (`needsMove`), at another start, the same start with another end
 * (the job plan changed), or kept as it was. A booking still on an older version is being
 * updated (the server points it at the accepted version in the same step, so this is brief).
 */
export function bookingOutcome(
  booking: BookingTimes,
  before: Pick<Booking, 'startUtc' | 'endUtc'> | null,
  acceptedVersion: number,
): BookingOutcome {
  if (booking.needsMove) return 'needs-move';
  if (booking.quote.versionNumber !== acceptedVersion) return 'updating';
  if (!before) return 'kept';
  if (Date.parse(before.startUtc) !== Date.parse(booking.startUtc)) return 'moved';
  if (Date.parse(before.endUtc) !== Date.parse(booking.endUtc)) return 're-planned';
  return 'kept';
}

/** Booking states in which a booking still holds workshop time for its quote. */
const ACTIVE_STATES: readonly Booking['state'][] = ['held', 'requested', 'confirmed'];

/** The quote's booking that still holds time (the newest, should there be more than one). */
export function activeBookingOf(
  bookings: readonly Booking[],
  quoteId: string,
): Booking | undefined {
  return bookings
    .filter((booking) => booking.quote.id === quoteId && ACTIVE_STATES.includes(booking.state))
    .sort((a, b) => Date.parse(b.createdAt) - Date.parse(a.createdAt))[0];
}

/**
 * A booking's times in the workshop's zone: "7 Dec 2026, 7:30 am to 3:30 pm" within one day,
 * both dates when it runs over into another.
 */
export function bookingTimesText(startUtc: string, endUtc: string, timeZone: string): string {
  const start = formatDateTime(startUtc, timeZone);
  const end = formatDateTime(endUtc, timeZone);
  if (formatDate(startUtc, timeZone) !== formatDate(endUtc, timeZone)) return `${start} to ${end}`;
  const time = new Intl.DateTimeFormat('en-AU', { timeStyle: 'short', timeZone });
  return `${start} to ${time.format(new Date(endUtc))}`;
}

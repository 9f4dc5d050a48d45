import type { Booking, BookingState } from '@/types/api';
import { localDateOf } from './booking-text';
import { weekDates } from './day-board';

/** The desk's quick views of the bookings table. */
export type BookingQuickFilter = 'all' | 'waiting' | 'today' | 'this-week';

export const quickFilterLabels: Record<BookingQuickFilter, string> = {
  all: 'All bookings',
  waiting: 'Waiting for confirmation',
  today: 'Today',
  'this-week': 'This week',
};

export interface BookingFilter {
  quick: BookingQuickFilter;
  /** One state only, or null for any. */
  state: BookingState | null;
  /** Customer name or e-mail, quote reference ("Q-000123" or "123") or booking reference. */
  search: string;
  /** The workshop's today, "YYYY-MM-DD". */
  today: string;
  timeZone: string;
}

/** "Q-000123", "q123" or "123" with the letter given → 123; null when it is not such a number. */
function referenceNumber(text: string, letter: 'Q' | 'B'): number | null {
  const match = new RegExp(`^(?:${letter}-?)?0*(\\d+)$`, 'i').exec(text);
  return match ? Number(match[1]) : null;
}

function numberOf(reference: string): number | null {
  const match = /(\d+)$/.exec(reference);
  return match ? Number(match[1]) : null;
}

/** Whether a booking answers the search text (empty text: every booking). */
export function matchesSearch(booking: Booking, search: string): boolean {
  const text = search.trim().toLowerCase();
  if (!text) return true;
  if (booking.customer.name.toLowerCase().includes(text)) return true;
  if (booking.customer.email.toLowerCase().includes(text)) return true;
  const quoteNumber = referenceNumber(text, 'Q');
  if (quoteNumber !== null && quoteNumber === numberOf(booking.quote.reference)) return true;
  const bookingNumber = referenceNumber(text, 'B');
  if (bookingNumber !== null && bookingNumber === numberOf(booking.reference)) return true;
  return false;
}

function matchesQuick(booking: Booking, filter: BookingFilter): boolean {
  switch (filter.quick) {
    case 'all':
      return true;
    case 'waiting':
      return booking.state === 'requested';
    case 'today':
      return localDateOf(booking.startUtc, filter.timeZone) === filter.today;
    case 'this-week': {
      const week = weekDates(filter.today);
      const date = localDateOf(booking.startUtc, filter.timeZone);
      return date >= week[0] && date <= week[6];
    }
  }
}

/** The rows of the bookings table for the chosen view, state and search. */
export function filterBookings(bookings: readonly Booking[], filter: BookingFilter): Booking[] {
  return bookings.filter(
    (booking) =>
      matchesQuick(booking, filter) &&
      (filter.state === null || booking.state === filter.state) &&
      matchesSearch(booking, filter.search),
  );
}

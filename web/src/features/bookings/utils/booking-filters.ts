import type { Booking, BookingState } from '@/types/api';
import { moveRequestStatus } from './booking-history';
import { localDateOf } from './booking-text';
import { weekDates } from './day-board';

/** The desk's quick views of the bookings table. */
export type BookingQuickFilter =
  'all' | 'waiting' | 'today' | 'this-week' | 'move-requested' | 'needs-move';

export const quickFilterLabels: Record<BookingQuickFilter, string> = {
  all: 'All bookings',
  waiting: 'Waiting for confirmation',
  today: 'Today',
  'this-week': 'This week',
  'move-requested': 'Move requested',
  'needs-move': 'Needs a move',
};

/** States in which a booking still holds its time (a move or a request to move matters). */
const OPEN_STATES: ReadonlySet<BookingState> = new Set(['held', 'requested', 'confirmed']);

/** The customer asked to move it, it is still to come, and it has not been moved since. */
export function moveRequested(booking: Pick<Booking, 'state' | 'moveRequest' | 'events'>): boolean {
  return moveRequestStatus(booking).kind === 'waiting';
}

/** An accepted revision no longer fits the booked time: the desk must move it. */
export function needsMove(booking: Pick<Booking, 'state' | 'needsMove'>): boolean {
  return booking.needsMove !== null && OPEN_STATES.has(booking.state);
}

export interface BookingFilter {
  quick: BookingQuickFilter;
  /** One state only, or null for any. */
  state: BookingState | null;
  /**
   * Customer name or e-mail, the vehicle's rego, quote reference ("Q-000123" or "123") or
   * booking reference.
   */
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

/** A rego as plates are read aloud: letters and digits only, upper case ("abc-123" → "ABC123"). */
export function regoKey(rego: string): string {
  return rego.replace(/[^0-9a-z]/gi, '').toUpperCase();
}

/** Whether a booking answers the search text (empty text: every booking). */
export function matchesSearch(booking: Booking, search: string): boolean {
  const text = search.trim().toLowerCase();
  if (!text) return true;
  if (booking.customer.name.toLowerCase().includes(text)) return true;
  if (booking.customer.email.toLowerCase().includes(text)) return true;
  const plate = regoKey(text);
  if (plate && booking.rego && regoKey(booking.rego).includes(plate)) return true;
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
    case 'move-requested':
      return moveRequested(booking);
    case 'needs-move':
      return needsMove(booking);
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

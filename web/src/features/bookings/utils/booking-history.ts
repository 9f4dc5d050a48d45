import { DateTime } from 'luxon';
import type { Booking, BookingEvent, BookingEventKind, Role } from '@/types/api';

/**
 * A booking's history read from its audit trail (`events`, oldest first, times in UTC): the
 * lines the desk reads, the moves and the confirmation the customer sees, and where the
 * customer's request to move stands. Times are shown on the workshop's clock.
 */

const LOCALE = 'en-AU';

export const bookingEventLabels: Record<BookingEventKind, string> = {
  held: 'Time held',
  'deposit-paid': 'Deposit paid',
  requested: 'Sent to the workshop',
  confirmed: 'Confirmed',
  moved: 'Moved',
  'move-requested': 'Move requested',
  arrived: 'Vehicle arrived',
  started: 'Work started',
  completed: 'Completed',
  cancelled: 'Cancelled',
  expired: 'Hold ran out',
  'top-up-paid': 'Top-up paid',
  'revision-sent': 'Revised quote sent',
  'revision-declined': 'Revision declined',
  're-planned': 'Re-planned',
  'needs-move': 'Needs a move',
};

const roleWords: Record<Role, string> = {
  customer: 'customer',
  desk: 'front desk',
  tech: 'technician',
  manager: 'manager',
};

/** "Thu 3 Dec 2026, 7:30 am" on the workshop's clock. */
export function formatEventTime(isoInstant: string, timeZone: string): string {
  const local = DateTime.fromISO(isoInstant).setZone(timeZone).setLocale(LOCALE);
  if (!local.isValid) return '';
  const date = local
    .toLocaleString({ weekday: 'short', day: 'numeric', month: 'short', year: 'numeric' })
    .replace(',', '');
  return `${date}, ${local.toLocaleString(DateTime.TIME_SIMPLE)}`;
}

/** "Bree Calder (front desk)"; no actor: the system or the payment provider. */
export function eventActorText(actor: BookingEvent['actor']): string {
  return actor ? `${actor.name} (${roleWords[actor.role]})` : 'Automatic';
}

export interface AuditRow {
  key: string;
  /** The UTC instant, for a <time> element. */
  at: string;
  time: string;
  label: string;
  actor: string;
  detail: string;
}

/** The audit trail as the desk reads it, oldest first as the API sends it. */
export function auditRows(booking: Pick<Booking, 'events' | 'timeZone'>): AuditRow[] {
  return booking.events.map((event, index) => ({
    key: `${index}-${event.at}-${event.kind}`,
    at: event.at,
    time: formatEventTime(event.at, booking.timeZone),
    label: bookingEventLabels[event.kind],
    actor: eventActorText(event.actor),
    detail: event.detail,
  }));
}

function at(event: BookingEvent): number {
  return Date.parse(event.at);
}

/** The events of one kind, oldest first. */
function eventsOf(booking: Pick<Booking, 'events'>, kind: BookingEventKind): BookingEvent[] {
  return booking.events.filter((event) => event.kind === kind).sort((a, b) => at(a) - at(b));
}

/** Every move of the booking, oldest first: when, and the trail's words ("Moved from … to …"). */
export function bookingMoves(booking: Pick<Booking, 'events'>): BookingEvent[] {
  return eventsOf(booking, 'moved');
}

/** When the workshop confirmed it (the last confirmation), or null. */
export function confirmedAt(booking: Pick<Booking, 'events'>): string | null {
  return eventsOf(booking, 'confirmed').at(-1)?.at ?? null;
}

/**
 * Where the customer's request to move stands:
 * - `none`: they have not asked;
 * - `waiting`: asked, the booking is still to come and has not been moved since;
 * - `moved`: the booking was moved at or after the request (`move` is that move);
 * - `closed`: the booking ended (cancelled, started, done) without being moved.
 */
export type MoveRequestStatus =
  | { kind: 'none' }
  | { kind: 'waiting' }
  | { kind: 'moved'; move: BookingEvent }
  | { kind: 'closed' };

const STILL_TO_COME: ReadonlySet<Booking['state']> = new Set(['held', 'requested', 'confirmed']);

export function moveRequestStatus(
  booking: Pick<Booking, 'moveRequest' | 'events' | 'state'>,
): MoveRequestStatus {
  if (!booking.moveRequest) return { kind: 'none' };
  const askedAt = Date.parse(booking.moveRequest.requestedAt);
  const move = bookingMoves(booking).find((event) => at(event) >= askedAt);
  if (move) return { kind: 'moved', move };
  return STILL_TO_COME.has(booking.state) ? { kind: 'waiting' } : { kind: 'closed' };
}

/**
 * A revision of the booked quote newer than the booked version: its number and state (the desk
 * sees any newer version; the customer is offered only one sent to them, see
 * `revisionToAnswer`). Null when the booking is on the quote's latest version.
 */
export function newerQuoteVersion(
  booking: Pick<Booking, 'quote'>,
): { number: number; state: Booking['quote']['latestVersionState'] } | null {
  const { versionNumber, latestVersionNumber, latestVersionState } = booking.quote;
  return latestVersionNumber > versionNumber
    ? { number: latestVersionNumber, state: latestVersionState }
    : null;
}

/**
 * The revised version waiting for the customer's answer (sent, newer than booked) while the
 * booking goes ahead, or null.
 */
export function revisionToAnswer(booking: Pick<Booking, 'quote' | 'state'>): number | null {
  const newer = newerQuoteVersion(booking);
  if (!newer || newer.state !== 'sent') return null;
  return booking.state === 'cancelled' || booking.state === 'expired' ? null : newer.number;
}

/**
 * The customer's note in quotation marks, ending its sentence: a full stop is added only when
 * the note does not already end with one (or with ? or !).
 */
export function noteSentence(note: string): string {
  const text = note.trim();
  return /[.!?…]$/.test(text) ? `“${text}”` : `“${text}”.`;
}

/** One note on a customer's booking card: what changed or what waits for them. */
export interface BookingNote {
  tone: 'info' | 'action' | 'done';
  text: string;
}

/**
 * The short notes on a booking in the customer's list, most pressing first: a revised quote to
 * answer, a top-up to pay, a new time the revised job needs, the request to move while it
 * waits, the last move.
 */
export function customerBookingNotes(
  booking: Pick<
    Booking,
    'quote' | 'state' | 'depositTopUpCents' | 'moveRequest' | 'needsMove' | 'events' | 'timeZone'
  >,
  formatCents: (cents: number) => string,
): BookingNote[] {
  const notes: BookingNote[] = [];
  const revision = revisionToAnswer(booking);
  if (revision !== null) {
    notes.push({ tone: 'action', text: `Revised quote (version ${revision}) to answer` });
  }
  if (booking.depositTopUpCents > 0) {
    notes.push({
      tone: 'action',
      text: `Deposit difference to pay: ${formatCents(booking.depositTopUpCents)}`,
    });
  }
  if (booking.needsMove && STILL_TO_COME.has(booking.state)) {
    notes.push({
      tone: 'info',
      text: 'The revised job needs a new time: the workshop will move it',
    });
  }
  const asked = moveRequestStatus(booking);
  if (asked.kind === 'waiting') {
    notes.push({ tone: 'info', text: 'You asked to move it: waiting for the workshop' });
  }
  const lastMove = bookingMoves(booking).at(-1);
  if (lastMove) {
    notes.push({
      tone: 'done',
      text: `${lastMove.detail.replace(/\.$/, '')} (${formatEventTime(lastMove.at, booking.timeZone)})`,
    });
  }
  return notes;
}

import { describe, expect, it } from 'vitest';
import type { Booking, BookingEvent } from '@/types/api';
import {
  auditRows,
  customerBookingNotes,
  bookingMoves,
  confirmedAt,
  formatEventTime,
  moveRequestStatus,
  newerQuoteVersion,
  noteSentence,
  revisionToAnswer,
} from './booking-history';

const SYDNEY = 'Australia/Sydney';
// Demo data: an invented front-desk person.
const desk = { name: 'Bree Calder', role: 'desk' as const };

function event(kind: BookingEvent['kind'], at: string, detail = ''): BookingEvent {
  return { at, kind, actor: kind === 'expired' ? null : desk, detail };
}

type HistoryFields = Pick<
  Booking,
  'events' | 'moveRequest' | 'needsMove' | 'state' | 'timeZone' | 'quote'
>;

function booking(fields: Partial<HistoryFields>): HistoryFields {
  return {
    events: [],
    moveRequest: null,
    needsMove: null,
    state: 'confirmed',
    timeZone: SYDNEY,
    quote: {
      versionNumber: 1,
      latestVersionNumber: 1,
      latestVersionState: 'accepted',
    } as Booking['quote'],
    ...fields,
  };
}

const moveDetail =
  'Moved from Thursday 3 December 2026, 7:30 am AEDT to Friday 4 December 2026, 7:30 am AEDT.';

describe('the audit trail', () => {
  it('shows each time on the workshop’s clock, with the year', () => {
    // Source: IANA time zone database, Australia/Sydney: AEDT (UTC+11) in December, so
    // 22:15 UTC on 2 Dec is 9:15 am on Thursday 3 Dec.
    expect(formatEventTime('2026-12-02T22:15:00.000Z', SYDNEY)).toMatch(
      /^Thu 3 Dec 2026, 9:15\s?am$/,
    );
    // Source: IANA, Australia/Sydney: AEST (UTC+10) in June: 03:00 UTC is 1:00 pm. (CLDR en-AU
    // writes the short month of June as "June" or "Jun" by version.)
    expect(formatEventTime('2027-06-02T03:00:00.000Z', SYDNEY)).toMatch(
      /^Wed 2 June? 2027, 1:00\s?pm$/,
    );
  });

  it('names each line, who did it (or that it happened by itself) and what the API said', () => {
    const rows = auditRows(
      booking({
        events: [
          event('held', '2026-12-01T01:00:00.000Z', 'Held for …'),
          event('expired', '2026-12-01T01:20:00.000Z', 'The held time ran out.'),
        ],
      }),
    );
    expect(rows.map(({ label, actor, detail }) => [label, actor, detail])).toEqual([
      ['Time held', 'Bree Calder (front desk)', 'Held for …'],
      ['Hold ran out', 'Automatic', 'The held time ran out.'],
    ]);
    expect(new Set(rows.map((row) => row.key)).size).toBe(2);
  });
});

describe('moves and confirmation', () => {
  it('lists the moves oldest first and finds the last confirmation', () => {
    const history = booking({
      events: [
        event('moved', '2026-12-01T06:00:00.000Z', 'second'),
        event('confirmed', '2026-12-01T02:00:00.000Z'),
        event('moved', '2026-12-01T03:00:00.000Z', 'first'),
      ],
    });
    expect(bookingMoves(history).map((move) => move.detail)).toEqual(['first', 'second']);
    expect(confirmedAt(history)).toBe('2026-12-01T02:00:00.000Z');
    expect(confirmedAt(booking({}))).toBeNull();
  });
});

describe('the customer’s request to move', () => {
  const asked = { note: 'Could it be the Friday?', requestedAt: '2026-12-01T04:00:00.000Z' };

  it('waits for the workshop until the booking is moved', () => {
    // A move before the request does not answer it.
    const before = event('moved', '2026-12-01T03:00:00.000Z', moveDetail);
    expect(moveRequestStatus(booking({ moveRequest: asked, events: [before] }))).toEqual({
      kind: 'waiting',
    });
    const after = event('moved', '2026-12-01T05:00:00.000Z', moveDetail);
    expect(moveRequestStatus(booking({ moveRequest: asked, events: [before, after] }))).toEqual({
      kind: 'moved',
      move: after,
    });
  });

  it('is closed when the booking ends without a move, and none when never asked', () => {
    expect(moveRequestStatus(booking({ moveRequest: asked, state: 'cancelled' }))).toEqual({
      kind: 'closed',
    });
    expect(moveRequestStatus(booking({}))).toEqual({ kind: 'none' });
  });
});

describe('a revised quote after the booking', () => {
  const revised = (latestVersionState: Booking['quote']['latestVersionState']) =>
    booking({
      quote: { versionNumber: 1, latestVersionNumber: 2, latestVersionState } as Booking['quote'],
    });

  it('is offered to the customer only while it waits for their answer', () => {
    expect(revisionToAnswer(revised('sent'))).toBe(2);
    expect(revisionToAnswer(revised('declined'))).toBeNull();
    expect(revisionToAnswer(revised('expired'))).toBeNull();
    expect(revisionToAnswer({ ...revised('sent'), state: 'cancelled' })).toBeNull();
  });

  it('is shown to the desk whatever its state, and not when the booking is on the latest', () => {
    expect(newerQuoteVersion(revised('declined'))).toEqual({ number: 2, state: 'declined' });
    expect(newerQuoteVersion(booking({}))).toBeNull();
    expect(revisionToAnswer(booking({}))).toBeNull();
  });
});

describe('the notes on a customer’s booking card', () => {
  // Source: ISO 4217, AUD has 2 minor units (a stand-in formatter keeps the test on the logic).
  const dollars = (cents: number) => `$${(cents / 100).toFixed(2)}`;

  it('puts what waits for the customer first, then the request and the last move', () => {
    const notes = customerBookingNotes(
      {
        ...booking({
          quote: {
            versionNumber: 1,
            latestVersionNumber: 2,
            latestVersionState: 'sent',
          } as Booking['quote'],
          moveRequest: { note: 'Later, please', requestedAt: '2026-12-01T08:00:00.000Z' },
          events: [event('moved', '2026-12-01T05:00:00.000Z', moveDetail)],
        }),
        depositTopUpCents: 20_000,
      },
      dollars,
    );
    expect(notes.map((note) => note.tone)).toEqual(['action', 'action', 'info', 'done']);
    expect(notes[2].text).toBe('You asked to move it: waiting for the workshop');
    expect(notes[0].text).toBe('Revised quote (version 2) to answer');
    expect(notes[1].text).toBe('Deposit difference to pay: $200.00');
    // Source: IANA, Australia/Sydney AEDT (UTC+11): 05:00 UTC on 1 Dec is 4:00 pm.
    expect(notes[3].text).toMatch(
      /^Moved from Thursday 3 December 2026, 7:30 am AEDT to Friday 4 December 2026, 7:30 am AEDT \(Tue 1 Dec 2026, 4:00\s?pm\)$/,
    );
  });

  it('tells the customer when the revised job needs a new time, until the booking ends', () => {
    const needsMove = { reason: 'Longer hoist time.', since: '2026-12-01T09:00:00.000Z' };
    const open = { ...booking({ needsMove }), depositTopUpCents: 0 };
    expect(customerBookingNotes(open, dollars)).toEqual([
      { tone: 'info', text: 'The revised job needs a new time: the workshop will move it' },
    ]);
    expect(customerBookingNotes({ ...open, state: 'cancelled' }, dollars)).toEqual([]);
  });

  it('says nothing of a booking with nothing new', () => {
    expect(customerBookingNotes({ ...booking({}), depositTopUpCents: 0 }, dollars)).toEqual([]);
  });
});

describe('the customer’s note in a sentence', () => {
  it('ends with one full stop, whatever the note ends with', () => {
    expect(noteSentence('Any day next week works, mornings best.')).toBe(
      '“Any day next week works, mornings best.”',
    );
    expect(noteSentence(' Could it be Friday? ')).toBe('“Could it be Friday?”');
    expect(noteSentence('Mornings only')).toBe('“Mornings only”.');
  });
});

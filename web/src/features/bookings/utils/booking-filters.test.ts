import { describe, expect, it } from 'vitest';
import type { Booking } from '@/types/api';
import { filterBookings, matchesSearch, type BookingFilter } from './booking-filters';

const SYDNEY = 'Australia/Sydney';

function booking(
  reference: string,
  state: Booking['state'],
  startUtc: string,
  quoteReference: string,
  name: string,
  extra: Partial<Pick<Booking, 'rego' | 'moveRequest' | 'needsMove' | 'events'>> = {},
): Booking {
  return {
    id: reference,
    reference,
    state,
    startUtc,
    timeZone: SYDNEY,
    customer: {
      id: `c-${reference}`,
      name,
      email: `${name.split(' ')[0].toLowerCase()}@example.test`,
    },
    quote: { reference: quoteReference },
    rego: null,
    moveRequest: null,
    needsMove: null,
    events: [],
    ...extra,
  } as Booking;
}

// Demo data: invented customers and references.
const askedToMove = { note: 'Could it be the Friday?', requestedAt: '2026-12-01T03:00:00.000Z' };
const revisedPastItsTime = {
  reason: 'The revised job needs 45 more minutes in the hoist bay.',
  since: '2026-12-01T04:00:00.000Z',
};
const bookings = [
  // 07:30 on Thu 3 Dec 2026, Sydney (UTC+11).
  booking('B-000042', 'requested', '2026-12-02T20:30:00.000Z', 'Q-000123', 'Ari Pellow', {
    rego: 'KTW 48Q',
    moveRequest: askedToMove,
  }),
  // 09:00 on Mon 7 Dec 2026: the next week.
  booking('B-000043', 'confirmed', '2026-12-06T22:00:00.000Z', 'Q-000124', 'Mika Ranter', {
    rego: 'ZZ-0917',
    needsMove: revisedPastItsTime,
  }),
  // 08:00 on Mon 30 Nov 2026: this week's Monday.
  booking('B-000044', 'held', '2026-11-29T21:00:00.000Z', 'Q-000125', 'Ola Fenwick'),
];

const base: BookingFilter = {
  quick: 'all',
  state: null,
  search: '',
  today: '2026-12-03',
  timeZone: SYDNEY,
};
const refs = (list: Booking[]) => list.map((entry) => entry.reference);

describe('the bookings table’s filters', () => {
  it('waits for confirmation on requested bookings only', () => {
    expect(refs(filterBookings(bookings, { ...base, quick: 'waiting' }))).toEqual(['B-000042']);
  });

  it('reads today and this week on the workshop’s clock', () => {
    // Source: IANA time zone database, Australia/Sydney AEDT (UTC+11): 20:30 UTC on 2 Dec is
    // 07:30 on 3 Dec, the workshop's today here.
    expect(refs(filterBookings(bookings, { ...base, quick: 'today' }))).toEqual(['B-000042']);
    // Source: ISO 8601-1:2019, week dates: week 49 of 2026 is Mon 30 Nov to Sun 6 Dec.
    expect(refs(filterBookings(bookings, { ...base, quick: 'this-week' }))).toEqual([
      'B-000042',
      'B-000044',
    ]);
  });

  it('lists the bookings the customer asked to move, and those the desk must move', () => {
    expect(refs(filterBookings(bookings, { ...base, quick: 'move-requested' }))).toEqual([
      'B-000042',
    ]);
    expect(refs(filterBookings(bookings, { ...base, quick: 'needs-move' }))).toEqual(['B-000043']);
  });

  it('drops a request to move once the desk has moved the booking', () => {
    const moved = {
      ...bookings[0],
      events: [
        {
          at: '2026-12-01T05:00:00.000Z',
          kind: 'moved' as const,
          actor: { name: 'Bree Calder', role: 'desk' as const },
          detail:
            'Moved from Thursday 3 December 2026, 7:30 am AEDT to Friday 4 December 2026, 7:30 am AEDT.',
        },
      ],
    };
    expect(filterBookings([moved], { ...base, quick: 'move-requested' })).toEqual([]);
  });

  it('drops a request to move once the booking is over', () => {
    const done = { ...bookings[0], state: 'completed' as const };
    const cancelled = { ...bookings[1], state: 'cancelled' as const };
    expect(filterBookings([done, cancelled], { ...base, quick: 'move-requested' })).toEqual([]);
    expect(filterBookings([done, cancelled], { ...base, quick: 'needs-move' })).toEqual([]);
  });

  it('narrows to one state', () => {
    expect(refs(filterBookings(bookings, { ...base, state: 'confirmed' }))).toEqual(['B-000043']);
  });
});

describe('searching the bookings', () => {
  it('finds a customer by name or e-mail, any case', () => {
    expect(matchesSearch(bookings[0], 'pellow')).toBe(true);
    expect(matchesSearch(bookings[0], 'ARI@EXAMPLE')).toBe(true);
    expect(matchesSearch(bookings[0], 'ranter')).toBe(false);
  });

  it('finds a quote by its reference, with or without the letter and zeros', () => {
    for (const text of ['Q-000123', 'q123', '123', '000123']) {
      expect(matchesSearch(bookings[0], text)).toBe(true);
    }
    expect(matchesSearch(bookings[0], 'Q-000124')).toBe(false);
  });

  it('finds a vehicle by its rego, whatever the spacing, dashes or case', () => {
    for (const text of ['KTW 48Q', 'ktw48q', 'KTW-48', 'w48']) {
      expect(matchesSearch(bookings[0], text)).toBe(true);
    }
    expect(matchesSearch(bookings[1], 'zz0917')).toBe(true);
    expect(matchesSearch(bookings[0], 'ZZ0917')).toBe(false);
    // A booking whose quote names no vehicle of the customer's has no rego to match.
    expect(matchesSearch(bookings[2], 'KTW')).toBe(false);
  });

  it('finds a booking by its reference', () => {
    expect(matchesSearch(bookings[0], 'B-000042')).toBe(true);
    expect(matchesSearch(bookings[0], 'b42')).toBe(true);
    expect(matchesSearch(bookings[0], 'B-000043')).toBe(false);
  });
});

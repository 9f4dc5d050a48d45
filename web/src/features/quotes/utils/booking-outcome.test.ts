import { describe, expect, it } from 'vitest';
import type { Booking } from '@/types/api';
import { activeBookingOf, bookingOutcome, bookingTimesText } from './booking-outcome';

function booking(partial: {
  id?: string;
  quoteId?: string;
  versionNumber?: number;
  state?: Booking['state'];
  startUtc?: string;
  endUtc?: string;
  needsMove?: Booking['needsMove'];
  createdAt?: string;
}): Booking {
  // Only the fields the outcome reads.
  return {
    id: partial.id ?? 'b1',
    state: partial.state ?? 'confirmed',
    startUtc: partial.startUtc ?? '2026-12-03T21:30:00.000Z',
    endUtc: partial.endUtc ?? '2026-12-04T03:30:00.000Z',
    needsMove: partial.needsMove ?? null,
    createdAt: partial.createdAt ?? '2026-12-01T00:00:00.000Z',
    quote: { id: partial.quoteId ?? 'q1', versionNumber: partial.versionNumber ?? 2 },
  } as unknown as Booking;
}

describe('what accepting a revision did to the booking', () => {
  const before = booking({ versionNumber: 1 });

  it('is kept when its times are the same', () => {
    expect(bookingOutcome(booking({}), before, 2)).toBe('kept');
    // Without a "before" (the page opened after the answer), a booking on the version is kept.
    expect(bookingOutcome(booking({}), null, 2)).toBe('kept');
  });

  it('is re-planned when it starts at the same time and ends later', () => {
    // The same instant written with an offset still counts as the same start.
    const later = booking({
      startUtc: '2026-12-04T08:30:00.000+11:00',
      endUtc: '2026-12-04T04:15:00.000Z',
    });
    expect(bookingOutcome(later, before, 2)).toBe('re-planned');
  });

  it('is moved when the start changed, and flagged when the desk must move it', () => {
    expect(bookingOutcome(booking({ startUtc: '2026-12-05T21:30:00.000Z' }), before, 2)).toBe(
      'moved',
    );
    const flagged = booking({
      versionNumber: 2,
      needsMove: { reason: 'The longer job does not fit', since: '2026-12-02T01:00:00.000Z' },
    });
    expect(bookingOutcome(flagged, before, 2)).toBe('needs-move');
  });

  it('is still being updated while it points at the older version', () => {
    expect(bookingOutcome(booking({ versionNumber: 1 }), before, 2)).toBe('updating');
  });

  it("finds the quote's booking that still holds time", () => {
    const list = [
      booking({ id: 'cancelled', state: 'cancelled', createdAt: '2026-12-02T00:00:00.000Z' }),
      booking({ id: 'other', quoteId: 'q2' }),
      booking({ id: 'held', state: 'held' }),
    ];
    expect(activeBookingOf(list, 'q1')?.id).toBe('held');
    expect(activeBookingOf(list, 'q3')).toBeUndefined();
  });
});

describe("a booking's times in words", () => {
  // Source: IANA tz database, Australia/Sydney is UTC+11 in December (daylight saving);
  // Unicode CLDR en-AU medium date "d MMM y" and short time "h:mm a" (lower-case am/pm).
  it('names the day once when the job ends the same day', () => {
    const text = bookingTimesText(
      '2026-12-06T20:30:00.000Z',
      '2026-12-07T04:30:00.000Z',
      'Australia/Sydney',
    );
    expect(text.replace(/\u202f/g, ' ')).toBe('7 Dec 2026, 7:30 am to 3:30 pm');
  });

  it('names both days when the job runs into the next', () => {
    const text = bookingTimesText(
      '2026-12-07T04:30:00.000Z',
      '2026-12-07T22:00:00.000Z',
      'Australia/Sydney',
    );
    expect(text.replace(/\u202f/g, ' ')).toBe('7 Dec 2026, 3:30 pm to 8 Dec 2026, 9:00 am');
  });
});

import { describe, expect, it } from 'vitest';
import type { Bay, Booking, OpeningHoursEntry, PlannedSegment } from '@/types/api';
import {
  boardBays,
  boardWindow,
  bookingsOnDay,
  dayStatus,
  placeSegments,
  rowKinds,
  weekDates,
  workshopToday,
} from './day-board';

const SYDNEY = 'Australia/Sydney';

/** Demo hours: Monday to Friday 07:30–17:00 with a break 12:00–12:30, Saturday 08:00–12:00. */
const week: OpeningHoursEntry[] = [1, 2, 3, 4, 5, 6, 7].map((weekday) =>
  weekday <= 5
    ? {
        weekday,
        open: true,
        opensAt: '07:30',
        closesAt: '17:00',
        breakStartsAt: '12:00',
        breakEndsAt: '12:30',
      }
    : weekday === 6
      ? {
          weekday,
          open: true,
          opensAt: '08:00',
          closesAt: '12:00',
          breakStartsAt: null,
          breakEndsAt: null,
        }
      : {
          weekday,
          open: false,
          opensAt: null,
          closesAt: null,
          breakStartsAt: null,
          breakEndsAt: null,
        },
);

const hoist: Bay = { id: 'bay-hoist', name: 'Hoist 1', kind: 'hoist', position: 1, active: true };
const align: Bay = {
  id: 'bay-align',
  name: 'Align 1',
  kind: 'alignment',
  position: 2,
  active: true,
};
const spare: Bay = { id: 'bay-spare', name: 'Hoist 2', kind: 'hoist', position: 3, active: false };

function segment(bay: Bay, startUtc: string, endUtc: string): PlannedSegment {
  return {
    bayId: bay.id,
    bayName: bay.name,
    bayKind: bay.kind,
    minutes: (Date.parse(endUtc) - Date.parse(startUtc)) / 60_000,
    start: startUtc,
    startUtc,
    end: endUtc,
    endUtc,
  };
}

function booking(id: string, state: Booking['state'], segments: PlannedSegment[]): Booking {
  return {
    id,
    reference: `B-${id}`,
    state,
    segments,
    startUtc: segments[0].startUtc,
    endUtc: segments[segments.length - 1].endUtc,
    timeZone: SYDNEY,
  } as Booking;
}

describe('the board’s rows', () => {
  it('run from the week’s earliest opening to its latest closing in 30-minute rows', () => {
    const window = boardWindow(week);
    // Common practice (no published source): the board starts at the earliest opening.
    expect(window).toEqual({ startMinute: 450, endMinute: 1020, rows: 19 });
  });

  it('shade the break and the time outside a short day’s hours', () => {
    const window = boardWindow(week)!;
    const weekday = rowKinds(window, week[0]);
    expect(weekday[0]).toBe('work');
    // 12:00 is row 9 from 07:30 (9 × 30 minutes = 4 h 30).
    expect(weekday[9]).toBe('break');
    expect(weekday[10]).toBe('work');
    const saturday = rowKinds(window, week[5]);
    expect(saturday[0]).toBe('closed');
    expect(saturday[1]).toBe('work');
    expect(saturday[9]).toBe('closed');
  });

  it('has no rows when the workshop never opens', () => {
    expect(boardWindow(week.map((entry) => ({ ...entry, open: false })))).toBeNull();
  });
});

describe('placing stays on the rows', () => {
  const window = boardWindow(week)!;

  it('reads each stay on the workshop’s clock (Sydney in summer is UTC+11)', () => {
    // Source: IANA time zone database, Australia/Sydney: AEDT (UTC+11) from the first Sunday
    // in October to the first Sunday in April, so 20:30 UTC on 2 Dec is 07:30 on 3 Dec.
    const job = booking('1', 'confirmed', [
      segment(hoist, '2026-12-02T20:30:00.000Z', '2026-12-03T00:00:00.000Z'),
      segment(align, '2026-12-03T00:00:00.000Z', '2026-12-03T01:00:00.000Z'),
    ]);
    const blocks = placeSegments([job], '2026-12-03', SYDNEY, window);
    expect(blocks.map(({ segment: s, rowStart, rowEnd }) => [s.bayId, rowStart, rowEnd])).toEqual([
      // 07:30–11:00 local: rows 0 to 7; 11:00–12:00: rows 7 to 9.
      ['bay-hoist', 0, 7],
      ['bay-align', 7, 9],
    ]);
    expect(placeSegments([job], '2026-12-04', SYDNEY, window)).toEqual([]);
  });

  it('reads the winter clock too (Sydney in June is UTC+10)', () => {
    // Source: IANA time zone database, Australia/Sydney: AEST (UTC+10) outside daylight time,
    // so 21:30 UTC on 1 Jun 2027 is 07:30 on 2 Jun.
    const job = booking('2', 'requested', [
      segment(hoist, '2027-06-01T21:30:00.000Z', '2027-06-01T22:30:00.000Z'),
    ]);
    const [block] = placeSegments([job], '2027-06-02', SYDNEY, window);
    expect([block.rowStart, block.rowEnd]).toEqual([0, 2]);
  });

  it('shows a stay that runs overnight on both days, cut at the board’s edges', () => {
    // 15:00 on 3 Dec to 09:00 on 4 Dec local (UTC+11).
    const job = booking('3', 'confirmed', [
      segment(hoist, '2026-12-03T04:00:00.000Z', '2026-12-03T22:00:00.000Z'),
    ]);
    const [first] = placeSegments([job], '2026-12-03', SYDNEY, window);
    expect([first.rowStart, first.rowEnd, first.continuesAfter]).toEqual([15, 19, true]);
    const [second] = placeSegments([job], '2026-12-04', SYDNEY, window);
    expect([second.rowStart, second.rowEnd, second.continuesFromBefore]).toEqual([0, 3, true]);
    expect(bookingsOnDay([job], '2026-12-04', SYDNEY)[0].startsThatDay).toBe(false);
  });

  it('leaves out cancelled and expired bookings', () => {
    const at = [segment(hoist, '2026-12-02T20:30:00.000Z', '2026-12-02T21:30:00.000Z')];
    const blocks = placeSegments(
      [booking('4', 'cancelled', at), booking('5', 'expired', at), booking('6', 'held', at)],
      '2026-12-03',
      SYDNEY,
      window,
    );
    expect(blocks.map((block) => block.booking.id)).toEqual(['6']);
  });

  it('keeps a switched-off bay as a column only while a stay sits in it', () => {
    const job = booking('7', 'confirmed', [
      segment(spare, '2026-12-02T20:30:00.000Z', '2026-12-02T21:30:00.000Z'),
    ]);
    const bays = [spare, align, hoist];
    expect(boardBays(bays, []).map((bay) => bay.id)).toEqual(['bay-hoist', 'bay-align']);
    const blocks = placeSegments([job], '2026-12-03', SYDNEY, window);
    expect(boardBays(bays, blocks).map((bay) => bay.id)).toEqual([
      'bay-hoist',
      'bay-align',
      'bay-spare',
    ]);
  });
});

describe('open and closed days', () => {
  const setup = {
    openingHours: week,
    closures: [{ id: 'c', startDate: '2027-01-04', endDate: '2027-01-08', reason: 'Stocktake' }],
    holidays: [
      { date: '2026-12-25', name: 'Christmas Day', opens: false, note: null },
      { date: '2027-01-26', name: 'Australia Day', opens: true, note: null },
    ],
  };

  it('names the reason a day is closed', () => {
    // Source: ISO 8601-1:2019, week dates (Monday = 1): 6 Dec 2026 is a Sunday.
    expect(dayStatus('2026-12-06', setup)).toMatchObject({
      open: false,
      reason: 'Closed on Sundays',
    });
    expect(dayStatus('2027-01-06', setup)).toMatchObject({
      open: false,
      reason: 'Closed: Stocktake',
    });
    expect(dayStatus('2026-12-25', setup)).toMatchObject({
      open: false,
      reason: 'Public holiday: Christmas Day',
    });
  });

  it('opens on a holiday the workshop works, with that weekday’s hours', () => {
    // Source: ISO 8601-1:2019, week dates: 26 Jan 2027 is a Tuesday (weekday 2).
    expect(dayStatus('2027-01-26', setup)).toMatchObject({ open: true, hours: week[1] });
  });
});

describe('the week and the workshop’s today', () => {
  it('runs Monday to Sunday', () => {
    // Source: ISO 8601-1:2019, week dates: week 49 of 2026 runs Mon 30 Nov to Sun 6 Dec.
    expect(weekDates('2026-12-03')).toEqual([
      '2026-11-30',
      '2026-12-01',
      '2026-12-02',
      '2026-12-03',
      '2026-12-04',
      '2026-12-05',
      '2026-12-06',
    ]);
  });

  it('is the date on the workshop’s clock, not UTC’s', () => {
    // Source: IANA time zone database, Australia/Sydney AEDT (UTC+11): 14:00 UTC on 2 Dec is
    // 01:00 on 3 Dec.
    expect(workshopToday(SYDNEY, new Date('2026-12-02T14:00:00Z'))).toBe('2026-12-03');
  });
});

import { describe, expect, it } from 'vitest';
import type { Bay, Booking, OpeningHoursEntry, BookingSegment } from '@/types/api';
import {
  BLOCK_METRICS,
  BOARD_SCALE,
  boardBays,
  boardHeightPx,
  boardWindow,
  bookingsOnDay,
  dayBands,
  dayStatus,
  layoutBlocks,
  minuteToPx,
  placeSegments,
  rowLines,
  weekDates,
  workshopToday,
  type LaidOutBlock,
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

function segment(bay: Bay, startUtc: string, endUtc: string): BookingSegment {
  return {
    bayId: bay.id,
    bayName: bay.name,
    bayKind: bay.kind,
    minutes: (Date.parse(endUtc) - Date.parse(startUtc)) / 60_000,
    start: startUtc,
    startUtc,
    end: endUtc,
    endUtc,
    work: [`Work in ${bay.name}`],
  };
}

function booking(id: string, state: Booking['state'], segments: BookingSegment[]): Booking {
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

  it('shade the break and the time outside a short day’s hours to the minute', () => {
    const window = boardWindow(week)!;
    // 07:30–17:00 with the break 12:00–12:30: only the break is shaded on a weekday.
    expect(
      dayBands(window, week[0]).map(({ kind, fromMinute, toMinute }) => [
        kind,
        fromMinute,
        toMinute,
      ]),
    ).toEqual([['break', 720, 750]]);
    // Saturday 08:00–12:00 on the week's 07:30–17:00 board: closed before and after.
    const saturday = dayBands(window, week[5]);
    expect(saturday.map(({ kind, fromMinute, toMinute }) => [kind, fromMinute, toMinute])).toEqual([
      ['closed', 450, 480],
      ['closed', 720, 1020],
    ]);
    // On the board's own scale: 30 minutes (07:30–08:00) are one row.
    expect([saturday[0].topPx, saturday[0].heightPx]).toEqual([0, BOARD_SCALE.rowHeightPx]);
  });

  it('shade a break that does not start or end on a row line where it really is', () => {
    const window = boardWindow(week)!;
    const lateBreak: OpeningHoursEntry = {
      ...week[0],
      breakStartsAt: '12:15',
      breakEndsAt: '13:00',
    };
    const [band] = dayBands(window, lateBreak);
    // 12:15 is 285 minutes after 07:30; 45 minutes of break.
    expect(band).toMatchObject({ kind: 'break', fromMinute: 735, toMinute: 780 });
    expect(band.topPx).toBe(minuteToPx(285));
    expect(band.heightPx).toBe(minuteToPx(330) - minuteToPx(285));
    // A row height is 30 minutes, so 285 minutes are 9.5 rows down: half-way into the 12:00 row.
    expect(band.topPx).toBe(9.5 * BOARD_SCALE.rowHeightPx);
  });

  it('draws the row lines on the same scale, one every 30 minutes', () => {
    const window = boardWindow(week)!;
    const lines = rowLines(window);
    expect(lines).toHaveLength(19);
    expect(lines[0]).toEqual({ minute: 450, topPx: 0, onTheHour: false });
    expect(lines[1]).toEqual({ minute: 480, topPx: BOARD_SCALE.rowHeightPx, onTheHour: true });
    // 13:00 is 11 rows below 07:30.
    expect(lines[11]).toEqual({
      minute: 780,
      topPx: 11 * BOARD_SCALE.rowHeightPx,
      onTheHour: true,
    });
    expect(boardHeightPx(window)).toBe(19 * BOARD_SCALE.rowHeightPx);
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
    expect(
      blocks.map(({ segment: s, fromMinute, toMinute }) => [s.bayId, fromMinute, toMinute]),
    ).toEqual([
      // 07:30–11:00 local: minutes 0 to 210 of the board; 11:00–12:00: 210 to 270.
      ['bay-hoist', 0, 210],
      ['bay-align', 210, 270],
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
    expect([block.fromMinute, block.toMinute]).toEqual([0, 60]);
  });

  it('shows a stay that runs overnight on both days, cut at the board’s edges', () => {
    // 15:00 on 3 Dec to 09:00 on 4 Dec local (UTC+11).
    const job = booking('3', 'confirmed', [
      segment(hoist, '2026-12-03T04:00:00.000Z', '2026-12-03T22:00:00.000Z'),
    ]);
    const [first] = placeSegments([job], '2026-12-03', SYDNEY, window);
    // 15:00 is 450 minutes after 07:30; the board ends at 17:00 (570).
    expect([first.fromMinute, first.toMinute, first.continuesAfter]).toEqual([450, 570, true]);
    const [second] = placeSegments([job], '2026-12-04', SYDNEY, window);
    // 07:30 to 09:00 the next morning.
    expect([second.fromMinute, second.toMinute, second.continuesFromBefore]).toEqual([0, 90, true]);
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

describe('drawing the blocks to scale', () => {
  const window = boardWindow(week)!;
  const gap = BLOCK_METRICS.gapPx;

  /**
   * A clock time on Thursday 3 Dec 2026 in the workshop, as UTC.
   * Source: IANA time zone database, Australia/Sydney: AEDT (UTC+11) in December.
   */
  function at(hhmm: string): string {
    return new Date(`2026-12-03T${hhmm}:00+11:00`).toISOString();
  }

  function laidOut(...jobs: Array<[Bay, string, string]>): LaidOutBlock[] {
    const bookings = jobs.map(([bay, from, to], index) =>
      booking(`L${index}`, 'confirmed', [segment(bay, at(from), at(to))]),
    );
    return layoutBlocks(placeSegments(bookings, '2026-12-03', SYDNEY, window), window);
  }

  function bottom(block: LaidOutBlock): number {
    return block.box.topPx + block.box.heightPx;
  }

  it('draws a 30-minute stay at 07:30 one full row tall, with room for two lines', () => {
    const [block] = laidOut([hoist, '07:30', '08:00']);
    // One row is 44 px (30 minutes); the block sits inside it, 1 px clear of each line.
    expect(block.box).toEqual({ topPx: 1, heightPx: 42, lines: 2 });
    expect(bottom(block)).toBeLessThan(rowLines(window)[1].topPx);
  });

  it('puts an afternoon stay exactly between the lines of its times', () => {
    const [block] = laidOut([align, '13:15', '14:45']);
    // 13:15 is 345 minutes after 07:30: 345 × 44 / 30 = 506 px; 14:45 is 435 minutes: 638 px.
    expect(block.box.topPx).toBe(506 + gap);
    expect(bottom(block)).toBe(638 - gap);
    // The same scale as the lines: 13:00 is line 11, and a quarter-hour is half a row.
    const lines = rowLines(window);
    expect(block.box.topPx - gap).toBe(lines[11].topPx + BOARD_SCALE.rowHeightPx / 2);
    expect(bottom(block) + gap).toBe(lines[14].topPx + BOARD_SCALE.rowHeightPx / 2);
  });

  it('keeps two alignment jobs that meet at 11:45 apart', () => {
    const [first, second] = laidOut([align, '10:45', '11:45'], [align, '11:45', '12:45']);
    // 11:45 is 255 minutes after 07:30: 255 × 44 / 30 = 374 px, the edge both share.
    expect(bottom(first)).toBe(374 - gap);
    expect(second.box.topPx).toBe(374 + gap);
    expect(bottom(first)).toBeLessThan(second.box.topPx);
  });

  it('draws a stay over the break at its true length', () => {
    const [block] = laidOut([hoist, '11:30', '13:00']);
    // 240 to 330 minutes after 07:30: 352 px to 484 px.
    expect(block.box.topPx).toBe(352 + gap);
    expect(block.box.heightPx).toBe(484 - 352 - 2 * gap);
  });

  it('makes a short stay readable when the time after it is free', () => {
    const [short] = laidOut([hoist, '07:30', '07:45']);
    // 15 minutes are 22 px, too small for two lines: it is drawn at the least readable height.
    expect(short.box).toEqual({ topPx: 1, heightPx: BLOCK_METRICS.minHeightPx, lines: 2 });
  });

  it('never grows a short stay over the next one in its bay', () => {
    const [short, next] = laidOut([hoist, '07:30', '07:45'], [hoist, '07:45', '09:00']);
    // Only its own 22 px (less the gaps) are free: one line, and clear of the next stay.
    expect(short.box).toEqual({ topPx: 1, heightPx: 20, lines: 1 });
    expect(bottom(short)).toBeLessThan(next.box.topPx);
  });

  it('lets a stay in another bay take no room from a short one', () => {
    const blocks = laidOut([hoist, '07:30', '07:45'], [align, '07:45', '08:15']);
    const short = blocks.find((block) => block.segment.bayId === hoist.id)!;
    expect(short.box.heightPx).toBe(BLOCK_METRICS.minHeightPx);
  });

  it('does not draw a short stay at the day’s end past the board', () => {
    const [late] = laidOut([align, '16:45', '17:00']);
    expect(bottom(late)).toBeLessThanOrEqual(boardHeightPx(window));
    expect(late.box.heightPx).toBe(20);
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

import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { findAvailability, startOptionAt } from './availability';
import { closedDatesFor } from './closed-dates';
import { publicHolidays } from './public-holidays';
import {
  DEMO_BAYS,
  DEMO_WEEKLY_HOURS,
  benchmarkQuery,
  demoCalendar,
  planOf,
} from './scheduling.fixtures';
import type {
  AvailabilityQuery,
  BusyInterval,
  DayAvailability,
  DayHours,
  StartOption,
} from './scheduling.types';

// The opening hours, bays, jobs and bookings are invented (scheduling.fixtures.ts); the rules
// checked are the product's own (docs/scheduling.md). What comes from outside is the time zone
// data: every instant below is written with the UTC offset the IANA time zone database gives
// for that zone and date, so the engine's conversions are checked against it, not against
// themselves.

const SYDNEY = 'Australia/Sydney';
const at = (iso: string) => Date.parse(iso);
const hour = 3_600_000;

function query(overrides: Partial<AvailabilityQuery> = {}): AvailabilityQuery {
  return {
    calendar: demoCalendar(),
    plan: planOf([['hoist', 60]], '2026-12-03'),
    bays: DEMO_BAYS,
    busy: [],
    fromDate: '2026-12-03',
    days: 1,
    notBeforeMs: at('2026-12-01T00:00:00Z'),
    ...overrides,
  };
}

/** The local clock times of a day's starts, "07:30 08:00 …". */
function localTimes(day: DayAvailability, timeZone = SYDNEY): string {
  return day.starts
    .map((start) => DateTime.fromMillis(start.startsAtMs, { zone: timeZone }).toFormat('HH:mm'))
    .join(' ');
}

function onlyDay(q: AvailabilityQuery): DayAvailability {
  const days = findAvailability(q);
  expect(days).toHaveLength(1);
  return days[0];
}

function optionAt(q: AvailabilityQuery, iso: string): StartOption {
  const option = startOptionAt(q, at(iso));
  if (option === null) throw new Error(`no option at ${iso}`);
  return option;
}

const busy = (bayId: string, from: string, to: string): BusyInterval => ({
  bayId,
  startsAtMs: at(from),
  endsAtMs: at(to),
});

const hoursOf = (opensAt: string, closesAt: string): DayHours => ({
  opensAt,
  closesAt,
  breakStartsAt: null,
  breakEndsAt: null,
});

describe('findAvailability: the slot grid', () => {
  const longBreak = demoCalendar({
    weeklyHours: {
      ...DEMO_WEEKLY_HOURS,
      4: { opensAt: '07:30', closesAt: '17:00', breakStartsAt: '12:00', breakEndsAt: '12:45' },
    },
  });

  it('offers opensAt + k × step inside the working windows: none in the break, none at or after closing', () => {
    const day = onlyDay(query({ calendar: longBreak }));
    expect(day.date).toBe('2026-12-03');
    expect(day.closedReason).toBeNull();
    // 12:00 and 12:30 are in the break; 12:45 is not on the grid.
    expect(localTimes(day)).toBe(
      '07:30 08:00 08:30 09:00 09:30 10:00 10:30 11:00 11:30 ' +
        '13:00 13:30 14:00 14:30 15:00 15:30 16:00 16:30',
    );
    // Source: IANA time zone database, Australia/Sydney: AEDT (UTC+11:00) in December.
    expect(day.starts[0].startsAtMs).toBe(at('2026-12-02T20:30:00Z'));
    expect(day.starts.at(-1)?.startsAtMs).toBe(at('2026-12-03T05:30:00Z'));
  });

  it('keeps the grid on the opening time, not on the end of the break', () => {
    const day = onlyDay(query({ calendar: { ...longBreak, slotStepMinutes: 45 } }));
    // 12:00 is the start of the break; 12:45, its end, is on the 45-minute grid.
    expect(localTimes(day)).toBe(
      '07:30 08:15 09:00 09:45 10:30 11:15 12:45 13:30 14:15 15:00 15:45 16:30',
    );
  });

  it('offers nothing earlier than notBeforeMs', () => {
    // Source: IANA time zone database, Australia/Sydney: AEDT (UTC+11:00) in December.
    const now = at('2026-12-03T10:10:00+11:00');
    expect(localTimes(onlyDay(query({ notBeforeMs: now })))).toMatch(/^10:30 11:00 /);
    const onASlot = at('2026-12-03T10:30:00+11:00');
    expect(localTimes(onlyDay(query({ notBeforeMs: onASlot })))).toMatch(/^10:30 /);
    const afterClosing = at('2026-12-03T17:00:00+11:00');
    expect(onlyDay(query({ notBeforeMs: afterClosing })).starts).toEqual([]);
  });
});

describe('findAvailability: closed days', () => {
  it('gives a closed weekday and a closure date no starts, with the reason', () => {
    const days = findAvailability(
      query({
        calendar: demoCalendar({ closedDates: new Map([['2026-12-08', 'Closed: stocktake']]) }),
        fromDate: '2026-12-05',
        days: 4,
      }),
    );
    // Source: Gregorian calendar: 5 December 2026 is a Saturday.
    expect(days.map((day) => [day.date, day.closedReason, day.starts.length > 0])).toEqual([
      ['2026-12-05', null, true],
      ['2026-12-06', 'Closed on Sundays', false],
      ['2026-12-07', null, true],
      ['2026-12-08', 'Closed: stocktake', false],
    ]);
    expect(days[1].starts).toEqual([]);
    expect(days[3].starts).toEqual([]);
    // Saturday keeps its own hours, 8:00 to 12:00.
    expect(localTimes(days[0])).toBe('08:00 08:30 09:00 09:30 10:00 10:30 11:00 11:30');
  });

  it('closes on the public holidays of the region, unless the workshop opens on one', () => {
    const holidays = publicHolidays('AU-NSW', '2026-12-20', '2027-01-10');
    const calendar = demoCalendar({
      closedDates: closedDatesFor({
        holidays,
        opensOnHolidays: [],
        closures: [],
        fromDate: '2026-12-20',
        toDate: '2027-01-10',
      }),
    });
    const days = findAvailability(query({ calendar, fromDate: '2026-12-24', days: 5 }));
    // Source: date-holidays 3.37.0 data, AU-NSW: Christmas Day Friday 25 December 2026, Boxing
    // Day Saturday 26 December, Boxing Day (substitute day) Monday 28 December.
    expect(days.map((day) => [day.date, day.closedReason])).toEqual([
      ['2026-12-24', null],
      ['2026-12-25', 'Public holiday: Christmas Day'],
      ['2026-12-26', 'Public holiday: Boxing Day'],
      ['2026-12-27', 'Closed on Sundays'],
      ['2026-12-28', 'Public holiday: Boxing Day (substitute day)'],
    ]);
    expect(days.slice(1).every((day) => day.starts.length === 0)).toBe(true);

    // The last start on the 24th runs on after the holidays and the Sunday: Tuesday the 29th.
    const last = days[0].starts.at(-1) as StartOption;
    // Source: IANA time zone database, Australia/Sydney: AEDT (UTC+11:00) in December.
    expect(last.startsAtMs).toBe(at('2026-12-24T16:30:00+11:00'));
    expect(last.endsAtMs).toBe(at('2026-12-29T08:00:00+11:00'));

    const opensOnTheSubstituteDay = demoCalendar({
      closedDates: closedDatesFor({
        holidays,
        opensOnHolidays: ['2026-12-28'],
        closures: [],
        fromDate: '2026-12-20',
        toDate: '2027-01-10',
      }),
    });
    const monday = findAvailability(
      query({ calendar: opensOnTheSubstituteDay, fromDate: '2026-12-28', days: 1 }),
    )[0];
    expect(monday.closedReason).toBeNull();
    expect(localTimes(monday)).toMatch(/^07:30 /);
  });

  it('returns the days before the earliest start date with no starts and no reason', () => {
    const days = findAvailability(
      query({ plan: planOf([['hoist', 60]], '2026-12-06'), fromDate: '2026-12-03', days: 5 }),
    );
    expect(days.map((day) => [day.date, day.closedReason, day.starts.length])).toEqual([
      ['2026-12-03', null, 0],
      ['2026-12-04', null, 0],
      // Saturday 5 December is open but before the earliest start date.
      ['2026-12-05', null, 0],
      ['2026-12-06', 'Closed on Sundays', 0],
      ['2026-12-07', null, 18],
    ]);
  });

  it('offers nothing for an empty plan, and still says which days are closed', () => {
    const days = findAvailability(
      query({ plan: planOf([], '2026-12-03'), fromDate: '2026-12-05', days: 2 }),
    );
    expect(days).toEqual([
      { date: '2026-12-05', closedReason: null, starts: [] },
      { date: '2026-12-06', closedReason: 'Closed on Sundays', starts: [] },
    ]);
  });
});

describe('findAvailability: multi-day jobs', () => {
  // Demo hours: 540 working minutes Monday to Friday (7:30–12:00, 12:30–17:00), 240 on Saturday.
  const tenHours = planOf([['hoist', 600]], '2026-12-03');

  it('resumes the next open day in the same bay, the reservation spanning the night', () => {
    const option = optionAt(query({ plan: tenHours }), '2026-12-03T07:30:00+11:00');
    // Source: IANA time zone database, Australia/Sydney: AEDT (UTC+11:00) in December.
    expect(option).toEqual({
      startsAtMs: at('2026-12-03T07:30:00+11:00'),
      endsAtMs: at('2026-12-04T08:30:00+11:00'),
      segments: [
        {
          bayId: 'bay-hoist-front',
          bayName: 'Hoist 1',
          bayKind: 'hoist',
          minutes: 600,
          startsAtMs: at('2026-12-03T07:30:00+11:00'),
          endsAtMs: at('2026-12-04T08:30:00+11:00'),
        },
      ],
    });
    expect(option.endsAtMs - option.startsAtMs).toBe(25 * hour);

    // Hoist 1 is taken overnight: the vehicle stays in the bay, so Hoist 2 is chosen.
    const overnight = busy(
      'bay-hoist-front',
      '2026-12-03T20:00:00+11:00',
      '2026-12-03T21:00:00+11:00',
    );
    const moved = optionAt(
      query({ plan: tenHours, busy: [overnight] }),
      '2026-12-03T07:30:00+11:00',
    );
    expect(moved.segments[0].bayName).toBe('Hoist 2');
  });

  it('skips closed days in between: the Sunday, then a closure', () => {
    const friday = '2026-12-04T16:00:00+11:00';
    const q = query({ plan: tenHours, fromDate: '2026-12-04' });
    // Friday 60 min, Saturday 240, Sunday shut, Monday 270 + 30.
    expect(optionAt(q, friday).endsAtMs).toBe(at('2026-12-07T13:00:00+11:00'));

    const stocktake = query({
      plan: tenHours,
      fromDate: '2026-12-04',
      calendar: demoCalendar({ closedDates: new Map([['2026-12-07', 'Closed: stocktake']]) }),
    });
    expect(optionAt(stocktake, friday).endsAtMs).toBe(at('2026-12-08T13:00:00+11:00'));
  });

  it('does not offer a start that needs more than maxJobDays open days', () => {
    const twoDays = query({ plan: tenHours, fromDate: '2026-12-04', maxJobDays: 2 });
    const friday = onlyDay(twoDays);
    // Friday from 10:30: 90 + 270 minutes, then Saturday's 240 ends the job at its closing time.
    expect(localTimes(friday)).toBe('07:30 08:00 08:30 09:00 09:30 10:00 10:30');
    expect(friday.starts.at(-1)?.endsAtMs).toBe(at('2026-12-05T12:00:00+11:00'));
    expect(startOptionAt(twoDays, at('2026-12-04T11:00:00+11:00'))).toBeNull();
    // The default (5 open days) allows it.
    expect(
      startOptionAt({ ...twoDays, maxJobDays: undefined }, at('2026-12-04T11:00:00+11:00')),
    ).not.toBeNull();
  });
});

describe('findAvailability: segments and bays', () => {
  it('starts the alignment segment exactly when the hoist segment ends, across the break too', () => {
    const q = (hoistMinutes: number) =>
      query({
        plan: planOf(
          [
            ['hoist', hoistMinutes],
            ['alignment', 60],
          ],
          '2026-12-03',
        ),
      });
    // Hoist work ends at the start of the break: alignment starts when the break ends.
    const atBreak = optionAt(q(270), '2026-12-03T07:30:00+11:00').segments;
    expect(atBreak.map((s) => [s.bayName, s.startsAtMs, s.endsAtMs])).toEqual([
      ['Hoist 1', at('2026-12-03T07:30:00+11:00'), at('2026-12-03T12:00:00+11:00')],
      ['Alignment 1', at('2026-12-03T12:30:00+11:00'), at('2026-12-03T13:30:00+11:00')],
    ]);
    // Hoist work runs over the break (its bay stays taken): alignment follows at 13:00.
    const overBreak = optionAt(q(300), '2026-12-03T07:30:00+11:00').segments;
    expect(overBreak.map((s) => [s.bayName, s.startsAtMs, s.endsAtMs])).toEqual([
      ['Hoist 1', at('2026-12-03T07:30:00+11:00'), at('2026-12-03T13:00:00+11:00')],
      ['Alignment 1', at('2026-12-03T13:00:00+11:00'), at('2026-12-03T14:00:00+11:00')],
    ]);
    // Hoist work ends at closing: alignment starts when the workshop opens next morning.
    const atClosing = optionAt(q(540), '2026-12-03T07:30:00+11:00');
    expect(atClosing.segments[1].startsAtMs).toBe(at('2026-12-04T07:30:00+11:00'));
    expect(atClosing.endsAtMs).toBe(at('2026-12-04T08:30:00+11:00'));
  });

  it('takes the first free bay of the kind by position; busy intervals are half-open', () => {
    const plan = planOf(
      [
        ['hoist', 60],
        ['alignment', 60],
      ],
      '2026-12-03',
    );
    const start = '2026-12-03T07:30:00+11:00';
    expect(optionAt(query({ plan }), start).segments.map((s) => s.bayName)).toEqual([
      'Hoist 1',
      'Alignment 1',
    ]);
    const taken = [
      busy('bay-hoist-front', '2026-12-03T07:00:00+11:00', '2026-12-03T08:00:00+11:00'),
      busy('bay-align-north', '2026-12-03T09:00:00+11:00', '2026-12-03T09:15:00+11:00'),
    ];
    expect(optionAt(query({ plan, busy: taken }), start).segments.map((s) => s.bayName)).toEqual([
      'Hoist 2',
      'Alignment 2',
    ]);
    // An interval ending exactly when a segment starts does not block it.
    const endsAtStart = [
      busy('bay-hoist-front', '2026-12-03T06:30:00+11:00', '2026-12-03T07:30:00+11:00'),
    ];
    expect(optionAt(query({ plan, busy: endsAtStart }), start).segments[0].bayName).toBe('Hoist 1');
  });

  it('offers no start while every bay of a kind is taken', () => {
    const allHoists = ['bay-hoist-front', 'bay-hoist-back', 'bay-hoist-side'].map((bayId) =>
      busy(bayId, '2026-12-03T07:00:00+11:00', '2026-12-03T10:00:00+11:00'),
    );
    const day = onlyDay(query({ busy: allHoists }));
    // A one-hour job starting 9:30 would run into the busy time; 10:00 is free again.
    expect(localTimes(day)).toMatch(/^10:00 /);
    expect(day.starts[0].segments[0].bayName).toBe('Hoist 1');
    expect(startOptionAt(query({ busy: allHoists }), at('2026-12-03T09:30:00+11:00'))).toBeNull();
    // No bay of the kind at all: nothing to offer.
    const noAlignmentBay = DEMO_BAYS.filter((bay) => bay.kind !== 'alignment');
    expect(
      onlyDay(query({ bays: noAlignmentBay, plan: planOf([['alignment', 45]], '2026-12-03') }))
        .starts,
    ).toEqual([]);
  });

  it('puts a tyre-only job in the tyre bay', () => {
    const option = optionAt(
      query({ plan: planOf([['tyre', 60]], '2026-12-03') }),
      '2026-12-03T07:30:00+11:00',
    );
    expect(option.segments.map((s) => [s.bayName, s.bayKind])).toEqual([['Tyre bay', 'tyre']]);
  });
});

describe('findAvailability: time zones and daylight saving', () => {
  // The change days are Sundays in all four zones, so the workshop opens on Saturday and Sunday
  // 8:00–12:00 in these calendars (an hour of work starts on every full hour).
  const weekend = (timeZone: string, sunday: DayHours = hoursOf('08:00', '12:00')) =>
    demoCalendar({
      timeZone,
      slotStepMinutes: 60,
      weeklyHours: { ...DEMO_WEEKLY_HOURS, 6: hoursOf('08:00', '12:00'), 7: sunday },
    });

  it.each([
    // Source: IANA time zone database (tzdata shipped with Node/ICU), Australia/Sydney: DST
    // begins 2026-10-04 02:00 AEST → 03:00 AEDT (UTC+10:00 → UTC+11:00).
    ['Australia/Sydney', '2026-10-03', '2026-10-02T22:00:00Z', '2026-10-03T21:00:00Z', 23],
    // Source: IANA time zone database, Australia/Sydney: DST ends 2027-04-04 03:00 AEDT → 02:00
    // AEST (UTC+11:00 → UTC+10:00).
    ['Australia/Sydney', '2027-04-03', '2027-04-02T21:00:00Z', '2027-04-03T22:00:00Z', 25],
    // Source: IANA time zone database, Europe/London: BST begins 2027-03-28 01:00 GMT → 02:00
    // BST (UTC+00:00 → UTC+01:00).
    ['Europe/London', '2027-03-27', '2027-03-27T08:00:00Z', '2027-03-28T07:00:00Z', 23],
    // Source: IANA time zone database, America/New_York: DST ends 2026-11-01 02:00 EDT → 01:00
    // EST (UTC−04:00 → UTC−05:00).
    ['America/New_York', '2026-10-31', '2026-10-31T12:00:00Z', '2026-11-01T13:00:00Z', 25],
  ])(
    '%s: the grid stays on the local clock over the change weekend starting %s',
    (timeZone, saturday, saturdayEight, sundayEight, hoursApart) => {
      const days = findAvailability(
        query({
          calendar: weekend(timeZone),
          plan: planOf([['hoist', 60]], saturday),
          fromDate: saturday,
          days: 2,
          notBeforeMs: at(saturdayEight) - 24 * hour,
        }),
      );
      for (const day of days) {
        expect(localTimes(day, timeZone)).toBe('08:00 09:00 10:00 11:00');
      }
      expect(days[0].starts[0].startsAtMs).toBe(at(saturdayEight));
      expect(days[1].starts[0].startsAtMs).toBe(at(sundayEight));
      expect(days[1].starts[0].startsAtMs - days[0].starts[0].startsAtMs).toBe(hoursApart * hour);
      // Every start an hour after the one before, on both days: the offset moved, not the grid.
      for (const day of days) {
        const gaps = day.starts.slice(1).map((s, i) => s.startsAtMs - day.starts[i].startsAtMs);
        expect(gaps).toEqual([hour, hour, hour]);
      }
    },
  );

  it('measures a segment over the change night in elapsed time', () => {
    const q = (saturday: string) =>
      query({
        calendar: weekend(SYDNEY),
        plan: planOf([['hoist', 180]], saturday),
        fromDate: saturday,
        days: 2,
        notBeforeMs: 0,
      });
    // Saturday 11:00–12:00, then Sunday 8:00–10:00: 23 hours on the clock.
    // Source: IANA time zone database, Australia/Sydney: DST begins 2026-10-04 02:00 AEST.
    const spring = optionAt(q('2026-10-03'), '2026-10-03T11:00:00+10:00');
    expect(spring.endsAtMs).toBe(at('2026-10-04T10:00:00+11:00'));
    expect(spring.endsAtMs - spring.startsAtMs).toBe(22 * hour);
    // Source: IANA time zone database, Australia/Sydney: DST ends 2027-04-04 03:00 AEDT.
    const autumn = optionAt(q('2027-04-03'), '2027-04-03T11:00:00+11:00');
    expect(autumn.endsAtMs).toBe(at('2027-04-04T10:00:00+10:00'));
    expect(autumn.endsAtMs - autumn.startsAtMs).toBe(24 * hour);
  });

  it('counts elapsed working time in a window the change falls inside', () => {
    // An unusual night shift, 1:00–5:00 on Sundays only, to put the change inside the window.
    const nightShift = demoCalendar({
      slotStepMinutes: 30,
      weeklyHours: {
        1: null,
        2: null,
        3: null,
        4: null,
        5: null,
        6: null,
        7: hoursOf('01:00', '05:00'),
      },
    });
    const q = (sunday: string, minutes: number) =>
      query({
        calendar: nightShift,
        plan: planOf([['hoist', minutes]], sunday),
        fromDate: sunday,
        days: 1,
        notBeforeMs: 0,
      });

    // Source: IANA time zone database, Australia/Sydney: on 2026-10-04 the clock goes from 02:00
    // AEST to 03:00 AEDT, so 2:00 and 2:30 do not exist and the window holds 3 hours.
    const spring = onlyDay(q('2026-10-04', 30));
    expect(localTimes(spring)).toBe('01:00 01:30 03:00 03:30 04:00 04:30');
    expect(spring.starts.map((s) => new Date(s.startsAtMs).toISOString().slice(11, 16))).toEqual([
      '15:00',
      '15:30',
      '16:00',
      '16:30',
      '17:00',
      '17:30',
    ]);
    // On a 45-minute grid 2:30 does not exist either; 3:15 is the next start, not 3:30.
    const coarse = onlyDay({
      ...q('2026-10-04', 30),
      calendar: { ...nightShift, slotStepMinutes: 45 },
    });
    expect(localTimes(coarse)).toBe('01:00 01:45 03:15 04:00 04:45');
    const twoHours = optionAt(q('2026-10-04', 120), '2026-10-04T01:00:00+10:00');
    expect(twoHours.endsAtMs).toBe(at('2026-10-04T04:00:00+11:00'));
    expect(twoHours.endsAtMs - twoHours.startsAtMs).toBe(2 * hour);

    // Source: IANA time zone database, Australia/Sydney: on 2027-04-04 the clock goes back from
    // 03:00 AEDT to 02:00 AEST; 2:00–2:59 happens twice and is offered once (the first time).
    const autumn = onlyDay(q('2027-04-04', 30));
    expect(localTimes(autumn)).toBe('01:00 01:30 02:00 02:30 03:00 03:30 04:00 04:30');
    expect(autumn.starts[2].startsAtMs).toBe(at('2027-04-04T02:00:00+11:00'));
    expect(autumn.starts[4].startsAtMs).toBe(at('2027-04-04T03:00:00+10:00'));
    // Four clock hours, five hours of work: a 5-hour job fits from 1:00 exactly.
    const fiveHours = optionAt(q('2027-04-04', 300), '2027-04-04T01:00:00+11:00');
    expect(fiveHours.endsAtMs).toBe(at('2027-04-04T05:00:00+10:00'));
  });

  it('works in local dates of the zone, whatever the UTC date', () => {
    // Source: IANA time zone database, Pacific/Auckland: NZDT (UTC+13:00) in December, so
    // 7:30 on Thursday 3 December is still Wednesday 2 December in UTC.
    const day = onlyDay(query({ calendar: demoCalendar({ timeZone: 'Pacific/Auckland' }) }));
    expect(day.starts[0].startsAtMs).toBe(at('2026-12-02T18:30:00Z'));
  });
});

describe('startOptionAt', () => {
  const plan = planOf(
    [
      ['hoist', 210],
      ['alignment', 60],
    ],
    '2026-12-03',
  );

  it('returns the very option findAvailability offers for each start', () => {
    const q = benchmarkQuery(400);
    const days = findAvailability(q);
    const starts = days.flatMap((day) => day.starts);
    expect(starts.length).toBeGreaterThan(50);
    for (const start of starts) expect(startOptionAt(q, start.startsAtMs)).toEqual(start);
  });

  it('returns null for a start that is not offered', () => {
    const q = query({ plan, fromDate: '2026-12-03', days: 3 });
    const offered = (iso: string) => startOptionAt(q, at(iso));
    expect(offered('2026-12-03T07:30:00+11:00')).not.toBeNull();
    // Off the grid, in the break, at closing, on a Sunday, after the query's last date.
    expect(offered('2026-12-03T07:45:00+11:00')).toBeNull();
    expect(offered('2026-12-03T12:00:00+11:00')).toBeNull();
    expect(offered('2026-12-03T17:00:00+11:00')).toBeNull();
    expect(offered('2026-12-06T08:00:00+11:00')).toBeNull();
    expect(offered('2026-12-07T07:30:00+11:00')).toBeNull();
    expect(startOptionAt(q, Number.NaN)).toBeNull();
    // Before now, and before the earliest start date.
    expect(
      startOptionAt(
        { ...q, notBeforeMs: at('2026-12-03T08:00:00+11:00') },
        at('2026-12-03T07:30:00+11:00'),
      ),
    ).toBeNull();
    expect(
      startOptionAt(
        { ...q, plan: { ...plan, earliestStartDate: '2026-12-04' } },
        at('2026-12-03T07:30:00+11:00'),
      ),
    ).toBeNull();
    // Both alignment bays taken when the hoist work would be done.
    const alignmentTaken = ['bay-align-north', 'bay-align-east'].map((bayId) =>
      busy(bayId, '2026-12-03T11:30:00+11:00', '2026-12-03T12:00:00+11:00'),
    );
    expect(
      startOptionAt({ ...q, busy: alignmentTaken }, at('2026-12-03T07:30:00+11:00')),
    ).toBeNull();
  });
});

describe('findAvailability: input it refuses', () => {
  it('throws a RangeError for an unknown zone, impossible hours or a bad step', () => {
    expect(() =>
      findAvailability(query({ calendar: demoCalendar({ timeZone: 'Nowhere/Tallowgate' }) })),
    ).toThrow(/timeZone/);
    expect(() =>
      findAvailability(
        query({
          calendar: demoCalendar({
            weeklyHours: { ...DEMO_WEEKLY_HOURS, 2: hoursOf('17:00', '07:30') },
          }),
        }),
      ),
    ).toThrow(/weeklyHours\[2\]\.closesAt/);
    expect(() =>
      findAvailability(query({ calendar: demoCalendar({ slotStepMinutes: 0 }) })),
    ).toThrow(/slotStepMinutes/);
    expect(() => findAvailability(query({ fromDate: '2026-13-01' }))).toThrow(/fromDate/);
    expect(() => findAvailability(query({ plan: planOf([['hoist', 0.5]], '2026-12-03') }))).toThrow(
      /minutes/,
    );
  });
});

import { describe, expect, it } from 'vitest';
import {
  earliestStartText,
  formatCountdown,
  formatLocalDate,
  formatLocalRange,
  formatLocalTime,
  formatWorkMinutes,
  holdCountdownText,
  jobSegmentsText,
  localDateOf,
  minutesLeft,
  nightsBetween,
  overnightNote,
} from './booking-text';

describe('work minutes in words', () => {
  it('writes hours and minutes the way the plan reads', () => {
    // Source: SI Brochure (BIPM, 9th ed.), Table 8: 1 h = 60 min.
    expect(formatWorkMinutes(210)).toBe('3 h 30');
    // Source: SI Brochure (BIPM, 9th ed.), Table 8: 1 h = 60 min.
    expect(formatWorkMinutes(60)).toBe('1 h');
    expect(formatWorkMinutes(45)).toBe('45 min');
    // Source: SI Brochure (BIPM, 9th ed.), Table 8: 1 h = 60 min.
    expect(formatWorkMinutes(65)).toBe('1 h 05');
    expect(formatWorkMinutes(0)).toBe('0 min');
  });

  it('names each bay kind and joins the segments in order', () => {
    expect(
      jobSegmentsText([
        { bayKind: 'hoist', minutes: 210 },
        { bayKind: 'alignment', minutes: 60 },
      ]),
    ).toBe('Hoist bay 3 h 30, then alignment bay 1 h');
    expect(jobSegmentsText([{ bayKind: 'tyre', minutes: 60 }])).toBe('Tyre bay 1 h');
    expect(jobSegmentsText([])).toBe('');
  });
});

describe('times in the workshop zone', () => {
  it('shows an instant on the workshop clock, not the browser clock', () => {
    // Source: IANA tz database (australasia), read through Python's zoneinfo:
    // 2026-12-02T20:30Z is 07:30 AEDT (UTC+11) on 3 December in Australia/Sydney.
    expect(formatLocalTime('2026-12-02T20:30:00.000Z', 'Australia/Sydney')).toBe('7:30 am');
    // Source: IANA tz database (australasia), read through Python's zoneinfo:
    // the same instant is 09:30 NZDT (UTC+13) in Pacific/Auckland.
    expect(formatLocalTime('2026-12-02T20:30:00.000Z', 'Pacific/Auckland')).toBe('9:30 am');
  });

  it('takes the date of the workshop zone, which may be a day after the UTC date', () => {
    // Source: IANA tz database (australasia), read through Python's zoneinfo:
    // 2026-12-02T13:30Z is 00:30 on 3 December in Australia/Sydney.
    expect(localDateOf('2026-12-02T13:30:00.000Z', 'Australia/Sydney')).toBe('2026-12-03');
    expect(localDateOf('2026-12-02T13:30:00.000Z', 'UTC')).toBe('2026-12-02');
  });

  it('names the weekday of a workshop date', () => {
    // Source: Gregorian calendar, Python's calendar.weekday(2026, 12, 3) = 3 (Thursday).
    expect(formatLocalDate('2026-12-03')).toBe('Thursday 3 December');
    // Source: Gregorian calendar, Python's calendar.weekday(2026, 12, 3) = 3 (Thursday).
    expect(formatLocalDate('2026-12-03', true)).toBe('Thursday 3 December 2026');
  });

  it('counts nights across the end of daylight saving', () => {
    // Source: IANA tz database (australasia), read through Python's zoneinfo: NSW daylight
    // saving ends on Sunday 4 April 2027, so 2027-04-02T22:00Z is Sat 3 Apr 09:00 (+11:00)
    // and 2027-04-05T00:00Z is Mon 5 Apr 10:00 (+10:00): two nights apart.
    const start = '2027-04-02T22:00:00.000Z';
    const end = '2027-04-05T00:00:00.000Z';
    expect(nightsBetween(start, end, 'Australia/Sydney')).toBe(2);
    expect(formatLocalRange(start, end, 'Australia/Sydney')).toBe(
      'Sat 3 Apr 9:00 am – Mon 5 Apr 10:00 am',
    );
    expect(overnightNote(start, end, 'Australia/Sydney')).toBe(
      'The job runs over 3 days: the vehicle stays in the workshop for 2 nights.',
    );
  });

  it('says nothing about overnight for a job done the same day', () => {
    // Source: IANA tz database (australasia), read through Python's zoneinfo:
    // 20:30Z and 01:30Z next day are 07:30 and 12:30 on 3 December in Australia/Sydney.
    const start = '2026-12-02T20:30:00.000Z';
    const end = '2026-12-03T01:30:00.000Z';
    expect(nightsBetween(start, end, 'Australia/Sydney')).toBe(0);
    expect(overnightNote(start, end, 'Australia/Sydney')).toBeNull();
    expect(formatLocalRange(start, end, 'Australia/Sydney')).toBe('7:30 am – 12:30 pm');
    // Source: IANA tz database, read through Python's zoneinfo: in UTC the same job spans
    // 2 and 3 December, so there it runs overnight.
    expect(overnightNote(start, end, 'UTC')).toBe(
      'The job runs over to the next day: the vehicle stays in the workshop overnight.',
    );
  });
});

describe('earliest start', () => {
  it('gives the reason: parts on order, or all on the shelf', () => {
    expect(earliestStartText({ earliestStartDate: '2026-12-10', longestLeadDays: 7 })).toBe(
      'Earliest start Thursday 10 December, because some parts are on order (up to 7 days for them to arrive).',
    );
    expect(earliestStartText({ earliestStartDate: '2026-12-04', longestLeadDays: 0 })).toBe(
      'Earliest start Friday 4 December; every part is on the shelf.',
    );
  });
});

describe('hold countdown', () => {
  it('shows minutes and seconds left, rounded up to the next second', () => {
    // Source: SI Brochure (BIPM, 9th ed.), Table 8: 1 min = 60 s; 872 s = 14 min 32 s.
    expect(formatCountdown(872_000)).toBe('14:32');
    expect(formatCountdown(871_001)).toBe('14:32');
    // Source: SI Brochure (BIPM, 9th ed.), Table 8: 3725 s = 1 h 2 min 5 s.
    expect(formatCountdown(3_725_000)).toBe('1:02:05');
    expect(formatCountdown(-5_000)).toBe('0:00');
  });

  it('turns into "expired" at zero', () => {
    expect(holdCountdownText(872_000)).toBe('Held for 14:32 more');
    expect(holdCountdownText(1)).toBe('Held for 0:01 more');
    expect(holdCountdownText(0)).toBe('This hold has expired');
    expect(holdCountdownText(-1)).toBe('This hold has expired');
  });

  it('announces whole minutes, rounded up', () => {
    expect(minutesLeft(60_000)).toBe(1);
    expect(minutesLeft(60_001)).toBe(2);
    expect(minutesLeft(0)).toBe(0);
  });
});

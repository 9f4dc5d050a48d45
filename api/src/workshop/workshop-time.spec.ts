import { describe, expect, it } from 'vitest';
import {
  addCalendarMonths,
  canonicalTimeZone,
  endOfLocalDay,
  isKnownTimeZone,
  localDateOf,
  longDate,
  todayLocalDate,
} from './workshop-time';

describe('workshop time zone helpers', () => {
  it('reads the local calendar date of an instant, not the UTC one', () => {
    // Source: IANA tz database, Australia/Sydney: AEDT (UTC+11) from the first Sunday in October
    // to the first Sunday in April, AEST (UTC+10) otherwise.
    expect(localDateOf(new Date('2026-12-31T12:59:59.999Z'), 'Australia/Sydney')).toBe(
      '2026-12-31',
    );
    expect(localDateOf(new Date('2026-12-31T13:00:00.000Z'), 'Australia/Sydney')).toBe(
      '2027-01-01',
    );
    expect(localDateOf(new Date('2026-06-30T14:00:00.000Z'), 'Australia/Sydney')).toBe(
      '2026-07-01',
    );
    expect(localDateOf(new Date('2026-06-30T13:59:59.000Z'), 'Australia/Sydney')).toBe(
      '2026-06-30',
    );
  });

  it('ends a local day at its last millisecond, in summer and in winter time', () => {
    // Source: IANA tz database, Australia/Sydney offsets (+11:00 in January, +10:00 in July).
    expect(endOfLocalDay('2027-01-15', 'Australia/Sydney').toISOString()).toBe(
      '2027-01-15T12:59:59.999Z',
    );
    expect(endOfLocalDay('2027-07-15', 'Australia/Sydney').toISOString()).toBe(
      '2027-07-15T13:59:59.999Z',
    );
    // Asked again (the kept answer), and for the same date in another zone.
    expect(endOfLocalDay('2027-07-15', 'Australia/Sydney').toISOString()).toBe(
      '2027-07-15T13:59:59.999Z',
    );
    // Source: IANA tz database, Australia/Perth: AWST, UTC+08:00 all year.
    expect(endOfLocalDay('2027-07-15', 'Australia/Perth').toISOString()).toBe(
      '2027-07-15T15:59:59.999Z',
    );
    expect(localDateOf(new Date('2027-07-15T16:00:00.000Z'), 'Australia/Perth')).toBe('2027-07-16');
  });

  it('handles the days daylight saving starts and ends (23 and 25 hour days)', () => {
    // Source: IANA tz database, Australia/Sydney: DST ends Sunday 5 April 2026 at 03:00 local
    // (back to 02:00), starts Sunday 4 October 2026 at 02:00 local (on to 03:00).
    expect(endOfLocalDay('2026-04-05', 'Australia/Sydney').toISOString()).toBe(
      '2026-04-05T13:59:59.999Z',
    );
    expect(endOfLocalDay('2026-10-04', 'Australia/Sydney').toISOString()).toBe(
      '2026-10-04T12:59:59.999Z',
    );
  });

  it('writes a date in words', () => {
    expect(longDate('2026-12-31')).toBe('31 December 2026');
    expect(longDate('2027-03-01')).toBe('1 March 2027');
  });

  it('refuses malformed dates and unknown zones', () => {
    expect(() => endOfLocalDay('31/12/2026', 'Australia/Sydney')).toThrow(RangeError);
    expect(() => endOfLocalDay('2026-02-30', 'Australia/Sydney')).toThrow(RangeError);
    expect(() => localDateOf(new Date(), 'Nowhere/Tallowgate')).toThrow(RangeError);
    expect(isKnownTimeZone('Australia/Sydney')).toBe(true);
    expect(isKnownTimeZone('Nowhere/Tallowgate')).toBe(false);
  });

  it('takes only zones of the IANA database, spelt as it spells them', () => {
    // Source: IANA tz database, zone.tab (Australia/Sydney, Pacific/Auckland) and backward
    // (Asia/Calcutta, a link to Asia/Kolkata).
    expect(isKnownTimeZone('Pacific/Auckland')).toBe(true);
    expect(isKnownTimeZone('Asia/Calcutta')).toBe(true);
    // luxon's names for the server's own zone and a fixed offset are not IANA zones.
    expect(isKnownTimeZone('local')).toBe(false);
    expect(isKnownTimeZone('system')).toBe(false);
    expect(isKnownTimeZone('UTC+10')).toBe(false);
    expect(isKnownTimeZone('')).toBe(false);
    expect(canonicalTimeZone('australia/sydney')).toBe('Australia/Sydney');
    expect(canonicalTimeZone('Pacific/Auckland')).toBe('Pacific/Auckland');
  });

  it('counts months across month and year ends', () => {
    // Source: Gregorian calendar: January has 31 days, February 2027 has 28.
    expect(addCalendarMonths('2026-12-02', 12)).toBe('2027-12-02');
    expect(addCalendarMonths('2027-01-31', 1)).toBe('2027-02-28');
  });

  it("gives today's date in the zone", () => {
    // Source: IANA tz database, Pacific/Auckland: NZDT (UTC+13) in December.
    expect(todayLocalDate('Pacific/Auckland', new Date('2026-12-02T11:30:00Z'))).toBe('2026-12-03');
    expect(todayLocalDate('Pacific/Auckland', new Date('2026-12-02T10:30:00Z'))).toBe('2026-12-02');
  });
});

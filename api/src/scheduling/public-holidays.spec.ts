import { describe, expect, it } from 'vitest';
import { holidayRegions, isHolidayRegion, publicHolidays } from './public-holidays';

describe('publicHolidays', () => {
  it('lists the AU-NSW public holidays of 2026 as the package gives them, substitute days included', () => {
    const holidays = publicHolidays('AU-NSW', '2026-01-01', '2026-12-31');
    // Source: date-holidays 3.37.0 data, AU-NSW, type "public" (the package's own names).
    expect(holidays).toEqual([
      { date: '2026-01-01', name: "New Year's Day" },
      { date: '2026-01-26', name: 'Australia Day' },
      { date: '2026-04-03', name: 'Good Friday' },
      { date: '2026-04-04', name: 'Easter Saturday' },
      { date: '2026-04-05', name: 'Easter Sunday' },
      { date: '2026-04-06', name: 'Easter Monday' },
      { date: '2026-04-25', name: 'Anzac Day' },
      { date: '2026-04-27', name: 'Anzac Day (substitute day)' },
      { date: '2026-06-08', name: "King's Birthday" },
      { date: '2026-10-05', name: 'Labour Day' },
      { date: '2026-12-25', name: 'Christmas Day' },
      { date: '2026-12-26', name: 'Boxing Day' },
      { date: '2026-12-28', name: 'Boxing Day (substitute day)' },
    ]);
    // Bank holidays and observances are not public holidays: the Bank Holiday (3 August) and
    // Mother's Day (10 May) are left out.
    // Source: date-holidays 3.37.0 data, AU-NSW: "Bank Holiday" is type "bank", "Mother's Day"
    // type "observance".
    expect(holidays.map((holiday) => holiday.date)).not.toContain('2026-08-03');
    expect(holidays.map((holiday) => holiday.date)).not.toContain('2026-05-10');
  });

  it('gives the 2027 Christmas substitute days, Anzac Day and Australia Day', () => {
    // Source: date-holidays 3.37.0 data, AU-NSW: Christmas Day 2027 falls on a Saturday and
    // Boxing Day on a Sunday; the package adds Monday 27 and Tuesday 28 December.
    expect(publicHolidays('AU-NSW', '2027-12-20', '2027-12-31')).toEqual([
      { date: '2027-12-25', name: 'Christmas Day' },
      { date: '2027-12-26', name: 'Boxing Day' },
      { date: '2027-12-27', name: 'Christmas Day (substitute day)' },
      { date: '2027-12-28', name: 'Boxing Day (substitute day)' },
    ]);
    // Source: date-holidays 3.37.0 data, AU-NSW: Anzac Day 25 April 2027 is a Sunday, with a
    // substitute on Monday 26 April; Australia Day is Tuesday 26 January 2027.
    expect(publicHolidays('AU-NSW', '2027-04-20', '2027-04-30')).toEqual([
      { date: '2027-04-25', name: 'Anzac Day' },
      { date: '2027-04-26', name: 'Anzac Day (substitute day)' },
    ]);
    expect(publicHolidays('AU-NSW', '2027-01-26', '2027-01-26')).toEqual([
      { date: '2027-01-26', name: 'Australia Day' },
    ]);
  });

  it('crosses a year end and keeps to the dates asked for, both included', () => {
    // Source: date-holidays 3.37.0 data, AU-NSW.
    expect(publicHolidays('AU-NSW', '2026-12-26', '2027-01-01')).toEqual([
      { date: '2026-12-26', name: 'Boxing Day' },
      { date: '2026-12-28', name: 'Boxing Day (substitute day)' },
      { date: '2027-01-01', name: "New Year's Day" },
    ]);
    expect(publicHolidays('AU-NSW', '2026-12-29', '2026-12-31')).toEqual([]);
    expect(publicHolidays('AU-NSW', '2027-01-02', '2026-12-01')).toEqual([]);
  });

  it('knows New Zealand holidays by country code', () => {
    // Source: date-holidays 3.37.0 data, NZ: Waitangi Day 6 February; the day after New
    // Year's Day is a public holiday there.
    expect(publicHolidays('NZ', '2026-01-01', '2026-02-28')).toEqual([
      { date: '2026-01-01', name: "New Year's Day" },
      { date: '2026-01-02', name: "Day after New Year's Day" },
      { date: '2026-02-06', name: 'Waitangi Day' },
    ]);
  });

  it('refuses an unknown region and malformed dates', () => {
    expect(() => publicHolidays('AU-XYZ', '2026-01-01', '2026-12-31')).toThrow(/AU-XYZ/);
    expect(() => publicHolidays('au-nsw', '2026-01-01', '2026-12-31')).toThrow(RangeError);
    expect(() => publicHolidays('AU-NSW', '2026-02-30', '2026-12-31')).toThrow(/fromDate/);
  });
});

describe('holiday regions', () => {
  it('lists every country and country-state the package knows, AU-NSW among them', () => {
    const regions = holidayRegions();
    // Source: date-holidays 3.37.0 data: Australia's states and territories and New Zealand.
    expect(regions).toContainEqual({ code: 'AU-NSW', name: 'Australia, New South Wales' });
    expect(regions).toContainEqual({ code: 'AU', name: 'Australia' });
    expect(regions).toContainEqual({ code: 'NZ', name: 'New Zealand' });
    expect(regions.filter((region) => region.code.startsWith('AU-')).map((r) => r.code)).toEqual([
      'AU-ACT',
      'AU-NSW',
      'AU-NT',
      'AU-QLD',
      'AU-SA',
      'AU-TAS',
      'AU-VIC',
      'AU-WA',
    ]);
    const codes = regions.map((region) => region.code);
    expect(new Set(codes).size).toBe(codes.length);
    expect([...codes].sort()).toEqual(codes);
  });

  it('checks a region code', () => {
    expect(isHolidayRegion('AU-NSW')).toBe(true);
    expect(isHolidayRegion('NZ')).toBe(true);
    expect(isHolidayRegion('AU-XYZ')).toBe(false);
    expect(isHolidayRegion('au-nsw')).toBe(false);
    expect(isHolidayRegion('')).toBe(false);
    expect(isHolidayRegion('Australia')).toBe(false);
  });
});

import { describe, expect, it } from 'vitest';
import { addDays, clockMinutes, daysBetween, isIsoDate, isoWeekday } from './local-date';

describe('local dates', () => {
  it('counts calendar days and weekdays', () => {
    // Source: Gregorian calendar: 1 January 2026 is a Thursday; 2028 is a leap year.
    expect(isoWeekday('2026-01-01')).toBe(4);
    expect(isoWeekday('2026-12-06')).toBe(7);
    expect(isoWeekday('2026-12-07')).toBe(1);
    expect(addDays('2028-02-28', 1)).toBe('2028-02-29');
    expect(addDays('2027-02-28', 1)).toBe('2027-03-01');
    expect(addDays('2027-01-01', -1)).toBe('2026-12-31');
    expect(daysBetween('2026-12-25', '2027-01-01')).toBe(7);
  });

  it('reads clock times and refuses what is not a date or a time', () => {
    expect(clockMinutes('07:30')).toBe(450);
    expect(clockMinutes('23:59')).toBe(1439);
    expect(() => clockMinutes('24:00')).toThrow(RangeError);
    expect(isIsoDate('2026-02-29')).toBe(false);
    expect(isIsoDate('2026-2-28')).toBe(false);
    expect(isIsoDate('2028-02-29')).toBe(true);
  });
});

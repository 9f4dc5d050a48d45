import { describe, expect, it } from 'vitest';
import { quoteValidUntilDate } from './quote-validity';

describe('quote validity', () => {
  it('adds the valid days to the issue date', () => {
    // Source: ISO 8601 / Gregorian calendar: March has 31 days; 2024 is a leap year, 2025 is not.
    expect(quoteValidUntilDate('2025-03-01', 30)).toBe('2025-03-31');
    expect(quoteValidUntilDate('2024-02-28', 1)).toBe('2024-02-29');
    expect(quoteValidUntilDate('2025-02-28', 1)).toBe('2025-03-01');
    expect(quoteValidUntilDate('2025-12-15', 30)).toBe('2026-01-14');
    expect(quoteValidUntilDate('2025-06-10', 0)).toBe('2025-06-10');
  });

  it('refuses a date that is not a calendar date, or fractional days', () => {
    expect(() => quoteValidUntilDate('2025-02-30', 30)).toThrow('not a calendar date');
    expect(() => quoteValidUntilDate('1/3/2025', 30)).toThrow('YYYY-MM-DD');
    expect(() => quoteValidUntilDate('2025-03-01', 1.5)).toThrow(RangeError);
    expect(() => quoteValidUntilDate('2025-03-01', -1)).toThrow(RangeError);
  });
});

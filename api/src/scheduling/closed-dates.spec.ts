import { describe, expect, it } from 'vitest';
import { closedDatesFor } from './closed-dates';
import { publicHolidays } from './public-holidays';

// The closures, their reasons and the override below are invented; the holidays are the
// package's.

describe('closedDatesFor', () => {
  const holidays = publicHolidays('AU-NSW', '2026-12-01', '2027-01-31');

  it('closes the public holidays, except those the workshop opens on', () => {
    const closed = closedDatesFor({
      holidays,
      opensOnHolidays: ['2026-12-26'],
      closures: [],
      fromDate: '2026-12-01',
      toDate: '2027-01-31',
    });
    // Source: date-holidays 3.37.0 data, AU-NSW, December 2026 and January 2027.
    expect([...closed]).toEqual([
      ['2026-12-25', 'Public holiday: Christmas Day'],
      ['2026-12-28', 'Public holiday: Boxing Day (substitute day)'],
      ['2027-01-01', "Public holiday: New Year's Day"],
      ['2027-01-26', 'Public holiday: Australia Day'],
    ]);
  });

  it('closes every date of a closure, both ends included, clipped to the range', () => {
    const closed = closedDatesFor({
      holidays: [],
      opensOnHolidays: [],
      closures: [
        { startDate: '2027-01-04', endDate: '2027-01-06', reason: 'stocktake' },
        { startDate: '2026-11-28', endDate: '2026-12-02', reason: '  hoist inspection ' },
      ],
      fromDate: '2026-12-01',
      toDate: '2027-01-05',
    });
    expect([...closed]).toEqual([
      ['2026-12-01', 'Closed: hoist inspection'],
      ['2026-12-02', 'Closed: hoist inspection'],
      ['2027-01-04', 'Closed: stocktake'],
      ['2027-01-05', 'Closed: stocktake'],
    ]);
  });

  it('lets a closure win over a holiday, opened or not, and names two holidays on one date', () => {
    const closed = closedDatesFor({
      holidays: [
        { date: '2027-03-29', name: 'Easter Monday' },
        { date: '2027-03-29', name: 'Harbour Regatta Day' },
        { date: '2027-03-29', name: 'Easter Monday' },
        { date: '2027-03-26', name: 'Good Friday' },
        { date: '2027-03-27', name: 'Easter Saturday' },
      ],
      opensOnHolidays: ['2027-03-26', '2027-03-27'],
      closures: [{ startDate: '2027-03-27', endDate: '2027-03-27', reason: '' }],
      fromDate: '2027-03-01',
      toDate: '2027-03-31',
    });
    expect([...closed]).toEqual([
      ['2027-03-27', 'Closed'],
      ['2027-03-29', 'Public holiday: Easter Monday, Harbour Regatta Day'],
    ]);
  });

  it('refuses malformed dates, naming the field', () => {
    expect(() =>
      closedDatesFor({
        holidays: [],
        opensOnHolidays: [],
        closures: [{ startDate: '2027-01-04', endDate: '04/01/2027', reason: 'x' }],
        fromDate: '2027-01-01',
        toDate: '2027-01-31',
      }),
    ).toThrow(/closures\[0\]\.endDate/);
  });
});

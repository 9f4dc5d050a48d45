/**
 * The closed dates of a workshop calendar (`WorkshopCalendar.closedDates`) from its public
 * holidays, the holidays it opens on anyway, and its own closures:
 *
 * - a closure (startDate … endDate, both included) closes every date in it, with its reason:
 *   "Closed: stocktake";
 * - a public holiday closes its date, "Public holiday: Christmas Day" (two on one date: both
 *   names), unless the workshop opens on that date (a holiday override);
 * - a closure wins over a holiday override: the workshop said it is shut.
 *
 * Weekdays without hours are not listed here; the engine knows them from `weeklyHours`.
 */
import { addDays, assertIsoDate } from './local-date';
import type { PublicHoliday } from './scheduling.types';

export interface ClosureRange {
  startDate: string;
  endDate: string;
  reason: string;
}

export interface ClosedDatesInput {
  holidays: readonly PublicHoliday[];
  /** Holiday dates the workshop opens on anyway. */
  opensOnHolidays: Iterable<string>;
  closures: readonly ClosureRange[];
  /** Only dates from … to (both included) are listed. */
  fromDate: string;
  toDate: string;
}

/** Local date → reason, for the dates from fromDate to toDate the workshop is shut. */
export function closedDatesFor(input: ClosedDatesInput): Map<string, string> {
  assertIsoDate(input.fromDate, 'fromDate');
  assertIsoDate(input.toDate, 'toDate');
  const opens = new Set(input.opensOnHolidays);
  const inRange = (date: string) => date >= input.fromDate && date <= input.toDate;

  const holidayNames = new Map<string, string[]>();
  for (const holiday of input.holidays) {
    if (!inRange(holiday.date) || opens.has(holiday.date)) continue;
    const names = holidayNames.get(holiday.date) ?? [];
    if (!names.includes(holiday.name)) names.push(holiday.name);
    holidayNames.set(holiday.date, names);
  }
  const closed = new Map<string, string>();
  for (const [date, names] of holidayNames) closed.set(date, `Public holiday: ${names.join(', ')}`);

  input.closures.forEach((closure, index) => {
    assertIsoDate(closure.startDate, `closures[${index}].startDate`);
    assertIsoDate(closure.endDate, `closures[${index}].endDate`);
    const reason = closure.reason.trim() === '' ? 'Closed' : `Closed: ${closure.reason.trim()}`;
    const first = closure.startDate > input.fromDate ? closure.startDate : input.fromDate;
    for (
      let date = first;
      date <= closure.endDate && date <= input.toDate;
      date = addDays(date, 1)
    ) {
      closed.set(date, reason);
    }
  });
  return new Map([...closed].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
}

/**
 * Calendar dates and instants in the workshop's time zone (IANA name), through luxon: a quote
 * is issued on the workshop's local date and holds its prices to the end of its last local day,
 * whatever the server's own zone and across daylight-saving changes.
 */
import { DateTime } from 'luxon';

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

function zoned(date: string, timeZone: string): DateTime {
  if (!ISO_DATE.test(date)) throw new RangeError(`Expected a date as YYYY-MM-DD, got '${date}'`);
  const local = DateTime.fromISO(date, { zone: timeZone });
  if (!local.isValid) {
    throw new RangeError(`Not a date in ${timeZone}: '${date}' (${local.invalidExplanation})`);
  }
  return local;
}

/** True for a time zone luxon (the ICU data of Node) knows, e.g. Australia/Sydney. */
export function isKnownTimeZone(timeZone: string): boolean {
  return DateTime.now().setZone(timeZone).isValid;
}

/** The calendar date (YYYY-MM-DD) an instant falls on in the time zone. */
export function localDateOf(instant: Date, timeZone: string): string {
  const local = DateTime.fromJSDate(instant, { zone: timeZone });
  if (!local.isValid) throw new RangeError(`Unknown time zone '${timeZone}'`);
  return local.toISODate() as string;
}

/** The last millisecond of that calendar day in the time zone, as an instant (UTC). */
export function endOfLocalDay(date: string, timeZone: string): Date {
  return zoned(date, timeZone).endOf('day').toJSDate();
}

/** "2026-12-31" → "31 December 2026" (the calendar date as the quote and its PDF print it). */
export function longDate(date: string): string {
  return zoned(date, 'UTC').setLocale('en-AU').toFormat('d LLLL yyyy');
}

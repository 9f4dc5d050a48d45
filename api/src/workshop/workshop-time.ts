/**
 * Calendar dates and instants in the workshop's time zone (IANA name), through luxon: a quote
 * is issued on the workshop's local date and holds its prices to the end of its last local day,
 * whatever the server's own zone and across daylight-saving changes.
 */
import { DateTime, IANAZone } from 'luxon';

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

function zoned(date: string, timeZone: string): DateTime {
  if (!ISO_DATE.test(date)) throw new RangeError(`Expected a date as YYYY-MM-DD, got '${date}'`);
  const local = DateTime.fromISO(date, { zone: timeZone });
  if (!local.isValid) {
    throw new RangeError(`Not a date in ${timeZone}: '${date}' (${local.invalidExplanation})`);
  }
  return local;
}

/**
 * True for a zone of the IANA time zone database that luxon (the ICU data of Node) knows, e.g.
 * Australia/Sydney. luxon's own words for the server's zone ('local', 'system') and fixed offsets
 * ('UTC+10') are not zones a workshop is in.
 */
export function isKnownTimeZone(timeZone: string): boolean {
  return IANAZone.isValidZone(timeZone) && DateTime.now().setZone(timeZone).isValid;
}

/** The zone's name as the IANA database spells it ('australia/sydney' → 'Australia/Sydney'). */
export function canonicalTimeZone(timeZone: string): string {
  return new Intl.DateTimeFormat('en-AU', { timeZone }).resolvedOptions().timeZone;
}

/** The calendar date `months` months after a YYYY-MM-DD date (31 January + 1 → 28/29 February). */
export function addCalendarMonths(date: string, months: number): string {
  return zoned(date, 'UTC').plus({ months }).toISODate() as string;
}

/** Today's calendar date (YYYY-MM-DD) in the time zone. */
export function todayLocalDate(timeZone: string, now: Date = new Date()): string {
  return localDateOf(now, timeZone);
}

/**
 * Both functions below run on every price preview, so their answers are kept: a zone's date
 * formatter is built once, and the end of a given local day never changes while the process runs
 * (the zone rules are Node's ICU data). Bounded so the memory stays small.
 */
const MAX_KEPT = 512;
const dateFormats = new Map<string, Intl.DateTimeFormat>();
const dayEnds = new Map<string, number>();

function remember<K, V>(map: Map<K, V>, key: K, value: V): V {
  if (map.size >= MAX_KEPT) map.clear();
  map.set(key, value);
  return value;
}

/** Per zone, the local day last asked about: its date and the instants it runs between. */
const lastDays = new Map<string, { date: string; startMs: number; endMs: number }>();

/** The calendar date (YYYY-MM-DD) an instant falls on in the time zone. */
export function localDateOf(instant: Date, timeZone: string): string {
  const ms = instant.getTime();
  const last = lastDays.get(timeZone);
  if (last && ms >= last.startMs && ms <= last.endMs) return last.date;
  let format = dateFormats.get(timeZone);
  if (!format) {
    if (!DateTime.fromJSDate(instant, { zone: timeZone }).isValid) {
      throw new RangeError(`Unknown time zone '${timeZone}'`);
    }
    // en-CA writes dates as YYYY-MM-DD.
    format = remember(
      dateFormats,
      timeZone,
      new Intl.DateTimeFormat('en-CA', {
        timeZone,
        year: 'numeric',
        month: '2-digit',
        day: '2-digit',
      }),
    );
  }
  const date = format.format(instant);
  const day = zoned(date, timeZone);
  remember(lastDays, timeZone, {
    date,
    startMs: day.startOf('day').toMillis(),
    endMs: day.endOf('day').toMillis(),
  });
  return date;
}

/** The last millisecond of that calendar day in the time zone, as an instant (UTC). */
export function endOfLocalDay(date: string, timeZone: string): Date {
  const key = `${timeZone} ${date}`;
  const kept = dayEnds.get(key);
  if (kept !== undefined) return new Date(kept);
  const end = zoned(date, timeZone).endOf('day').toMillis();
  return new Date(remember(dayEnds, key, end));
}

/** "2026-12-31" → "31 December 2026" (the calendar date as the quote and its PDF print it). */
export function longDate(date: string): string {
  return zoned(date, 'UTC').setLocale('en-AU').toFormat('d LLLL yyyy');
}

/**
 * Calendar dates (YYYY-MM-DD) and clock times (HH:mm) as plain values. Date arithmetic runs on a
 * UTC midnight, so no time zone or daylight-saving change can move a date; turning a local date
 * and clock time into an instant is the job of luxon (see working-time.ts).
 */
import type { IsoWeekday } from './scheduling.types';

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const CLOCK_TIME = /^([01]\d|2[0-3]):([0-5]\d)$/;
const MILLISECONDS_PER_DAY = 86_400_000;

/** Milliseconds of a UTC midnight for a YYYY-MM-DD date; RangeError naming `field` otherwise. */
function utcMidnightMs(date: string, field: string): number {
  const match = ISO_DATE.exec(date);
  if (!match) throw new RangeError(`${field} must be a date as YYYY-MM-DD, got '${date}'`);
  const [year, month, day] = match.slice(1).map(Number);
  const ms = Date.UTC(year, month - 1, day);
  const check = new Date(ms);
  if (
    check.getUTCFullYear() !== year ||
    check.getUTCMonth() !== month - 1 ||
    check.getUTCDate() !== day
  ) {
    throw new RangeError(`${field} is not a calendar date: '${date}'`);
  }
  return ms;
}

/** Throws a RangeError naming `field` unless `date` is a real calendar date as YYYY-MM-DD. */
export function assertIsoDate(date: string, field = 'date'): void {
  utcMidnightMs(date, field);
}

/** True for a real calendar date written YYYY-MM-DD. */
export function isIsoDate(date: string): boolean {
  try {
    utcMidnightMs(date, 'date');
    return true;
  } catch {
    return false;
  }
}

/** The date `days` calendar days after `date` (negative: before). */
export function addDays(date: string, days: number): string {
  return new Date(utcMidnightMs(date, 'date') + days * MILLISECONDS_PER_DAY)
    .toISOString()
    .slice(0, 10);
}

/** Calendar days from `from` to `to` (negative when `to` is earlier). */
export function daysBetween(from: string, to: string): number {
  return Math.round((utcMidnightMs(to, 'to') - utcMidnightMs(from, 'from')) / MILLISECONDS_PER_DAY);
}

/** ISO weekday of a date: 1 = Monday … 7 = Sunday. */
export function isoWeekday(date: string): IsoWeekday {
  const sundayFirst = new Date(utcMidnightMs(date, 'date')).getUTCDay();
  return (sundayFirst === 0 ? 7 : sundayFirst) as IsoWeekday;
}

/** The later of two dates (YYYY-MM-DD sorts as text). */
export function laterDate(a: string, b: string): string {
  return a >= b ? a : b;
}

/** True for a clock time written HH:mm, 00:00 … 23:59. */
export function isClockTime(time: string): boolean {
  return CLOCK_TIME.test(time);
}

/** "07:30" → 450 (minutes after midnight on the clock). */
export function clockMinutes(time: string, field = 'time'): number {
  const match = CLOCK_TIME.exec(time);
  if (!match) throw new RangeError(`${field} must be a time as HH:mm, got '${time}'`);
  return Number(match[1]) * 60 + Number(match[2]);
}

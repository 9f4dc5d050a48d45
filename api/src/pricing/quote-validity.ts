/**
 * How long a quote holds its prices. The engine has no clock: the caller passes the calendar
 * date the quote was issued on, in the workshop's time zone, and gets the last calendar date it
 * is valid on. Issued on 1 March and valid 30 days: valid until the end of 31 March.
 */
import { assertWholeNumber } from './cents';

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const MILLISECONDS_PER_DAY = 86_400_000;

/** `issuedOn` + `quoteValidDays` as a calendar date (YYYY-MM-DD). */
export function quoteValidUntilDate(issuedOn: string, quoteValidDays: number): string {
  assertWholeNumber(quoteValidDays, 'quoteValidDays');
  if (quoteValidDays < 0) throw new RangeError('quoteValidDays must not be negative');
  const match = ISO_DATE.exec(issuedOn);
  if (!match) throw new RangeError(`issuedOn must be a date as YYYY-MM-DD, got '${issuedOn}'`);
  const [year, month, day] = match.slice(1).map(Number);
  // Calendar arithmetic on a UTC midnight: no time zone or daylight-saving shift can move it.
  const issuedUtcMs = Date.UTC(year, month - 1, day);
  const issued = new Date(issuedUtcMs);
  if (
    issued.getUTCFullYear() !== year ||
    issued.getUTCMonth() !== month - 1 ||
    issued.getUTCDate() !== day
  ) {
    throw new RangeError(`issuedOn is not a calendar date: '${issuedOn}'`);
  }
  return new Date(issuedUtcMs + quoteValidDays * MILLISECONDS_PER_DAY).toISOString().slice(0, 10);
}

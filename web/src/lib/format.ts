const dateFormats = new Map<string, Intl.DateTimeFormat>();

/**
 * A calendar date for an ISO instant. Pass the workshop's IANA time zone once the API provides
 * it; without one the browser's zone is used.
 */
export function formatDate(isoInstant: string, timeZone?: string): string {
  const key = timeZone ?? '';
  let format = dateFormats.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeZone });
    dateFormats.set(key, format);
  }
  const date = new Date(isoInstant);
  return Number.isNaN(date.getTime()) ? '' : format.format(date);
}

const calendarDateFormat = new Intl.DateTimeFormat('en-AU', {
  day: 'numeric',
  month: 'long',
  year: 'numeric',
  timeZone: 'UTC',
});

/**
 * A calendar date the API sends as "YYYY-MM-DD" (already the workshop's date): "31 December 2026".
 * Read as a date only, so no time zone can move it to the day before.
 */
export function formatCalendarDate(isoDate: string): string {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(isoDate);
  if (!match) return isoDate;
  const date = new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3])));
  return calendarDateFormat.format(date);
}

const dateTimeFormats = new Map<string, Intl.DateTimeFormat>();

/** An instant as date and time in the given IANA zone (the workshop's): "3 Mar 2026, 2:05 pm". */
export function formatDateTime(isoInstant: string, timeZone?: string): string {
  const key = timeZone ?? '';
  let format = dateTimeFormats.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat('en-AU', {
      dateStyle: 'medium',
      timeStyle: 'short',
      timeZone,
    });
    dateTimeFormats.set(key, format);
  }
  const date = new Date(isoInstant);
  return Number.isNaN(date.getTime()) ? '' : format.format(date);
}

const wholeNumberFormat = new Intl.NumberFormat('en-AU', { maximumFractionDigits: 0 });
const oneDecimalFormat = new Intl.NumberFormat('en-AU', {
  minimumFractionDigits: 1,
  maximumFractionDigits: 1,
});

/** 3100 → "3,100". */
export function formatWholeNumber(value: number): string {
  return wholeNumberFormat.format(value);
}

/** 96.72 → "96.7". */
export function formatOneDecimal(value: number): string {
  return oneDecimalFormat.format(value);
}

/** 3.4 → "+3.4 %", -1.25 → "−1.3 %" (a true minus sign). */
export function formatSignedPercent(value: number): string {
  const text = oneDecimalFormat.format(Math.abs(value));
  const sign = value > 0 ? '+' : value < 0 ? '−' : '';
  return `${sign}${text} %`;
}

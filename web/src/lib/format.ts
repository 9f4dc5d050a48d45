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

/**
 * Public holidays from the data the date-holidays package ships (pinned, so the dates only change
 * when we upgrade it). A region is a country code ("NZ") or a country and state ("AU-NSW").
 * Only holidays of type `public` count; observed and substitute days are included as the package
 * gives them (e.g. "Boxing Day (substitute day)").
 */
import Holidays from 'date-holidays';
import { assertIsoDate } from './local-date';
import type { PublicHoliday } from './scheduling.types';

export type { PublicHoliday } from './scheduling.types';

const REGION_CODE = /^([A-Z]{2})(?:-([A-Z0-9]{1,4}))?$/;

/** One set-up package instance per region: building one reads its rules. */
const calendars = new Map<string, Holidays>();
let regions: { code: string; name: string }[] | null = null;

function calendarOf(region: string): Holidays {
  const kept = calendars.get(region);
  if (kept) return kept;
  if (!isHolidayRegion(region)) throw new RangeError(`Unknown holiday region '${region}'`);
  const [country, state] = region.split('-');
  const calendar = state === undefined ? new Holidays(country) : new Holidays(country, state);
  calendars.set(region, calendar);
  return calendar;
}

/**
 * Every country, and every country-state, the package knows, by code ("AU", "AU-NSW"), with an
 * English name ("Australia", "Australia, New South Wales"), sorted by code.
 */
export function holidayRegions(): { code: string; name: string }[] {
  if (regions === null) {
    const found: { code: string; name: string }[] = [];
    const lookup = new Holidays();
    for (const [country, countryName] of Object.entries(lookup.getCountries('en'))) {
      found.push({ code: country, name: countryName });
      for (const [state, stateName] of Object.entries(lookup.getStates(country, 'en') ?? {})) {
        found.push({ code: `${country}-${state}`, name: `${countryName}, ${stateName}` });
      }
    }
    regions = found.sort((a, b) => (a.code < b.code ? -1 : a.code > b.code ? 1 : 0));
  }
  return regions.map((region) => ({ ...region }));
}

/** True for a code holidayRegions() lists. */
export function isHolidayRegion(code: string): boolean {
  if (!REGION_CODE.test(code)) return false;
  if (regions === null) holidayRegions();
  return (regions ?? []).some((region) => region.code === code);
}

/** A region's year of public holidays never changes for a given package version: kept once worked out. */
const yearsWorkedOut = new Map<string, readonly PublicHoliday[]>();

function publicHolidaysOfYear(region: string, year: number): readonly PublicHoliday[] {
  const key = `${region}:${year}`;
  let holidays = yearsWorkedOut.get(key);
  if (!holidays) {
    holidays = calendarOf(region)
      .getHolidays(year)
      // `date` is the local date and time the holiday starts: "2026-12-25 00:00:00".
      .filter((holiday) => holiday.type === 'public')
      .map((holiday) => ({ date: holiday.date.slice(0, 10), name: holiday.name }));
    if (yearsWorkedOut.size > 500) yearsWorkedOut.clear();
    yearsWorkedOut.set(key, holidays);
  }
  return holidays;
}

/**
 * The public holidays of the region from fromDate to toDate (both included), by date; a date the
 * package gives two holidays on appears twice. RangeError for an unknown region or a bad date.
 */
export function publicHolidays(region: string, fromDate: string, toDate: string): PublicHoliday[] {
  assertIsoDate(fromDate, 'fromDate');
  assertIsoDate(toDate, 'toDate');
  const found: PublicHoliday[] = [];
  for (let year = Number(fromDate.slice(0, 4)); year <= Number(toDate.slice(0, 4)); year += 1) {
    for (const holiday of publicHolidaysOfYear(region, year)) {
      if (holiday.date >= fromDate && holiday.date <= toDate) found.push(holiday);
    }
  }
  return found.sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
}

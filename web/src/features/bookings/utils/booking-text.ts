import { DateTime } from 'luxon';
import type { BayKind, BookingState, JobPlan, JobSegment, PlannedSegment } from '@/types/api';

/**
 * Words and times for bookings. Every time is shown in the workshop's zone (the API sends it
 * as `timeZone`), never the browser's: a customer travelling still sees the shop's clock.
 */

const LOCALE = 'en-AU';

export const bayKindLabels: Record<BayKind, string> = {
  hoist: 'hoist bay',
  alignment: 'alignment bay',
  tyre: 'tyre bay',
};

export const bookingStateLabels: Record<BookingState, string> = {
  held: 'Held',
  requested: 'Requested',
  confirmed: 'Confirmed',
  'in-progress': 'In progress',
  completed: 'Completed',
  cancelled: 'Cancelled',
  expired: 'Expired',
};

/** One line on what each state means for the customer. */
export const bookingStateDescriptions: Record<BookingState, string> = {
  held: 'The time is kept for you for a short while; nothing is paid yet.',
  requested: 'Deposit paid, waiting for the workshop to confirm.',
  confirmed: 'The workshop expects your vehicle at this time.',
  'in-progress': 'Your vehicle is in the workshop.',
  completed: 'The work is done.',
  cancelled: 'This booking was cancelled; its time is free again.',
  expired: 'The hold ran out before it was taken up; the time is free again.',
};

/** 210 → "3 h 30", 60 → "1 h", 45 → "45 min", 65 → "1 h 05". */
export function formatWorkMinutes(minutes: number): string {
  const whole = Math.max(0, Math.round(minutes));
  const hours = Math.floor(whole / 60);
  const rest = whole % 60;
  if (hours === 0) return `${rest} min`;
  if (rest === 0) return `${hours} h`;
  return `${hours} h ${String(rest).padStart(2, '0')}`;
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** "Hoist bay 3 h 30, then alignment bay 1 h"; empty when the job needs no bay. */
export function jobSegmentsText(segments: readonly Pick<JobSegment, 'bayKind' | 'minutes'>[]) {
  const parts = segments.map(
    (segment) => `${bayKindLabels[segment.bayKind]} ${formatWorkMinutes(segment.minutes)}`,
  );
  return capitalise(parts.join(', then '));
}

/** A workshop-local date "YYYY-MM-DD" as "Thursday 3 December" (the year when not this one). */
export function formatLocalDate(isoDate: string, withYear = false): string {
  const date = DateTime.fromISO(isoDate, { zone: 'UTC' }).setLocale(LOCALE);
  if (!date.isValid) return isoDate;
  return date.toLocaleString({
    weekday: 'long',
    day: 'numeric',
    month: 'long',
    ...(withYear ? { year: 'numeric' } : {}),
  });
}

/** "Thu 3 Dec", for lists. */
export function formatShortLocalDate(isoDate: string): string {
  const date = DateTime.fromISO(isoDate, { zone: 'UTC' }).setLocale(LOCALE);
  if (!date.isValid) return isoDate;
  return date.toLocaleString({ weekday: 'short', day: 'numeric', month: 'short' }).replace(',', '');
}

function inZone(isoInstant: string, timeZone: string): DateTime {
  return DateTime.fromISO(isoInstant).setZone(timeZone).setLocale(LOCALE);
}

/** An instant as the workshop's clock shows it: "7:30 am". */
export function formatLocalTime(isoInstant: string, timeZone: string): string {
  const time = inZone(isoInstant, timeZone);
  return time.isValid ? time.toLocaleString(DateTime.TIME_SIMPLE) : '';
}

/** The workshop-local date of an instant, "YYYY-MM-DD". */
export function localDateOf(isoInstant: string, timeZone: string): string {
  return inZone(isoInstant, timeZone).toISODate() ?? '';
}

/** An instant as the workshop's date and clock: "Thursday 3 December, 7:30 am". */
export function formatLocalDateTime(isoInstant: string, timeZone: string): string {
  const date = localDateOf(isoInstant, timeZone);
  if (!date) return '';
  return `${formatLocalDate(date)}, ${formatLocalTime(isoInstant, timeZone)}`;
}

/** Whole workshop-local days between two instants' dates (0: the same day). */
export function nightsBetween(startIso: string, endIso: string, timeZone: string): number {
  const start = inZone(startIso, timeZone).startOf('day');
  const end = inZone(endIso, timeZone).startOf('day');
  if (!start.isValid || !end.isValid) return 0;
  return Math.max(0, Math.round(end.diff(start, 'days').days));
}

/** "7:30 am – 11:00 am", or with the dates when the stay runs past the day it starts. */
export function formatLocalRange(startIso: string, endIso: string, timeZone: string): string {
  const sameDay = nightsBetween(startIso, endIso, timeZone) === 0;
  if (sameDay) {
    return `${formatLocalTime(startIso, timeZone)} – ${formatLocalTime(endIso, timeZone)}`;
  }
  const day = (iso: string) => formatShortLocalDate(localDateOf(iso, timeZone));
  return `${day(startIso)} ${formatLocalTime(startIso, timeZone)} – ${day(endIso)} ${formatLocalTime(endIso, timeZone)}`;
}

/**
 * Said when a job ends on a later day than it starts; null when it is done the same day.
 */
export function overnightNote(startIso: string, endIso: string, timeZone: string): string | null {
  const nights = nightsBetween(startIso, endIso, timeZone);
  if (nights === 0) return null;
  if (nights === 1) {
    return 'The job runs over to the next day: the vehicle stays in the workshop overnight.';
  }
  return `The job runs over ${nights + 1} days: the vehicle stays in the workshop for ${nights} nights.`;
}

/** "Hoist 1 (hoist bay), 3 h 30" for one planned segment. */
export function segmentTitle(segment: Pick<PlannedSegment, 'bayName' | 'bayKind' | 'minutes'>) {
  return `${segment.bayName} (${bayKindLabels[segment.bayKind]}), ${formatWorkMinutes(segment.minutes)} of work`;
}

/**
 * Why the job cannot start earlier, in plain words: parts on order, or the next open day.
 */
export function earliestStartText(plan: Pick<JobPlan, 'earliestStartDate' | 'longestLeadDays'>) {
  const date = formatLocalDate(plan.earliestStartDate);
  if (plan.longestLeadDays > 0) {
    const days = `${plan.longestLeadDays} day${plan.longestLeadDays === 1 ? '' : 's'}`;
    return `Earliest start ${date}, because some parts are on order (up to ${days} for them to arrive).`;
  }
  return `Earliest start ${date}; every part is on the shelf.`;
}

/** The time left on a hold as a clock: "14:32", or "1:02:05" past an hour. */
export function formatCountdown(msLeft: number): string {
  const totalSeconds = Math.max(0, Math.ceil(msLeft / 1000));
  const hours = Math.floor(totalSeconds / 3600);
  const minutes = Math.floor((totalSeconds % 3600) / 60);
  const seconds = totalSeconds % 60;
  const two = (value: number) => String(value).padStart(2, '0');
  return hours > 0 ? `${hours}:${two(minutes)}:${two(seconds)}` : `${minutes}:${two(seconds)}`;
}

/** "Held for 14:32 more", or "This hold has expired" once the time is up. */
export function holdCountdownText(msLeft: number): string {
  return msLeft > 0 ? `Held for ${formatCountdown(msLeft)} more` : 'This hold has expired';
}

/** Whole minutes left, rounded up: what is announced (not every second). */
export function minutesLeft(msLeft: number): number {
  return Math.max(0, Math.ceil(msLeft / 60_000));
}

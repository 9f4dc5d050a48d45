import { DateTime } from 'luxon';
import type {
  Bay,
  Booking,
  BookingState,
  OpeningHoursEntry,
  PlannedSegment,
  WorkshopSetup,
} from '@/types/api';

/**
 * The day board's arithmetic, kept free of React: which rows a day has, which bays are columns,
 * where each stay in a bay sits, and whether the workshop is open. Every time is read on the
 * workshop's clock (its IANA zone), never the browser's.
 */

/** One row of the board is this many minutes of working time. */
export const ROW_MINUTES = 30;

const MINUTES_PER_DAY = 24 * 60;

/** "07:30" → 450 (minutes after local midnight); null when not a clock time. */
export function clockMinutes(hhmm: string | null | undefined): number | null {
  const match = hhmm ? /^(\d{1,2}):(\d{2})$/.exec(hhmm) : null;
  if (!match) return null;
  return Number(match[1]) * 60 + Number(match[2]);
}

/** 450 → "07:30". */
export function clockText(minutes: number): string {
  const hours = Math.floor(minutes / 60);
  return `${String(hours).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}`;
}

/** The board's rows: from the week's earliest opening to its latest closing, in 30-minute steps. */
export interface BoardWindow {
  /** Minutes after local midnight of the first row's start. */
  startMinute: number;
  /** Minutes after local midnight of the last row's end. */
  endMinute: number;
  rows: number;
}

export function boardWindow(openingHours: readonly OpeningHoursEntry[]): BoardWindow | null {
  let start = Infinity;
  let end = -Infinity;
  for (const entry of openingHours) {
    const opens = clockMinutes(entry.opensAt);
    const closes = clockMinutes(entry.closesAt);
    if (!entry.open || opens === null || closes === null) continue;
    start = Math.min(start, opens);
    end = Math.max(end, closes);
  }
  if (!Number.isFinite(start) || end <= start) return null;
  const startMinute = Math.floor(start / ROW_MINUTES) * ROW_MINUTES;
  const endMinute = Math.ceil(end / ROW_MINUTES) * ROW_MINUTES;
  return { startMinute, endMinute, rows: (endMinute - startMinute) / ROW_MINUTES };
}

/** How each row of a day reads: working time, the break, or outside that day's hours. */
export type RowKind = 'work' | 'break' | 'closed';

export function rowKinds(window: BoardWindow, hours: OpeningHoursEntry | null): RowKind[] {
  const opens = hours?.open ? clockMinutes(hours.opensAt) : null;
  const closes = hours?.open ? clockMinutes(hours.closesAt) : null;
  const breakStarts = clockMinutes(hours?.breakStartsAt);
  const breakEnds = clockMinutes(hours?.breakEndsAt);
  return Array.from({ length: window.rows }, (_, index) => {
    const from = window.startMinute + index * ROW_MINUTES;
    const to = from + ROW_MINUTES;
    if (opens === null || closes === null || from < opens || to > closes) return 'closed';
    if (breakStarts !== null && breakEnds !== null && from < breakEnds && to > breakStarts) {
      return 'break';
    }
    return 'work';
  });
}

/** States drawn on the board: a cancelled or expired booking holds no bay. */
export function shownOnBoard(state: BookingState): boolean {
  return state !== 'cancelled' && state !== 'expired';
}

/** ISO weekday (1 = Monday) of a local date "YYYY-MM-DD". */
export function isoWeekday(date: string): number {
  return DateTime.fromISO(date, { zone: 'UTC' }).weekday;
}

/** The seven local dates, Monday first, of the week a date is in. */
export function weekDates(date: string): string[] {
  const monday = DateTime.fromISO(date, { zone: 'UTC' }).startOf('week');
  return Array.from({ length: 7 }, (_, index) => monday.plus({ days: index }).toISODate() ?? '');
}

/** A local date moved by whole days. */
export function addDays(date: string, days: number): string {
  return DateTime.fromISO(date, { zone: 'UTC' }).plus({ days }).toISODate() ?? date;
}

/** The workshop's today, "YYYY-MM-DD", at an instant. */
export function workshopToday(timeZone: string, now: Date = new Date()): string {
  return DateTime.fromJSDate(now).setZone(timeZone).toISODate() ?? '';
}

const weekdayPlurals = ['Mondays', 'Tuesdays', 'Wednesdays', 'Thursdays', 'Fridays'];
const weekendPlurals = ['Saturdays', 'Sundays'];

/** Open or closed on a day, and why not. */
export interface DayStatus {
  open: boolean;
  /** "Closed on Sundays", "Closed: Stocktake", "Public holiday: Christmas Day". */
  reason: string | null;
  /** That weekday's hours (its break), when open. */
  hours: OpeningHoursEntry | null;
}

export function dayStatus(
  date: string,
  setup: Pick<WorkshopSetup, 'openingHours' | 'closures' | 'holidays'>,
): DayStatus {
  const weekday = isoWeekday(date);
  const hours = setup.openingHours.find((entry) => entry.weekday === weekday) ?? null;
  const closure = setup.closures.find((entry) => entry.startDate <= date && date <= entry.endDate);
  if (closure) return { open: false, reason: `Closed: ${closure.reason}`, hours: null };
  const holiday = setup.holidays.find((entry) => entry.date === date);
  if (holiday && !holiday.opens) {
    return { open: false, reason: `Public holiday: ${holiday.name}`, hours: null };
  }
  if (!hours?.open) {
    const plural = [...weekdayPlurals, ...weekendPlurals][weekday - 1];
    return { open: false, reason: `Closed on ${plural}`, hours: null };
  }
  return { open: true, reason: null, hours };
}

/** Minutes after the local midnight of `date` (below 0: an earlier day; 1440 or more: later). */
function minutesOnDate(isoInstant: string, date: string, timeZone: string): number {
  const local = DateTime.fromISO(isoInstant).setZone(timeZone);
  const day = local.toISODate() ?? '';
  if (day < date) return -Infinity;
  if (day > date) return Infinity;
  // The clock's reading, so a day of a daylight-saving change keeps its printed times.
  return local.hour * 60 + local.minute;
}

/** One stay of a booking in one bay, placed on the rows of one day. */
export interface PlacedBlock {
  booking: Booking;
  segment: PlannedSegment;
  /** First row (0-based) the stay covers, and the row after its last. */
  rowStart: number;
  rowEnd: number;
  /** The stay began on an earlier day or before the first row. */
  continuesFromBefore: boolean;
  /** The stay runs on past the last row (to another day). */
  continuesAfter: boolean;
}

/**
 * Every stay of the given bookings that falls on `date`, as rows of the window; a stay running
 * over the evening shows on each day up to the window's edge. Cancelled and expired bookings
 * are left out.
 */
export function placeSegments(
  bookings: readonly Booking[],
  date: string,
  timeZone: string,
  window: BoardWindow,
): PlacedBlock[] {
  const placed: PlacedBlock[] = [];
  for (const booking of bookings) {
    if (!shownOnBoard(booking.state)) continue;
    for (const segment of booking.segments) {
      const from = minutesOnDate(segment.startUtc, date, timeZone);
      const to = minutesOnDate(segment.endUtc, date, timeZone);
      const clippedFrom = Math.max(from, window.startMinute);
      const clippedTo = Math.min(to, window.endMinute);
      if (clippedTo <= clippedFrom) continue;
      const rowStart = Math.floor((clippedFrom - window.startMinute) / ROW_MINUTES);
      const rowEnd = Math.ceil((clippedTo - window.startMinute) / ROW_MINUTES);
      placed.push({
        booking,
        segment,
        rowStart,
        rowEnd: Math.max(rowEnd, rowStart + 1),
        continuesFromBefore: from < window.startMinute,
        continuesAfter: to > window.endMinute && to !== MINUTES_PER_DAY,
      });
    }
  }
  return placed.sort((a, b) => a.rowStart - b.rowStart);
}

/**
 * The board's columns: active bays by position, then any switched-off bay that still has a
 * stay on the day (so no booking is hidden).
 */
export function boardBays(bays: readonly Bay[], blocks: readonly PlacedBlock[]): Bay[] {
  const used = new Set(blocks.map((block) => block.segment.bayId));
  return [...bays]
    .filter((bay) => bay.active || used.has(bay.id))
    .sort((a, b) => Number(b.active) - Number(a.active) || a.position - b.position);
}

/** One booking in the week view: its first stay of the day, and the bays it uses that day. */
export interface DayEntry {
  booking: Booking;
  /** The instant its first stay of that day starts (or the day's start, carried over). */
  firstStartUtc: string;
  startsThatDay: boolean;
  bayNames: string[];
}

/** The bookings with a stay on a local date, by the time their first stay that day starts. */
export function bookingsOnDay(
  bookings: readonly Booking[],
  date: string,
  timeZone: string,
): DayEntry[] {
  const entries: DayEntry[] = [];
  for (const booking of bookings) {
    if (!shownOnBoard(booking.state)) continue;
    const stays = booking.segments.filter((segment) => {
      const from = minutesOnDate(segment.startUtc, date, timeZone);
      const to = minutesOnDate(segment.endUtc, date, timeZone);
      return to > 0 && from < MINUTES_PER_DAY;
    });
    if (stays.length === 0) continue;
    const sorted = [...stays].sort((a, b) => a.startUtc.localeCompare(b.startUtc));
    const bayNames = [...new Set(sorted.map((segment) => segment.bayName))];
    entries.push({
      booking,
      firstStartUtc: sorted[0].startUtc,
      startsThatDay: minutesOnDate(sorted[0].startUtc, date, timeZone) >= 0,
      bayNames,
    });
  }
  // Carried over from an earlier day sorts first: its stay began before any of the day's.
  return entries.sort((a, b) => a.firstStartUtc.localeCompare(b.firstStartUtc));
}

import { DateTime } from 'luxon';
import type {
  Bay,
  Booking,
  BookingState,
  OpeningHoursEntry,
  BookingSegment,
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

/**
 * The board's vertical scale. Every vertical position on the board (row lines, shaded break and
 * closed time, blocks) comes from minutes after the first row's start through this one scale,
 * so a block starting at 13:15 sits exactly a quarter of the way past the 13:00 line.
 */
export interface BoardScale {
  /** Height of one row of `ROW_MINUTES` minutes. */
  rowHeightPx: number;
}

/** 30 minutes are 44 px: two lines of a block's text fit in half an hour. */
export const BOARD_SCALE: BoardScale = { rowHeightPx: 44 };

/**
 * Pixels below the first row's top of a time `minutes` after the first row's start. Rounded
 * to whole pixels the same way for every caller, so the bottom of one stay and the top of the
 * next, at the same minute, are the same pixel.
 */
export function minuteToPx(minutes: number, scale: BoardScale = BOARD_SCALE): number {
  return Math.round((minutes * scale.rowHeightPx) / ROW_MINUTES);
}

/** The body's height: every row of the window. */
export function boardHeightPx(window: BoardWindow, scale: BoardScale = BOARD_SCALE): number {
  return minuteToPx(window.endMinute - window.startMinute, scale);
}

/** One row line: its clock time, where it is drawn, and whether it is on the hour. */
export interface RowLine {
  minute: number;
  topPx: number;
  onTheHour: boolean;
}

export function rowLines(window: BoardWindow, scale: BoardScale = BOARD_SCALE): RowLine[] {
  return Array.from({ length: window.rows }, (_, index) => {
    const minute = window.startMinute + index * ROW_MINUTES;
    return {
      minute,
      topPx: minuteToPx(minute - window.startMinute, scale),
      onTheHour: minute % 60 === 0,
    };
  });
}

/** Time of a day the workshop does not work: the break, or before opening and after closing. */
export interface DayBand {
  kind: 'break' | 'closed';
  /** Minutes after local midnight. */
  fromMinute: number;
  toMinute: number;
  topPx: number;
  heightPx: number;
}

/**
 * The shaded stretches of one day on the board, to the minute (not rounded to rows): before
 * opening, the break and after closing. A day without hours is closed from edge to edge.
 */
export function dayBands(
  window: BoardWindow,
  hours: OpeningHoursEntry | null,
  scale: BoardScale = BOARD_SCALE,
): DayBand[] {
  const opens = hours?.open ? clockMinutes(hours.opensAt) : null;
  const closes = hours?.open ? clockMinutes(hours.closesAt) : null;
  const breakStarts = clockMinutes(hours?.breakStartsAt);
  const breakEnds = clockMinutes(hours?.breakEndsAt);
  const stretches: Array<Pick<DayBand, 'kind' | 'fromMinute' | 'toMinute'>> = [];
  if (opens === null || closes === null || closes <= opens) {
    stretches.push({ kind: 'closed', fromMinute: window.startMinute, toMinute: window.endMinute });
  } else {
    stretches.push({ kind: 'closed', fromMinute: window.startMinute, toMinute: opens });
    if (breakStarts !== null && breakEnds !== null && breakEnds > breakStarts) {
      stretches.push({
        kind: 'break',
        fromMinute: Math.max(breakStarts, opens),
        toMinute: Math.min(breakEnds, closes),
      });
    }
    stretches.push({ kind: 'closed', fromMinute: closes, toMinute: window.endMinute });
  }
  return stretches
    .map((stretch) => ({
      ...stretch,
      fromMinute: Math.max(stretch.fromMinute, window.startMinute),
      toMinute: Math.min(stretch.toMinute, window.endMinute),
    }))
    .filter((stretch) => stretch.toMinute > stretch.fromMinute)
    .map((stretch) => {
      const topPx = minuteToPx(stretch.fromMinute - window.startMinute, scale);
      return {
        ...stretch,
        topPx,
        heightPx: minuteToPx(stretch.toMinute - window.startMinute, scale) - topPx,
      };
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

/** One stay of a booking in one bay, placed on the window of one day. */
export interface PlacedBlock {
  booking: Booking;
  segment: BookingSegment;
  /** Minutes after the first row's start where the stay begins and ends, cut to the window. */
  fromMinute: number;
  toMinute: number;
  /** The stay began on an earlier day or before the first row. */
  continuesFromBefore: boolean;
  /** The stay runs on past the last row (to another day). */
  continuesAfter: boolean;
}

/**
 * Every stay of the given bookings that falls on `date`, in minutes of the window; a stay
 * running over the evening shows on each day up to the window's edge. Cancelled and expired
 * bookings are left out. Sorted by start.
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
      placed.push({
        booking,
        segment,
        fromMinute: clippedFrom - window.startMinute,
        toMinute: clippedTo - window.startMinute,
        continuesFromBefore: from < window.startMinute,
        continuesAfter: to > window.endMinute && to !== MINUTES_PER_DAY,
      });
    }
  }
  return placed.sort(
    (a, b) => a.fromMinute - b.fromMinute || a.segment.bayId.localeCompare(b.segment.bayId),
  );
}

/** How blocks are drawn: the gap around each, its least readable height, its text lines. */
export interface BlockMetrics {
  /** Space kept between a block and the lines (and blocks) above and below it. */
  gapPx: number;
  /** The least height a block is drawn at, when there is room below it. */
  minHeightPx: number;
  /** Borders and padding of a block, top and bottom together. */
  chromePx: number;
  /** One line of a block's text. */
  lineHeightPx: number;
}

/**
 * A block's border is 2 px and its padding 2 px (top and bottom: 8 px); its text is 12 px on
 * 15 px lines, so 38 px holds two lines: the customer and the vehicle.
 */
export const BLOCK_METRICS: BlockMetrics = {
  gapPx: 1,
  minHeightPx: 38,
  chromePx: 8,
  lineHeightPx: 15,
};

/** Where one block is drawn in its bay's column. */
export interface BlockBox {
  /** From the first row's top. */
  topPx: number;
  heightPx: number;
  /** Whole lines of text that fit (at least 1: a block that small shows the customer only). */
  lines: number;
}

export interface LaidOutBlock extends PlacedBlock {
  box: BlockBox;
}

/**
 * Pixel boxes for the blocks of one day. The top and bottom of a stay are its start and end on
 * the board's scale (the same as the row lines), inset by the gap, so two stays that meet at a
 * minute in one bay leave a gap of twice the gap between them and never overlap. A stay too
 * short to read is drawn taller, up to the least readable height, but only into free time
 * below it: never over the next stay in its bay nor past the board's end.
 */
export function layoutBlocks(
  blocks: readonly PlacedBlock[],
  window: BoardWindow,
  scale: BoardScale = BOARD_SCALE,
  metrics: BlockMetrics = BLOCK_METRICS,
): LaidOutBlock[] {
  const bottomPx = boardHeightPx(window, scale);
  const byBay = new Map<string, PlacedBlock[]>();
  for (const block of blocks) {
    const column = byBay.get(block.segment.bayId) ?? [];
    column.push(block);
    byBay.set(block.segment.bayId, column);
  }
  const laidOut: LaidOutBlock[] = [];
  for (const column of byBay.values()) {
    const sorted = [...column].sort((a, b) => a.fromMinute - b.fromMinute);
    sorted.forEach((block, index) => {
      const startPx = minuteToPx(block.fromMinute, scale);
      const endPx = minuteToPx(block.toMinute, scale);
      // The next stay in this bay (sorted by start): the short block may grow only up to it.
      const next = sorted[index + 1];
      const roomEndPx = next ? minuteToPx(next.fromMinute, scale) : bottomPx;
      const topPx = startPx + metrics.gapPx;
      const trueHeightPx = Math.max(1, endPx - startPx - 2 * metrics.gapPx);
      const roomPx = roomEndPx - startPx - 2 * metrics.gapPx;
      const heightPx = Math.max(trueHeightPx, Math.min(metrics.minHeightPx, roomPx));
      const lines = Math.max(1, Math.floor((heightPx - metrics.chromePx) / metrics.lineHeightPx));
      laidOut.push({ ...block, box: { topPx, heightPx, lines } });
    });
  }
  return laidOut.sort((a, b) => a.fromMinute - b.fromMinute);
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

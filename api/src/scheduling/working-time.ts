/**
 * The workshop's working time as instants: for each local date, whether it is open and its
 * working windows, [opensAt, breakStartsAt) and [breakEndsAt, closesAt) (one window without a
 * break), turned into UTC instants by luxon in the workshop's zone on that date, so a
 * daylight-saving day gets the right instants. Working time is elapsed time: an hour of work is
 * 3,600,000 ms whatever the wall clock does.
 */
import { DateTime } from 'luxon';
import { addDays, clockMinutes, isClockTime, isoWeekday } from './local-date';
import type { DayHours, IsoWeekday, WorkshopCalendar } from './scheduling.types';

const MILLISECONDS_PER_MINUTE = 60_000;
/** Consecutive closed days after which the timeline stops looking for the next open day. */
const MAX_CLOSED_RUN_DAYS = 366;

const WEEKDAY_PLURALS: Record<IsoWeekday, string> = {
  1: 'Mondays',
  2: 'Tuesdays',
  3: 'Wednesdays',
  4: 'Thursdays',
  5: 'Fridays',
  6: 'Saturdays',
  7: 'Sundays',
};

/** A problem with a day's hours, keyed by the field (as a form or DTO names it). */
export interface DayHoursIssue {
  field: keyof DayHours;
  message: string;
}

/**
 * What is wrong with a day's hours, or nothing: times as HH:mm, the break both set or both
 * empty, and opensAt < breakStartsAt < breakEndsAt < closesAt.
 */
export function dayHoursIssues(hours: DayHours): DayHoursIssue[] {
  const issues: DayHoursIssue[] = [];
  const fields = ['opensAt', 'closesAt', 'breakStartsAt', 'breakEndsAt'] as const;
  for (const field of fields) {
    const value = hours[field];
    if (value !== null && !isClockTime(value)) {
      issues.push({ field, message: 'Enter a time as HH:mm (00:00 to 23:59).' });
    }
  }
  if (hours.opensAt === null) issues.push({ field: 'opensAt', message: 'Enter the opening time.' });
  if (hours.closesAt === null) {
    issues.push({ field: 'closesAt', message: 'Enter the closing time.' });
  }
  if ((hours.breakStartsAt === null) !== (hours.breakEndsAt === null)) {
    const field = hours.breakStartsAt === null ? 'breakStartsAt' : 'breakEndsAt';
    issues.push({ field, message: 'Give both ends of the break, or neither.' });
  }
  if (issues.length > 0) return issues;

  const opens = clockMinutes(hours.opensAt);
  const closes = clockMinutes(hours.closesAt);
  if (closes <= opens) {
    issues.push({ field: 'closesAt', message: 'Closing time must be after the opening time.' });
    return issues;
  }
  if (hours.breakStartsAt !== null && hours.breakEndsAt !== null) {
    const breakStarts = clockMinutes(hours.breakStartsAt);
    const breakEnds = clockMinutes(hours.breakEndsAt);
    if (breakStarts <= opens || breakStarts >= closes) {
      issues.push({
        field: 'breakStartsAt',
        message: 'The break must start after opening and before closing.',
      });
    } else if (breakEnds <= breakStarts || breakEnds >= closes) {
      issues.push({
        field: 'breakEndsAt',
        message: 'The break must end after it starts and before closing.',
      });
    }
  }
  return issues;
}

/** One stretch of working time: [startMs, endMs), with its place in the calendar. */
export interface WorkingWindow {
  startMs: number;
  endMs: number;
  date: string;
  /** Open days since the timeline's first date (the first open day is 0). */
  openDay: number;
  /** Wall-clock minutes of the local day the window runs between. */
  startClockMinutes: number;
  endClockMinutes: number;
}

/** A local date of the calendar: shut (with the reason) or open with its windows. */
export interface WorkingDay {
  date: string;
  closedReason: string | null;
  hours: DayHours | null;
  /** Index in the timeline's windows of the day's first window (meaningless when closed). */
  firstWindow: number;
  windowCount: number;
}

/** Throws a RangeError for a calendar the engine cannot work with. */
export function assertUsableCalendar(calendar: WorkshopCalendar): void {
  if (!DateTime.now().setZone(calendar.timeZone).isValid) {
    throw new RangeError(`calendar.timeZone: unknown time zone '${calendar.timeZone}'`);
  }
  if (!Number.isInteger(calendar.slotStepMinutes) || calendar.slotStepMinutes <= 0) {
    throw new RangeError(
      `calendar.slotStepMinutes must be a whole number > 0, got ${calendar.slotStepMinutes}`,
    );
  }
  for (const weekday of [1, 2, 3, 4, 5, 6, 7] as const) {
    const hours = calendar.weeklyHours[weekday];
    if (hours === undefined) {
      throw new RangeError(`calendar.weeklyHours[${weekday}] is missing (null means closed)`);
    }
    const issue = hours === null ? undefined : dayHoursIssues(hours)[0];
    if (issue) {
      throw new RangeError(`calendar.weeklyHours[${weekday}].${issue.field}: ${issue.message}`);
    }
  }
}

/**
 * The working windows of a calendar from a first date on, built a day at a time as they are
 * asked for and kept in one array, so a job's working time is a walk along it.
 */
export class WorkingTimeline {
  readonly windows: WorkingWindow[] = [];
  private readonly days: WorkingDay[] = [];
  private readonly dayIndex = new Map<string, number>();
  private nextDate: string;
  private openDays = 0;
  private closedRun = 0;

  constructor(
    private readonly calendar: WorkshopCalendar,
    readonly firstDate: string,
  ) {
    this.nextDate = firstDate;
  }

  /** The working day of a local date on or after the first date. */
  day(date: string): WorkingDay {
    if (date < this.firstDate) {
      throw new RangeError(`${date} is before the timeline's first date ${this.firstDate}`);
    }
    let index = this.dayIndex.get(date);
    while (index === undefined) {
      this.addDay();
      index = this.dayIndex.get(date);
    }
    return this.days[index];
  }

  /**
   * The window at an index, building days until it exists; null when there is none within reach
   * (a run of MAX_CLOSED_RUN_DAYS closed days).
   */
  window(index: number): WorkingWindow | null {
    while (index >= this.windows.length) {
      if (this.closedRun >= MAX_CLOSED_RUN_DAYS) return null;
      this.addDay();
    }
    return this.windows[index];
  }

  private addDay(): void {
    const date = this.nextDate;
    this.nextDate = addDays(date, 1);
    const weekday = isoWeekday(date);
    const hours = this.calendar.weeklyHours[weekday];
    const closedReason =
      this.calendar.closedDates.get(date) ??
      (hours === null ? `Closed on ${WEEKDAY_PLURALS[weekday]}` : null);
    const day: WorkingDay = {
      date,
      closedReason,
      hours: closedReason === null ? hours : null,
      firstWindow: this.windows.length,
      windowCount: 0,
    };
    if (day.hours !== null) {
      for (const [from, to] of clockRanges(day.hours)) {
        const startMs = instantOf(date, from, this.calendar.timeZone);
        const endMs = instantOf(date, to, this.calendar.timeZone);
        // A window inside a daylight-saving gap has no time at all.
        if (endMs <= startMs) continue;
        this.windows.push({
          startMs,
          endMs,
          date,
          openDay: this.openDays,
          startClockMinutes: from,
          endClockMinutes: to,
        });
        day.windowCount += 1;
      }
    }
    if (day.windowCount > 0) {
      this.openDays += 1;
      this.closedRun = 0;
    } else {
      this.closedRun += 1;
    }
    this.dayIndex.set(date, this.days.length);
    this.days.push(day);
  }

  /**
   * Candidate starts of an open day: opensAt + k × slotStepMinutes on the local clock, inside a
   * working window, as [instant, window index] pairs in time order. A clock time the
   * daylight-saving change skips is not offered; one it repeats is offered once (luxon's
   * earlier instant).
   */
  slotsOf(day: WorkingDay): Array<[number, number]> {
    const slots: Array<[number, number]> = [];
    if (day.hours === null) return slots;
    const step = this.calendar.slotStepMinutes;
    const opens = clockMinutes(day.hours.opensAt);
    for (let index = day.firstWindow; index < day.firstWindow + day.windowCount; index += 1) {
      const window = this.windows[index];
      const first = opens + Math.ceil((window.startClockMinutes - opens) / step) * step;
      const steady =
        window.endMs - window.startMs ===
        (window.endClockMinutes - window.startClockMinutes) * MILLISECONDS_PER_MINUTE;
      for (let clock = first; clock < window.endClockMinutes; clock += step) {
        if (steady) {
          slots.push([
            window.startMs + (clock - window.startClockMinutes) * MILLISECONDS_PER_MINUTE,
            index,
          ]);
          continue;
        }
        // The offset changes inside this window: each clock time through luxon.
        const local = localDateTime(day.date, clock, this.calendar.timeZone);
        if (local.hour * 60 + local.minute !== clock) continue;
        const ms = local.toMillis();
        const last = slots[slots.length - 1];
        if (ms < window.startMs || ms >= window.endMs || (last && last[0] >= ms)) continue;
        slots.push([ms, index]);
      }
    }
    return slots;
  }
}

/** The clock-minute ranges of a day's hours: one, or two around the break. */
function clockRanges(hours: DayHours): Array<[number, number]> {
  const opens = clockMinutes(hours.opensAt);
  const closes = clockMinutes(hours.closesAt);
  if (hours.breakStartsAt === null || hours.breakEndsAt === null) return [[opens, closes]];
  return [
    [opens, clockMinutes(hours.breakStartsAt)],
    [clockMinutes(hours.breakEndsAt), closes],
  ];
}

function localDateTime(date: string, clock: number, timeZone: string): DateTime {
  const [year, month, day] = date.split('-').map(Number);
  return DateTime.fromObject(
    { year, month, day, hour: Math.floor(clock / 60), minute: clock % 60 },
    { zone: timeZone },
  );
}

/** The instant of a local clock time on a local date (luxon moves a skipped time forward). */
function instantOf(date: string, clock: number, timeZone: string): number {
  return localDateTime(date, clock, timeZone).toMillis();
}

/** The local date an instant falls on in the zone. */
export function localDateOfMs(ms: number, timeZone: string): string {
  return DateTime.fromMillis(ms, { zone: timeZone }).toISODate() as string;
}

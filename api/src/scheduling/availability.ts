/**
 * The start times a workshop can offer for a job plan, day by day.
 *
 * - Candidate starts: on each open day from max(fromDate, plan.earliestStartDate), at
 *   opensAt + k × slotStepMinutes on the local clock while inside a working window (not in the
 *   break, not at or after closing), and not before `notBeforeMs`.
 * - A segment consumes its minutes of working time from its start. It pauses over the break and
 *   closed time and resumes at the next working window, the next open day if need be (the vehicle
 *   stays in the bay). Its reservation runs from its start to the end of its last working minute.
 * - The next segment starts when the previous one ends; at a window's end, at the next window's
 *   start.
 * - Each segment takes the first bay of its kind (by position) that is free over its whole
 *   reservation. No free bay for some segment, or a job running past `maxJobDays` open days:
 *   that start is not offered.
 */
import { BayOccupancy } from './bay-occupancy';
import { addDays, assertIsoDate, laterDate } from './local-date';
import type {
  AvailabilityQuery,
  DayAvailability,
  PlannedSegment,
  StartOption,
} from './scheduling.types';
import { WorkingTimeline, assertUsableCalendar, localDateOfMs } from './working-time';

export type {
  AvailabilityQuery,
  BayRef,
  BusyInterval,
  DayAvailability,
  DayHours,
  PlannedSegment,
  StartOption,
  WorkshopCalendar,
} from './scheduling.types';

/** Open days a job may run over when the query does not say. */
export const DEFAULT_MAX_JOB_DAYS = 5;

const MILLISECONDS_PER_MINUTE = 60_000;

/** What a query needs once, whatever days are asked about. */
interface Engine {
  query: AvailabilityQuery;
  timeline: WorkingTimeline;
  occupancy: BayOccupancy;
  maxJobDays: number;
  firstBookableDate: string;
  lastDate: string;
}

function engineFor(query: AvailabilityQuery, timelineFrom: string): Engine {
  assertIsoDate(query.fromDate, 'fromDate');
  assertIsoDate(query.plan.earliestStartDate, 'plan.earliestStartDate');
  if (!Number.isInteger(query.days) || query.days < 0) {
    throw new RangeError(`days must be a whole number ≥ 0, got ${query.days}`);
  }
  const maxJobDays = query.maxJobDays ?? DEFAULT_MAX_JOB_DAYS;
  if (!Number.isInteger(maxJobDays) || maxJobDays < 1) {
    throw new RangeError(`maxJobDays must be a whole number ≥ 1, got ${maxJobDays}`);
  }
  query.plan.segments.forEach((segment, index) => {
    if (!Number.isInteger(segment.minutes) || segment.minutes <= 0) {
      throw new RangeError(`plan.segments[${index}].minutes must be a whole number > 0`);
    }
  });
  assertUsableCalendar(query.calendar);
  return {
    query,
    timeline: new WorkingTimeline(query.calendar, timelineFrom),
    occupancy: new BayOccupancy(query.bays, query.busy),
    maxJobDays,
    firstBookableDate: laterDate(query.fromDate, query.plan.earliestStartDate),
    lastDate: addDays(query.fromDate, query.days - 1),
  };
}

/**
 * The job placed from a start (an instant inside the timeline's window `windowIndex`), or null
 * when some segment finds no free bay or the job would need more than maxJobDays open days.
 */
function placeJob(engine: Engine, startMs: number, windowIndex: number): StartOption | null {
  const { timeline, occupancy, maxJobDays } = engine;
  const firstOpenDay = timeline.windows[windowIndex].openDay;
  const segments: PlannedSegment[] = [];
  let index = windowIndex;
  let cursor = startMs;
  for (const segment of engine.query.plan.segments) {
    let window = timeline.window(index);
    // A segment that would start at a window's end starts when the next window opens.
    while (window !== null && cursor >= window.endMs) {
      index += 1;
      window = timeline.window(index);
      if (window !== null) cursor = window.startMs;
    }
    if (window === null || window.openDay - firstOpenDay >= maxJobDays) return null;
    const segmentStartMs = cursor;
    let remainingMs = segment.minutes * MILLISECONDS_PER_MINUTE;
    for (;;) {
      const available = window.endMs - cursor;
      if (remainingMs <= available) {
        cursor += remainingMs;
        break;
      }
      remainingMs -= available;
      index += 1;
      window = timeline.window(index);
      if (window === null || window.openDay - firstOpenDay >= maxJobDays) return null;
      cursor = window.startMs;
    }
    const bay = occupancy.firstFreeBay(segment.bayKind, segmentStartMs, cursor);
    if (bay === null) return null;
    segments.push({
      bayId: bay.id,
      bayName: bay.name,
      bayKind: bay.kind,
      minutes: segment.minutes,
      startsAtMs: segmentStartMs,
      endsAtMs: cursor,
    });
  }
  if (segments.length === 0) return null;
  return { startsAtMs: segments[0].startsAtMs, endsAtMs: cursor, segments };
}

/** The offered starts of one date within the query's range (the date is on or after the first bookable one). */
function startsOn(engine: Engine, date: string): DayAvailability {
  const day = engine.timeline.day(date);
  if (day.closedReason !== null) return { date, closedReason: day.closedReason, starts: [] };
  const starts: StartOption[] = [];
  if (engine.query.plan.segments.length > 0) {
    for (const [startMs, windowIndex] of engine.timeline.slotsOf(day)) {
      if (startMs < engine.query.notBeforeMs) continue;
      const option = placeJob(engine, startMs, windowIndex);
      if (option !== null) starts.push(option);
    }
  }
  return { date, closedReason: null, starts };
}

/**
 * One entry per local date fromDate … fromDate + days − 1: why it is closed, or the starts the
 * workshop can offer. Dates before the plan's earliest start date have no starts and no
 * closed reason. An empty plan (no workshop time) has nothing to book: no starts.
 * Throws a RangeError for a malformed query (dates, zone, hours, step).
 */
export function findAvailability(query: AvailabilityQuery): DayAvailability[] {
  const engine = engineFor(query, laterDate(query.fromDate, query.plan.earliestStartDate));
  const answer: DayAvailability[] = [];
  for (let offset = 0; offset < query.days; offset += 1) {
    const date = addDays(query.fromDate, offset);
    answer.push(
      date < engine.firstBookableDate
        ? { date, closedReason: null, starts: [] }
        : startsOn(engine, date),
    );
  }
  return answer;
}

/**
 * The option findAvailability(query) offers for exactly this start, or null when it offers none
 * there: the start must fall on a date of the query's range (fromDate … fromDate + days − 1), on
 * or after the plan's earliest start date, on the slot grid, not before notBeforeMs, with a free
 * bay for every segment. Only that one day is worked out.
 */
export function startOptionAt(query: AvailabilityQuery, startsAtMs: number): StartOption | null {
  assertUsableCalendar(query.calendar);
  if (!Number.isFinite(startsAtMs)) return null;
  const date = localDateOfMs(startsAtMs, query.calendar.timeZone);
  const engine = engineFor(query, date);
  if (date < engine.firstBookableDate || date > engine.lastDate) return null;
  if (startsAtMs < query.notBeforeMs || query.plan.segments.length === 0) return null;
  const day = engine.timeline.day(date);
  if (day.closedReason !== null) return null;
  const slot = engine.timeline.slotsOf(day).find(([ms]) => ms === startsAtMs);
  return slot === undefined ? null : placeJob(engine, slot[0], slot[1]);
}

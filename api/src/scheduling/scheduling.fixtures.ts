/**
 * An invented workshop calendar, bays and busy loads for the scheduling specs and the benchmark.
 * The hours, bay names and bookings are made up; only the time zones are real (IANA names).
 */
import { DateTime } from 'luxon';
import type {
  AvailabilityQuery,
  BayKind,
  BayRef,
  BusyInterval,
  DayHours,
  IsoWeekday,
  JobPlan,
  WorkshopCalendar,
} from './scheduling.types';

export const WEEKDAY_HOURS: DayHours = {
  opensAt: '07:30',
  closesAt: '17:00',
  breakStartsAt: '12:00',
  breakEndsAt: '12:30',
};

export const SATURDAY_HOURS: DayHours = {
  opensAt: '08:00',
  closesAt: '12:00',
  breakStartsAt: null,
  breakEndsAt: null,
};

/** Monday to Friday 7:30–17:00 with a half-hour break at noon, Saturday 8:00–12:00, Sunday shut. */
export const DEMO_WEEKLY_HOURS: Record<IsoWeekday, DayHours | null> = {
  1: WEEKDAY_HOURS,
  2: WEEKDAY_HOURS,
  3: WEEKDAY_HOURS,
  4: WEEKDAY_HOURS,
  5: WEEKDAY_HOURS,
  6: SATURDAY_HOURS,
  7: null,
};

export function demoCalendar(overrides: Partial<WorkshopCalendar> = {}): WorkshopCalendar {
  return {
    timeZone: 'Australia/Sydney',
    weeklyHours: DEMO_WEEKLY_HOURS,
    closedDates: new Map(),
    slotStepMinutes: 30,
    ...overrides,
  };
}

/**
 * Three hoists, two alignment bays and a tyre bay. Neither the list order nor the ids sort like
 * the positions, so only `position` can put Hoist 1 first.
 */
export const DEMO_BAYS: BayRef[] = [
  { id: 'bay-hoist-back', name: 'Hoist 2', kind: 'hoist', position: 2 },
  { id: 'bay-hoist-front', name: 'Hoist 1', kind: 'hoist', position: 1 },
  { id: 'bay-hoist-side', name: 'Hoist 3', kind: 'hoist', position: 3 },
  { id: 'bay-align-north', name: 'Alignment 1', kind: 'alignment', position: 4 },
  { id: 'bay-align-east', name: 'Alignment 2', kind: 'alignment', position: 5 },
  { id: 'bay-tyre', name: 'Tyre bay', kind: 'tyre', position: 6 },
];

/** A job plan of the given segments, startable from `earliestStartDate`. */
export function planOf(segments: Array<[BayKind, number]>, earliestStartDate: string): JobPlan {
  return {
    segments: segments.map(([bayKind, minutes]) => ({
      bayKind,
      minutes,
      descriptions: [`${bayKind} work`],
    })),
    totalMinutes: segments.reduce((total, [, minutes]) => total + minutes, 0),
    longestLeadDays: 0,
    earliestStartDate,
  };
}

/** A small deterministic pseudo-random generator (mulberry32), so a load is the same every run. */
function seeded(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** `count` busy intervals of 15–240 minutes spread over the bays between two instants. */
export function busyLoad(
  bays: readonly BayRef[],
  fromMs: number,
  toMs: number,
  count: number,
  seed = 1,
): BusyInterval[] {
  const random = seeded(seed);
  const quarterHourMs = 15 * 60_000;
  return Array.from({ length: count }, () => {
    const bay = bays[Math.floor(random() * bays.length)];
    const startsAtMs =
      fromMs + Math.floor((random() * (toMs - fromMs)) / quarterHourMs) * quarterHourMs;
    const endsAtMs = startsAtMs + (1 + Math.floor(random() * 16)) * quarterHourMs;
    return { bayId: bay.id, startsAtMs, endsAtMs };
  });
}

/**
 * The benchmark case: 14 days from Monday 7 December 2026 in the demo calendar, six bays,
 * `busyCount` busy intervals over those days, a hoist-then-alignment job of 3 h 30 + 1 h.
 */
export function benchmarkQuery(busyCount = 1000): AvailabilityQuery {
  const calendar = demoCalendar();
  const fromDate = '2026-12-07';
  const fromMs = DateTime.fromISO(fromDate, { zone: calendar.timeZone }).toMillis();
  const toMs = DateTime.fromISO('2026-12-21', { zone: calendar.timeZone }).toMillis();
  return {
    calendar,
    plan: planOf(
      [
        ['hoist', 210],
        ['alignment', 60],
      ],
      fromDate,
    ),
    bays: DEMO_BAYS,
    busy: busyLoad(DEMO_BAYS, fromMs, toMs, busyCount),
    fromDate,
    days: 14,
    notBeforeMs: fromMs,
  };
}

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { findAvailability, startOptionAt } from './availability';
import { DEMO_BAYS, DEMO_WEEKLY_HOURS, demoCalendar } from './scheduling.fixtures';
import {
  type AvailabilityQuery,
  type BayKind,
  type BusyInterval,
  type IsoWeekday,
  type JobPlan,
  SEGMENT_ORDER,
} from './scheduling.types';

// Random bookings, jobs, slot steps and closures on the invented demo calendar, checked against a
// separate, plain model of the working time (below) rather than against the engine itself.

const RUNS = { numRuns: 150 };
const MINUTE = 60_000;
const DAY = 86_400_000;
// Source: IANA time zone database, Australia/Brisbane: AEST, UTC+10:00 all year (no daylight
// saving), so local clock time is UTC + 10 h and the model needs no zone library.
const TIME_ZONE = 'Australia/Brisbane';
const OFFSET_MS = 10 * 3_600_000;
const FROM_DATE = '2026-12-03';
const FROM_MS = Date.UTC(2026, 11, 3) - OFFSET_MS;

const clock = (time: string) => Number(time.slice(0, 2)) * 60 + Number(time.slice(3, 5));

/** The model: working windows of the local day starting at `dayStartMs`, as instants. */
function modelWindows(dayStartMs: number, closed: ReadonlySet<string>): Array<[number, number]> {
  const date = new Date(dayStartMs + OFFSET_MS).toISOString().slice(0, 10);
  const weekday = (((new Date(dayStartMs + OFFSET_MS).getUTCDay() + 6) % 7) + 1) as IsoWeekday;
  const hours = DEMO_WEEKLY_HOURS[weekday];
  if (hours === null || closed.has(date)) return [];
  const ranges: Array<[string, string]> =
    hours.breakStartsAt === null || hours.breakEndsAt === null
      ? [[hours.opensAt, hours.closesAt]]
      : [
          [hours.opensAt, hours.breakStartsAt],
          [hours.breakEndsAt, hours.closesAt],
        ];
  return ranges.map(([from, to]) => [
    dayStartMs + clock(from) * MINUTE,
    dayStartMs + clock(to) * MINUTE,
  ]);
}

/** Working milliseconds in [fromMs, toMs) by the model. */
function workingMs(fromMs: number, toMs: number, closed: ReadonlySet<string>): number {
  let total = 0;
  const firstDay = Math.floor((fromMs + OFFSET_MS) / DAY) * DAY - OFFSET_MS;
  for (let dayStart = firstDay; dayStart < toMs; dayStart += DAY) {
    for (const [start, end] of modelWindows(dayStart, closed)) {
      total += Math.max(0, Math.min(toMs, end) - Math.max(fromMs, start));
    }
  }
  return total;
}

const overlaps = (interval: BusyInterval, startMs: number, endMs: number) =>
  interval.startsAtMs < endMs && startMs < interval.endsAtMs;

const busyArb: fc.Arbitrary<BusyInterval[]> = fc.array(
  fc
    .record({
      bayId: fc.constantFrom(...DEMO_BAYS.map((bay) => bay.id)),
      startMinute: fc.integer({ min: 0, max: (6 * 24 * 60) / 5 }).map((n) => n * 5),
      lengthMinutes: fc.integer({ min: 1, max: 120 }).map((n) => n * 5),
    })
    .map(({ bayId, startMinute, lengthMinutes }) => ({
      bayId,
      startsAtMs: FROM_MS + startMinute * MINUTE,
      endsAtMs: FROM_MS + (startMinute + lengthMinutes) * MINUTE,
    })),
  { maxLength: 40 },
);

const planArb: fc.Arbitrary<JobPlan> = fc
  .subarray([...SEGMENT_ORDER], { minLength: 1 })
  .chain((kinds: BayKind[]) =>
    fc
      .tuple(...kinds.map(() => fc.integer({ min: 1, max: 240 }).map((n) => n * 5)))
      .map((minutes) => ({
        segments: kinds.map((bayKind, index) => ({
          bayKind,
          minutes: minutes[index],
          descriptions: [bayKind],
        })),
        totalMinutes: minutes.reduce((total, value) => total + value, 0),
        longestLeadDays: 0,
        earliestStartDate: FROM_DATE,
      })),
  );

const queryArb: fc.Arbitrary<AvailabilityQuery> = fc
  .record({
    plan: planArb,
    busy: busyArb,
    slotStepMinutes: fc.constantFrom(15, 20, 30, 45, 60),
    closedDates: fc.subarray(['2026-12-04', '2026-12-05', '2026-12-07', '2026-12-08']),
    notBeforeMinutes: fc.integer({ min: 0, max: 24 * 60 }),
    maxJobDays: fc.integer({ min: 1, max: 5 }),
  })
  .map((drawn) => ({
    calendar: demoCalendar({
      timeZone: TIME_ZONE,
      slotStepMinutes: drawn.slotStepMinutes,
      closedDates: new Map(drawn.closedDates.map((date) => [date, 'Closed: test'])),
    }),
    plan: drawn.plan,
    bays: DEMO_BAYS,
    busy: drawn.busy,
    fromDate: FROM_DATE,
    days: 3,
    notBeforeMs: FROM_MS + drawn.notBeforeMinutes * MINUTE,
    maxJobDays: drawn.maxJobDays,
  }));

describe('findAvailability properties', () => {
  it('never places a segment over a busy interval of its bay, and takes the first free bay', () => {
    fc.assert(
      fc.property(queryArb, (query) => {
        for (const day of findAvailability(query)) {
          for (const option of day.starts) {
            for (const segment of option.segments) {
              const clash = query.busy.find(
                (interval) =>
                  interval.bayId === segment.bayId &&
                  overlaps(interval, segment.startsAtMs, segment.endsAtMs),
              );
              expect(clash).toBeUndefined();
              const position = DEMO_BAYS.find((bay) => bay.id === segment.bayId)?.position ?? 0;
              for (const earlier of DEMO_BAYS.filter(
                (bay) => bay.kind === segment.bayKind && bay.position < position,
              )) {
                const taken = query.busy.some(
                  (interval) =>
                    interval.bayId === earlier.id &&
                    overlaps(interval, segment.startsAtMs, segment.endsAtMs),
                );
                expect(taken, `${earlier.name} was free`).toBe(true);
              }
            }
          }
        }
      }),
      RUNS,
    );
  });

  it('makes the segments of an option contiguous in working time, each its own minutes long', () => {
    fc.assert(
      fc.property(queryArb, (query) => {
        const closed = new Set(query.calendar.closedDates.keys());
        for (const day of findAvailability(query)) {
          for (const option of day.starts) {
            const { segments } = option;
            expect(segments.map((s) => [s.bayKind, s.minutes])).toEqual(
              query.plan.segments.map((s) => [s.bayKind, s.minutes]),
            );
            expect(option.startsAtMs).toBe(segments[0].startsAtMs);
            expect(option.endsAtMs).toBe(segments[segments.length - 1].endsAtMs);
            segments.forEach((segment, index) => {
              expect(workingMs(segment.startsAtMs, segment.endsAtMs, closed)).toBe(
                segment.minutes * MINUTE,
              );
              // It starts in working time and its last minute is a working minute.
              expect(workingMs(segment.startsAtMs, segment.startsAtMs + MINUTE, closed)).toBe(
                MINUTE,
              );
              expect(workingMs(segment.endsAtMs - MINUTE, segment.endsAtMs, closed)).toBe(MINUTE);
              const next = segments[index + 1];
              if (next) {
                expect(next.startsAtMs).toBeGreaterThanOrEqual(segment.endsAtMs);
                expect(workingMs(segment.endsAtMs, next.startsAtMs, closed)).toBe(0);
              }
            });
          }
        }
      }),
      RUNS,
    );
  });

  it('offers starts on the grid, not before now, within maxJobDays open days', () => {
    fc.assert(
      fc.property(queryArb, (query) => {
        const closed = new Set(query.calendar.closedDates.keys());
        const step = query.calendar.slotStepMinutes;
        for (const day of findAvailability(query)) {
          if (closed.has(day.date)) expect(day.starts).toEqual([]);
          for (const option of day.starts) {
            const local = new Date(option.startsAtMs + OFFSET_MS);
            expect(local.toISOString().slice(0, 10)).toBe(day.date);
            const weekday = (((local.getUTCDay() + 6) % 7) + 1) as IsoWeekday;
            const opens = clock(DEMO_WEEKLY_HOURS[weekday]?.opensAt ?? '');
            const minuteOfDay = local.getUTCHours() * 60 + local.getUTCMinutes();
            expect((minuteOfDay - opens) % step).toBe(0);
            expect(option.startsAtMs).toBeGreaterThanOrEqual(query.notBeforeMs);
            // Open days touched: count local days from start to end that have working time.
            let openDays = 0;
            const firstDay = Math.floor((option.startsAtMs + OFFSET_MS) / DAY) * DAY - OFFSET_MS;
            for (let dayStart = firstDay; dayStart < option.endsAtMs; dayStart += DAY) {
              if (modelWindows(dayStart, closed).length > 0) openDays += 1;
            }
            expect(openDays).toBeLessThanOrEqual(query.maxJobDays ?? 5);
          }
        }
      }),
      RUNS,
    );
  });

  it('answers startOptionAt with the offered option, and null off the offer', () => {
    fc.assert(
      fc.property(
        queryArb,
        fc.array(fc.integer({ min: 0, max: (3 * 24 * 60) / 15 }), { maxLength: 10 }),
        (query, probes) => {
          const offered = new Map(
            findAvailability(query)
              .flatMap((day) => day.starts)
              .map((option) => [option.startsAtMs, option]),
          );
          for (const option of offered.values()) {
            expect(startOptionAt(query, option.startsAtMs)).toEqual(option);
          }
          for (const probe of probes) {
            const startsAtMs = FROM_MS + probe * 15 * MINUTE;
            expect(startOptionAt(query, startsAtMs)).toEqual(offered.get(startsAtMs) ?? null);
          }
        },
      ),
      RUNS,
    );
  });

  it('offers every grid start of the open days when nothing is busy and jobs are short', () => {
    fc.assert(
      fc.property(queryArb, (drawn) => {
        const query: AvailabilityQuery = {
          ...drawn,
          busy: [],
          notBeforeMs: FROM_MS,
          plan: { ...drawn.plan, segments: drawn.plan.segments.slice(0, 1) },
          maxJobDays: 5,
        };
        query.plan.segments = [{ ...query.plan.segments[0], minutes: 5 }];
        const closed = new Set(query.calendar.closedDates.keys());
        const step = query.calendar.slotStepMinutes;
        findAvailability(query).forEach((day, index) => {
          const dayStart = FROM_MS + index * DAY;
          const expected: number[] = [];
          const windows = modelWindows(dayStart, closed);
          if (windows.length > 0) {
            for (
              let start = windows[0][0];
              start < windows[windows.length - 1][1];
              start += step * MINUTE
            ) {
              if (windows.some(([from, to]) => start >= from && start < to)) expected.push(start);
            }
          }
          expect(day.starts.map((option) => option.startsAtMs)).toEqual(expected);
        });
      }),
      { numRuns: 40 },
    );
  });
});

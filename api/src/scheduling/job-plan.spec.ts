import { describe, expect, it } from 'vitest';
import { planJob } from './job-plan';
import type { JobPlanInput, JobWorkItem } from './scheduling.types';

// The plan rules are the product's own (docs/scheduling.md, "Job plans"); the work lines and
// minutes below are invented. The calendar arithmetic is checked against the Gregorian
// calendar (days per month, leap years).

function input(work: JobWorkItem[], overrides: Partial<JobPlanInput> = {}): JobPlanInput {
  return { work, parts: [], leadTimeBufferDays: 0, todayLocalDate: '2026-12-02', ...overrides };
}

describe('planJob', () => {
  it('puts hoist work before alignment work, one segment per kind, minutes summed', () => {
    const plan = planJob(
      input([
        { bayKind: 'alignment', minutes: 60, description: 'Wheel alignment' },
        { bayKind: 'hoist', minutes: 180, description: 'Fit lift kit' },
        { bayKind: 'hoist', minutes: 30, description: 'Fit steering damper' },
      ]),
    );
    expect(plan.segments).toEqual([
      { bayKind: 'hoist', minutes: 210, descriptions: ['Fit lift kit', 'Fit steering damper'] },
      { bayKind: 'alignment', minutes: 60, descriptions: ['Wheel alignment'] },
    ]);
    expect(plan.totalMinutes).toBe(270);
  });

  it('joins tyre-bay work to the hoist segment when there is hoist work (wheels go on while it is up)', () => {
    const plan = planJob(
      input([
        { bayKind: 'tyre', minutes: 60, description: 'Fitting and balancing, 4 wheels' },
        { bayKind: 'hoist', minutes: 150, description: 'Fit coil springs' },
        { bayKind: 'alignment', minutes: 45, description: 'Wheel alignment' },
        { bayKind: 'tyre', minutes: 10, description: 'Valve stems' },
      ]),
    );
    expect(plan.segments).toEqual([
      {
        bayKind: 'hoist',
        minutes: 220,
        // Line order, not kind order.
        descriptions: ['Fitting and balancing, 4 wheels', 'Fit coil springs', 'Valve stems'],
      },
      { bayKind: 'alignment', minutes: 45, descriptions: ['Wheel alignment'] },
    ]);
  });

  it('keeps a tyre-only job in the tyre bay, before any alignment', () => {
    expect(
      planJob(input([{ bayKind: 'tyre', minutes: 60, description: 'Fit four tyres' }])).segments,
    ).toEqual([{ bayKind: 'tyre', minutes: 60, descriptions: ['Fit four tyres'] }]);
    expect(
      planJob(
        input([
          { bayKind: 'alignment', minutes: 45, description: 'Wheel alignment' },
          { bayKind: 'tyre', minutes: 60, description: 'Fit four tyres' },
        ]),
      ).segments.map((segment) => segment.bayKind),
    ).toEqual(['tyre', 'alignment']);
  });

  it('joins work with no bay kind to the first segment; alone it makes a hoist segment', () => {
    expect(
      planJob(
        input([
          { bayKind: 'alignment', minutes: 45, description: 'Wheel alignment' },
          { bayKind: null, minutes: 20, description: 'Road test' },
          { bayKind: 'tyre', minutes: 60, description: 'Fit four tyres' },
        ]),
      ).segments,
    ).toEqual([
      { bayKind: 'tyre', minutes: 80, descriptions: ['Road test', 'Fit four tyres'] },
      { bayKind: 'alignment', minutes: 45, descriptions: ['Wheel alignment'] },
    ]);
    expect(
      planJob(input([{ bayKind: null, minutes: 30, description: 'Pre-trip inspection' }])).segments,
    ).toEqual([{ bayKind: 'hoist', minutes: 30, descriptions: ['Pre-trip inspection'] }]);
  });

  it('drops work with zero minutes', () => {
    const plan = planJob(
      input([
        { bayKind: 'hoist', minutes: 0, description: 'Quoted separately' },
        { bayKind: 'alignment', minutes: 45, description: 'Wheel alignment' },
        { bayKind: null, minutes: 0, description: 'Paperwork' },
      ]),
    );
    expect(plan.segments).toEqual([
      { bayKind: 'alignment', minutes: 45, descriptions: ['Wheel alignment'] },
    ]);
    // Zero-minute hoist work does not pull tyre work into a hoist segment either.
    expect(
      planJob(
        input([
          { bayKind: 'hoist', minutes: 0, description: 'Quoted separately' },
          { bayKind: 'tyre', minutes: 60, description: 'Fit four tyres' },
        ]),
      ).segments.map((segment) => segment.bayKind),
    ).toEqual(['tyre']);
  });

  it('has an empty plan when there is no workshop time', () => {
    expect(planJob(input([]))).toEqual({
      segments: [],
      totalMinutes: 0,
      longestLeadDays: 0,
      earliestStartDate: '2026-12-02',
    });
    expect(planJob(input([{ bayKind: 'hoist', minutes: 0, description: 'x' }])).segments).toEqual(
      [],
    );
  });

  it('starts no earlier than today + the longest special-order lead time + the buffer', () => {
    const plan = planJob(
      input([{ bayKind: 'hoist', minutes: 60, description: 'Fit lift kit' }], {
        leadTimeBufferDays: 1,
        parts: [
          { description: 'Lift kit', specialOrder: true, leadDays: 7 },
          { description: 'Wheels', specialOrder: true, leadDays: 10 },
          // On the shelf: its lead time does not count.
          { description: 'Tyres', specialOrder: false, leadDays: 21 },
        ],
      }),
    );
    expect(plan.longestLeadDays).toBe(10);
    // Source: Gregorian calendar, December has 31 days: 2 December + 11 days = 13 December.
    expect(plan.earliestStartDate).toBe('2026-12-13');

    const stockOnly = planJob(
      input([{ bayKind: 'hoist', minutes: 60, description: 'Fit lift kit' }], {
        todayLocalDate: '2026-12-31',
        leadTimeBufferDays: 1,
        parts: [{ description: 'Tyres', specialOrder: false, leadDays: 21 }],
      }),
    );
    expect(stockOnly.longestLeadDays).toBe(0);
    // Source: Gregorian calendar: the day after 31 December 2026 is 1 January 2027.
    expect(stockOnly.earliestStartDate).toBe('2027-01-01');

    // Source: Gregorian calendar, 2028 is a leap year: 27 February + 2 days = 29 February.
    expect(
      planJob(
        input([], {
          todayLocalDate: '2028-02-27',
          parts: [{ description: 'Shocks', specialOrder: true, leadDays: 2 }],
        }),
      ).earliestStartDate,
    ).toBe('2028-02-29');
  });

  it('refuses malformed input, naming the field', () => {
    expect(() => planJob(input([], { todayLocalDate: '2026-02-30' }))).toThrow(/todayLocalDate/);
    expect(() => planJob(input([{ bayKind: 'hoist', minutes: -5, description: 'x' }]))).toThrow(
      /work\[0\]\.minutes/,
    );
    expect(() => planJob(input([{ bayKind: 'hoist', minutes: 12.5, description: 'x' }]))).toThrow(
      RangeError,
    );
    expect(() =>
      planJob(input([], { parts: [{ description: 'Kit', specialOrder: true, leadDays: -1 }] })),
    ).toThrow(/parts\[0\]\.leadDays/);
    expect(() => planJob(input([], { leadTimeBufferDays: -1 }))).toThrow(/leadTimeBufferDays/);
  });
});

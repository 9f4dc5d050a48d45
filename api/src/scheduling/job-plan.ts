/**
 * The job plan of a quote: which bays the vehicle stays in, in what order and for how long, and
 * the first day the work can start (when the special-order parts are in).
 *
 * - Work with 0 minutes is dropped.
 * - One segment per bay kind, in the order hoist → tyre → alignment, minutes summed and the
 *   descriptions kept in line order.
 * - When there is hoist work, tyre-bay work joins the hoist segment: the wheels go on while the
 *   vehicle is up.
 * - Work with no bay kind joins the first segment; alone it makes a hoist segment.
 * - Earliest start: today + the longest special-order lead time (stock parts count 0) + the
 *   workshop's buffer, in calendar days.
 */
import { addDays, assertIsoDate } from './local-date';
import {
  type BayKind,
  type JobPlan,
  type JobPlanInput,
  type JobSegment,
  SEGMENT_ORDER,
} from './scheduling.types';

export type { JobPlan, JobPlanInput, JobSegment } from './scheduling.types';

function assertWholeNonNegative(value: number, field: string): void {
  if (!Number.isInteger(value) || value < 0) {
    throw new RangeError(`${field} must be a whole number ≥ 0, got ${value}`);
  }
}

function isBayKind(value: unknown): value is BayKind {
  return SEGMENT_ORDER.includes(value as BayKind);
}

/** The job plan of the work and parts; RangeError (naming the field) for malformed input. */
export function planJob(input: JobPlanInput): JobPlan {
  assertIsoDate(input.todayLocalDate, 'todayLocalDate');
  assertWholeNonNegative(input.leadTimeBufferDays, 'leadTimeBufferDays');
  input.work.forEach((item, index) => {
    assertWholeNonNegative(item.minutes, `work[${index}].minutes`);
    if (item.bayKind !== null && !isBayKind(item.bayKind)) {
      throw new RangeError(`work[${index}].bayKind is not a bay kind: '${String(item.bayKind)}'`);
    }
  });
  input.parts.forEach((part, index) =>
    assertWholeNonNegative(part.leadDays, `parts[${index}].leadDays`),
  );

  const work = input.work.filter((item) => item.minutes > 0);
  const hasHoist = work.some((item) => item.bayKind === 'hoist');
  const segmentKindOf = (kind: BayKind): BayKind => (kind === 'tyre' && hasHoist ? 'hoist' : kind);
  const segmentKinds = SEGMENT_ORDER.filter((kind) =>
    work.some((item) => item.bayKind !== null && segmentKindOf(item.bayKind) === kind),
  );
  if (segmentKinds.length === 0 && work.length > 0) segmentKinds.push('hoist');

  const segments = new Map<BayKind, JobSegment>(
    segmentKinds.map((kind) => [kind, { bayKind: kind, minutes: 0, descriptions: [] }]),
  );
  for (const item of work) {
    const kind = item.bayKind === null ? segmentKinds[0] : segmentKindOf(item.bayKind);
    const segment = segments.get(kind) as JobSegment;
    segment.minutes += item.minutes;
    segment.descriptions.push(item.description);
  }

  const longestLeadDays = input.parts.reduce(
    (longest, part) => (part.specialOrder ? Math.max(longest, part.leadDays) : longest),
    0,
  );
  const planned = [...segments.values()];
  return {
    segments: planned,
    totalMinutes: planned.reduce((total, segment) => total + segment.minutes, 0),
    longestLeadDays,
    earliestStartDate: addDays(input.todayLocalDate, longestLeadDays + input.leadTimeBufferDays),
  };
}

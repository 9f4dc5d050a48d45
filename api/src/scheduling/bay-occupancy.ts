/**
 * Which bays are taken when. Built once per query: each bay's busy intervals are sorted and
 * merged into disjoint runs, so "is this bay free over [start, end)?" is one binary search.
 */
import type { BayKind, BayRef, BusyInterval } from './scheduling.types';

interface BayRuns {
  /** Start and end of each disjoint busy run, in time order (ends are in order too). */
  starts: Float64Array;
  ends: Float64Array;
}

const NO_RUNS: BayRuns = { starts: new Float64Array(0), ends: new Float64Array(0) };

/** Sorts and merges intervals; touching ones merge ([a, b) and [b, c) make [a, c)). */
function mergeRuns(intervals: BusyInterval[]): BayRuns {
  const sorted = intervals
    .filter((interval) => interval.endsAtMs > interval.startsAtMs)
    .sort((a, b) => a.startsAtMs - b.startsAtMs);
  const starts: number[] = [];
  const ends: number[] = [];
  for (const interval of sorted) {
    const last = ends.length - 1;
    if (last >= 0 && interval.startsAtMs <= ends[last]) {
      ends[last] = Math.max(ends[last], interval.endsAtMs);
    } else {
      starts.push(interval.startsAtMs);
      ends.push(interval.endsAtMs);
    }
  }
  return { starts: Float64Array.from(starts), ends: Float64Array.from(ends) };
}

export class BayOccupancy {
  private readonly runs = new Map<string, BayRuns>();
  private readonly baysByKind = new Map<BayKind, BayRef[]>();

  constructor(bays: readonly BayRef[], busy: readonly BusyInterval[]) {
    const ordered = [...bays].sort(
      (a, b) => a.position - b.position || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0),
    );
    for (const bay of ordered) {
      const ofKind = this.baysByKind.get(bay.kind) ?? [];
      ofKind.push(bay);
      this.baysByKind.set(bay.kind, ofKind);
    }
    const byBay = new Map<string, BusyInterval[]>(bays.map((bay) => [bay.id, []]));
    busy.forEach((interval, index) => {
      if (!Number.isFinite(interval.startsAtMs) || !Number.isFinite(interval.endsAtMs)) {
        throw new RangeError(`busy[${index}] must have finite startsAtMs and endsAtMs`);
      }
      // Intervals of bays not asked about (inactive, removed) cannot block anything.
      byBay.get(interval.bayId)?.push(interval);
    });
    for (const [bayId, intervals] of byBay) this.runs.set(bayId, mergeRuns(intervals));
  }

  /** True when no busy interval of the bay overlaps [startMs, endMs). */
  isFree(bayId: string, startMs: number, endMs: number): boolean {
    const { starts, ends } = this.runs.get(bayId) ?? NO_RUNS;
    // The first run that ends after startMs; the bay is free if it starts at or after endMs.
    let low = 0;
    let high = ends.length;
    while (low < high) {
      const middle = (low + high) >>> 1;
      if (ends[middle] > startMs) high = middle;
      else low = middle + 1;
    }
    return low === ends.length || starts[low] >= endMs;
  }

  /** The first bay of the kind, by position, free over [startMs, endMs); null when none is. */
  firstFreeBay(kind: BayKind, startMs: number, endMs: number): BayRef | null {
    for (const bay of this.baysByKind.get(kind) ?? []) {
      if (this.isFree(bay.id, startMs, endMs)) return bay;
    }
    return null;
  }
}

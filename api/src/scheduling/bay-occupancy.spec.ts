import { describe, expect, it } from 'vitest';
import { BayOccupancy } from './bay-occupancy';
import type { BayRef, BusyInterval } from './scheduling.types';

// Invented bays and bookings; the rule checked is half-open interval overlap:
// [a, b) and [c, d) overlap exactly when a < d and c < b.

const bays: BayRef[] = [
  // The ids sort the other way round from the positions.
  { id: 'h1', name: 'Hoist 2', kind: 'hoist', position: 2 },
  { id: 'h2', name: 'Hoist 1', kind: 'hoist', position: 1 },
  { id: 't1', name: 'Tyre bay', kind: 'tyre', position: 3 },
];
const busy = (bayId: string, startsAtMs: number, endsAtMs: number): BusyInterval => ({
  bayId,
  startsAtMs,
  endsAtMs,
});

describe('BayOccupancy', () => {
  it('finds overlaps with unsorted, overlapping and touching intervals', () => {
    const occupancy = new BayOccupancy(bays, [
      busy('h2', 50, 60),
      busy('h2', 10, 20),
      busy('h2', 15, 30),
      busy('h2', 30, 35),
      busy('h2', 70, 70),
    ]);
    // Merged: [10, 35) and [50, 60); [70, 70) is empty.
    expect(occupancy.isFree('h2', 0, 10)).toBe(true);
    expect(occupancy.isFree('h2', 0, 11)).toBe(false);
    expect(occupancy.isFree('h2', 34, 36)).toBe(false);
    expect(occupancy.isFree('h2', 35, 50)).toBe(true);
    expect(occupancy.isFree('h2', 40, 51)).toBe(false);
    expect(occupancy.isFree('h2', 12, 13)).toBe(false);
    expect(occupancy.isFree('h2', 60, 1000)).toBe(true);
    expect(occupancy.isFree('h2', 69, 71)).toBe(true);
    expect(occupancy.isFree('h2', 0, 1000)).toBe(false);
    expect(occupancy.isFree('h1', 0, 1000)).toBe(true);
  });

  it('agrees with a plain overlap check on every small interval', () => {
    const intervals = [busy('h2', 3, 7), busy('h2', 9, 10), busy('h2', 6, 8), busy('h2', 14, 20)];
    const occupancy = new BayOccupancy(bays, intervals);
    for (let start = 0; start < 22; start += 1) {
      for (let end = start + 1; end <= 22; end += 1) {
        const overlaps = intervals.some((i) => i.startsAtMs < end && start < i.endsAtMs);
        expect(occupancy.isFree('h2', start, end), `[${start}, ${end})`).toBe(!overlaps);
      }
    }
  });

  it('chooses the first free bay of the kind by position, ignoring unknown bays', () => {
    const occupancy = new BayOccupancy(bays, [busy('h2', 0, 100), busy('gone', 0, 1000)]);
    expect(occupancy.firstFreeBay('hoist', 200, 300)?.name).toBe('Hoist 1');
    expect(occupancy.firstFreeBay('hoist', 50, 150)?.name).toBe('Hoist 2');
    expect(occupancy.firstFreeBay('alignment', 0, 10)).toBeNull();
    const allTaken = new BayOccupancy(bays, [busy('h2', 0, 100), busy('h1', 90, 200)]);
    expect(allTaken.firstFreeBay('hoist', 95, 96)).toBeNull();
    expect(allTaken.firstFreeBay('tyre', 95, 96)?.name).toBe('Tyre bay');
  });

  it('refuses a busy interval without finite instants', () => {
    expect(() => new BayOccupancy(bays, [busy('h2', Number.NaN, 10)])).toThrow(/busy\[0\]/);
  });
});

import { describe, expect, it } from 'vitest';
import {
  HIGHEST_LOAD_INDEX,
  LOAD_INDEX_KG,
  LOWEST_LOAD_INDEX,
  loadIndexKg,
  lowestLoadIndexFor,
  tyreLoadCapacityKg,
} from './load-index';

// Source: ISO 4000-1 / ETRTO load index table (REFERENCES.md, H), copied verbatim.
const PUBLISHED_90_TO_130 = `90 600 · 91 615 · 92 630 · 93 650 · 94 670 · 95 690 · 96 710 · 97 730 · 98 750 · 99 775 ·
100 800 · 101 825 · 102 850 · 103 875 · 104 900 · 105 925 · 106 950 · 107 975 · 108 1000 ·
109 1030 · 110 1060 · 111 1090 · 112 1120 · 113 1150 · 114 1180 · 115 1215 · 116 1250 ·
117 1285 · 118 1320 · 119 1360 · 120 1400 · 121 1450 · 122 1500 · 123 1550 · 124 1600 ·
125 1650 · 126 1700 · 127 1750 · 128 1800 · 129 1850 · 130 1900.`;

function parsePublished(text: string): Array<[number, number]> {
  return text
    .replace(/\.$/, '')
    .split('·')
    .map((pair) => pair.trim().split(/\s+/).map(Number) as [number, number]);
}

describe('load index table', () => {
  it('holds every published value from 90 to 130', () => {
    const published = parsePublished(PUBLISHED_90_TO_130);
    expect(published).toHaveLength(41);
    expect(published.map(([index]) => index)).toEqual(
      Array.from({ length: 41 }, (_, offset) => 90 + offset),
    );
    for (const [index, kg] of published) expect(loadIndexKg(index), `index ${index}`).toBe(kg);
  });

  it('holds the extension below 90 and above 130', () => {
    // From memory: ISO 4000-1 / ETRTO load index table, not verified against the standard's text.
    expect(loadIndexKg(60)).toBe(250);
    expect(loadIndexKg(75)).toBe(387);
    expect(loadIndexKg(84)).toBe(500);
    expect(loadIndexKg(89)).toBe(580);
    expect(loadIndexKg(131)).toBe(1950);
    expect(loadIndexKg(140)).toBe(2500);
    expect(loadIndexKg(150)).toBe(3350);
    expect(LOWEST_LOAD_INDEX).toBe(60);
    expect(HIGHEST_LOAD_INDEX).toBe(150);
  });

  it('has no gaps and grows by about 2.9 % per step (catches a mistyped value)', () => {
    // From memory: the load index series is geometric, about 10^(1/80) ≈ 1.029 per step, rounded.
    const indices = [...LOAD_INDEX_KG.keys()];
    expect(indices).toEqual(
      Array.from(
        { length: HIGHEST_LOAD_INDEX - LOWEST_LOAD_INDEX + 1 },
        (_, i) => LOWEST_LOAD_INDEX + i,
      ),
    );
    for (const index of indices.slice(1)) {
      const ratio = (loadIndexKg(index) ?? 0) / (loadIndexKg(index - 1) ?? 1);
      expect(ratio, `step ${index - 1} → ${index}`).toBeGreaterThan(1.015);
      expect(ratio, `step ${index - 1} → ${index}`).toBeLessThan(1.045);
    }
  });

  it('returns null outside the table', () => {
    expect(loadIndexKg(59)).toBeNull();
    expect(loadIndexKg(151)).toBeNull();
    expect(loadIndexKg(112.5)).toBeNull();
  });

  it('gives single and dual capacities for an LT dual mark', () => {
    // Source: ISO 4000-1 / ETRTO load index table; LT dual marking 121/118 → 1450 kg single, 1320 kg dual (REFERENCES.md, H).
    expect(tyreLoadCapacityKg(121, 118)).toEqual({ singleKg: 1450, dualKg: 1320 });
    // Source: ISO 4000-1 / ETRTO load index table: 126 → 1700 kg, 123 → 1550 kg (REFERENCES.md, H).
    expect(tyreLoadCapacityKg(126, 123)).toEqual({ singleKg: 1700, dualKg: 1550 });
    expect(tyreLoadCapacityKg(115, null)).toEqual({ singleKg: 1215, dualKg: null });
    expect(tyreLoadCapacityKg(200, null)).toBeNull();
  });

  it('finds the lowest index that carries a load', () => {
    // Source: ISO 4000-1 / ETRTO load index table: 112 → 1120 kg, 113 → 1150 kg (REFERENCES.md, H).
    expect(lowestLoadIndexFor(1120)).toBe(112);
    expect(lowestLoadIndexFor(1121)).toBe(113);
    expect(lowestLoadIndexFor(5000)).toBeNull();
  });
});

import { describe, expect, it } from 'vitest';
import {
  DERIVED_RANGE_HALF_WIDTH_IN,
  approvedRimWidthRangeIn,
  measuringRimWidthIn,
  metricRimWidthFactorK,
  roundToNearestHalfInch,
} from './rim-width';
import { type TyreSize, parseTyreDesignation } from './tyre-designation';

function size(designation: string): TyreSize {
  const result = parseTyreDesignation(designation);
  if (!result.ok) throw new Error(result.error.message);
  return result.size;
}

describe('rim width for a tyre section', () => {
  it.each([
    // Source: Tire and Rim Association measuring rims, as quoted in REFERENCES.md "Rim width for a tyre section" (M).
    ['P225/75R15', 6.0],
    ['P225/55R15', 7.0],
    ['P225/45R17', 7.5],
    ['P225/40R18', 8.0],
    // Source: Tire and Rim Association measuring rims (K × section width rule), derived: 265/70R17 → 8.0 in.
    ['265/70R17', 8.0],
  ])('measuring rim of %s is %d in', (designation, rimIn) => {
    expect(measuringRimWidthIn(size(designation))).toBe(rimIn);
  });

  it('uses K by aspect band', () => {
    // Source: Tire and Rim Association measuring rims (K × section width rule): K = 0.70 (75+), 0.75 (70–60), 0.80 (55–50), 0.85 (45), 0.90 (40).
    expect([85, 80, 75].map(metricRimWidthFactorK)).toEqual([0.7, 0.7, 0.7]);
    expect([70, 65, 60].map(metricRimWidthFactorK)).toEqual([0.75, 0.75, 0.75]);
    expect([55, 50].map(metricRimWidthFactorK)).toEqual([0.8, 0.8]);
    expect(metricRimWidthFactorK(45)).toBe(0.85);
    expect(metricRimWidthFactorK(40)).toBe(0.9);
    expect(metricRimWidthFactorK(35)).toBeNull();
  });

  it('rounds to the nearest half inch', () => {
    expect(roundToNearestHalfInch(6.2)).toBe(6);
    expect(roundToNearestHalfInch(7.53)).toBe(7.5);
    expect(roundToNearestHalfInch(7.82)).toBe(8);
    expect(roundToNearestHalfInch(7.75)).toBe(8);
  });

  it('derives about 7.0–9.0 in for 265/70R17', () => {
    // From memory: approved range about 7.0–9.0 in for 265/70R17 (REFERENCES.md, MEM).
    expect(approvedRimWidthRangeIn(size('265/70R17'))).toEqual({
      minIn: 7,
      maxIn: 9,
      measuringRimIn: 8,
      basis: 'derived',
    });
  });

  it('derives a flotation range inside the recalled 8.5–11.0 in for 33x12.50R15LT', () => {
    // From memory: approved range 8.5–11.0 in for 33x12.50R15LT (REFERENCES.md, MEM); flotation
    // measuring rim 10.0 in (Tire and Rim Association, from memory).
    const range = approvedRimWidthRangeIn(size('33x12.50R15LT'));
    expect(range?.measuringRimIn).toBe(10);
    expect(range?.minIn).toBeGreaterThanOrEqual(8.5);
    expect(range?.maxIn).toBeLessThanOrEqual(11);
    expect(range?.basis).toBe('derived');
    // From memory: Tire and Rim Association measuring rim for 31x10.50R15 is 8.5 in.
    expect(measuringRimWidthIn(size('31x10.50R15'))).toBe(8.5);
  });

  it("prefers the tyre maker's approved range when given", () => {
    expect(approvedRimWidthRangeIn(size('33x12.50R15LT'), { minIn: 8.5, maxIn: 11 })).toEqual({
      minIn: 8.5,
      maxIn: 11,
      measuringRimIn: 10,
      basis: 'tyre-maker',
    });
  });

  it('derives nothing below the 40 series without data', () => {
    expect(approvedRimWidthRangeIn(size('285/35R20'))).toBeNull();
    expect(approvedRimWidthRangeIn(size('285/35R20'), { minIn: 9.5, maxIn: 11 })?.basis).toBe(
      'tyre-maker',
    );
    expect(DERIVED_RANGE_HALF_WIDTH_IN).toBe(1);
  });
});

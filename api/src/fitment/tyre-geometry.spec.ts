import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type TyreSize, parseTyreDesignation } from './tyre-designation';
import { MM_PER_INCH, mmToInches, tyreGeometry } from './tyre-geometry';
import { metricSizeArb } from './tyre-size.fixtures';

function geometryOf(designation: string) {
  const result = parseTyreDesignation(designation);
  if (!result.ok) throw new Error(result.error.message);
  return tyreGeometry(result.size);
}

describe('tyre geometry', () => {
  it('uses 1 in = 25.4 mm exactly', () => {
    // Source: ISO 4000-1 / ETRTO nominal tyre dimensions: 1 in = 25.4 mm exactly (international inch).
    expect(MM_PER_INCH).toBe(25.4);
  });

  it.each([
    // Source: ISO 4000-1 / ETRTO nominal dimensions, REFERENCES.md worked examples (H).
    ['265/70R17', 802.8],
    ['285/70R17', 830.8],
    ['265/65R17', 776.3],
    ['285/75R17', 859.3],
    ['33x12.50R15LT', 838.2],
    // Source: ISO 4000-1 / ETRTO nominal formula D = rim × 25.4 + 2 × W × aspect / 100, worked by hand:
    // 16 × 25.4 + 2 × 285 × 0.75 = 406.4 + 427.5; 15 × 25.4 + 2 × 225 × 0.75 = 381 + 337.5;
    // 35 in × 25.4 = 889.0 (flotation sizes name their diameter).
    ['LT285/75R16 126/123Q', 833.9],
    ['P225/75R15 102S', 718.5],
    ['35x12.50R17 121Q', 889.0],
  ])('%s is %d mm overall', (designation, diameterMm) => {
    expect(geometryOf(designation).overallDiameterMm).toBeCloseTo(diameterMm, 1);
  });

  it('gives 265/70R17 as 31.61 in with a 185.5 mm sidewall', () => {
    // Source: ISO 4000-1 / ETRTO nominal tyre dimensions: 265/70R17 → 802.8 mm (31.61 in); H = W × aspect / 100.
    const geometry = geometryOf('265/70R17');
    expect(mmToInches(geometry.overallDiameterMm)).toBeCloseTo(31.61, 2);
    expect(geometry.sidewallHeightMm).toBeCloseTo(185.5, 6);
    expect(geometry.sectionWidthMm).toBe(265);
    expect(geometry.rimDiameterMm).toBeCloseTo(431.8, 6);
  });

  it('gives a flotation section and sidewall from its inch sizes', () => {
    // Source: ISO 4000-1 / ETRTO nominal tyre dimensions: 33x12.50R15LT → section 12.50 in (317.5 mm), rim 15 in.
    const geometry = geometryOf('33x12.50R15LT');
    expect(geometry.sectionWidthMm).toBeCloseTo(317.5, 6);
    expect(geometry.sidewallHeightMm).toBeCloseTo((838.2 - 381) / 2, 6);
  });

  it('gives circumference π·D and revolutions per km 1 000 000 / (π·D)', () => {
    // Source: ISO 4000-1 / ETRTO nominal tyre dimensions: circumference = π·D; revolutions per km = 1,000,000 / (π·D in mm).
    // Worked by hand: π × 802.8 = 2522.07 mm; 1 000 000 / 2522.07 = 396.50 rev/km.
    const geometry = geometryOf('265/70R17');
    expect(geometry.circumferenceMm).toBeCloseTo(2522.07, 1);
    expect(geometry.revolutionsPerKm).toBeCloseTo(396.5, 1);
    // π × 838.2 = 2633.28 mm; 1 000 000 / 2633.28 = 379.76 rev/km.
    const flotation = geometryOf('33x12.50R15LT');
    expect(flotation.circumferenceMm).toBeCloseTo(2633.28, 1);
    expect(flotation.revolutionsPerKm).toBeCloseTo(379.76, 1);
  });

  describe('properties', () => {
    const withChange = (size: TyreSize, change: Partial<TyreSize>) =>
      ({ ...size, ...change }) as TyreSize;

    it('grows overall diameter with rim, width and aspect', () => {
      // Source: ISO 4000-1 / ETRTO nominal formula: D = rim × 25.4 + 2 × W × aspect / 100 is increasing in each.
      fc.assert(
        fc.property(metricSizeArb, (size) => {
          const diameterMm = tyreGeometry(size).overallDiameterMm;
          if (size.rimDiameterIn < 30) {
            expect(
              tyreGeometry(withChange(size, { rimDiameterIn: size.rimDiameterIn + 0.5 }))
                .overallDiameterMm,
            ).toBeGreaterThan(diameterMm);
          }
          if (size.sectionWidthMm < 455) {
            expect(
              tyreGeometry(withChange(size, { sectionWidthMm: size.sectionWidthMm + 10 }))
                .overallDiameterMm,
            ).toBeGreaterThan(diameterMm);
          }
          if (size.aspectRatioPercent < 95) {
            expect(
              tyreGeometry(withChange(size, { aspectRatioPercent: size.aspectRatioPercent + 5 }))
                .overallDiameterMm,
            ).toBeGreaterThan(diameterMm);
          }
        }),
        { numRuns: 1000 },
      );
    });

    it('keeps revolutions per km times circumference at one kilometre', () => {
      fc.assert(
        fc.property(metricSizeArb, (size) => {
          const geometry = tyreGeometry(size);
          expect(geometry.revolutionsPerKm * geometry.circumferenceMm).toBeCloseTo(1_000_000, 3);
        }),
      );
    });
  });
});

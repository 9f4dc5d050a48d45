import { describe, expect, it } from 'vitest';
import {
  allowedIndicatedRangeKmh,
  allowedTrueRangeKmh,
  indicatedSpeedAfterTyreChangeKmh,
  speedometerReadingAllowed,
} from './speedometer';

describe('speedometer accuracy', () => {
  it('allows 100–114 km/h indicated at a true 100 km/h', () => {
    // Source: UN ECE Regulation No. 39 §5.3; ADR 18/03: 0 ≤ V1 − V2 ≤ 0.1·V2 + 4 → true 100 → indicated 100–114 (REFERENCES.md, H).
    expect(allowedIndicatedRangeKmh(100)).toEqual({ minKmh: 100, maxKmh: 114 });
    expect(speedometerReadingAllowed(100, 100)).toBe(true);
    expect(speedometerReadingAllowed(114, 100)).toBe(true);
    expect(speedometerReadingAllowed(114.01, 100)).toBe(false);
    expect(speedometerReadingAllowed(99.99, 100)).toBe(false);
  });

  it('allows 50–59 km/h indicated at a true 50 km/h', () => {
    // Source: UN ECE Regulation No. 39 §5.3; ADR 18/03: true 50 → indicated 50–59 (REFERENCES.md, H).
    expect(allowedIndicatedRangeKmh(50)).toEqual({ minKmh: 50, maxKmh: 59 });
    expect(speedometerReadingAllowed(59, 50)).toBe(true);
    expect(speedometerReadingAllowed(59.1, 50)).toBe(false);
  });

  it('puts the true speed between 87.27 and 100 km/h at an indicated 100 km/h', () => {
    // Source: UN ECE Regulation No. 39 §5.3; ADR 18/03: indicated 100 → true between 87.27 and 100 (REFERENCES.md, H).
    const range = allowedTrueRangeKmh(100);
    expect(range.minKmh).toBeCloseTo(87.27, 2);
    expect(range.maxKmh).toBe(100);
    expect(speedometerReadingAllowed(100, 87.28)).toBe(true);
    expect(speedometerReadingAllowed(100, 87.26)).toBe(false);
    expect(speedometerReadingAllowed(100, 100.01)).toBe(false);
  });

  it('reads low on larger tyres: indicated = true × D_old / D_new', () => {
    // Source: UN ECE Regulation No. 39 §5.3; ADR 18/03: true / indicated = D_new / D_old; 265/65R17 776.3 mm → 285/70R17 830.8 mm.
    // Worked by hand: 100 × 776.3 / 830.8 = 93.44 km/h.
    const indicatedKmh = indicatedSpeedAfterTyreChangeKmh(100, 776.3, 830.8);
    expect(indicatedKmh).toBeCloseTo(93.44, 2);
    expect(speedometerReadingAllowed(indicatedKmh, 100)).toBe(false);
    expect(indicatedSpeedAfterTyreChangeKmh(100, 802.8, 802.8)).toBe(100);
    expect(indicatedSpeedAfterTyreChangeKmh(100, 830.8, 776.3)).toBeGreaterThan(100);
  });
});

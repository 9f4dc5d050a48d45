import { describe, expect, it } from 'vitest';
import { addedHalfShaftAngleDeg, diffDropNeededMm } from './joint-angle';

describe('front half-shaft angle', () => {
  it('adds about 6.3° for a 50 mm lift on a 450 mm shaft', () => {
    // Source: right-triangle geometry of the half-shaft (angle = atan(rise ÷ shaft length)), derived: atan(Δh / L); 50 mm on 450 mm ≈ +6.3°.
    expect(addedHalfShaftAngleDeg(50, 450)).toBeCloseTo(6.34, 2);
  });

  it('roughly halves with a 25 mm diff drop', () => {
    // Source: right-triangle geometry of the half-shaft (angle = atan(rise ÷ shaft length)), derived: atan((Δh − d) / L); a 25 mm drop roughly halves it.
    const withoutDeg = addedHalfShaftAngleDeg(50, 450);
    const withDropDeg = addedHalfShaftAngleDeg(50, 450, 25);
    expect(withDropDeg).toBeCloseTo(3.18, 2);
    expect(withDropDeg / withoutDeg).toBeGreaterThan(0.45);
    expect(withDropDeg / withoutDeg).toBeLessThan(0.55);
  });

  it('finds the drop that brings the angle back to a threshold', () => {
    const dropMm = diffDropNeededMm(75, 450, 6.5);
    // Worked by hand: 450 × tan 6.5° = 51.27 mm allowed rise; 75 − 51.27 = 23.73 mm.
    expect(dropMm).toBeCloseTo(23.73, 2);
    expect(addedHalfShaftAngleDeg(75, 450, dropMm)).toBeCloseTo(6.5, 6);
    expect(diffDropNeededMm(40, 450, 6.5)).toBe(0);
  });
});

import { describe, expect, it } from 'vitest';
import { labourCents } from './labour';

describe('labour', () => {
  it('is minutes × hourly rate ÷ 60', () => {
    // Worked by hand: 270 min × $140.00/h ÷ 60 = $630.00; 60 min = one hour's rate; 15 min = a quarter.
    expect(labourCents(270, 14000)).toBe(63000);
    expect(labourCents(60, 14000)).toBe(14000);
    expect(labourCents(15, 14000)).toBe(3500);
    expect(labourCents(0, 14000)).toBe(0);
    expect(labourCents(90, 0)).toBe(0);
  });

  it('rounds each labour line half-up to the cent', () => {
    // Liftwright's policy applies the s 9-90 half-cent-up rule to labour (A New Tax System (Goods and Services Tax) Act 1999 s 9-90 sets it for GST).
    // Worked by hand: 95 × 14000 / 60 = 22 166.67 c → 22 167 c; 25 × 13900 / 60 = 5 791.67 c → 5 792 c.
    expect(labourCents(95, 14000)).toBe(22167);
    expect(labourCents(25, 13900)).toBe(5792);
    // Worked by hand: 3 × 13910 / 60 = 695.5 c exactly → 696 c (half up); 1 × 13910 / 60 = 231.83 c → 232 c; 1 × 13901 / 60 = 231.68 → 232; 1 × 13890 / 60 = 231.5 → 232; 1 × 13889 / 60 = 231.48 → 231.
    expect(labourCents(3, 13910)).toBe(696);
    expect(labourCents(1, 13890)).toBe(232);
    expect(labourCents(1, 13889)).toBe(231);
  });

  it('refuses fractional minutes or a fractional rate', () => {
    expect(() => labourCents(1.5, 14000)).toThrow('labourMinutes');
    expect(() => labourCents(30, 14000.5)).toThrow(RangeError);
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  NotCentsError,
  assertCents,
  divideRoundHalfUp,
  formatCents,
  multiplyCents,
  multiplyDivideRoundHalfUp,
  percentToBasisPoints,
  percentageOfCents,
  sumCents,
} from './cents';

describe('whole cents', () => {
  it('accepts whole cents and refuses anything else', () => {
    expect(assertCents(0)).toBe(0);
    expect(assertCents(-2817)).toBe(-2817);
    expect(assertCents(1_000_000_000)).toBe(1_000_000_000);
    for (const bad of [0.5, 19.95, Number.NaN, Number.POSITIVE_INFINITY, 2 ** 53]) {
      expect(() => assertCents(bad, 'unitPriceCents'), String(bad)).toThrow(NotCentsError);
    }
    expect(() => assertCents(12.5, 'unitPriceCents')).toThrow(
      'unitPriceCents must be a whole number of cents, got 12.5',
    );
  });

  it('adds and multiplies only whole numbers', () => {
    expect(sumCents([174500, 164500, -28170])).toBe(310830);
    expect(sumCents([])).toBe(0);
    expect(() => sumCents([100, 0.1])).toThrow(NotCentsError);
    expect(multiplyCents(32900, 5)).toBe(164500);
    expect(() => multiplyCents(32900, 1.5)).toThrow(RangeError);
    expect(() => multiplyCents(2 ** 40, 2 ** 20)).toThrow('too large');
  });
});

describe('rounding half-up to the cent', () => {
  it('rounds a remainder of half or more up, and less than half down', () => {
    // Source: A New Tax System (Goods and Services Tax) Act 1999 s 9-90 (rounding): to the nearest cent, half a cent up (REFERENCES.md, H).
    expect(divideRoundHalfUp(5, 2)).toBe(3); // 2.5 → 3
    expect(divideRoundHalfUp(7, 2)).toBe(4); // 3.5 → 4
    expect(divideRoundHalfUp(4, 3)).toBe(1); // 1.33 → 1
    expect(divideRoundHalfUp(5, 3)).toBe(2); // 1.67 → 2
    expect(divideRoundHalfUp(6, 3)).toBe(2); // exact
    expect(divideRoundHalfUp(0, 7)).toBe(0);
    // Source: same s 9-90 rounding on the GST of a $19.95 GST-inclusive price: 1995 / 11 = 181.36 → 181 cents.
    expect(divideRoundHalfUp(1995, 11)).toBe(181);
    // Source: same, on 3 × $19.95 = $59.85: 5985 / 11 = 544.09 → 544 cents (REFERENCES.md three-line example).
    expect(divideRoundHalfUp(5985, 11)).toBe(544);
  });

  it('rounds a negative amount as the mirror image of the positive one', () => {
    expect(divideRoundHalfUp(-5, 2)).toBe(-3);
    expect(divideRoundHalfUp(-4, 3)).toBe(-1);
    expect(Object.is(divideRoundHalfUp(-1, 3), 0)).toBe(true);
  });

  it('refuses fractional operands and a zero or negative denominator', () => {
    expect(() => divideRoundHalfUp(1.5, 2)).toThrow(RangeError);
    expect(() => divideRoundHalfUp(1, 0)).toThrow('denominator');
    expect(() => divideRoundHalfUp(1, -2)).toThrow('denominator');
    expect(() => multiplyDivideRoundHalfUp(3, 0.5, 2)).toThrow(RangeError);
  });

  it('forms large products exactly before dividing', () => {
    // 2^53 − 1 × 10 000 does not fit in a double; the BigInt product does.
    expect(multiplyDivideRoundHalfUp(Number.MAX_SAFE_INTEGER, 10_000, 10_000)).toBe(
      Number.MAX_SAFE_INTEGER,
    );
    expect(multiplyDivideRoundHalfUp(123_456_789_012, 9_999, 10_000)).toBe(123_444_443_333);
  });

  it('matches the exact quotient within half a cent, always as a whole number', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -1e12, max: 1e12 }),
        fc.integer({ min: 1, max: 1e6 }),
        (numerator, denominator) => {
          const rounded = divideRoundHalfUp(numerator, denominator);
          expect(Number.isSafeInteger(rounded)).toBe(true);
          // |rounded × d − n| ≤ d / 2, with the half case going away from zero.
          const error = rounded * denominator - numerator;
          expect(2 * Math.abs(error)).toBeLessThanOrEqual(denominator);
          if (2 * Math.abs(error) === denominator) {
            expect(Math.abs(rounded)).toBeGreaterThan(Math.abs(numerator / denominator));
          }
        },
      ),
      { numRuns: 2000 },
    );
  });
});

describe('percentages', () => {
  it('holds percentages as whole basis points and refuses more than two decimals', () => {
    expect(percentToBasisPoints(10)).toBe(1000);
    expect(percentToBasisPoints(12.5)).toBe(1250);
    expect(percentToBasisPoints(7.25)).toBe(725);
    expect(percentToBasisPoints(0.01)).toBe(1);
    expect(percentToBasisPoints(33.33)).toBe(3333);
    expect(() => percentToBasisPoints(10.005)).toThrow('at most two decimals');
    expect(() => percentToBasisPoints(-1)).toThrow(RangeError);
    expect(() => percentToBasisPoints(Number.NaN)).toThrow(RangeError);
  });

  it('takes a percentage of an amount, rounded half-up', () => {
    // Worked by hand: 5 % of $5,634.00 = $281.70; 7.5 % of 33 333 c = 2499.975 → 2500 c; 5 % of 10 c = 0.5 → 1 c.
    expect(percentageOfCents(563400, 500)).toBe(28170);
    expect(percentageOfCents(33333, 750)).toBe(2500);
    expect(percentageOfCents(10, 500)).toBe(1);
    expect(percentageOfCents(9, 500)).toBe(0);
  });
});

describe('formatting', () => {
  it('writes dollars with thousands separators', () => {
    expect(formatCents(0)).toBe('$0.00');
    expect(formatCents(5)).toBe('$0.05');
    expect(formatCents(100000)).toBe('$1,000.00');
    expect(formatCents(123456789)).toBe('$1,234,567.89');
    expect(formatCents(-28170)).toBe('−$281.70');
    expect(() => formatCents(1.5)).toThrow(NotCentsError);
  });
});

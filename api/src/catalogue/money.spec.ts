import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatCentsAsDollars, parseDollarsToCents } from './money';

describe('parseDollarsToCents', () => {
  it.each([
    ['1249.5', 124950],
    ['1249.50', 124950],
    ['1249', 124900],
    ['1249.', 124900],
    ['0.95', 95],
    ['0.1', 10],
    ['0.07', 7],
    ['0', 0],
    ['  35.00 ', 3500],
    ['1.005', null],
    // Amounts where Number(text) * 100 is not a whole number in binary floating point
    // (4.35 * 100 = 434.99999999999994, 1.15 * 100 = 114.99999999999999).
    ['4.35', 435],
    ['1.15', 115],
    ['10000000.00', 1_000_000_000],
  ])('reads %j', (text, cents) => {
    const parsed = parseDollarsToCents(text);
    if (cents === null) expect(parsed.ok).toBe(false);
    else expect(parsed).toEqual({ ok: true, cents });
  });

  it.each([
    ['-5.00', 'must not be negative'],
    ['12.345', 'has more than 2 decimals'],
    ['abc', "'abc' is not an amount in dollars (e.g. 1249.00)"],
    ['$12.00', "'$12.00' is not an amount in dollars (e.g. 1249.00)"],
    ['1,249.00', "'1,249.00' is not an amount in dollars (e.g. 1249.00)"],
    ['1e3', "'1e3' is not an amount in dollars (e.g. 1249.00)"],
    ['', 'is required (dollars, e.g. 1249.00)'],
    ['10000000.01', 'is more than $10,000,000.00'],
  ])('refuses %j with a reason', (text, reason) => {
    expect(parseDollarsToCents(text)).toEqual({ ok: false, reason });
  });

  it('round-trips every amount in cents through its dollar text', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1_000_000_000 }), (cents) => {
        expect(parseDollarsToCents(formatCentsAsDollars(cents))).toEqual({ ok: true, cents });
      }),
    );
  });
});

describe('formatCentsAsDollars', () => {
  it('writes two decimals', () => {
    expect(formatCentsAsDollars(124950)).toBe('1249.50');
    expect(formatCentsAsDollars(7)).toBe('0.07');
    expect(formatCentsAsDollars(0)).toBe('0.00');
  });

  it('refuses what is not a price', () => {
    expect(() => formatCentsAsDollars(-1)).toThrow();
    expect(() => formatCentsAsDollars(1.5)).toThrow();
  });
});

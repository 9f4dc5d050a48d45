import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  invoiceTaxCents,
  perInvoiceTaxCents,
  perLineTaxCents,
  taxBasis,
  taxOfAmountCents,
} from './tax';

const gstInclusive = taxBasis(true, 10);
const gstExclusive = taxBasis(false, 10);

describe('GST in a GST-inclusive price', () => {
  it('is one eleventh of the price', () => {
    // Source: A New Tax System (Goods and Services Tax) Act 1999 (GST-inclusive price ÷ 11, the "1/11th" rule at a 10 % rate): $1,100 → $100 (REFERENCES.md, H).
    expect(taxOfAmountCents(110000, gstInclusive)).toBe(10000);
    // Source: same 1/11th rule: $110 → $10; $11 → $1.
    expect(taxOfAmountCents(11000, gstInclusive)).toBe(1000);
    expect(taxOfAmountCents(1100, gstInclusive)).toBe(100);
  });

  it('is rounded to the nearest cent', () => {
    // Source: A New Tax System (Goods and Services Tax) Act 1999 s 9-90 (rounding), 1/11th rule: $19.95 ÷ 11 = $1.8136… → $1.81.
    expect(taxOfAmountCents(1995, gstInclusive)).toBe(181);
    // Source: same: $59.85 ÷ 11 = $5.4409… → $5.44.
    expect(taxOfAmountCents(5985, gstInclusive)).toBe(544);
    // Source: same: 6 c ÷ 11 = 0.545 c → 1 c; 5 c ÷ 11 = 0.4545 c → 0 c.
    expect(taxOfAmountCents(6, gstInclusive)).toBe(1);
    expect(taxOfAmountCents(5, gstInclusive)).toBe(0);
  });

  it('uses rate / (100 + rate) at other rates', () => {
    // From memory: New Zealand GST at 15 % is 3/23 of a GST-inclusive price ($115 → $15).
    expect(taxOfAmountCents(11500, taxBasis(true, 15))).toBe(1500);
    expect(taxOfAmountCents(2300, taxBasis(true, 15))).toBe(300);
    expect(taxOfAmountCents(12345, taxBasis(true, 0))).toBe(0);
  });
});

describe('GST added to a GST-exclusive price', () => {
  it('is 10 % of the price, half a cent rounded up', () => {
    // Source: A New Tax System (Goods and Services Tax) Act 1999 s 9-70 (GST is 10 % of the value of the supply): $1,000 → $100.
    expect(taxOfAmountCents(100000, gstExclusive)).toBe(10000);
    // Source: same Act s 9-90 (rounding): to the nearest cent, half a cent up: 5 c → 0.5 c → 1 c; 15 c → 1.5 c → 2 c; 14 c → 1.4 c → 1 c.
    expect(taxOfAmountCents(5, gstExclusive)).toBe(1);
    expect(taxOfAmountCents(15, gstExclusive)).toBe(2);
    expect(taxOfAmountCents(14, gstExclusive)).toBe(1);
    expect(taxOfAmountCents(4, gstExclusive)).toBe(0);
  });
});

describe('rounding on a multi-line invoice', () => {
  const threeLines = [1995, 1995, 1995];

  it('gives $5.44 rounded once on the total and $5.43 rounded per line', () => {
    // Source: A New Tax System (Goods and Services Tax) Act 1999 s 9-90 (rounding), as in the ATO's worked example: three lines at $19.95 → $5.44 (total method) or $5.43 (line method) (REFERENCES.md, H).
    expect(perInvoiceTaxCents(threeLines, gstInclusive)).toBe(544);
    expect(perLineTaxCents(threeLines, gstInclusive)).toBe(543);
    expect(invoiceTaxCents(threeLines, gstInclusive, 'per-invoice')).toBe(544);
    expect(invoiceTaxCents(threeLines, gstInclusive, 'per-line')).toBe(543);
  });

  it('keeps the two methods within half a cent per line of each other', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 0, max: 10_000_000 }), { maxLength: 20 }),
        fc.boolean(),
        (amounts, pricesIncludeTax) => {
          const basis = taxBasis(pricesIncludeTax, 10);
          const difference = perLineTaxCents(amounts, basis) - perInvoiceTaxCents(amounts, basis);
          expect(2 * Math.abs(difference)).toBeLessThanOrEqual(amounts.length + 1);
        },
      ),
    );
  });
});

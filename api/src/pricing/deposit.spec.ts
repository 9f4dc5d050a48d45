import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { depositFor, isSpecialOrder } from './deposit';
import { percentArb } from './pricing.fixtures';
import type { DepositPolicy } from './pricing.types';

// The deposit percentages, floor and cap are the workshop's own policy values, not published
// figures: these tests use invented policy numbers and check the arithmetic of the rule in
// DESIGN.md ("Computation" → pricing): percentage of the total, at least the floor, at most the
// cap, never more than the total, a higher percentage for special-order parts.
const policy: DepositPolicy = {
  percent: 20,
  floorCents: 10000,
  capCents: 100000,
  specialOrderPercent: 50,
};

describe('deposit', () => {
  it('is the percentage of the total, rounded half-up, between the floor and the cap', () => {
    // Common practice (no published source), invented policy numbers: 20 % of $2,000.00 = $400.00.
    expect(depositFor(200000, policy, [])).toMatchObject({
      depositCents: 40000,
      percentageCents: 40000,
      percentApplied: 20,
      basis: 'percentage',
      specialOrder: false,
    });
    // Worked by hand: 20 % of 200 003 c = 40 000.6 c → 40 001 c; 20 % of 200 002 c = 40 000.4 → 40 000 c.
    expect(depositFor(200003, policy, []).depositCents).toBe(40001);
    expect(depositFor(200002, policy, []).depositCents).toBe(40000);
  });

  it('is at least the floor', () => {
    // Common practice (no published source), invented policy numbers: 20 % of $300.00 = $60.00, below the $100.00 floor.
    expect(depositFor(30000, policy, [])).toMatchObject({
      depositCents: 10000,
      percentageCents: 6000,
      basis: 'floor',
    });
    // Exactly at the floor the percentage itself decides.
    expect(depositFor(50000, policy, [])).toMatchObject({
      depositCents: 10000,
      basis: 'percentage',
    });
  });

  it('is at most the cap', () => {
    // Common practice (no published source), invented policy numbers: 20 % of $6,560.47 = $1,312.09, above the $1,000.00 cap.
    expect(depositFor(656047, policy, [])).toMatchObject({
      depositCents: 100000,
      percentageCents: 131209,
      basis: 'cap',
    });
    expect(depositFor(500000, policy, [])).toMatchObject({
      depositCents: 100000,
      basis: 'percentage',
    });
  });

  it('is never more than the total', () => {
    // Common practice (no published source), invented policy numbers: a $65.00 job is below the $100.00 floor, so the deposit is the whole $65.00.
    expect(depositFor(6500, policy, [])).toMatchObject({ depositCents: 6500, basis: 'total' });
    expect(depositFor(0, policy, [])).toMatchObject({ depositCents: 0, basis: 'total' });
  });

  it('uses the special-order percentage when a part must be ordered in', () => {
    // Common practice (no published source), invented policy numbers: 50 % of $1,200.00 = $600.00 instead of 20 % = $240.00.
    expect(depositFor(120000, policy, ['BR-STR-50-H'])).toMatchObject({
      depositCents: 60000,
      percentApplied: 50,
      basis: 'percentage',
      specialOrder: true,
      specialOrderSkus: ['BR-STR-50-H'],
    });
    expect(depositFor(120000, policy, []).depositCents).toBe(24000);
    // The cap still holds for special orders: 50 % of $6,560.47 → $1,000.00.
    expect(depositFor(656047, policy, ['BR-STR-50-H']).depositCents).toBe(100000);
  });

  it('keeps every deposit within [min(floor, total), min(cap, total)]', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 5_000_000 }),
        fc.tuple(percentArb, percentArb),
        fc.tuple(fc.integer({ min: 0, max: 500_000 }), fc.integer({ min: 0, max: 500_000 })),
        fc.boolean(),
        (totalCents, percents, bounds, specialOrder) => {
          const [percent, specialOrderPercent] = [...percents].sort((a, b) => a - b);
          const [floorCents, capCents] = [...bounds].sort((a, b) => a - b);
          const outcome = depositFor(
            totalCents,
            { percent, specialOrderPercent, floorCents, capCents },
            specialOrder ? ['SKU-1'] : [],
          );
          expect(Number.isSafeInteger(outcome.depositCents)).toBe(true);
          expect(outcome.depositCents).toBeGreaterThanOrEqual(Math.min(floorCents, totalCents));
          expect(outcome.depositCents).toBeLessThanOrEqual(Math.min(capCents, totalCents));
          expect(outcome.percentApplied).toBe(specialOrder ? specialOrderPercent : percent);
        },
      ),
      { numRuns: 2000 },
    );
  });
});

describe('special order', () => {
  const part = { kind: 'suspension-kit' as const, quantity: 1, stockQty: 0, leadDays: 5 };

  it('is a part with fewer on the shelf than needed and a lead time', () => {
    expect(isSpecialOrder(part)).toBe(true);
    expect(isSpecialOrder({ ...part, kind: 'tyre', quantity: 5, stockQty: 4 })).toBe(true);
  });

  it('is not a part in stock, one available the same day, or a service', () => {
    expect(isSpecialOrder({ ...part, stockQty: 1 })).toBe(false);
    expect(isSpecialOrder({ ...part, kind: 'tyre', quantity: 5, stockQty: 5 })).toBe(false);
    expect(isSpecialOrder({ ...part, leadDays: 0 })).toBe(false);
    expect(isSpecialOrder({ ...part, kind: 'service' })).toBe(false);
  });
});

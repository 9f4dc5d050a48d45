import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  bundleDiscountApplies,
  bundleDiscountCents,
  bundleDiscountTaxCents,
  missingBundleKinds,
} from './bundle-discount';
import { percentArb } from './pricing.fixtures';
import type { BundleDiscountPolicy, PricingProductKind } from './pricing.types';

// The bundle discount is the workshop's own policy: the percentage here is invented and the
// tests check the rule's arithmetic and conditions, not a published value.
const policy: BundleDiscountPolicy = {
  enabled: true,
  percent: 5,
  requiresKinds: ['suspension-kit', 'wheel', 'tyre'],
};
const linesOf = (...kinds: PricingProductKind[]) => kinds.map((kind) => ({ kind }));

describe('bundle discount conditions', () => {
  it('applies when the package holds every required kind', () => {
    expect(bundleDiscountApplies(linesOf('suspension-kit', 'wheel', 'tyre'), policy)).toBe(true);
    expect(
      bundleDiscountApplies(
        linesOf('tyre', 'service', 'wheel', 'component', 'suspension-kit'),
        policy,
      ),
    ).toBe(true);
  });

  it('does not apply when any required kind is missing', () => {
    expect(bundleDiscountApplies(linesOf('wheel', 'tyre'), policy)).toBe(false);
    expect(bundleDiscountApplies(linesOf('suspension-kit', 'wheel', 'service'), policy)).toBe(
      false,
    );
    expect(bundleDiscountApplies([], policy)).toBe(false);
    expect(missingBundleKinds(linesOf('wheel'), policy)).toEqual(['suspension-kit', 'tyre']);
  });

  it('does not apply when switched off or at 0 %', () => {
    const all = linesOf('suspension-kit', 'wheel', 'tyre');
    expect(bundleDiscountApplies(all, { ...policy, enabled: false })).toBe(false);
    expect(bundleDiscountApplies(all, { ...policy, percent: 0 })).toBe(false);
    expect(bundleDiscountApplies(all, { ...policy, requiresKinds: [] })).toBe(false);
  });
});

describe('bundle discount amount', () => {
  it('is the percentage of the parts total, rounded half-up to the cent', () => {
    // Worked by hand: 5 % of $5,634.00 = $281.70; 7.5 % of $333.33 = $24.99975 → $25.00;
    // 5 % of $0.30 = 1.5 c → 2 c; 5 % of $0.29 = 1.45 c → 1 c.
    expect(bundleDiscountCents(563400, 5)).toBe(28170);
    expect(bundleDiscountCents(33333, 7.5)).toBe(2500);
    expect(bundleDiscountCents(30, 5)).toBe(2);
    expect(bundleDiscountCents(29, 5)).toBe(1);
    expect(bundleDiscountCents(0, 5)).toBe(0);
  });

  it('is the same percentage of the parts tax with per-line rounding', () => {
    // Worked by hand: 5 % of 51 219 c of GST = 2 560.95 c → 2 561 c.
    expect(bundleDiscountTaxCents(51219, 5)).toBe(2561);
  });

  it('never makes a fractional cent and never exceeds the parts total', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1e11 }), percentArb, (partsCents, percent) => {
        const discountCents = bundleDiscountCents(partsCents, percent);
        expect(Number.isSafeInteger(discountCents)).toBe(true);
        expect(discountCents).toBeGreaterThanOrEqual(0);
        expect(discountCents).toBeLessThanOrEqual(partsCents);
        // Within half a cent of the exact percentage.
        expect(
          Math.abs(discountCents * 10_000 - partsCents * Math.round(percent * 100)),
        ).toBeLessThanOrEqual(5_000);
      }),
      { numRuns: 2000 },
    );
  });
});

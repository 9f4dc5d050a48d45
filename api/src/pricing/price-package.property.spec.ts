import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { pricePackage, workshopDiscountLimitCents } from './price-package';
import { validatePricingInput } from './pricing-input';
import {
  packageLineArb,
  pricingInputArb,
  suspensionKitLine,
  tyreLine,
  wheelLine,
} from './pricing.fixtures';
import type { PackagePrice, PricingInput } from './pricing.types';

const RUNS = { numRuns: 1500 };

/** Every amount in a price, with where it is (for a failure message). */
function amountsOf(price: PackagePrice): Array<[string, number]> {
  const found: Array<[string, number]> = [];
  price.lines.forEach((line, index) => {
    found.push([`lines[${index}].amountCents`, line.amountCents]);
    if (line.taxCents !== null) found.push([`lines[${index}].taxCents`, line.taxCents]);
    if ('unitPriceCents' in line)
      found.push([`lines[${index}].unitPriceCents`, line.unitPriceCents]);
    if (line.kind === 'bundle-discount') {
      found.push([`lines[${index}].discountedCents`, line.discountedCents]);
    }
  });
  for (const [key, value] of Object.entries(price.breakdown))
    found.push([`breakdown.${key}`, value]);
  for (const key of [
    'subtotalCents',
    'taxCents',
    'totalCents',
    'totalExcludingTaxCents',
    'depositCents',
    'balanceDueCents',
  ] as const) {
    found.push([key, price[key]]);
  }
  found.push(['deposit.percentageCents', price.deposit.percentageCents]);
  return found;
}

const sum = (values: number[]) => values.reduce((total, value) => total + value, 0);

/** Packages that always hold a kit, wheels and tyres, so the bundle discount is exercised. */
const bundlePackageArb: fc.Arbitrary<PricingInput> = fc
  .tuple(pricingInputArb, fc.array(packageLineArb, { maxLength: 4 }))
  .map(([input, extra]) => ({
    ...input,
    lines: [suspensionKitLine, wheelLine, tyreLine, ...extra],
    policy: {
      ...input.policy,
      bundleDiscount: { ...input.policy.bundleDiscount, enabled: true },
    },
  }));

const anyPackageArb = fc.oneof(pricingInputArb, bundlePackageArb);

describe('pricePackage properties', () => {
  it('accepts every generated package', () => {
    fc.assert(
      fc.property(anyPackageArb, (input) => {
        expect(validatePricingInput(input)).toEqual([]);
      }),
      RUNS,
    );
  });

  it('makes every amount a whole number of cents (no fractional cent anywhere)', () => {
    fc.assert(
      fc.property(anyPackageArb, (input) => {
        for (const [where, value] of amountsOf(pricePackage(input))) {
          expect(Number.isSafeInteger(value), `${where} = ${value}`).toBe(true);
        }
      }),
      RUNS,
    );
  });

  it('makes the subtotal exactly the sum of the lines, and the total follow from it', () => {
    fc.assert(
      fc.property(anyPackageArb, (input) => {
        const price = pricePackage(input);
        expect(price.subtotalCents).toBe(sum(price.lines.map((line) => line.amountCents)));
        expect(price.subtotalCents).toBe(sum(Object.values(price.breakdown)));
        expect(price.totalCents).toBe(
          input.policy.pricesIncludeTax
            ? price.subtotalCents
            : price.subtotalCents + price.taxCents,
        );
        expect(price.totalExcludingTaxCents + price.taxCents).toBe(price.totalCents);
        expect(price.depositCents + price.balanceDueCents).toBe(price.totalCents);
        if (price.taxRoundingMethod === 'per-line') {
          expect(sum(price.lines.map((line) => line.taxCents ?? Number.NaN))).toBe(price.taxCents);
        } else {
          expect(price.lines.every((line) => line.taxCents === null)).toBe(true);
        }
      }),
      RUNS,
    );
  });

  it('keeps the tax between zero and the total', () => {
    fc.assert(
      fc.property(anyPackageArb, (input) => {
        const price = pricePackage(input);
        expect(price.taxCents).toBeGreaterThanOrEqual(0);
        expect(price.taxCents).toBeLessThanOrEqual(price.totalCents);
        expect(price.totalCents).toBeGreaterThanOrEqual(0);
      }),
      RUNS,
    );
  });

  it('keeps the deposit within [min(floor, total), min(cap, total)]', () => {
    fc.assert(
      fc.property(anyPackageArb, (input) => {
        const { floorCents, capCents } = input.policy.deposit;
        const price = pricePackage(input);
        expect(price.depositCents).toBeGreaterThanOrEqual(Math.min(floorCents, price.totalCents));
        expect(price.depositCents).toBeLessThanOrEqual(Math.min(capCents, price.totalCents));
        expect(price.balanceDueCents).toBeGreaterThanOrEqual(0);
      }),
      RUNS,
    );
  });

  it('discounts a whole number of cents, never more than the parts, only with every required kind', () => {
    fc.assert(
      fc.property(anyPackageArb, (input) => {
        const price = pricePackage(input);
        const discounts = price.lines.filter((line) => line.kind === 'bundle-discount');
        const kinds = new Set(input.lines.map((line) => line.kind));
        const { enabled, percent, requiresKinds } = input.policy.bundleDiscount;
        const qualifies = enabled && percent > 0 && requiresKinds.every((kind) => kinds.has(kind));
        expect(discounts).toHaveLength(qualifies ? 1 : 0);
        expect(price.bundleDiscountApplied).toBe(qualifies);
        for (const discount of discounts) {
          expect(discount.amountCents).toBeLessThanOrEqual(0);
          expect(-discount.amountCents).toBeLessThanOrEqual(price.breakdown.partsCents);
        }
      }),
      RUNS,
    );
  });

  it('takes the workshop discount off after everything else, never below zero', () => {
    fc.assert(
      fc.property(anyPackageArb, (input) => {
        const price = pricePackage(input);
        const limit = workshopDiscountLimitCents(input);
        const applied = Math.min(input.workshopDiscountCents ?? 0, limit);
        const discounts = price.lines.filter((line) => line.kind === 'workshop-discount');
        expect(discounts).toHaveLength(applied > 0 ? 1 : 0);
        expect(price.breakdown.workshopDiscountCents).toBe(0 - applied);
        expect(price.subtotalCents).toBe(limit - applied);
        if (discounts.length > 0) expect(price.lines.at(-1)).toBe(discounts[0]);
      }),
      RUNS,
    );
  });

  it('uses the special-order percentage exactly when a part is short with a lead time', () => {
    fc.assert(
      fc.property(anyPackageArb, (input) => {
        const price = pricePackage(input);
        const short = input.lines.some(
          (line) => line.kind !== 'service' && line.stockQty < line.quantity && line.leadDays > 0,
        );
        expect(price.deposit.specialOrder).toBe(short);
        expect(price.deposit.percentApplied).toBe(
          short ? input.policy.deposit.specialOrderPercent : input.policy.deposit.percent,
        );
      }),
      RUNS,
    );
  });

  it('does not change its input', () => {
    fc.assert(
      fc.property(anyPackageArb, (input) => {
        const before = structuredClone(input);
        pricePackage(input);
        expect(input).toEqual(before);
      }),
      { numRuns: 300 },
    );
  });
});

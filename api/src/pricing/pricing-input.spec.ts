import { describe, expect, it } from 'vitest';
import { pricePackage } from './price-package';
import { PricingInputError, validatePricingInput } from './pricing-input';
import { demoPackage, demoPolicy, packageLine, policyWith, wheelLine } from './pricing.fixtures';
import type { PricingInput } from './pricing.types';

function fieldsOf(input: PricingInput): string[] {
  return validatePricingInput(input).map((issue) => issue.field);
}

describe('pricing input', () => {
  it('accepts the demo package', () => {
    expect(validatePricingInput(demoPackage)).toEqual([]);
  });

  it('refuses a price that is not whole cents, naming the field', () => {
    const input = { ...demoPackage, lines: [{ ...wheelLine, unitPriceCents: 329.5 }] };
    expect(validatePricingInput(input)).toEqual([
      {
        field: 'lines[0].unitPriceCents',
        message: 'must be a whole number of cents from 0 to 1000000000, got 329.5',
      },
    ]);
    expect(() => pricePackage(input)).toThrow(PricingInputError);
  });

  it('refuses fractional or out-of-range counts and minutes', () => {
    const input: PricingInput = {
      ...demoPackage,
      lines: [{ ...wheelLine, quantity: 0, labourMinutes: 12.5, stockQty: -1, leadDays: 0.5 }],
      wheelsFitted: 4.5,
      tyresReplaced: -1,
    };
    expect(fieldsOf(input)).toEqual([
      'lines[0].quantity',
      'lines[0].labourMinutes',
      'lines[0].leadDays',
      'lines[0].stockQty',
      'wheelsFitted',
      'tyresReplaced',
    ]);
  });

  it('refuses unknown kinds, blank names and a per-wheel flag on a part', () => {
    const input = {
      ...demoPackage,
      lines: [
        { ...wheelLine, kind: 'rim' as never, sku: ' ', bayKind: 'paint' as never },
        packageLine({ sku: 'IW-NUT', kind: 'component', unitPriceCents: 900, perWheel: true }),
      ],
    };
    expect(fieldsOf(input)).toEqual([
      'lines[0].sku',
      'lines[0].kind',
      'lines[0].bayKind',
      'lines[1].perWheel',
    ]);
  });

  it('refuses an inconsistent or malformed policy', () => {
    const policy = policyWith({
      labourRateCentsPerHour: 14000.5,
      taxRatePercent: 10.125,
      taxRoundingMethod: 'per-item' as never,
      deposit: { percent: 30, specialOrderPercent: 20, floorCents: 50000, capCents: 10000 },
      bundleDiscount: { enabled: true, percent: 120, requiresKinds: [] },
      quoteValidDays: 0,
    });
    expect(fieldsOf({ ...demoPackage, policy })).toEqual([
      'policy.labourRateCentsPerHour',
      'policy.taxRatePercent',
      'policy.taxRoundingMethod',
      'policy.bundleDiscount.percent',
      'policy.bundleDiscount.requiresKinds',
      'policy.deposit.specialOrderPercent',
      'policy.deposit.capCents',
      'policy.quoteValidDays',
    ]);
  });

  it('lists every issue in the error it throws', () => {
    const input = {
      ...demoPackage,
      wheelsFitted: -1,
      policy: { ...demoPolicy, tyreDisposalCentsPerTyre: 6.5 },
    };
    try {
      pricePackage(input);
      expect.unreachable('pricePackage accepted bad input');
    } catch (error) {
      expect(error).toBeInstanceOf(PricingInputError);
      const issues = (error as PricingInputError).issues;
      expect(issues.map((issue) => issue.field)).toEqual([
        'wheelsFitted',
        'policy.tyreDisposalCentsPerTyre',
      ]);
      expect((error as Error).message).toContain('policy.tyreDisposalCentsPerTyre');
    }
  });
});

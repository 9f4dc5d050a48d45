import { describe, expect, it } from 'vitest';
import { DEMO_PRICING_POLICY } from '../database/seeders/demo-workshop.seeder';
import { demoPolicy } from '../pricing/pricing.fixtures';
import { Workshop } from './entities/workshop.entity';
import {
  assignPolicy,
  basisPointsToPercent,
  policyFieldErrors,
  pricingPolicyOf,
} from './policy-mapping';

describe('workshop pricing policy mapping', () => {
  it('stores percentages as basis points and reads them back unchanged', () => {
    const workshop = new Workshop();
    const policy = {
      ...DEMO_PRICING_POLICY,
      taxRatePercent: 12.5,
      bundleDiscount: { ...DEMO_PRICING_POLICY.bundleDiscount, percent: 7.25 },
      deposit: { ...DEMO_PRICING_POLICY.deposit, percent: 0.01, specialOrderPercent: 99.99 },
    };
    assignPolicy(workshop, policy);
    expect(workshop.taxRateBasisPoints).toBe(1250);
    expect(workshop.bundleDiscountBasisPoints).toBe(725);
    expect(workshop.depositBasisPoints).toBe(1);
    expect(workshop.depositSpecialOrderBasisPoints).toBe(9999);
    expect(pricingPolicyOf(workshop)).toEqual(policy);
    expect(basisPointsToPercent(1000)).toBe(10);
  });

  it('seeds the demo policy the pricing documentation works its examples with', () => {
    expect(DEMO_PRICING_POLICY).toEqual(demoPolicy);
    expect(policyFieldErrors(DEMO_PRICING_POLICY)).toEqual({});
  });

  it("reports the engine's refusals keyed like the request body", () => {
    expect(
      policyFieldErrors({
        ...DEMO_PRICING_POLICY,
        bundleDiscount: { enabled: true, percent: 5, requiresKinds: [] },
        deposit: { percent: 20, floorCents: 10000, capCents: 5000, specialOrderPercent: 10 },
      }),
    ).toEqual({
      'bundleDiscount.requiresKinds': ['must name at least one kind when enabled'],
      'deposit.specialOrderPercent': ['must not be below deposit.percent'],
      'deposit.capCents': ['must not be below deposit.floorCents'],
    });
  });
});

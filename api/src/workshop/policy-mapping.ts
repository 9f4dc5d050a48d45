/**
 * The workshop's stored pricing policy (basis points, cents) to and from the API's shape
 * (percentages with up to two decimals) and the pricing engine's `PricingPolicy`. A new policy is
 * checked with the engine's own `validatePricingInput`, so the API refuses exactly what the
 * engine would refuse to price with.
 */
import type { FieldErrors } from '../common/errors/field-errors.exception';
import { BASIS_POINTS_PER_PERCENT, percentToBasisPoints } from '../pricing/cents';
import { validatePricingInput } from '../pricing/pricing-input';
import type { PricingPolicy } from '../pricing/pricing.types';
import type { Workshop } from './entities/workshop.entity';

/** Basis points back to a percentage: 1250 → 12.5 (exact for two decimals). */
export function basisPointsToPercent(basisPoints: number): number {
  return basisPoints / BASIS_POINTS_PER_PERCENT;
}

/** The engine's policy from the stored row. */
export function pricingPolicyOf(workshop: Workshop): PricingPolicy {
  return {
    labourRateCentsPerHour: workshop.labourRateCentsPerHour,
    pricesIncludeTax: workshop.pricesIncludeTax,
    taxRatePercent: basisPointsToPercent(workshop.taxRateBasisPoints),
    taxRoundingMethod: workshop.taxRoundingMethod,
    fittingBalancingCentsPerWheel: workshop.fittingBalancingCentsPerWheel,
    tyreDisposalCentsPerTyre: workshop.tyreDisposalCentsPerTyre,
    bundleDiscount: {
      enabled: workshop.bundleDiscountEnabled,
      percent: basisPointsToPercent(workshop.bundleDiscountBasisPoints),
      requiresKinds: [...workshop.bundleRequiresKinds],
    },
    deposit: {
      percent: basisPointsToPercent(workshop.depositBasisPoints),
      floorCents: workshop.depositFloorCents,
      capCents: workshop.depositCapCents,
      specialOrderPercent: basisPointsToPercent(workshop.depositSpecialOrderBasisPoints),
    },
    quoteValidDays: workshop.quoteValidDays,
  };
}

/**
 * The engine's verdict on a policy, as field errors keyed like the request body
 * (`deposit.capCents`, `bundleDiscount.requiresKinds[0]`); empty when it can price with it.
 */
export function policyFieldErrors(policy: PricingPolicy): FieldErrors {
  const issues = validatePricingInput({ lines: [], wheelsFitted: 0, tyresReplaced: 0, policy });
  const errors: FieldErrors = {};
  for (const issue of issues) {
    const field = issue.field.replace(/^policy\./, '');
    (errors[field] ??= []).push(issue.message);
  }
  return errors;
}

/** Writes a policy the engine accepted into the row (percentages as basis points). */
export function assignPolicy(workshop: Workshop, policy: PricingPolicy): void {
  workshop.labourRateCentsPerHour = policy.labourRateCentsPerHour;
  workshop.pricesIncludeTax = policy.pricesIncludeTax;
  workshop.taxRateBasisPoints = percentToBasisPoints(policy.taxRatePercent, 'taxRatePercent');
  workshop.taxRoundingMethod = policy.taxRoundingMethod ?? 'per-invoice';
  workshop.fittingBalancingCentsPerWheel = policy.fittingBalancingCentsPerWheel;
  workshop.tyreDisposalCentsPerTyre = policy.tyreDisposalCentsPerTyre;
  workshop.bundleDiscountEnabled = policy.bundleDiscount.enabled;
  workshop.bundleDiscountBasisPoints = percentToBasisPoints(
    policy.bundleDiscount.percent,
    'bundleDiscount.percent',
  );
  workshop.bundleRequiresKinds = [...policy.bundleDiscount.requiresKinds];
  workshop.depositBasisPoints = percentToBasisPoints(policy.deposit.percent, 'deposit.percent');
  workshop.depositFloorCents = policy.deposit.floorCents;
  workshop.depositCapCents = policy.deposit.capCents;
  workshop.depositSpecialOrderBasisPoints = percentToBasisPoints(
    policy.deposit.specialOrderPercent,
    'deposit.specialOrderPercent',
  );
  workshop.quoteValidDays = policy.quoteValidDays;
}

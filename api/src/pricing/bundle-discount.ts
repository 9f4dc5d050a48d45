/**
 * Bundle discount: when the package holds every kind the policy requires (by default a
 * suspension kit, wheels and tyres), a percentage off the parts total, shown as one negative
 * line. It is taken of parts only (wheels, tyres, kits, components): labour, services, fitting
 * and balancing and the disposal levy are never discounted. The amount is rounded half-up to
 * the cent, so the line is always whole cents.
 */
import { type Cents, percentToBasisPoints, percentageOfCents } from './cents';
import type { BundleDiscountPolicy, PackageLine, PricingProductKind } from './pricing.types';

/** The required kinds the package does not hold (empty: every one is there). */
export function missingBundleKinds(
  lines: readonly Pick<PackageLine, 'kind'>[],
  policy: BundleDiscountPolicy,
): PricingProductKind[] {
  const present = new Set(lines.map((line) => line.kind));
  return [...new Set(policy.requiresKinds)].filter((kind) => !present.has(kind));
}

/** The discount applies: enabled, a non-zero percentage and every required kind present. */
export function bundleDiscountApplies(
  lines: readonly Pick<PackageLine, 'kind'>[],
  policy: BundleDiscountPolicy,
): boolean {
  return (
    policy.enabled &&
    policy.percent > 0 &&
    policy.requiresKinds.length > 0 &&
    missingBundleKinds(lines, policy).length === 0
  );
}

/** The discount's size (a positive amount) on a parts total, rounded half-up to the cent. */
export function bundleDiscountCents(partsCents: Cents, percent: number): Cents {
  return percentageOfCents(partsCents, percentToBasisPoints(percent, 'bundleDiscount.percent'));
}

/**
 * With per-line tax rounding: the discount line's tax (a positive amount, shown negated) is
 * the same percentage of the tax on the parts lines it discounts, rounded half-up. The discount
 * lowers each part's price in proportion, so it lowers each part's tax in proportion.
 */
export function bundleDiscountTaxCents(partsTaxCents: Cents, percent: number): Cents {
  return percentageOfCents(partsTaxCents, percentToBasisPoints(percent, 'bundleDiscount.percent'));
}

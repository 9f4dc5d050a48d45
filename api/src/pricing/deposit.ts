/**
 * Deposit policy: a percentage of the total, rounded half-up to the cent, then at least the
 * floor, at most the cap and never more than the total. When any part is special-order (fewer
 * on the shelf than the package needs and a lead time to get it in), the higher special-order
 * percentage is used instead. The percentages, floor and cap are the workshop's own policy.
 */
import { type Cents, percentToBasisPoints, percentageOfCents } from './cents';
import {
  type DepositBasis,
  type DepositOutcome,
  type DepositPolicy,
  type PackageLine,
  isPartKind,
} from './pricing.types';

/** A part the workshop must order in: stock short of the quantity and a lead time. */
export function isSpecialOrder(
  line: Pick<PackageLine, 'kind' | 'quantity' | 'stockQty' | 'leadDays'>,
): boolean {
  return isPartKind(line.kind) && line.stockQty < line.quantity && line.leadDays > 0;
}

/** The deposit on a total, given the SKUs of any special-order parts. */
export function depositFor(
  totalCents: Cents,
  policy: DepositPolicy,
  specialOrderSkus: readonly string[],
): DepositOutcome {
  const specialOrder = specialOrderSkus.length > 0;
  const percentApplied = specialOrder ? policy.specialOrderPercent : policy.percent;
  const percentageCents = percentageOfCents(
    totalCents,
    percentToBasisPoints(percentApplied, 'deposit percent'),
  );

  let depositCents = percentageCents;
  let basis: DepositBasis = 'percentage';
  if (depositCents < policy.floorCents) {
    depositCents = policy.floorCents;
    basis = 'floor';
  }
  if (depositCents > policy.capCents) {
    depositCents = policy.capCents;
    basis = 'cap';
  }
  if (depositCents > totalCents) {
    depositCents = totalCents;
    basis = 'total';
  }
  return {
    depositCents,
    percentApplied,
    percentageCents,
    basis,
    specialOrder,
    specialOrderSkus: [...specialOrderSkus],
  };
}

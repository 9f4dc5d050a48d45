/**
 * GST on an amount (A New Tax System (Goods and Services Tax) Act 1999; REFERENCES.md, H).
 *
 * - Prices include tax: the tax in an amount is amount × rate / (100 + rate); at the 10 % GST
 *   rate that is one eleventh ($1,100 → $100).
 * - Prices exclude tax: the tax on an amount is amount × rate / 100 ($1,000 → $100 at 10 %).
 *
 * Each result is rounded half-up to the cent (s 9-90 as summarised in REFERENCES.md). On an
 * invoice the tax is either worked out once on the total (`per-invoice`) or on each line and
 * then added (`per-line`); both are lawful and give different cents on some invoices.
 */
import {
  BASIS_POINTS_PER_WHOLE,
  type BasisPoints,
  type Cents,
  multiplyDivideRoundHalfUp,
  percentToBasisPoints,
  sumCents,
} from './cents';
import type { TaxRoundingMethod } from './pricing.types';

export interface TaxBasis {
  /** True: amounts include the tax (the tax is a fraction of them); false: the tax is added. */
  pricesIncludeTax: boolean;
  rateBasisPoints: BasisPoints;
}

export function taxBasis(pricesIncludeTax: boolean, taxRatePercent: number): TaxBasis {
  return {
    pricesIncludeTax,
    rateBasisPoints: percentToBasisPoints(taxRatePercent, 'taxRatePercent'),
  };
}

/** The tax in (tax-inclusive basis) or on (tax-exclusive basis) one amount, rounded half-up. */
export function taxOfAmountCents(amountCents: Cents, basis: TaxBasis): Cents {
  const divisor = basis.pricesIncludeTax
    ? BASIS_POINTS_PER_WHOLE + basis.rateBasisPoints
    : BASIS_POINTS_PER_WHOLE;
  return multiplyDivideRoundHalfUp(amountCents, basis.rateBasisPoints, divisor);
}

/** Tax of an invoice's line amounts, rounded once on their total. */
export function perInvoiceTaxCents(lineAmountsCents: readonly Cents[], basis: TaxBasis): Cents {
  return taxOfAmountCents(sumCents(lineAmountsCents), basis);
}

/** Tax of each line amount, each rounded, then added. */
export function perLineTaxCents(lineAmountsCents: readonly Cents[], basis: TaxBasis): Cents {
  return sumCents(lineAmountsCents.map((amountCents) => taxOfAmountCents(amountCents, basis)));
}

/** Tax of an invoice's line amounts by the given rounding method. */
export function invoiceTaxCents(
  lineAmountsCents: readonly Cents[],
  basis: TaxBasis,
  method: TaxRoundingMethod,
): Cents {
  return method === 'per-line'
    ? perLineTaxCents(lineAmountsCents, basis)
    : perInvoiceTaxCents(lineAmountsCents, basis);
}

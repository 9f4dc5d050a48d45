/**
 * Prices a package: parts, services, labour, fitting and balancing, tyre disposal, the bundle
 * discount, tax, total and deposit, every amount in whole cents. Pure: input in, price out.
 *
 * Invariants (tested as properties): every amount is a safe integer; the subtotal is exactly the
 * sum of the lines; the total is the subtotal (prices include tax) or the subtotal plus the tax
 * (prices exclude it); 0 ≤ tax ≤ total; the deposit lies within
 * [min(floor, total), min(cap, total)]; deposit + balance due = total.
 */
import {
  bundleDiscountApplies,
  bundleDiscountCents,
  bundleDiscountTaxCents,
} from './bundle-discount';
import {
  type Cents,
  formatCents,
  multiplyCents,
  multiplyDivideRoundHalfUp,
  sumCents,
} from './cents';
import { depositFor, isSpecialOrder } from './deposit';
import { labourCents } from './labour';
import { assertValidPricingInput } from './pricing-input';
import {
  DEFAULT_TAX_ROUNDING_METHOD,
  type PackagePrice,
  type PriceBreakdown,
  type PricedBundleDiscountLine,
  type PricedFittingBalancingLine,
  type PricedLabourLine,
  type PricedLine,
  type PricedPartLine,
  type PricedServiceLine,
  type PricedTyreDisposalLine,
  type PricedWorkshopDiscountLine,
  type PricingInput,
  isPartKind,
} from './pricing.types';
import { roundingNote } from './rounding-note';
import { type TaxBasis, taxBasis, taxOfAmountCents } from './tax';

/**
 * The most a workshop discount can take off this package: its subtotal before the discount.
 * Callers refuse a larger discount with this figure in the message.
 */
export function workshopDiscountLimitCents(input: PricingInput): Cents {
  const { workshopDiscountCents: _ignored, ...withoutDiscount } = input;
  return pricePackage(withoutDiscount).subtotalCents;
}

/**
 * Price a package. Throws PricingInputError (with field-level issues) for input that
 * `validatePricingInput` refuses; never throws for input it accepts.
 */
export function pricePackage(input: PricingInput): PackagePrice {
  assertValidPricingInput(input);
  const { policy } = input;
  const taxRoundingMethod = policy.taxRoundingMethod ?? DEFAULT_TAX_ROUNDING_METHOD;
  const basis = taxBasis(policy.pricesIncludeTax, policy.taxRatePercent);
  const perLine = taxRoundingMethod === 'per-line';

  const partLines: PricedPartLine[] = [];
  const serviceLines: PricedServiceLine[] = [];
  const labourLines: PricedLabourLine[] = [];
  for (const line of input.lines) {
    if (isPartKind(line.kind)) {
      partLines.push({
        kind: 'part',
        productKind: line.kind,
        productId: line.productId,
        sku: line.sku,
        description: line.name,
        quantity: line.quantity,
        unitPriceCents: line.unitPriceCents,
        amountCents: multiplyCents(line.unitPriceCents, line.quantity, `${line.sku} amount`),
        taxCents: null,
        specialOrder: isSpecialOrder(line),
        leadDays: line.leadDays,
      });
      const labourMinutes = line.quantity * line.labourMinutes;
      if (labourMinutes > 0) {
        labourLines.push({
          kind: 'labour',
          productId: line.productId,
          sku: line.sku,
          description: `Labour: ${line.name} (${labourMinutes} min at ${formatCents(policy.labourRateCentsPerHour)}/h)`,
          labourMinutes,
          labourRateCentsPerHour: policy.labourRateCentsPerHour,
          bayKind: line.bayKind,
          amountCents: labourCents(labourMinutes, policy.labourRateCentsPerHour),
          taxCents: null,
        });
      }
    } else {
      const perWheel = line.perWheel === true;
      const quantity = perWheel ? line.quantity * input.wheelsFitted : line.quantity;
      serviceLines.push({
        kind: 'service',
        productId: line.productId,
        sku: line.sku,
        description: perWheel
          ? `${line.name} (${quantity} for ${plural(input.wheelsFitted, 'wheel')})`
          : line.name,
        quantity,
        unitPriceCents: line.unitPriceCents,
        amountCents: multiplyCents(line.unitPriceCents, quantity, `${line.sku} amount`),
        taxCents: null,
        perWheel,
        bayMinutes: quantity * line.labourMinutes,
        bayKind: line.bayKind,
      });
    }
  }

  const fittingLine: PricedFittingBalancingLine | null = chargesPerUnit(
    input.wheelsFitted,
    policy.fittingBalancingCentsPerWheel,
  )
    ? {
        kind: 'fitting-balancing',
        description: `Fitting and balancing, ${plural(input.wheelsFitted, 'wheel')}`,
        ...perUnitAmount(input.wheelsFitted, policy.fittingBalancingCentsPerWheel),
      }
    : null;
  const disposalLine: PricedTyreDisposalLine | null = chargesPerUnit(
    input.tyresReplaced,
    policy.tyreDisposalCentsPerTyre,
  )
    ? {
        kind: 'tyre-disposal',
        description: `Tyre disposal levy, ${plural(input.tyresReplaced, 'tyre')}`,
        ...perUnitAmount(input.tyresReplaced, policy.tyreDisposalCentsPerTyre),
      }
    : null;

  const partsCents = sumCents(partLines.map((line) => line.amountCents));
  const discountApplies = bundleDiscountApplies(input.lines, policy.bundleDiscount);
  const discountLine: PricedBundleDiscountLine | null = discountApplies
    ? {
        kind: 'bundle-discount',
        description: `Bundle discount, ${policy.bundleDiscount.percent} % of parts`,
        percent: policy.bundleDiscount.percent,
        discountedCents: partsCents,
        // 0 − x rather than −x: a zero discount stays +0.
        amountCents: 0 - bundleDiscountCents(partsCents, policy.bundleDiscount.percent),
        taxCents: null,
      }
    : null;

  const lines: PricedLine[] = [
    ...partLines,
    ...serviceLines,
    ...labourLines,
    ...(fittingLine ? [fittingLine] : []),
    ...(disposalLine ? [disposalLine] : []),
    ...(discountLine ? [discountLine] : []),
  ];
  const workshopDiscountCents = Math.min(
    input.workshopDiscountCents ?? 0,
    sumCents(lines.map((line) => line.amountCents)),
  );
  const workshopDiscountLine: PricedWorkshopDiscountLine | null =
    workshopDiscountCents > 0
      ? {
          kind: 'workshop-discount',
          description: 'Workshop discount',
          amountCents: 0 - workshopDiscountCents,
          taxCents: null,
        }
      : null;
  if (workshopDiscountLine) lines.push(workshopDiscountLine);
  const subtotalCents = sumCents(lines.map((line) => line.amountCents));

  let taxCents: Cents;
  if (perLine) {
    taxCents = applyPerLineTax(lines, partLines, discountLine, workshopDiscountLine, basis);
  } else {
    taxCents = taxOfAmountCents(subtotalCents, basis);
  }
  const totalCents = policy.pricesIncludeTax ? subtotalCents : sumCents([subtotalCents, taxCents]);

  const specialOrderSkus = [
    ...new Set(partLines.filter((line) => line.specialOrder).map((line) => line.sku)),
  ];
  const deposit = depositFor(totalCents, policy.deposit, specialOrderSkus);

  const breakdown: PriceBreakdown = {
    partsCents,
    servicesCents: sumCents(serviceLines.map((line) => line.amountCents)),
    labourCents: sumCents(labourLines.map((line) => line.amountCents)),
    fittingBalancingCents: fittingLine?.amountCents ?? 0,
    tyreDisposalCents: disposalLine?.amountCents ?? 0,
    bundleDiscountCents: discountLine?.amountCents ?? 0,
    workshopDiscountCents: workshopDiscountLine?.amountCents ?? 0,
  };

  return {
    lines,
    breakdown,
    subtotalCents,
    taxCents,
    totalCents,
    totalExcludingTaxCents: totalCents - taxCents,
    pricesIncludeTax: policy.pricesIncludeTax,
    taxRatePercent: policy.taxRatePercent,
    taxRoundingMethod,
    bundleDiscountApplied: discountApplies,
    deposit,
    depositCents: deposit.depositCents,
    balanceDueCents: totalCents - deposit.depositCents,
    quoteValidDays: policy.quoteValidDays,
    roundingNote: roundingNote({
      pricesIncludeTax: policy.pricesIncludeTax,
      taxRatePercent: policy.taxRatePercent,
      taxRoundingMethod,
      bundleDiscountPercent: discountLine ? discountLine.percent : null,
      deposit: {
        floorCents: policy.deposit.floorCents,
        capCents: policy.deposit.capCents,
        percentApplied: deposit.percentApplied,
        specialOrder: deposit.specialOrder,
      },
    }),
  };
}

/**
 * Per-line rounding: each line's tax is rounded on that line; the bundle discount's tax is the
 * discount percentage of the parts lines' tax (see bundle-discount.ts); the workshop discount
 * takes its share of the other lines' tax. Sets `taxCents` on every
 * line and returns their sum.
 */
function applyPerLineTax(
  lines: PricedLine[],
  partLines: readonly PricedPartLine[],
  discountLine: PricedBundleDiscountLine | null,
  workshopDiscountLine: PricedWorkshopDiscountLine | null,
  basis: TaxBasis,
): Cents {
  for (const line of lines) {
    if (line !== discountLine && line !== workshopDiscountLine) {
      line.taxCents = taxOfAmountCents(line.amountCents, basis);
    }
  }
  if (discountLine) {
    const partsTaxCents = sumCents(partLines.map((line) => line.taxCents ?? 0));
    discountLine.taxCents = 0 - bundleDiscountTaxCents(partsTaxCents, discountLine.percent);
  }
  if (workshopDiscountLine) {
    // The discount takes the same share of the tax as of the amount, so the tax falls to zero
    // with the total and never exceeds it.
    const others = lines.filter((line) => line !== workshopDiscountLine);
    const beforeCents = sumCents(others.map((line) => line.amountCents));
    const beforeTaxCents = sumCents(others.map((line) => line.taxCents ?? 0));
    workshopDiscountLine.taxCents =
      0 -
      multiplyDivideRoundHalfUp(beforeTaxCents, 0 - workshopDiscountLine.amountCents, beforeCents);
  }
  return sumCents(lines.map((line) => line.taxCents ?? 0));
}

/** A per-wheel or per-tyre charge appears only when there is something to charge. */
function chargesPerUnit(quantity: number, unitPriceCents: Cents): boolean {
  return quantity > 0 && unitPriceCents > 0;
}

function perUnitAmount(quantity: number, unitPriceCents: Cents) {
  return {
    quantity,
    unitPriceCents,
    amountCents: multiplyCents(unitPriceCents, quantity, 'per-unit amount'),
    taxCents: null,
  };
}

function plural(count: number, noun: string): string {
  return `${count} ${noun}${count === 1 ? '' : 's'}`;
}

/**
 * Input and output types of the pricing engine. The API maps its product, quote and workshop
 * entities to `PricingInput` and stores the `PackagePrice` as the quote version's priced
 * snapshot. Every amount is integer cents (`Cents`); every count and minute is a whole number.
 */
import type { Cents } from './cents';

export type PricingProductKind = 'wheel' | 'tyre' | 'suspension-kit' | 'component' | 'service';

/** The kinds that are goods (parts) rather than a service. */
export type PartKind = Exclude<PricingProductKind, 'service'>;

export const PART_KINDS: readonly PartKind[] = ['wheel', 'tyre', 'suspension-kit', 'component'];

export const PRICING_PRODUCT_KINDS: readonly PricingProductKind[] = [...PART_KINDS, 'service'];

export function isPartKind(kind: PricingProductKind): kind is PartKind {
  return kind !== 'service';
}

/** The bay the labour is done in (null: no bay time). */
export type PricingBayKind = 'hoist' | 'alignment' | 'tyre';

export const PRICING_BAY_KINDS: readonly PricingBayKind[] = ['hoist', 'alignment', 'tyre'];

/**
 * How GST is rounded on a multi-line invoice (A New Tax System (Goods and Services Tax) Act
 * 1999 s 9-90 as summarised in REFERENCES.md; both are lawful):
 * - `per-invoice`: tax worked out once on the total, then rounded;
 * - `per-line`: tax worked out and rounded on each line, then added.
 */
export type TaxRoundingMethod = 'per-invoice' | 'per-line';

export const TAX_ROUNDING_METHODS: readonly TaxRoundingMethod[] = ['per-invoice', 'per-line'];

export const DEFAULT_TAX_ROUNDING_METHOD: TaxRoundingMethod = 'per-invoice';

/** One product in the package, as the catalogue holds it at the time of pricing. */
export interface PackageLine {
  productId: string;
  sku: string;
  name: string;
  kind: PricingProductKind;
  /** Units; for a per-wheel service, units per wheel fitted (normally 1). */
  quantity: number;
  /** Price of one unit, integer cents, on the policy's tax basis (`pricesIncludeTax`). */
  unitPriceCents: Cents;
  /**
   * Labour per unit, whole minutes. Charged at the labour rate for parts; for a service the
   * price already includes the work, so its minutes are bay time only and are not charged again.
   */
  labourMinutes: number;
  bayKind: PricingBayKind | null;
  /** Days to get the part in when it is not in stock (0: same day). */
  leadDays: number;
  /** Units on the shelf now. */
  stockQty: number;
  /** Services only: charged per wheel fitted (quantity × wheelsFitted units). */
  perWheel?: boolean;
}

export interface BundleDiscountPolicy {
  enabled: boolean;
  /** 0–100, at most two decimals; applied to the parts total. */
  percent: number;
  /** The package must hold at least one line of each of these kinds (e.g. kit, wheel, tyre). */
  requiresKinds: readonly PricingProductKind[];
}

export interface DepositPolicy {
  /** Percentage of the total, 0–100, at most two decimals. */
  percent: number;
  /** The deposit is at least this much (never more than the total). */
  floorCents: Cents;
  /** The deposit is at most this much; not below `floorCents`. */
  capCents: Cents;
  /** Used instead of `percent` when any part is special-order; not below `percent`. */
  specialOrderPercent: number;
}

/** The workshop's pricing policy (managed under Policies). */
export interface PricingPolicy {
  labourRateCentsPerHour: Cents;
  /** True: every price, rate and levy here and on the lines includes tax (GST-inclusive). */
  pricesIncludeTax: boolean;
  /** 10 for Australian GST; 0–100, at most two decimals. */
  taxRatePercent: number;
  /** Default `per-invoice`. */
  taxRoundingMethod?: TaxRoundingMethod;
  fittingBalancingCentsPerWheel: Cents;
  tyreDisposalCentsPerTyre: Cents;
  bundleDiscount: BundleDiscountPolicy;
  deposit: DepositPolicy;
  /** Days the quote holds its prices, at least 1. */
  quoteValidDays: number;
}

export interface PricingInput {
  lines: readonly PackageLine[];
  /** Wheels mounted, balanced and fitted (fitting & balancing, per-wheel services). */
  wheelsFitted: number;
  /** Old tyres the workshop takes back (tyre disposal levy). */
  tyresReplaced: number;
  policy: PricingPolicy;
  /**
   * A discount the desk gives on a revised quote, whole cents, taken off after the bundle
   * discount. It never takes the package below zero: the engine applies at most the subtotal
   * before it (`workshopDiscountLimitCents`), and the caller refuses a larger request.
   */
  workshopDiscountCents?: Cents;
}

export type PricedLineKind =
  | 'part'
  | 'service'
  | 'labour'
  | 'fitting-balancing'
  | 'tyre-disposal'
  | 'bundle-discount'
  | 'workshop-discount';

interface PricedLineCommon {
  /** Plain words for the quote. */
  description: string;
  /** Integer cents on the policy's tax basis; negative only for the bundle discount. */
  amountCents: Cents;
  /** This line's tax with `per-line` rounding; null with `per-invoice` rounding. */
  taxCents: Cents | null;
}

export interface PricedPartLine extends PricedLineCommon {
  kind: 'part';
  productKind: PartKind;
  productId: string;
  sku: string;
  quantity: number;
  unitPriceCents: Cents;
  /** Not enough on the shelf and a lead time: it must be ordered in. */
  specialOrder: boolean;
  leadDays: number;
}

export interface PricedServiceLine extends PricedLineCommon {
  kind: 'service';
  productId: string;
  sku: string;
  /** Units charged (for a per-wheel service: quantity × wheels fitted). */
  quantity: number;
  unitPriceCents: Cents;
  perWheel: boolean;
  /** Bay time the service takes (quantity × minutes per unit); included in the price. */
  bayMinutes: number;
  bayKind: PricingBayKind | null;
}

export interface PricedLabourLine extends PricedLineCommon {
  kind: 'labour';
  /** The part the labour fits. */
  productId: string;
  sku: string;
  /** Quantity × minutes per unit. */
  labourMinutes: number;
  labourRateCentsPerHour: Cents;
  bayKind: PricingBayKind | null;
}

export interface PricedFittingBalancingLine extends PricedLineCommon {
  kind: 'fitting-balancing';
  /** Wheels fitted. */
  quantity: number;
  unitPriceCents: Cents;
}

export interface PricedTyreDisposalLine extends PricedLineCommon {
  kind: 'tyre-disposal';
  /** Tyres replaced. */
  quantity: number;
  unitPriceCents: Cents;
}

export interface PricedBundleDiscountLine extends PricedLineCommon {
  kind: 'bundle-discount';
  percent: number;
  /** The parts total the percentage is taken of. */
  discountedCents: Cents;
}

export interface PricedWorkshopDiscountLine extends PricedLineCommon {
  kind: 'workshop-discount';
}

export type PricedLine =
  | PricedWorkshopDiscountLine
  | PricedPartLine
  | PricedServiceLine
  | PricedLabourLine
  | PricedFittingBalancingLine
  | PricedTyreDisposalLine
  | PricedBundleDiscountLine;

/** Which bound decided the deposit. */
export type DepositBasis = 'percentage' | 'floor' | 'cap' | 'total';

export interface DepositOutcome {
  depositCents: Cents;
  /** The percentage used: the policy's `specialOrderPercent` when any part is special-order. */
  percentApplied: number;
  /** The percentage of the total before the floor, cap and total were applied. */
  percentageCents: Cents;
  basis: DepositBasis;
  specialOrder: boolean;
  /** SKUs of the special-order parts, in line order. */
  specialOrderSkus: string[];
}

/** Totals of each line kind; they add up to `subtotalCents`. */
export interface PriceBreakdown {
  partsCents: Cents;
  servicesCents: Cents;
  labourCents: Cents;
  fittingBalancingCents: Cents;
  tyreDisposalCents: Cents;
  /** Zero or negative. */
  bundleDiscountCents: Cents;
  /** Zero or negative (absent from versions saved before the desk could give one). */
  workshopDiscountCents: Cents;
}

export interface PackagePrice {
  /**
   * Parts, services, labour, fitting & balancing, tyre disposal, bundle discount, workshop
   * discount, in that order.
   */
  lines: PricedLine[];
  breakdown: PriceBreakdown;
  /** The sum of the lines, exactly (tax included when `pricesIncludeTax`). */
  subtotalCents: Cents;
  /** GST: included in the subtotal when prices include tax, added to it when they do not. */
  taxCents: Cents;
  /** What the customer pays: the subtotal, plus the tax when prices exclude it. */
  totalCents: Cents;
  totalExcludingTaxCents: Cents;
  pricesIncludeTax: boolean;
  taxRatePercent: number;
  taxRoundingMethod: TaxRoundingMethod;
  bundleDiscountApplied: boolean;
  deposit: DepositOutcome;
  depositCents: Cents;
  balanceDueCents: Cents;
  quoteValidDays: number;
  /** The rounding and tax method, in words, for the quote. */
  roundingNote: string;
}

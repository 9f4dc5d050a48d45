import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { BAY_KINDS, PRODUCT_KINDS } from '../../catalogue/product-kinds';
import type { PackagePrice } from '../../pricing/pricing.types';
import { TAX_ROUNDING_METHODS } from '../../pricing/pricing.types';

const PRICED_LINE_KINDS = [
  'part',
  'service',
  'labour',
  'fitting-balancing',
  'tyre-disposal',
  'bundle-discount',
  'workshop-discount',
];

/**
 * One line of the pricing engine's result. Fields beyond kind, description, amountCents and
 * taxCents belong to some kinds only (see docs/pricing.md).
 */
export class PricedLineResponse {
  @ApiProperty({ enum: PRICED_LINE_KINDS, enumName: 'PricedLineKind' })
  kind!: string;

  @ApiProperty({ example: 'Bramblerock Strata 50 mm lift kit, medium load (150–300 kg)' })
  description!: string;

  @ApiProperty({ example: 174500, description: 'Integer cents; negative only for the discount' })
  amountCents!: number;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: "This line's GST with per-line rounding; null with per-invoice rounding",
  })
  taxCents!: number | null;

  @ApiPropertyOptional({
    enum: PRODUCT_KINDS.filter((kind) => kind !== 'service'),
    enumName: 'PartKind',
    description: 'part',
  })
  productKind?: string;

  @ApiPropertyOptional({ format: 'uuid', description: 'part, service, labour' })
  productId?: string;

  @ApiPropertyOptional({ description: 'part, service, labour' })
  sku?: string;

  @ApiPropertyOptional({
    description: 'part, service (units charged), fitting-balancing (wheels), tyre-disposal (tyres)',
  })
  quantity?: number;

  @ApiPropertyOptional({ description: 'part, service, fitting-balancing, tyre-disposal' })
  unitPriceCents?: number;

  @ApiPropertyOptional({ description: 'part: must be ordered in' })
  specialOrder?: boolean;

  @ApiPropertyOptional({ description: 'part' })
  leadDays?: number;

  @ApiPropertyOptional({ description: 'service: charged per wheel fitted' })
  perWheel?: boolean;

  @ApiPropertyOptional({ description: 'service: bay time included in its price' })
  bayMinutes?: number;

  @ApiPropertyOptional({
    enum: BAY_KINDS,
    enumName: 'BayKind',
    nullable: true,
    description: 'service, labour',
  })
  bayKind?: string | null;

  @ApiPropertyOptional({ description: 'labour: quantity × minutes per unit' })
  labourMinutes?: number;

  @ApiPropertyOptional({ description: 'labour' })
  labourRateCentsPerHour?: number;

  @ApiPropertyOptional({ description: 'bundle-discount' })
  percent?: number;

  @ApiPropertyOptional({ description: 'bundle-discount: the parts total it was taken of' })
  discountedCents?: number;
}

export class PriceBreakdownResponse {
  @ApiProperty()
  partsCents!: number;

  @ApiProperty()
  servicesCents!: number;

  @ApiProperty()
  labourCents!: number;

  @ApiProperty()
  fittingBalancingCents!: number;

  @ApiProperty()
  tyreDisposalCents!: number;

  @ApiProperty({ description: 'Zero or negative' })
  bundleDiscountCents!: number;

  @ApiProperty({ description: "Zero or negative: the desk's discount on a revised quote" })
  workshopDiscountCents!: number;
}

export class DepositOutcomeResponse {
  @ApiProperty()
  depositCents!: number;

  @ApiProperty({ example: 20 })
  percentApplied!: number;

  @ApiProperty({ description: 'The percentage of the total before the floor and cap' })
  percentageCents!: number;

  @ApiProperty({ enum: ['percentage', 'floor', 'cap', 'total'], enumName: 'DepositBasis' })
  basis!: string;

  @ApiProperty()
  specialOrder!: boolean;

  @ApiProperty({ type: [String] })
  specialOrderSkus!: string[];
}

/** The pricing engine's PackagePrice, every field, as computed (preview) or saved (version). */
export class PackagePriceResponse {
  @ApiProperty({ type: [PricedLineResponse] })
  lines!: PricedLineResponse[];

  @ApiProperty({ type: PriceBreakdownResponse })
  breakdown!: PriceBreakdownResponse;

  @ApiProperty()
  subtotalCents!: number;

  @ApiProperty({ description: 'GST: included in the total when prices include tax' })
  taxCents!: number;

  @ApiProperty()
  totalCents!: number;

  @ApiProperty()
  totalExcludingTaxCents!: number;

  @ApiProperty()
  pricesIncludeTax!: boolean;

  @ApiProperty({ example: 10 })
  taxRatePercent!: number;

  @ApiProperty({ enum: TAX_ROUNDING_METHODS, enumName: 'TaxRoundingMethod' })
  taxRoundingMethod!: string;

  @ApiProperty()
  bundleDiscountApplied!: boolean;

  @ApiProperty({ type: DepositOutcomeResponse })
  deposit!: DepositOutcomeResponse;

  @ApiProperty()
  depositCents!: number;

  @ApiProperty()
  balanceDueCents!: number;

  @ApiProperty()
  quoteValidDays!: number;

  @ApiProperty({ description: 'The rounding and tax method in words' })
  roundingNote!: string;

  static from(price: PackagePrice): PackagePriceResponse {
    // The engine's result and a loaded snapshot are both fresh objects of this request: no copy.
    // Versions saved before the desk could give a discount have no workshop discount figure.
    price.breakdown.workshopDiscountCents ??= 0;
    return Object.assign(new PackagePriceResponse(), price);
  }
}

import { ApiProperty } from '@nestjs/swagger';
import { PRODUCT_KINDS, type ProductKind } from '../../catalogue/product-kinds';
import {
  TAX_ROUNDING_METHODS,
  type PricingPolicy,
  type TaxRoundingMethod,
} from '../../pricing/pricing.types';

export class BundleDiscountPolicyResponse {
  @ApiProperty()
  enabled!: boolean;

  @ApiProperty({ example: 5, description: 'Percent of the parts total, at most two decimals' })
  percent!: number;

  @ApiProperty({
    enum: PRODUCT_KINDS,
    enumName: 'ProductKind',
    isArray: true,
    example: ['suspension-kit', 'wheel', 'tyre'],
    description: 'The package must hold a line of each of these kinds',
  })
  requiresKinds!: ProductKind[];
}

export class DepositPolicyResponse {
  @ApiProperty({ example: 20, description: 'Percent of the total, at most two decimals' })
  percent!: number;

  @ApiProperty({ example: 10000, description: 'Integer cents: the deposit is at least this' })
  floorCents!: number;

  @ApiProperty({ example: 100000, description: 'Integer cents: the deposit is at most this' })
  capCents!: number;

  @ApiProperty({ example: 50, description: 'Percent used when a part must be ordered in' })
  specialOrderPercent!: number;
}

/** The workshop's pricing policy (Manage → Policies). Money in integer cents. */
export class PolicyResponse {
  @ApiProperty({ example: 14000 })
  labourRateCentsPerHour!: number;

  @ApiProperty({
    description: 'True: catalogue prices, the labour rate and the charges below include GST',
  })
  pricesIncludeTax!: boolean;

  @ApiProperty({ example: 10, description: 'Percent, at most two decimals' })
  taxRatePercent!: number;

  @ApiProperty({ enum: TAX_ROUNDING_METHODS, enumName: 'TaxRoundingMethod' })
  taxRoundingMethod!: TaxRoundingMethod;

  @ApiProperty({ example: 3500 })
  fittingBalancingCentsPerWheel!: number;

  @ApiProperty({ example: 650 })
  tyreDisposalCentsPerTyre!: number;

  @ApiProperty({ type: BundleDiscountPolicyResponse })
  bundleDiscount!: BundleDiscountPolicyResponse;

  @ApiProperty({ type: DepositPolicyResponse })
  deposit!: DepositPolicyResponse;

  @ApiProperty({ example: 30, description: 'Days a quote holds its prices' })
  quoteValidDays!: number;

  @ApiProperty({ type: String, format: 'date-time' })
  updatedAt!: string;

  static from(policy: PricingPolicy, updatedAt: Date): PolicyResponse {
    return Object.assign(new PolicyResponse(), {
      labourRateCentsPerHour: policy.labourRateCentsPerHour,
      pricesIncludeTax: policy.pricesIncludeTax,
      taxRatePercent: policy.taxRatePercent,
      taxRoundingMethod: policy.taxRoundingMethod ?? 'per-invoice',
      fittingBalancingCentsPerWheel: policy.fittingBalancingCentsPerWheel,
      tyreDisposalCentsPerTyre: policy.tyreDisposalCentsPerTyre,
      bundleDiscount: {
        enabled: policy.bundleDiscount.enabled,
        percent: policy.bundleDiscount.percent,
        requiresKinds: [...policy.bundleDiscount.requiresKinds],
      },
      deposit: { ...policy.deposit },
      quoteValidDays: policy.quoteValidDays,
      updatedAt: updatedAt.toISOString(),
    });
  }
}

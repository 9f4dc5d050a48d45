import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayUnique,
  IsArray,
  IsDefined,
  IsIn,
  IsObject,
  ValidateNested,
} from 'class-validator';
import { PRODUCT_KINDS, type ProductKind } from '../../catalogue/product-kinds';
import {
  BooleanField,
  NumberInRange,
  WholeNumberInRange,
  oneOfMessage,
} from '../../common/decorators/field-validators';
import {
  MAX_LABOUR_RATE_CENTS_PER_HOUR,
  MAX_QUOTE_VALID_DAYS,
  MAX_UNIT_PRICE_CENTS,
} from '../../pricing/pricing-input';
import { TAX_ROUNDING_METHODS, type TaxRoundingMethod } from '../../pricing/pricing.types';

/** Integer cents of a fee, floor or cap: up to $10,000,000.00, as the engine allows. */
const CentsField = () => WholeNumberInRange(0, MAX_UNIT_PRICE_CENTS, 'cents');
/** 0–100 with at most two decimals (stored as basis points). */
const PercentField = () => NumberInRange(0, 100, '%', 2);
const Required = () => IsDefined({ message: 'is required' });

export class BundleDiscountPolicyDto {
  @Required()
  @BooleanField()
  @ApiProperty()
  enabled!: boolean;

  @Required()
  @PercentField()
  @ApiProperty({ example: 5, minimum: 0, maximum: 100 })
  percent!: number;

  @Required()
  @IsArray({ message: 'must be a list of product kinds' })
  @ArrayMaxSize(PRODUCT_KINDS.length, {
    message: `must name at most ${PRODUCT_KINDS.length} kinds`,
  })
  @ArrayUnique({ message: 'must not name a kind twice' })
  @IsIn(PRODUCT_KINDS, { each: true, message: oneOfMessage(PRODUCT_KINDS) })
  @ApiProperty({ enum: PRODUCT_KINDS, enumName: 'ProductKind', isArray: true })
  requiresKinds!: ProductKind[];
}

export class DepositPolicyDto {
  @Required()
  @PercentField()
  @ApiProperty({ example: 20, minimum: 0, maximum: 100 })
  percent!: number;

  @Required()
  @CentsField()
  @ApiProperty({ example: 10000 })
  floorCents!: number;

  @Required()
  @CentsField()
  @ApiProperty({ example: 100000, description: 'Not below floorCents' })
  capCents!: number;

  @Required()
  @PercentField()
  @ApiProperty({ example: 50, minimum: 0, maximum: 100, description: 'Not below percent' })
  specialOrderPercent!: number;
}

/** PUT /api/policies: the whole policy, every field required (PolicyResponse without updatedAt). */
export class UpdatePolicyDto {
  @Required()
  @WholeNumberInRange(0, MAX_LABOUR_RATE_CENTS_PER_HOUR, 'cents')
  @ApiProperty({ example: 14000 })
  labourRateCentsPerHour!: number;

  @Required()
  @BooleanField()
  @ApiProperty()
  pricesIncludeTax!: boolean;

  @Required()
  @PercentField()
  @ApiProperty({ example: 10, minimum: 0, maximum: 100 })
  taxRatePercent!: number;

  @Required()
  @IsIn(TAX_ROUNDING_METHODS, { message: oneOfMessage(TAX_ROUNDING_METHODS) })
  @ApiProperty({ enum: TAX_ROUNDING_METHODS, enumName: 'TaxRoundingMethod' })
  taxRoundingMethod!: TaxRoundingMethod;

  @Required()
  @CentsField()
  @ApiProperty({ example: 3500 })
  fittingBalancingCentsPerWheel!: number;

  @Required()
  @CentsField()
  @ApiProperty({ example: 650 })
  tyreDisposalCentsPerTyre!: number;

  @Required()
  @IsObject({ message: 'must be an object' })
  @ValidateNested()
  @Type(() => BundleDiscountPolicyDto)
  @ApiProperty({ type: BundleDiscountPolicyDto })
  bundleDiscount!: BundleDiscountPolicyDto;

  @Required()
  @IsObject({ message: 'must be an object' })
  @ValidateNested()
  @Type(() => DepositPolicyDto)
  @ApiProperty({ type: DepositPolicyDto })
  deposit!: DepositPolicyDto;

  @Required()
  @WholeNumberInRange(1, MAX_QUOTE_VALID_DAYS, 'days')
  @ApiProperty({ example: 30, minimum: 1, maximum: MAX_QUOTE_VALID_DAYS })
  quoteValidDays!: number;
}

import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  ArrayUnique,
  IsArray,
  IsIn,
  IsOptional,
  IsUUID,
  ValidateNested,
} from 'class-validator';
import { WholeNumberInRange, oneOfMessage } from '../../common/decorators/field-validators';
import { VEHICLE_USES, type VehicleUse } from '../quote-states';

/** Most units of one product in a package (dual rear wheels, spares, a fleet's set). */
export const MAX_ITEM_QUANTITY = 24;
/** Most products in one package. */
export const MAX_PACKAGE_ITEMS = 30;

export class QuoteItemDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'must be a UUID' })
  productId!: string;

  @ApiProperty({ minimum: 1, maximum: MAX_ITEM_QUANTITY, example: 4 })
  @WholeNumberInRange(1, MAX_ITEM_QUANTITY)
  quantity!: number;
}

/**
 * The package a customer (or the desk) builds in the planner. The server derives the wheels
 * fitted and tyres replaced from the wheel and tyre lines and charges fitting, balancing and
 * tyre disposal from the workshop's policy.
 */
export class QuotePackageDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'must be a UUID' })
  vehicleModelId!: string;

  @ApiPropertyOptional({
    format: 'uuid',
    description: "The customer's own vehicle (theirs, and of this model)",
  })
  @IsOptional()
  @IsUUID('all', { message: 'must be a UUID' })
  customerVehicleId?: string;

  @ApiPropertyOptional({ example: 2019, description: "Within the model's years" })
  @IsOptional()
  @WholeNumberInRange(1900, 2100)
  vehicleYear?: number;

  @ApiProperty({ enum: VEHICLE_USES, enumName: 'VehicleUse', isArray: true, maxItems: 4 })
  @IsArray({ message: 'must be a list of uses' })
  @ArrayMaxSize(VEHICLE_USES.length, { message: `must hold at most ${VEHICLE_USES.length} uses` })
  @ArrayUnique({ message: 'must not name a use twice' })
  @IsIn(VEHICLE_USES, { each: true, message: oneOfMessage(VEHICLE_USES) })
  uses!: VehicleUse[];

  @ApiPropertyOptional({
    minimum: 0,
    maximum: 3000,
    default: 0,
    description: 'Permanent extra load, kg (drawers, canopy, water, tools)',
  })
  @IsOptional()
  @WholeNumberInRange(0, 3000, 'kg')
  constantLoadKg?: number;

  @ApiProperty({
    type: [QuoteItemDto],
    minItems: 1,
    maxItems: MAX_PACKAGE_ITEMS,
    description:
      'At most one wheel, one tyre and one suspension kit, plus components and services; each product once. Fitting, balancing and tyre disposal are charged by the policy, not sent as items.',
  })
  @IsArray({ message: 'must be a list of products and quantities' })
  @ArrayMinSize(1, { message: 'must hold at least one product' })
  @ArrayMaxSize(MAX_PACKAGE_ITEMS, { message: `must hold at most ${MAX_PACKAGE_ITEMS} products` })
  @ValidateNested({ each: true })
  @Type(() => QuoteItemDto)
  items!: QuoteItemDto[];
}

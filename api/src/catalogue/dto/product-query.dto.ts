import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional, IsUUID } from 'class-validator';
import {
  TrimmedText,
  WholeNumberInRange,
  oneOfMessage,
} from '../../common/decorators/field-validators';
import { PRODUCT_KINDS, type ProductKind } from '../product-kinds';

function queryBoolean({ value }: { value: unknown }): unknown {
  if (value === 'true') return true;
  if (value === 'false') return false;
  return value;
}

export class ProductQueryDto {
  @ApiPropertyOptional({
    format: 'uuid',
    description:
      "Only products made for this vehicle model, each with its fit verdict on the vehicle's stock set-up",
  })
  @IsOptional()
  @IsUUID('all', { message: 'must be a UUID' })
  vehicleModelId?: string;

  @ApiPropertyOptional({ enum: PRODUCT_KINDS, enumName: 'ProductKind' })
  @IsOptional()
  @IsIn(PRODUCT_KINDS, { message: oneOfMessage(PRODUCT_KINDS) })
  kind?: ProductKind;

  @ApiPropertyOptional({ description: 'Words matched against SKU, name and brand (any case)' })
  @IsOptional()
  @TrimmedText(0, 100)
  q?: string;

  @ApiPropertyOptional({ description: 'Managers only: include switched-off products' })
  @IsOptional()
  @Transform(queryBoolean)
  @IsBoolean({ message: 'must be true or false' })
  includeInactive?: boolean;

  @ApiPropertyOptional({
    minimum: 0,
    maximum: 3000,
    description:
      "With vehicleModelId: the declared constant load, kg, for the kits' spring-rating verdicts (0 when absent)",
  })
  @IsOptional()
  @Type(() => Number)
  @WholeNumberInRange(0, 3000, 'kg')
  constantLoadKg?: number;
}

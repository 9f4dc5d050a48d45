import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsIn, IsOptional, IsUUID, ValidateNested } from 'class-validator';
import { PRODUCT_KINDS, type ProductKind } from '../../catalogue/product-kinds';
import { WholeNumberInRange, oneOfMessage } from '../../common/decorators/field-validators';
import { MAX_PACKAGE_ITEMS, QuoteItemDto } from './quote-package.dto';

export class PlannerOptionsDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'must be a UUID' })
  vehicleModelId!: string;

  @ApiPropertyOptional({ minimum: 0, maximum: 3000, default: 0 })
  @IsOptional()
  @WholeNumberInRange(0, 3000, 'kg')
  constantLoadKg?: number;

  @ApiProperty({
    type: [QuoteItemDto],
    maxItems: MAX_PACKAGE_ITEMS,
    description: 'The current selection (may be empty)',
  })
  @IsArray({ message: 'must be a list of products and quantities' })
  @ArrayMaxSize(MAX_PACKAGE_ITEMS, { message: `must hold at most ${MAX_PACKAGE_ITEMS} products` })
  @ValidateNested({ each: true })
  @Type(() => QuoteItemDto)
  items!: QuoteItemDto[];

  @ApiProperty({ enum: PRODUCT_KINDS, enumName: 'ProductKind', description: 'The kind to choose' })
  @IsIn(PRODUCT_KINDS, { message: oneOfMessage(PRODUCT_KINDS) })
  kind!: ProductKind;
}

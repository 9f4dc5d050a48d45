import { ApiProperty, ApiPropertyOptional, OmitType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsOptional, ValidateNested } from 'class-validator';
import { TrimmedText, WholeNumberInRange } from '../../common/decorators/field-validators';
import { MAX_PACKAGE_ITEMS, QuoteItemDto, QuotePackageDto } from './quote-package.dto';

/** Most labour the desk can put on one unit: a day. */
export const MAX_REVISION_LABOUR_MINUTES = 1440;
/** Largest workshop discount, cents ($100,000: beyond any package here). */
export const MAX_REVISION_DISCOUNT_CENTS = 10_000_000;

export class RevisionItemDto extends QuoteItemDto {
  @ApiPropertyOptional({
    minimum: 0,
    maximum: MAX_REVISION_LABOUR_MINUTES,
    description:
      "Labour minutes per unit for this revision, instead of the catalogue's (it changes the labour charged and the bay time)",
  })
  @IsOptional()
  @WholeNumberInRange(0, MAX_REVISION_LABOUR_MINUTES, 'minutes')
  labourMinutes?: number;
}

/** A revision as the desk edits it: the package, per-line labour and a discount. */
export class RevisionPackageDto extends OmitType(QuotePackageDto, ['items'] as const) {
  @ApiProperty({
    type: [RevisionItemDto],
    minItems: 1,
    maxItems: MAX_PACKAGE_ITEMS,
    description:
      "The package's products, as when saving a quote, each with an optional labour override",
  })
  @IsArray({ message: 'must be a list of products and quantities' })
  @ArrayMinSize(1, { message: 'must hold at least one product' })
  @ArrayMaxSize(MAX_PACKAGE_ITEMS, { message: `must hold at most ${MAX_PACKAGE_ITEMS} products` })
  @ValidateNested({ each: true })
  @Type(() => RevisionItemDto)
  items!: RevisionItemDto[];

  @ApiPropertyOptional({
    minimum: 0,
    maximum: MAX_REVISION_DISCOUNT_CENTS,
    description: 'Workshop discount, integer cents, not more than the package before it',
  })
  @IsOptional()
  @WholeNumberInRange(0, MAX_REVISION_DISCOUNT_CENTS, 'cents')
  discountCents?: number;
}

/** Previewing a revision (writes nothing): the reason may still be missing. */
export class RevisionPreviewDto extends RevisionPackageDto {
  @ApiPropertyOptional({ maxLength: 500 })
  @IsOptional()
  @TrimmedText(5, 500)
  reason?: string;
}

/** Saving the revision: the package with the reason the customer will read. */
export class ReviseQuoteDto extends RevisionPackageDto {
  @ApiProperty({
    minLength: 5,
    maxLength: 500,
    example:
      'The Trekline tyre is out of stock until March: swapped for the Ridgeback in the same size.',
  })
  @TrimmedText(5, 500)
  reason!: string;
}

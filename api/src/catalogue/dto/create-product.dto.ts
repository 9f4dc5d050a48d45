import {
  ApiProperty,
  ApiPropertyOptional,
  IntersectionType,
  PartialType,
  PickType,
  getSchemaPath,
} from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsDefined,
  IsIn,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  Matches,
  ValidateBy,
} from 'class-validator';
import {
  BooleanField,
  TrimmedText,
  WholeNumberInRange,
  oneOfMessage,
} from '../../common/decorators/field-validators';
import { MAX_PRICE_CENTS } from '../money';
import {
  ComponentAttributesDto,
  ServiceAttributesDto,
  SuspensionKitAttributesDto,
  TyreAttributesDto,
  WheelAttributesDto,
} from '../product-attributes';
import {
  BAY_KINDS,
  type BayKind,
  FORMULA_START_PATTERN,
  PRODUCT_KINDS,
  type ProductKind,
  SKU_PATTERN,
} from '../product-kinds';

export const ATTRIBUTES_SCHEMA = {
  description:
    'Per kind: wheel, tyre, suspension-kit, component or service attributes (validated for the kind; errors as "attributes.<field>")',
  oneOf: [
    { $ref: getSchemaPath(WheelAttributesDto) },
    { $ref: getSchemaPath(TyreAttributesDto) },
    { $ref: getSchemaPath(SuspensionKitAttributesDto) },
    { $ref: getSchemaPath(ComponentAttributesDto) },
    { $ref: getSchemaPath(ServiceAttributesDto) },
  ],
};

/** Refuses text a spreadsheet would run as a formula (see FORMULA_START_PATTERN). */
function NotFormula() {
  return ValidateBy({
    name: 'notFormula',
    validator: {
      validate: (value: unknown) => typeof value !== 'string' || !FORMULA_START_PATTERN.test(value),
      defaultMessage: () =>
        'must not start with =, +, - or @ (a spreadsheet would run it as a formula)',
    },
  });
}

/** The fields every product has; the CSV import validates its rows with the same class. */
export class ProductFieldsDto {
  @ApiProperty({ example: 'BR-STR-50-M', description: 'Upper-case letters, digits and hyphens' })
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'must be text' })
  @Matches(SKU_PATTERN, { message: 'must be 2 to 40 upper-case letters, digits and hyphens' })
  sku!: string;

  @ApiProperty({ enum: PRODUCT_KINDS, enumName: 'ProductKind' })
  @IsIn(PRODUCT_KINDS, { message: oneOfMessage(PRODUCT_KINDS) })
  kind!: ProductKind;

  @ApiProperty({ example: 'Strata 50 mm kit, medium load', maxLength: 120 })
  @TrimmedText(1, 120)
  @NotFormula()
  name!: string;

  @ApiProperty({ example: 'Bramblerock', maxLength: 60 })
  @TrimmedText(1, 60)
  @NotFormula()
  brand!: string;

  @ApiProperty({ example: 189500, description: 'Price including tax, integer cents' })
  @WholeNumberInRange(0, MAX_PRICE_CENTS, 'cents')
  priceCents!: number;

  @ApiProperty({ example: 240, minimum: 0, maximum: 6000 })
  @WholeNumberInRange(0, 6000, 'minutes')
  labourMinutes!: number;

  @ApiProperty({ enum: BAY_KINDS, enumName: 'BayKind', nullable: true })
  @IsOptional()
  @IsIn(BAY_KINDS, { message: oneOfMessage(BAY_KINDS) })
  bayKind!: BayKind | null;

  @ApiProperty({ example: 4, minimum: 0, maximum: 100000 })
  @WholeNumberInRange(0, 100000)
  stockQty!: number;

  @ApiProperty({
    example: 0,
    minimum: 0,
    maximum: 365,
    description: 'Days to get it in when out of stock',
  })
  @WholeNumberInRange(0, 365, 'days')
  leadDays!: number;

  @ApiProperty()
  @BooleanField()
  active!: boolean;

  @ApiProperty(ATTRIBUTES_SCHEMA)
  @IsDefined({ message: 'is required' })
  @IsObject({ message: 'must be an object' })
  attributes!: Record<string, unknown>;
}

/** POST: the product fields (labour, bay, stock, lead days and active have defaults). */
export class CreateProductDto extends IntersectionType(
  PickType(ProductFieldsDto, ['sku', 'kind', 'name', 'brand', 'priceCents', 'attributes'] as const),
  PartialType(
    PickType(ProductFieldsDto, [
      'labourMinutes',
      'bayKind',
      'stockQty',
      'leadDays',
      'active',
    ] as const),
  ),
) {
  @ApiPropertyOptional({ maxLength: 2000, default: '' })
  @IsOptional()
  @TrimmedText(0, 2000)
  description?: string;

  @ApiPropertyOptional({
    type: [String],
    format: 'uuid',
    default: [],
    description: 'Vehicle models it is made for; empty: any vehicle (the fit report decides)',
  })
  @IsOptional()
  @IsArray({ message: 'must be a list of vehicle model ids' })
  @ArrayMaxSize(200, { message: 'must hold at most 200 ids' })
  @IsUUID('all', { each: true, message: 'must hold vehicle model ids (UUIDs)' })
  fitsVehicleModelIds?: string[];
}

import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { VERDICTS_WORST_FIRST, type FitVerdict } from '../../fitment/fitment.types';
import type { Product } from '../entities/product.entity';
import type { ProductAttributes } from '../product-attributes';
import { BAY_KINDS, type BayKind, PRODUCT_KINDS, type ProductKind } from '../product-kinds';
import { ATTRIBUTES_SCHEMA } from './create-product.dto';

export class ProductResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ example: 'BR-STR-50-M' })
  sku!: string;

  @ApiProperty({ enum: PRODUCT_KINDS, enumName: 'ProductKind' })
  kind!: ProductKind;

  @ApiProperty()
  name!: string;

  @ApiProperty()
  brand!: string;

  @ApiProperty()
  description!: string;

  @ApiProperty({ example: 189500, description: 'Integer cents, tax included' })
  priceCents!: number;

  @ApiProperty({ example: 240 })
  labourMinutes!: number;

  @ApiProperty({ enum: BAY_KINDS, enumName: 'BayKind', nullable: true })
  bayKind!: BayKind | null;

  @ApiProperty({ example: 4 })
  stockQty!: number;

  @ApiProperty({ example: 0 })
  leadDays!: number;

  @ApiProperty()
  active!: boolean;

  @ApiProperty({ type: [String], format: 'uuid', description: 'Empty: any vehicle' })
  fitsVehicleModelIds!: string[];

  @ApiProperty(ATTRIBUTES_SCHEMA)
  attributes!: ProductAttributes;

  /** `product.fitsVehicleModels` must be loaded. */
  static from(product: Product): ProductResponse {
    return Object.assign(new ProductResponse(), ProductResponse.fieldsOf(product));
  }

  protected static fieldsOf(product: Product): Omit<ProductResponse, never> {
    return {
      id: product.id,
      sku: product.sku,
      kind: product.kind,
      name: product.name,
      brand: product.brand,
      description: product.description,
      priceCents: product.priceCents,
      labourMinutes: product.labourMinutes,
      bayKind: product.bayKind,
      stockQty: product.stockQty,
      leadDays: product.leadDays,
      active: product.active,
      fitsVehicleModelIds: product.fitsVehicleModels
        .getItems()
        .map((vehicle) => vehicle.id)
        .sort(),
      attributes: { ...product.attributes },
    };
  }
}

export class ProductFitResponse {
  @ApiProperty({ enum: VERDICTS_WORST_FIRST, enumName: 'FitVerdict' })
  verdict!: FitVerdict;

  @ApiProperty({
    example:
      "Does not fit: The wheel's 6x114.3 bolt pattern does not match the vehicle's 6x139.7: it cannot be bolted on.",
  })
  summary!: string;
}

export class ProductWithFitResponse extends ProductResponse {
  @ApiPropertyOptional({
    type: ProductFitResponse,
    description: "Only with vehicleModelId: this product alone on the vehicle's stock set-up",
  })
  fit?: ProductFitResponse;
}

export class ProductListResponse {
  @ApiProperty({ type: [ProductWithFitResponse] })
  items!: ProductWithFitResponse[];
}

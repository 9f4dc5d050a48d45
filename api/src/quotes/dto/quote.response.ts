import { ApiProperty } from '@nestjs/swagger';
import { BAY_KINDS, PRODUCT_KINDS } from '../../catalogue/product-kinds';
import { FitReportResponse } from '../../fit-reports/dto/fit-report.response';
import { ROLES } from '../../users/user-role';
import { QUOTE_VERSION_STATES, VEHICLE_USES } from '../quote-states';
import { PackagePriceResponse } from './package-price.response';

export class QuoteCustomerResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty()
  name!: string;

  @ApiProperty()
  email!: string;
}

export class QuoteCustomerVehicleResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ type: String, nullable: true })
  nickname!: string | null;

  @ApiProperty({ type: String, nullable: true })
  rego!: string | null;
}

export class QuoteVehicleResponse {
  @ApiProperty({ format: 'uuid' })
  vehicleModelId!: string;

  @ApiProperty({ example: 'Vantrel Strata SR dual cab' })
  name!: string;

  @ApiProperty({ type: Number, nullable: true })
  year!: number | null;

  @ApiProperty({ type: QuoteCustomerVehicleResponse, nullable: true })
  customerVehicle!: QuoteCustomerVehicleResponse | null;
}

export class QuotePhotoResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ enum: ['vehicle', 'tyre-placard'], enumName: 'UploadKind' })
  kind!: string;

  @ApiProperty()
  widthPx!: number;

  @ApiProperty()
  heightPx!: number;

  @ApiProperty({ example: '/api/uploads/4f0c…' })
  url!: string;

  @ApiProperty({ example: '/api/uploads/4f0c…/thumbnail' })
  thumbnailUrl!: string;
}

/** The catalogue values of one product as the version was priced from them. */
export class QuoteLineResponse {
  @ApiProperty({ example: 1 })
  position!: number;

  @ApiProperty({
    type: String,
    format: 'uuid',
    nullable: true,
    description: 'Null when the product was deleted since',
  })
  productId!: string | null;

  @ApiProperty()
  sku!: string;

  @ApiProperty()
  name!: string;

  @ApiProperty()
  brand!: string;

  @ApiProperty({ enum: PRODUCT_KINDS, enumName: 'ProductKind' })
  kind!: string;

  @ApiProperty()
  quantity!: number;

  @ApiProperty({ description: 'Integer cents, on the policy tax basis at the time' })
  unitPriceCents!: number;

  @ApiProperty()
  labourMinutes!: number;

  @ApiProperty({ enum: BAY_KINDS, enumName: 'BayKind', nullable: true })
  bayKind!: string | null;

  @ApiProperty()
  leadDays!: number;

  @ApiProperty()
  stockQty!: number;

  @ApiProperty()
  perWheel!: boolean;
}

export class QuoteVersionAuthorResponse {
  @ApiProperty()
  name!: string;

  @ApiProperty({ enum: ROLES, enumName: 'Role' })
  role!: string;
}

export class QuoteVersionResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ example: 1 })
  number!: number;

  @ApiProperty({
    enum: QUOTE_VERSION_STATES,
    enumName: 'QuoteVersionState',
    description: 'Effective state: a draft or sent version past validUntil reads expired',
  })
  state!: string;

  @ApiProperty({ type: String, format: 'date-time' })
  stateChangedAt!: string;

  @ApiProperty({ type: String, nullable: true })
  revisionReason!: string | null;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt!: string;

  @ApiProperty({ type: QuoteVersionAuthorResponse })
  createdBy!: QuoteVersionAuthorResponse;

  @ApiProperty({
    example: '2026-12-31',
    description: 'Last day the prices hold (workshop time zone)',
  })
  validUntilDate!: string;

  @ApiProperty({ type: String, format: 'date-time', description: 'The end of that day (UTC)' })
  validUntil!: string;

  @ApiProperty()
  wheelsFitted!: number;

  @ApiProperty()
  tyresReplaced!: number;

  @ApiProperty({ type: [QuoteLineResponse] })
  lines!: QuoteLineResponse[];

  @ApiProperty({ type: PackagePriceResponse })
  price!: PackagePriceResponse;

  @ApiProperty({ type: FitReportResponse })
  fitReport!: FitReportResponse;

  @ApiProperty({ description: 'The latest version, sent or accepted, and not past validUntil' })
  bookable!: boolean;

  @ApiProperty({ example: '/api/quotes/4f0c…/versions/1/pdf' })
  pdfUrl!: string;
}

export class QuoteResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ example: 123 })
  number!: number;

  @ApiProperty({ example: 'Q-000123' })
  reference!: string;

  @ApiProperty({ type: QuoteCustomerResponse })
  customer!: QuoteCustomerResponse;

  @ApiProperty({ type: QuoteVehicleResponse })
  vehicle!: QuoteVehicleResponse;

  @ApiProperty({ enum: VEHICLE_USES, enumName: 'VehicleUse', isArray: true })
  uses!: string[];

  @ApiProperty()
  constantLoadKg!: number;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt!: string;

  @ApiProperty({ type: [QuotePhotoResponse] })
  photos!: QuotePhotoResponse[];

  @ApiProperty({ type: [QuoteVersionResponse], description: 'Oldest first' })
  versions!: QuoteVersionResponse[];
}

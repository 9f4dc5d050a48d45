import { ApiProperty } from '@nestjs/swagger';
import { FitReportResponse } from '../../fit-reports/dto/fit-report.response';
import { PackagePriceResponse } from './package-price.response';

export class QuoteVehicleNameResponse {
  @ApiProperty({ format: 'uuid' })
  vehicleModelId!: string;

  @ApiProperty({ example: 'Vantrel Strata SR dual cab' })
  name!: string;
}

export class QuotePreviewResponse {
  @ApiProperty({ type: PackagePriceResponse })
  price!: PackagePriceResponse;

  @ApiProperty({ type: FitReportResponse })
  fitReport!: FitReportResponse;

  @ApiProperty({ description: 'max(quantity of the wheel line, quantity of the tyre line)' })
  wheelsFitted!: number;

  @ApiProperty({ description: 'Quantity of the tyre line' })
  tyresReplaced!: number;

  @ApiProperty({
    example: '2026-12-31',
    description: 'The last day the prices would hold if saved now (workshop time zone)',
  })
  validUntilDate!: string;

  @ApiProperty({ type: QuoteVehicleNameResponse })
  vehicle!: QuoteVehicleNameResponse;
}

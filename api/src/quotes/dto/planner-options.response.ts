import { ApiProperty } from '@nestjs/swagger';
import { ProductResponse } from '../../catalogue/dto/product.response';
import { SuggestedAdditionResponse } from '../../fit-reports/dto/fit-report.response';
import { VERDICTS_WORST_FIRST, type FitVerdict } from '../../fitment/fitment.types';

const ADDITION_ROLES = [
  'diff-drop',
  'alignment',
  'hub-rings',
  'greasable-shackles',
  'extended-brake-lines',
  'steering-damper',
  'headlight-re-aim',
  'speedometer-recalibration',
  'spring-rating',
];

/** The fit report's metrics for the package with this product in it. */
export class PlannerOptionMetricsResponse {
  @ApiProperty({ type: Number, nullable: true, example: 802.8 })
  newDiameterMm!: number | null;

  @ApiProperty({ type: Number, nullable: true, example: 3.4 })
  diameterChangePercent!: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    example: 96.7,
    description: 'What the speedometer reads at a true 100 km/h',
  })
  speedometerAtTrue100Kmh!: number | null;

  @ApiProperty({ example: 63.3 })
  combinedLiftMm!: number;

  @ApiProperty({ example: 20 })
  trackChangeMm!: number;
}

export class PlannerOptionResponse {
  @ApiProperty({ type: ProductResponse })
  product!: ProductResponse;

  @ApiProperty({ enum: VERDICTS_WORST_FIRST, enumName: 'FitVerdict' })
  verdict!: FitVerdict;

  @ApiProperty({ example: 'Fits with the rest of the package.' })
  summary!: string;

  @ApiProperty({ type: PlannerOptionMetricsResponse })
  metrics!: PlannerOptionMetricsResponse;

  @ApiProperty({
    enum: ADDITION_ROLES,
    enumName: 'AdditionRole',
    isArray: true,
    description: "Roles of the current package's suggested additions this product fills",
  })
  suggestedBy!: string[];
}

export class PlannerOptionsResponse {
  @ApiProperty({ type: [PlannerOptionResponse], description: 'Best verdict first, then price' })
  items!: PlannerOptionResponse[];

  @ApiProperty({
    type: [SuggestedAdditionResponse],
    description: "The current selection's suggested additions",
  })
  suggestedAdditions!: SuggestedAdditionResponse[];
}

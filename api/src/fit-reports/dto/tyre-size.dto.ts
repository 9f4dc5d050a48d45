import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength } from 'class-validator';

export class TyreSizeQueryDto {
  @ApiProperty({
    example: '265/70R17 115T',
    description: 'A tyre size, with or without service description',
  })
  @IsString({ message: 'must be text' })
  @MaxLength(60, { message: 'must be at most 60 characters' })
  designation!: string;
}

export class TyreGeometryResponse {
  @ApiProperty({ example: 265 })
  sectionWidthMm!: number;

  @ApiProperty({ example: 185.5 })
  sidewallHeightMm!: number;

  @ApiProperty({ example: 431.8 })
  rimDiameterMm!: number;

  @ApiProperty({ example: 802.8 })
  overallDiameterMm!: number;

  @ApiProperty({ example: 31.61 })
  overallDiameterIn!: number;

  @ApiProperty({ example: 2522.1 })
  circumferenceMm!: number;

  @ApiProperty({ example: 396.5 })
  revolutionsPerKm!: number;

  @ApiProperty({ example: 70 })
  aspectRatioPercent!: number;
}

export class TyreSizeResponse {
  @ApiProperty({ example: '265/70R17 115T', description: 'The canonical designation' })
  designation!: string;

  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    description:
      'The parsed size: kind "metric" (serviceType, sectionWidthMm, aspectRatioPercent, construction, zRatedMarking, rimDiameterIn) or "flotation" (overallDiameterIn, sectionWidthIn, construction, rimDiameterIn, lightTruck), with loadIndexSingle, loadIndexDual and speedSymbol (null when not given)',
    example: {
      kind: 'metric',
      serviceType: 'unmarked',
      sectionWidthMm: 265,
      aspectRatioPercent: 70,
      construction: 'radial',
      zRatedMarking: false,
      rimDiameterIn: 17,
      loadIndexSingle: 115,
      loadIndexDual: null,
      speedSymbol: 'T',
    },
  })
  size!: Record<string, unknown>;

  @ApiProperty({
    type: TyreGeometryResponse,
    description: 'Nominal dimensions (ISO 4000-1 / ETRTO), rounded to 0.1 mm (inches to 0.01)',
  })
  geometry!: TyreGeometryResponse;
}

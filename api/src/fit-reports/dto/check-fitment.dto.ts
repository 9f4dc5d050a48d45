import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsOptional, IsUUID } from 'class-validator';
import { WholeNumberInRange } from '../../common/decorators/field-validators';

export class CheckFitmentDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'must be a UUID' })
  vehicleModelId!: string;

  @ApiProperty({
    type: [String],
    format: 'uuid',
    description:
      'The package: at most one wheel, one tyre and one suspension kit, plus components and services',
  })
  @IsArray({ message: 'must be a list of product ids' })
  @ArrayMaxSize(30, { message: 'must hold at most 30 products' })
  @IsUUID('all', { each: true, message: 'must hold product ids (UUIDs)' })
  productIds!: string[];

  @ApiPropertyOptional({
    minimum: 0,
    maximum: 3000,
    example: 250,
    description: 'Permanent extra load, kg (drawers, canopy, water, tools)',
  })
  @IsOptional()
  @WholeNumberInRange(0, 3000, 'kg')
  constantLoadKg?: number;

  @ApiPropertyOptional({
    format: 'uuid',
    description: 'Rule set to apply; the default one when absent',
  })
  @IsOptional()
  @IsUUID('all', { message: 'must be a UUID' })
  ruleSetId?: string;
}

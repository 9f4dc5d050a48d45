import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsOptional } from 'class-validator';
import { TrimmedText, WholeNumberInRange } from '../../common/decorators/field-validators';

export class VehicleModelQueryDto {
  @ApiPropertyOptional({ description: 'Words matched against make, model and variant (any case)' })
  @IsOptional()
  @TrimmedText(0, 100)
  q?: string;

  @ApiPropertyOptional({ description: 'Exact make (any case)' })
  @IsOptional()
  @TrimmedText(0, 60)
  make?: string;

  @ApiPropertyOptional({ description: 'Model year within yearFrom..yearTo', example: 2020 })
  @IsOptional()
  @Type(() => Number)
  @WholeNumberInRange(1950, 2100)
  year?: number;
}

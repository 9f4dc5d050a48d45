import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional } from 'class-validator';
import { TrimmedText } from '../../common/decorators/field-validators';

export class CustomerQueryDto {
  @ApiPropertyOptional({
    description:
      'Words each found in the name or e-mail address (any case); without it, the first customers by name',
    maxLength: 100,
  })
  @IsOptional()
  @TrimmedText(0, 100)
  q?: string;
}

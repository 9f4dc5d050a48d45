import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsUUID } from 'class-validator';
import { TrimmedText } from '../../common/decorators/field-validators';

export class QuoteListQueryDto {
  @ApiPropertyOptional({ format: 'uuid', description: "Desk and manager: one customer's quotes" })
  @IsOptional()
  @IsUUID('all', { message: 'must be a UUID' })
  customerId?: string;

  @ApiPropertyOptional({
    description: 'Quote number (123 or Q-000123), customer name or e-mail, or rego',
  })
  @IsOptional()
  @TrimmedText(0, 100)
  q?: string;
}

import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsUUID } from 'class-validator';

export class UploadQueryDto {
  @ApiPropertyOptional({ format: 'uuid', description: 'Only the photos on this quote' })
  @IsOptional()
  @IsUUID('all', { message: 'must be a UUID' })
  quoteId?: string;
}

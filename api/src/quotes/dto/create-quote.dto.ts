import { ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayUnique, IsArray, IsOptional, IsUUID } from 'class-validator';
import { QuotePackageDto } from './quote-package.dto';

export class CreateQuoteDto extends QuotePackageDto {
  @ApiPropertyOptional({
    type: [String],
    format: 'uuid',
    description: "Photos the quote's customer uploaded and has not attached to a quote yet",
  })
  @IsOptional()
  @IsArray({ message: 'must be a list of upload ids' })
  @ArrayMaxSize(20, { message: 'must hold at most 20 photos' })
  @ArrayUnique({ message: 'must not name a photo twice' })
  @IsUUID('all', { each: true, message: 'must hold upload ids (UUIDs)' })
  photoIds?: string[];

  @ApiPropertyOptional({
    format: 'uuid',
    description:
      'Desk and manager only, and required for them: the customer the walk-in quote is for',
  })
  @IsOptional()
  @IsUUID('all', { message: 'must be a UUID' })
  customerId?: string;
}

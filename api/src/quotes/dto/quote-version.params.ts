import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsUUID } from 'class-validator';
import { WholeNumberInRange } from '../../common/decorators/field-validators';

/** `:id/versions/:n` (a malformed one is 400 with fieldErrors, an unknown one 404). */
export class QuoteVersionParams {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'must be a UUID' })
  id!: string;

  @ApiProperty({ minimum: 1, example: 1, description: 'Version number' })
  @Type(() => Number)
  @WholeNumberInRange(1, 32767)
  n!: number;
}

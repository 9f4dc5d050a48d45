import { ApiProperty } from '@nestjs/swagger';
import { IsUUID } from 'class-validator';

/** A route's `:id` (a malformed one is 400 fieldErrors.id, an unknown one 404). */
export class IdParams {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'must be a UUID' })
  id!: string;
}

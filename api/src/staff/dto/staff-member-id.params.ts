import { ApiProperty } from '@nestjs/swagger';
import { IsUUID } from 'class-validator';

export class StaffMemberIdParams {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'must be a UUID' })
  id!: string;
}

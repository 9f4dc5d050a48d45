import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { BAY_KINDS, type BayKind } from '../../catalogue/product-kinds';
import { TrimmedText, oneOfMessage } from '../../common/decorators/field-validators';
import { Required } from './calendar-fields';

/** POST /api/workshop/bays: a new bay, placed last. */
export class CreateBayDto {
  @Required()
  @TrimmedText(1, 60)
  @ApiProperty({ minLength: 1, maxLength: 60, example: 'Hoist 4', description: 'Unique' })
  name!: string;

  @Required()
  @IsIn(BAY_KINDS, { message: oneOfMessage(BAY_KINDS) })
  @ApiProperty({ enum: BAY_KINDS, enumName: 'BayKind' })
  kind!: BayKind;
}

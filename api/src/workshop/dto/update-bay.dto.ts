import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';
import { BAY_KINDS, type BayKind } from '../../catalogue/product-kinds';
import {
  BooleanField,
  TrimmedText,
  WholeNumberInRange,
  oneOfMessage,
} from '../../common/decorators/field-validators';

/** PATCH /api/workshop/bays/:id: rename, change the kind, move in the order, switch on or off. */
export class UpdateBayDto {
  @IsOptional()
  @TrimmedText(1, 60)
  @ApiPropertyOptional({ minLength: 1, maxLength: 60, example: 'Hoist 4' })
  name?: string;

  @IsOptional()
  @IsIn(BAY_KINDS, { message: oneOfMessage(BAY_KINDS) })
  @ApiPropertyOptional({ enum: BAY_KINDS, enumName: 'BayKind' })
  kind?: BayKind;

  @IsOptional()
  @WholeNumberInRange(1, 999)
  @ApiPropertyOptional({
    minimum: 1,
    example: 2,
    description: 'The place to move the bay to (1 first, at most the number of bays)',
  })
  position?: number;

  @IsOptional()
  @BooleanField()
  @ApiPropertyOptional({ description: 'False: switched off (refused while it has bookings ahead)' })
  active?: boolean;
}

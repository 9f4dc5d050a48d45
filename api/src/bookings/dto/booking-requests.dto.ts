import { TrimmedText } from '../../common/decorators/field-validators';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsDateString, IsIn, IsInt, IsOptional, IsUUID, Matches, Max, Min } from 'class-validator';

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;
/** An instant needs its offset: 'Z' or '+11:00'. */
const WITH_OFFSET = /(Z|[+-]\d{2}:\d{2})$/;

export class AvailabilityQueryDto {
  @IsUUID('4', { message: 'must be a quote version id' })
  @ApiProperty({ format: 'uuid' })
  quoteVersionId!: string;

  @IsOptional()
  @Matches(ISO_DATE, { message: 'must be a date as YYYY-MM-DD' })
  @ApiPropertyOptional({ example: '2026-12-03', description: "Default: the workshop's today" })
  from?: string;

  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'must be a whole number' })
  @Min(1, { message: 'must be 1 or more' })
  @Max(31, { message: 'must be 31 or fewer' })
  @ApiPropertyOptional({ default: 14, minimum: 1, maximum: 31 })
  days?: number;
}

export class CreateBookingDto {
  @IsUUID('4', { message: 'must be a quote version id' })
  @ApiProperty({ format: 'uuid' })
  quoteVersionId!: string;

  @Matches(WITH_OFFSET, { message: 'must be a date and time with its offset (ISO 8601)' })
  @IsDateString({ strict: true }, { message: 'must be a date and time with its offset (ISO 8601)' })
  @ApiProperty({ example: '2026-12-02T20:30:00.000Z', description: 'One of the offered starts' })
  start!: string;
}

export class MoveBookingDto {
  @Matches(WITH_OFFSET, { message: 'must be a date and time with its offset (ISO 8601)' })
  @IsDateString({ strict: true }, { message: 'must be a date and time with its offset (ISO 8601)' })
  @ApiProperty({ example: '2026-12-02T20:30:00.000Z' })
  start!: string;
}

export class MoveRequestDto {
  @TrimmedText(1, 500)
  @ApiProperty({ example: 'Could it be the Thursday after?', maxLength: 500 })
  note!: string;
}

/** The desk's steps of a booking's work, in order. */
export const DESK_STEPS = ['confirmed', 'in-progress', 'completed'] as const;

export class AdvanceBookingDto {
  @IsIn(DESK_STEPS, { message: `must be one of ${DESK_STEPS.join(', ')}` })
  @ApiProperty({ enum: DESK_STEPS, enumName: 'DeskBookingStep' })
  state!: (typeof DESK_STEPS)[number];
}

import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsOptional,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { BooleanField, WholeNumberInRange } from '../../common/decorators/field-validators';
import { SLOT_STEP_MINUTES } from '../calendar-rules';
import { ClockTime, HolidayRegionCode, KnownTimeZone, Required } from './calendar-fields';

const SEVEN_DAYS_MESSAGE = 'must list the 7 days of the week, Monday (1) to Sunday (7)';

/**
 * One weekday. An open day needs opensAt and closesAt; a break has both ends or neither. The
 * times of a closed day are not stored (they may be left out, null, or any HH:mm).
 */
export class OpeningHoursEntryDto {
  @Required()
  @WholeNumberInRange(1, 7)
  @ApiProperty({ minimum: 1, maximum: 7, example: 1, description: 'ISO weekday: 1 = Monday' })
  weekday!: number;

  @Required()
  @BooleanField()
  @ApiProperty()
  open!: boolean;

  @IsOptional()
  @ClockTime()
  @ApiPropertyOptional({ type: String, nullable: true, example: '07:30' })
  opensAt?: string | null;

  @IsOptional()
  @ClockTime()
  @ApiPropertyOptional({ type: String, nullable: true, example: '17:00' })
  closesAt?: string | null;

  @IsOptional()
  @ClockTime()
  @ApiPropertyOptional({ type: String, nullable: true, example: '12:00' })
  breakStartsAt?: string | null;

  @IsOptional()
  @ClockTime()
  @ApiPropertyOptional({ type: String, nullable: true, example: '12:30' })
  breakEndsAt?: string | null;
}

/**
 * PUT /api/workshop/calendar: the calendar settings and the week's hours, all at once, and the
 * cancellation policy (each of its two fields optional: left out, it stays as it is).
 */
export class UpdateWorkshopCalendarDto {
  @Required()
  @KnownTimeZone()
  @ApiProperty({ example: 'Australia/Sydney', description: 'IANA time zone' })
  timeZone!: string;

  @Required()
  @HolidayRegionCode()
  @ApiProperty({ example: 'AU-NSW', description: 'A code from holidayRegions' })
  holidayRegion!: string;

  @Required()
  @IsIn(SLOT_STEP_MINUTES, { message: `must be one of ${SLOT_STEP_MINUTES.join(', ')} (minutes)` })
  @ApiProperty({ enum: SLOT_STEP_MINUTES, example: 30 })
  slotStepMinutes!: number;

  @Required()
  @WholeNumberInRange(5, 60, 'minutes')
  @ApiProperty({ minimum: 5, maximum: 60, example: 15 })
  holdMinutes!: number;

  @Required()
  @WholeNumberInRange(0, 30, 'days')
  @ApiProperty({ minimum: 0, maximum: 30, example: 1 })
  leadTimeBufferDays!: number;

  @Required()
  @WholeNumberInRange(0, 120, 'minutes')
  @ApiProperty({ minimum: 0, maximum: 120, example: 15 })
  fittingMinutesPerWheel!: number;

  /** Left out: unchanged (null is refused). */
  @ValidateIf((_dto, value) => value !== undefined)
  @WholeNumberInRange(0, 720, 'hours')
  @ApiPropertyOptional({
    minimum: 0,
    maximum: 720,
    example: 48,
    description:
      'Cancelled at least this many hours before the start: the whole deposit back (left out: unchanged)',
  })
  fullRefundHoursBefore?: number;

  /** Left out: unchanged (null is refused). */
  @ValidateIf((_dto, value) => value !== undefined)
  @WholeNumberInRange(0, 100, '%')
  @ApiPropertyOptional({
    minimum: 0,
    maximum: 100,
    example: 0,
    description:
      'Cancelled later: this percentage of the deposit back, rounded down to the cent; 0: none (left out: unchanged)',
  })
  lateCancelRefundPercent?: number;

  @Required()
  @IsArray({ message: SEVEN_DAYS_MESSAGE })
  @ArrayMinSize(7, { message: SEVEN_DAYS_MESSAGE })
  @ArrayMaxSize(7, { message: SEVEN_DAYS_MESSAGE })
  @ValidateNested({ each: true })
  @Type(() => OpeningHoursEntryDto)
  @ApiProperty({ type: [OpeningHoursEntryDto], minItems: 7, maxItems: 7 })
  openingHours!: OpeningHoursEntryDto[];
}

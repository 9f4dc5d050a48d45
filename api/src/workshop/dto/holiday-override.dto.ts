import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional } from 'class-validator';
import { BooleanField, TrimmedText } from '../../common/decorators/field-validators';
import { CalendarDate, Required } from './calendar-fields';

/** The `:date` of PUT /api/workshop/holidays/:date. */
export class HolidayDateParams {
  @CalendarDate()
  @ApiProperty({ format: 'date', example: '2026-12-26' })
  date!: string;
}

/** PUT /api/workshop/holidays/:date: open on a public holiday anyway (usual hours), or not. */
export class HolidayOverrideDto {
  @Required()
  @BooleanField()
  @ApiProperty({ description: 'True: open with the usual hours; false: closed (the default)' })
  opens!: boolean;

  @IsOptional()
  @TrimmedText(0, 120)
  @ApiPropertyOptional({
    type: String,
    nullable: true,
    maxLength: 120,
    description: 'Kept while the workshop opens on the day',
  })
  note?: string | null;
}

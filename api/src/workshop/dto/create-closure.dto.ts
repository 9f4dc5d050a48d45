import { ApiProperty } from '@nestjs/swagger';
import { TrimmedText } from '../../common/decorators/field-validators';
import { CalendarDate, Required } from './calendar-fields';

/** POST /api/workshop/closures: days the workshop is shut, both ends included (local dates). */
export class CreateClosureDto {
  @Required()
  @CalendarDate()
  @ApiProperty({ format: 'date', example: '2027-01-04' })
  startDate!: string;

  @Required()
  @CalendarDate()
  @ApiProperty({ format: 'date', example: '2027-01-08', description: 'Not before startDate' })
  endDate!: string;

  @Required()
  @TrimmedText(1, 120)
  @ApiProperty({ minLength: 1, maxLength: 120, example: 'Stocktake' })
  reason!: string;
}

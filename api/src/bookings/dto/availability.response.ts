import { ApiProperty } from '@nestjs/swagger';
import { BAY_KINDS, type BayKind } from '../../catalogue/product-kinds';
import { PlannedSegmentResponse } from './booking.response';

export class JobSegmentResponse {
  @ApiProperty({ enum: BAY_KINDS, enumName: 'BayKind' })
  bayKind!: BayKind;

  @ApiProperty({ description: 'Working minutes in a bay of this kind' })
  minutes!: number;

  @ApiProperty({ type: [String], description: 'The work done there, in line order' })
  descriptions!: string[];
}

export class JobPlanResponse {
  @ApiProperty({ type: [JobSegmentResponse], description: 'In order; the next starts as one ends' })
  segments!: JobSegmentResponse[];

  @ApiProperty()
  totalMinutes!: number;

  @ApiProperty({
    description: 'The longest lead time of the special-order parts (0: all on the shelf)',
  })
  longestLeadDays!: number;

  @ApiProperty({ example: '2026-12-03', description: 'Local date: no start before it' })
  earliestStartDate!: string;
}

export class StartOptionResponse {
  @ApiProperty({ example: '2026-12-03T07:30:00+11:00' })
  start!: string;

  @ApiProperty({ format: 'date-time' })
  startUtc!: string;

  @ApiProperty({ example: '07:30' })
  localTime!: string;

  @ApiProperty()
  end!: string;

  @ApiProperty({ format: 'date-time' })
  endUtc!: string;

  @ApiProperty({ type: [PlannedSegmentResponse] })
  segments!: PlannedSegmentResponse[];
}

export class AvailabilityDayResponse {
  @ApiProperty({ example: '2026-12-03' })
  date!: string;

  @ApiProperty({ type: String, nullable: true, example: 'Public holiday: Christmas Day' })
  closedReason!: string | null;

  @ApiProperty({ type: [StartOptionResponse] })
  starts!: StartOptionResponse[];
}

export class AvailabilityResponse {
  @ApiProperty({ format: 'uuid' })
  quoteVersionId!: string;

  @ApiProperty({ example: 'Australia/Sydney' })
  timeZone!: string;

  @ApiProperty({ description: 'How long a chosen time is held' })
  holdMinutes!: number;

  @ApiProperty({ type: JobPlanResponse })
  plan!: JobPlanResponse;

  @ApiProperty({ type: [AvailabilityDayResponse] })
  days!: AvailabilityDayResponse[];
}

/** 409: the time is taken or not offered; the next ones that are. */
export class BookingConflictResponse {
  @ApiProperty()
  statusCode!: number;

  @ApiProperty()
  message!: string;

  @ApiProperty({ type: [StartOptionResponse], description: 'Up to 5 later starts that fit' })
  nextStarts!: StartOptionResponse[];
}

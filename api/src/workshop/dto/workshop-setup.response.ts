import { ApiProperty } from '@nestjs/swagger';
import { BAY_KINDS, type BayKind } from '../../catalogue/product-kinds';

/** One weekday of the week's hours (local clock, 'HH:mm'); a closed day has no times. */
export class OpeningHoursEntryResponse {
  @ApiProperty({ minimum: 1, maximum: 7, example: 1, description: 'ISO weekday: 1 = Monday' })
  weekday!: number;

  @ApiProperty()
  open!: boolean;

  @ApiProperty({ type: String, nullable: true, example: '07:30' })
  opensAt!: string | null;

  @ApiProperty({ type: String, nullable: true, example: '17:00' })
  closesAt!: string | null;

  @ApiProperty({ type: String, nullable: true, example: '12:00' })
  breakStartsAt!: string | null;

  @ApiProperty({ type: String, nullable: true, example: '12:30' })
  breakEndsAt!: string | null;
}

export class BayResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ example: 'Hoist 1' })
  name!: string;

  @ApiProperty({ enum: BAY_KINDS, enumName: 'BayKind' })
  kind!: BayKind;

  @ApiProperty({ example: 1, description: 'Order on screens and in bay choice (1 first)' })
  position!: number;

  @ApiProperty({ description: 'False: switched off, offered for no new bookings' })
  active!: boolean;
}

/** Days the workshop is shut, both ends included (local dates). */
export class ClosureResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ format: 'date', example: '2027-01-04' })
  startDate!: string;

  @ApiProperty({ format: 'date', example: '2027-01-08' })
  endDate!: string;

  @ApiProperty({ example: 'Stocktake' })
  reason!: string;
}

/** A public holiday of the workshop's region, and whether the workshop opens on it anyway. */
export class HolidayResponse {
  @ApiProperty({ format: 'date', example: '2026-12-25' })
  date!: string;

  @ApiProperty({ example: 'Christmas Day' })
  name!: string;

  @ApiProperty({ description: 'True: the workshop opens on this day with its usual hours' })
  opens!: boolean;

  @ApiProperty({ type: String, nullable: true })
  note!: string | null;
}

export class HolidayRegionResponse {
  @ApiProperty({ example: 'AU-NSW' })
  code!: string;

  @ApiProperty({ example: 'Australia, New South Wales' })
  name!: string;
}

/** Manage → Workshop: the calendar, the bays, closures and public holidays. */
export class WorkshopSetupResponse {
  @ApiProperty({ example: 'Australia/Sydney', description: 'IANA time zone of the workshop' })
  timeZone!: string;

  @ApiProperty({ example: 'AU-NSW', description: 'Public holidays come from this region' })
  holidayRegion!: string;

  @ApiProperty({ example: 30, description: 'Start times are offered every this many minutes' })
  slotStepMinutes!: number;

  @ApiProperty({ example: 15, description: 'How long a held time is kept for the customer' })
  holdMinutes!: number;

  @ApiProperty({
    example: 1,
    description: 'Calendar days added after the longest lead time of special-order parts',
  })
  leadTimeBufferDays!: number;

  @ApiProperty({ example: 15, description: 'Bay minutes to mount, balance and fit one wheel' })
  fittingMinutesPerWheel!: number;

  @ApiProperty({
    example: 48,
    description: 'Cancelled at least this many hours before the start: the whole deposit back',
  })
  fullRefundHoursBefore!: number;

  @ApiProperty({
    example: 0,
    minimum: 0,
    maximum: 100,
    description: 'Cancelled later: this percentage of the deposit back (rounded down); 0: none',
  })
  lateCancelRefundPercent!: number;

  @ApiProperty({ type: [OpeningHoursEntryResponse], description: 'Always 7, Monday first' })
  openingHours!: OpeningHoursEntryResponse[];

  @ApiProperty({ type: [BayResponse], description: 'By position' })
  bays!: BayResponse[];

  @ApiProperty({
    type: [ClosureResponse],
    description: 'Closures not yet over (ending today or later), by start date',
  })
  closures!: ClosureResponse[];

  @ApiProperty({
    type: [HolidayResponse],
    description: "Public holidays of the next 12 months from the workshop's today, by date",
  })
  holidays!: HolidayResponse[];

  @ApiProperty({ type: [HolidayRegionResponse] })
  holidayRegions!: HolidayRegionResponse[];
}

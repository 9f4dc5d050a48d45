/** Validators of the workshop calendar's fields, with the house's short messages. */
import { applyDecorators } from '@nestjs/common';
import { IsDefined, IsString, ValidateBy } from 'class-validator';
import { isClockTime, isIsoDate } from '../../scheduling/local-date';
import { isHolidayRegion } from '../../scheduling/public-holidays';
import { isKnownTimeZone } from '../workshop-time';

export const Required = () => IsDefined({ message: 'is required' });

/** A zone of the IANA time zone database, e.g. Australia/Sydney. */
export function KnownTimeZone() {
  return applyDecorators(
    IsString({ message: 'must be text' }),
    ValidateBy({
      name: 'knownTimeZone',
      validator: {
        validate: (value: unknown) => typeof value === 'string' && isKnownTimeZone(value),
        defaultMessage: () => 'must be a time zone of the IANA database, such as Australia/Sydney',
      },
    }),
  );
}

/** A country or country-state code the public-holiday data knows, e.g. AU-NSW or NZ. */
export function HolidayRegionCode() {
  return applyDecorators(
    IsString({ message: 'must be text' }),
    ValidateBy({
      name: 'holidayRegionCode',
      validator: {
        validate: (value: unknown) => typeof value === 'string' && isHolidayRegion(value),
        defaultMessage: () =>
          'must be a region of the public holiday list, such as AU-NSW or NZ (see holidayRegions)',
      },
    }),
  );
}

/** A local clock time 'HH:mm', 24-hour (00:00 to 23:59). */
export function ClockTime() {
  return applyDecorators(
    IsString({ message: 'must be a time as HH:mm, such as 07:30' }),
    ValidateBy({
      name: 'clockTime',
      validator: {
        validate: (value: unknown) => typeof value === 'string' && isClockTime(value),
        defaultMessage: () => 'must be a time as HH:mm (24-hour, 00:00 to 23:59), such as 07:30',
      },
    }),
  );
}

/** A real calendar date written YYYY-MM-DD. */
export function CalendarDate() {
  return ValidateBy({
    name: 'calendarDate',
    validator: {
      validate: (value: unknown) => typeof value === 'string' && isIsoDate(value),
      defaultMessage: () => 'must be a calendar date as YYYY-MM-DD, such as 2027-01-04',
    },
  });
}

import { describe, expect, it } from 'vitest';
import type { WorkshopSetup } from '@/types/api';
import {
  calendarFieldFor,
  calendarRequest,
  calendarSchema,
  calendarValues,
  clockMinutes,
  isKnownTimeZone,
  openingHoursSchema,
  type OpeningHoursValues,
} from './calendar-fields';
import { closureSchema, isCalendarDate } from './closure-fields';

const day = (changes: Partial<OpeningHoursValues>): OpeningHoursValues => ({
  weekday: 1,
  open: true,
  opensAt: '07:30',
  closesAt: '17:00',
  breakStartsAt: '12:00',
  breakEndsAt: '12:30',
  ...changes,
});

/** Formik hands Yup an empty text field as undefined (prepareDataForValidation). */
function asFormikValidates(values: OpeningHoursValues): Record<string, unknown> {
  return Object.fromEntries(
    Object.entries(values).map(([key, value]) => [key, value === '' ? undefined : value]),
  );
}

async function dayErrors(values: OpeningHoursValues): Promise<Record<string, string>> {
  try {
    await openingHoursSchema.validate(asFormikValidates(values), { abortEarly: false });
    return {};
  } catch (error) {
    const inner = (error as { inner: { path: string; message: string }[] }).inner;
    return Object.fromEntries(inner.map((issue) => [issue.path, issue.message]));
  }
}

describe('the week’s hours, as the API checks them', () => {
  it('accepts an open day with a break inside its hours', async () => {
    expect(await dayErrors(day({}))).toEqual({});
    expect(await dayErrors(day({ breakStartsAt: '', breakEndsAt: '' }))).toEqual({});
  });

  it('puts each problem on the field it is about', async () => {
    expect(await dayErrors(day({ closesAt: '07:00' }))).toEqual({
      closesAt: 'Closing time must be after the opening time.',
    });
    expect(await dayErrors(day({ breakEndsAt: '' }))).toEqual({
      breakEndsAt: 'Give both ends of the break, or neither.',
    });
    expect(await dayErrors(day({ breakStartsAt: '07:00' }))).toEqual({
      breakStartsAt: 'The break must start after opening and before closing.',
    });
    expect(await dayErrors(day({ breakEndsAt: '11:30' }))).toEqual({
      breakEndsAt: 'The break must end after it starts and before closing.',
    });
    expect(await dayErrors(day({ opensAt: '' }))).toEqual({ opensAt: 'Enter the opening time.' });
  });

  it('leaves a closed day’s times alone', async () => {
    expect(await dayErrors(day({ open: false, opensAt: '', closesAt: '' }))).toEqual({});
  });

  it('reads clock times as 24-hour HH:mm only', () => {
    // Source: ISO 8601-1:2019 §5.3.1.2: hh:mm, hours 00 to 23, minutes 00 to 59.
    expect(clockMinutes('07:30')).toBe(450);
    // Source: ISO 8601-1:2019 §5.3.1.2: hh:mm, hours 00 to 23, minutes 00 to 59.
    expect(clockMinutes('23:59')).toBe(1439);
    expect(clockMinutes('24:00')).toBeNull();
    expect(clockMinutes('7:30')).toBeNull();
  });
});

describe('server field errors land on the day', () => {
  it('takes the bracketed and the dotted form', () => {
    expect(calendarFieldFor('openingHours[2].closesAt')).toBe('openingHours[2].closesAt');
    expect(calendarFieldFor('openingHours.2.closesAt')).toBe('openingHours[2].closesAt');
    expect(calendarFieldFor('openingHours[4]')).toBe('openingHours[4].opensAt');
    expect(calendarFieldFor('openingHours[1].weekday')).toBe('openingHours[1].open');
    expect(calendarFieldFor('holdMinutes')).toBe('holdMinutes');
  });
});

const setup: WorkshopSetup = {
  timeZone: 'Australia/Sydney',
  holidayRegion: 'AU-NSW',
  slotStepMinutes: 30,
  holdMinutes: 15,
  leadTimeBufferDays: 1,
  fittingMinutesPerWheel: 15,
  fullRefundHoursBefore: 48,
  lateCancelRefundPercent: 0,
  openingHours: [1, 2, 3, 4, 5, 6, 7].map((weekday) => ({
    weekday,
    open: weekday <= 5,
    opensAt: weekday <= 5 ? '07:30' : null,
    closesAt: weekday <= 5 ? '17:00' : null,
    breakStartsAt: weekday <= 5 ? '12:00' : null,
    breakEndsAt: weekday <= 5 ? '12:30' : null,
  })),
  bays: [],
  closures: [],
  holidays: [],
  holidayRegions: [{ code: 'AU-NSW', name: 'Australia, New South Wales' }],
};

describe('the calendar form and its request', () => {
  it('validates the whole week as Formik hands it over', async () => {
    const values = calendarValues(setup);
    const handed = {
      ...values,
      openingHours: values.openingHours.map(asFormikValidates),
    };
    await expect(calendarSchema(['AU-NSW']).validate(handed)).resolves.toBeTruthy();
  });

  it('sends the seven days in order, a closed day without times', () => {
    const body = calendarRequest(calendarValues(setup));
    expect(body.openingHours.map((entry) => entry.weekday)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    expect(body.openingHours[5]).toEqual({
      weekday: 6,
      open: false,
      opensAt: null,
      closesAt: null,
      breakStartsAt: null,
      breakEndsAt: null,
    });
    expect(body).toMatchObject({
      timeZone: 'Australia/Sydney',
      slotStepMinutes: 30,
      holdMinutes: 15,
      leadTimeBufferDays: 1,
      fittingMinutesPerWheel: 15,
      fullRefundHoursBefore: 48,
      lateCancelRefundPercent: 0,
    });
  });

  it('sends the cancellation rule as whole numbers', () => {
    const values = {
      ...calendarValues(setup),
      fullRefundHoursBefore: ' 72 ',
      lateCancelRefundPercent: '25',
    };
    expect(calendarRequest(values)).toMatchObject({
      fullRefundHoursBefore: 72,
      lateCancelRefundPercent: 25,
    });
  });

  it('takes the cancellation rule inside the API’s bounds only', async () => {
    const schema = calendarSchema(['AU-NSW']);
    const values = calendarValues(setup);
    const check = (field: string, value: string) =>
      schema.validateAt(field, { ...values, [field]: value });
    await expect(check('fullRefundHoursBefore', '0')).resolves.toBe(0);
    await expect(check('fullRefundHoursBefore', '720')).resolves.toBe(720);
    await expect(check('fullRefundHoursBefore', '721')).rejects.toThrow(
      'Use 0 hours to 720 hours.',
    );
    await expect(check('fullRefundHoursBefore', '-1')).rejects.toThrow('Use 0 hours to 720 hours.');
    await expect(check('fullRefundHoursBefore', '1.5')).rejects.toThrow('Enter a whole number.');
    await expect(check('lateCancelRefundPercent', '100')).resolves.toBe(100);
    await expect(check('lateCancelRefundPercent', '101')).rejects.toThrow('Use 0 % to 100 %.');
    await expect(
      schema.validateAt('lateCancelRefundPercent', {
        ...values,
        lateCancelRefundPercent: undefined,
      }),
    ).rejects.toThrow(
      'Enter the share of the deposit a later cancellation gets back (0 for none).',
    );
  });

  it('refuses a slot step the API does not offer and an unknown region', async () => {
    const schema = calendarSchema(['AU-NSW']);
    const values = { ...calendarValues(setup), slotStepMinutes: '25', holidayRegion: 'XX' };
    await expect(schema.validateAt('slotStepMinutes', values)).rejects.toThrow(
      'Use one of 10, 15, 20, 30, 60 minutes.',
    );
    await expect(schema.validateAt('holidayRegion', values)).rejects.toThrow(
      'Choose a region from the list.',
    );
    await expect(
      schema.validateAt('holdMinutes', { ...values, holdMinutes: '61' }),
    ).rejects.toThrow('Use 5 minutes to 60 minutes.');
  });

  it('knows the zones of the IANA database', () => {
    // Source: IANA tz database (australasia): Australia/Sydney and Pacific/Auckland are zones.
    expect(isKnownTimeZone('Australia/Sydney')).toBe(true);
    // Source: IANA tz database (australasia): Australia/Sydney and Pacific/Auckland are zones.
    expect(isKnownTimeZone('Pacific/Auckland')).toBe(true);
    expect(isKnownTimeZone('Mars/Olympus_Mons')).toBe(false);
  });
});

describe('closures', () => {
  it('takes real calendar dates only', () => {
    // Source: Gregorian calendar (ISO 8601-1:2019 §4.3): 2028 is a leap year, 2027 is not.
    expect(isCalendarDate('2028-02-29')).toBe(true);
    // Source: Gregorian calendar (ISO 8601-1:2019 §4.3): 2028 is a leap year, 2027 is not.
    expect(isCalendarDate('2027-02-29')).toBe(false);
    expect(isCalendarDate('2027-13-01')).toBe(false);
    expect(isCalendarDate('4 January 2027')).toBe(false);
  });

  it('refuses a last day before the first', async () => {
    await expect(
      closureSchema.validate({
        startDate: '2027-01-08',
        endDate: '2027-01-04',
        reason: 'Stocktake',
      }),
    ).rejects.toThrow('The last day cannot be before the first.');
    await expect(
      closureSchema.validate({
        startDate: '2027-01-04',
        endDate: '2027-01-04',
        reason: 'Stocktake',
      }),
    ).resolves.toBeTruthy();
  });
});

import * as yup from 'yup';
import { numberInRange } from '@/lib/number-fields';
import type {
  OpeningHoursEntry,
  OpeningHoursEntryRequest,
  UpdateWorkshopCalendarRequest,
  WorkshopSetup,
} from '@/types/api';

/** Mirrors the API's UpdateWorkshopCalendarDto: its calendar and cancellation rules. */
export const SLOT_STEP_MINUTES = [10, 15, 20, 30, 60] as const;
export const HOLD_MINUTES = { min: 5, max: 60 } as const;
export const LEAD_TIME_BUFFER_DAYS = { min: 0, max: 30 } as const;
export const FITTING_MINUTES_PER_WHEEL = { min: 0, max: 120 } as const;
/** The cancellation rule: a full refund until this many hours before the start… */
export const FULL_REFUND_HOURS_BEFORE = { min: 0, max: 720 } as const;
/** …and this share of the deposit for a later cancellation (0: none). */
export const LATE_CANCEL_REFUND_PERCENT = { min: 0, max: 100 } as const;

/** ISO weekdays, Monday (1) first, as the API lists them. */
export const weekdayNames = [
  'Monday',
  'Tuesday',
  'Wednesday',
  'Thursday',
  'Friday',
  'Saturday',
  'Sunday',
] as const;

export function weekdayName(weekday: number): string {
  return weekdayNames[weekday - 1] ?? `Day ${weekday}`;
}

/** One weekday as the form edits it: times as typed ('' when none). */
export interface OpeningHoursValues {
  weekday: number;
  open: boolean;
  opensAt: string;
  closesAt: string;
  breakStartsAt: string;
  breakEndsAt: string;
}

export interface CalendarFormValues {
  timeZone: string;
  holidayRegion: string;
  slotStepMinutes: string;
  holdMinutes: string;
  leadTimeBufferDays: string;
  fittingMinutesPerWheel: string;
  fullRefundHoursBefore: string;
  lateCancelRefundPercent: string;
  openingHours: OpeningHoursValues[];
}

const HOURS_FIELDS = ['open', 'opensAt', 'closesAt', 'breakStartsAt', 'breakEndsAt'] as const;

/** Every field the form shows, named as the API names them in fieldErrors. */
export const calendarFormFields: readonly string[] = [
  'timeZone',
  'holidayRegion',
  'slotStepMinutes',
  'holdMinutes',
  'leadTimeBufferDays',
  'fittingMinutesPerWheel',
  'fullRefundHoursBefore',
  'lateCancelRefundPercent',
  ...weekdayNames.flatMap((_name, index) =>
    HOURS_FIELDS.map((field) => `openingHours[${index}].${field}`),
  ),
];

/**
 * The API's field names → the form's: both "openingHours[2].closesAt" and the dotted
 * "openingHours.2.closesAt" land on the day's field; "openingHours[2]" as a whole on its
 * opening time, so the message shows on the day it is about.
 */
export function calendarFieldFor(property: string): string {
  const dotted = /^openingHours\.(\d+)(?:\.(\w+))?$/.exec(property);
  const bracketed = /^openingHours\[(\d+)\](?:\.(\w+))?$/.exec(property);
  const match = dotted ?? bracketed;
  if (!match) return property;
  const field = match[2] ?? 'opensAt';
  return `openingHours[${match[1]}].${field === 'weekday' ? 'open' : field}`;
}

export function openingHoursValues(entry: OpeningHoursEntry): OpeningHoursValues {
  return {
    weekday: entry.weekday,
    open: entry.open,
    opensAt: entry.opensAt ?? '',
    closesAt: entry.closesAt ?? '',
    breakStartsAt: entry.breakStartsAt ?? '',
    breakEndsAt: entry.breakEndsAt ?? '',
  };
}

export function calendarValues(setup: WorkshopSetup): CalendarFormValues {
  const byWeekday = new Map(setup.openingHours.map((entry) => [entry.weekday, entry]));
  return {
    timeZone: setup.timeZone,
    holidayRegion: setup.holidayRegion,
    slotStepMinutes: String(setup.slotStepMinutes),
    holdMinutes: String(setup.holdMinutes),
    leadTimeBufferDays: String(setup.leadTimeBufferDays),
    fittingMinutesPerWheel: String(setup.fittingMinutesPerWheel),
    fullRefundHoursBefore: String(setup.fullRefundHoursBefore),
    lateCancelRefundPercent: String(setup.lateCancelRefundPercent),
    openingHours: weekdayNames.map((_name, index) => {
      const entry = byWeekday.get(index + 1);
      return entry
        ? openingHoursValues(entry)
        : {
            weekday: index + 1,
            open: false,
            opensAt: '',
            closesAt: '',
            breakStartsAt: '',
            breakEndsAt: '',
          };
    }),
  };
}

/** 'HH:mm', 24-hour, 00:00 to 23:59 (the API's clock-time format). */
export const CLOCK_TIME = /^([01]\d|2[0-3]):([0-5]\d)$/;

/** "07:30" → 450; null for anything else. */
export function clockMinutes(time: string): number | null {
  const match = CLOCK_TIME.exec(time.trim());
  return match ? Number(match[1]) * 60 + Number(match[2]) : null;
}

/**
 * What a day's tests see of its siblings: Formik hands Yup an empty field as undefined, so
 * every time may be missing.
 */
type HoursContext = {
  parent: { open?: boolean } & Partial<
    Record<'opensAt' | 'closesAt' | 'breakStartsAt' | 'breakEndsAt', string>
  >;
};

const clock = (required: string) =>
  yup
    .string()
    .trim()
    .test(
      'clock',
      'Enter a time as HH:mm, like 07:30.',
      (value) => !value || CLOCK_TIME.test(value),
    )
    .when('open', {
      is: true,
      then: (schema) => schema.required(required),
    });

/** One day's hours: the same rules as the API's (an open day only; a closed day's times rest). */
export const openingHoursSchema = yup.object({
  weekday: yup.number().integer().min(1).max(7).required(),
  open: yup.boolean().required(),
  opensAt: clock('Enter the opening time.'),
  closesAt: clock('Enter the closing time.').test(
    'after-opening',
    'Closing time must be after the opening time.',
    function afterOpening(value) {
      const { parent } = this as unknown as HoursContext;
      if (!parent.open) return true;
      const opens = clockMinutes(parent.opensAt ?? '');
      const closes = clockMinutes(value ?? '');
      return opens === null || closes === null || closes > opens;
    },
  ),
  breakStartsAt: yup
    .string()
    .trim()
    .test(
      'clock',
      'Enter a time as HH:mm, like 12:00.',
      (value) => !value || CLOCK_TIME.test(value),
    )
    .test('both-ends', 'Give both ends of the break, or neither.', function bothEnds(value) {
      const { parent } = this as unknown as HoursContext;
      return !parent.open || Boolean(value) || !parent.breakEndsAt?.trim();
    })
    .test(
      'inside-hours',
      'The break must start after opening and before closing.',
      function insideHours(value) {
        const { parent } = this as unknown as HoursContext;
        const starts = clockMinutes(value ?? '');
        const opens = clockMinutes(parent.opensAt ?? '');
        const closes = clockMinutes(parent.closesAt ?? '');
        if (!parent.open || starts === null || opens === null || closes === null) return true;
        // Hours that close before they open are the closing time's problem alone.
        if (closes <= opens) return true;
        return starts > opens && starts < closes;
      },
    ),
  breakEndsAt: yup
    .string()
    .trim()
    .test(
      'clock',
      'Enter a time as HH:mm, like 12:30.',
      (value) => !value || CLOCK_TIME.test(value),
    )
    .test('both-ends', 'Give both ends of the break, or neither.', function bothEnds(value) {
      const { parent } = this as unknown as HoursContext;
      return !parent.open || Boolean(value) || !parent.breakStartsAt?.trim();
    })
    .test(
      'after-break-start',
      'The break must end after it starts and before closing.',
      function afterBreakStart(value) {
        const { parent } = this as unknown as HoursContext;
        const ends = clockMinutes(value ?? '');
        const starts = clockMinutes(parent.breakStartsAt ?? '');
        const opens = clockMinutes(parent.opensAt ?? '');
        const closes = clockMinutes(parent.closesAt ?? '');
        if (!parent.open || ends === null || starts === null || closes === null) return true;
        // As the API: one message at a time, the break's start first.
        if (opens === null || closes <= opens || starts <= opens || starts >= closes) return true;
        return ends > starts && ends < closes;
      },
    ),
});

/** A zone the browser's time zone data knows (the API checks against its own copy). */
export function isKnownTimeZone(timeZone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-AU', { timeZone });
    return true;
  } catch {
    return false;
  }
}

/** The whole form, with the regions the API offers. */
export function calendarSchema(regionCodes: readonly string[]) {
  const regions = new Set(regionCodes);
  return yup.object({
    timeZone: yup
      .string()
      .trim()
      .required('Choose the time zone the workshop is in.')
      .test('known', 'Choose a time zone from the list, like Australia/Sydney.', (value) =>
        value ? isKnownTimeZone(value) : true,
      ),
    holidayRegion: yup
      .string()
      .required('Choose the region whose public holidays the workshop keeps.')
      .test('known', 'Choose a region from the list.', (value) => !value || regions.has(value)),
    slotStepMinutes: yup
      .string()
      .required('Choose how often start times are offered.')
      .oneOf(SLOT_STEP_MINUTES.map(String), `Use one of ${SLOT_STEP_MINUTES.join(', ')} minutes.`),
    holdMinutes: numberInRange({ ...HOLD_MINUTES, unit: 'minutes', whole: true }).required(
      'Enter how long a held time is kept.',
    ),
    leadTimeBufferDays: numberInRange({
      ...LEAD_TIME_BUFFER_DAYS,
      unit: 'days',
      whole: true,
    }).required('Enter the days added after parts arrive.'),
    fittingMinutesPerWheel: numberInRange({
      ...FITTING_MINUTES_PER_WHEEL,
      unit: 'minutes',
      whole: true,
    }).required('Enter the bay time to fit one wheel.'),
    fullRefundHoursBefore: numberInRange({
      ...FULL_REFUND_HOURS_BEFORE,
      unit: 'hours',
      whole: true,
    }).required('Enter how many hours before the start a cancellation is refunded in full.'),
    lateCancelRefundPercent: numberInRange({
      ...LATE_CANCEL_REFUND_PERCENT,
      unit: '%',
      whole: true,
    }).required('Enter the share of the deposit a later cancellation gets back (0 for none).'),
    openingHours: yup.array(openingHoursSchema).length(7).required(),
  });
}

const timeOrNull = (text: string) => (text.trim() ? text.trim() : null);

export function openingHoursRequest(day: OpeningHoursValues): OpeningHoursEntryRequest {
  if (!day.open) {
    // A closed day's times are not stored: none are sent.
    return {
      weekday: day.weekday,
      open: false,
      opensAt: null,
      closesAt: null,
      breakStartsAt: null,
      breakEndsAt: null,
    };
  }
  return {
    weekday: day.weekday,
    open: true,
    opensAt: timeOrNull(day.opensAt),
    closesAt: timeOrNull(day.closesAt),
    breakStartsAt: timeOrNull(day.breakStartsAt),
    breakEndsAt: timeOrNull(day.breakEndsAt),
  };
}

/** The form as the API takes it (the values have passed the schema). */
export function calendarRequest(values: CalendarFormValues): UpdateWorkshopCalendarRequest {
  return {
    timeZone: values.timeZone.trim(),
    holidayRegion: values.holidayRegion,
    // One of the offered steps (the schema has checked it); the usual half hour otherwise.
    slotStepMinutes:
      SLOT_STEP_MINUTES.find((minutes) => String(minutes) === values.slotStepMinutes) ?? 30,
    holdMinutes: Number(values.holdMinutes.trim()),
    leadTimeBufferDays: Number(values.leadTimeBufferDays.trim()),
    fittingMinutesPerWheel: Number(values.fittingMinutesPerWheel.trim()),
    fullRefundHoursBefore: Number(values.fullRefundHoursBefore.trim()),
    lateCancelRefundPercent: Number(values.lateCancelRefundPercent.trim()),
    openingHours: values.openingHours.map(openingHoursRequest),
  };
}

/**
 * The workshop calendar's rules beyond each field's own format, as field errors keyed like the
 * request body (`openingHours[2].closesAt`). A day's hours are checked by the scheduling engine's
 * own `dayHoursIssues`, so the API stores no week the engine would refuse to plan with.
 */
import type { FieldErrors } from '../common/errors/field-errors.exception';
import type { DayHours, IsoWeekday, WorkshopCalendar } from '../scheduling/scheduling.types';
import { dayHoursIssues } from '../scheduling/working-time';
import type { OpeningHoursFields } from './entities/opening-hours.entity';

/** Start times are offered every this many minutes from opening. */
export const SLOT_STEP_MINUTES = [10, 15, 20, 30, 60] as const;

export const WEEKDAYS: readonly IsoWeekday[] = [1, 2, 3, 4, 5, 6, 7];

const WEEKDAY_NAMES: Record<IsoWeekday, string> = {
  1: 'Monday',
  2: 'Tuesday',
  3: 'Wednesday',
  4: 'Thursday',
  5: 'Friday',
  6: 'Saturday',
  7: 'Sunday',
};

/** One weekday as the API takes and gives it: closed days carry no times. */
export interface OpeningHoursEntry {
  weekday: number;
  open: boolean;
  opensAt?: string | null;
  closesAt?: string | null;
  breakStartsAt?: string | null;
  breakEndsAt?: string | null;
}

/** The hours of an open day for the engine (absent times as null). */
export function dayHoursOf(entry: OpeningHoursEntry): DayHours {
  return {
    opensAt: entry.opensAt ?? null,
    closesAt: entry.closesAt ?? null,
    breakStartsAt: entry.breakStartsAt ?? null,
    breakEndsAt: entry.breakEndsAt ?? null,
  } as DayHours;
}

/**
 * Each weekday once; an open day's hours as the engine wants them (opening and closing time,
 * closing later; a break with both ends or neither, opensAt < breakStartsAt < breakEndsAt <
 * closesAt). The times of a closed day are not used. Assumes the DTO checked each field's format.
 */
export function openingHoursFieldErrors(entries: readonly OpeningHoursEntry[]): FieldErrors {
  const errors: FieldErrors = {};
  const add = (field: string, message: string) => (errors[field] ??= []).push(message);
  const seen = new Set<number>();
  entries.forEach((entry, index) => {
    if (seen.has(entry.weekday)) {
      const name = WEEKDAY_NAMES[entry.weekday as IsoWeekday] ?? `Weekday ${entry.weekday}`;
      add(`openingHours[${index}].weekday`, `${name} is listed twice`);
    }
    seen.add(entry.weekday);
    if (!entry.open) return;
    for (const issue of dayHoursIssues(dayHoursOf(entry))) {
      add(`openingHours[${index}].${issue.field}`, issue.message);
    }
  });
  return errors;
}

/** The stored rows (one per open weekday) as the API's week, Monday first, always 7 entries. */
export function openingHoursEntriesOf(
  rows: readonly OpeningHoursFields[],
): Required<OpeningHoursEntry>[] {
  return WEEKDAYS.map((weekday) => {
    const row = rows.find((candidate) => candidate.weekday === weekday);
    return {
      weekday,
      open: row !== undefined,
      opensAt: row?.opensAt ?? null,
      closesAt: row?.closesAt ?? null,
      breakStartsAt: row?.breakStartsAt ?? null,
      breakEndsAt: row?.breakEndsAt ?? null,
    };
  });
}

/** The stored rows as the engine's week: weekday → hours, null when closed. */
export function weeklyHoursOf(
  rows: readonly OpeningHoursFields[],
): WorkshopCalendar['weeklyHours'] {
  const week = {} as WorkshopCalendar['weeklyHours'];
  for (const weekday of WEEKDAYS) {
    const row = rows.find((candidate) => candidate.weekday === weekday);
    week[weekday] = row
      ? {
          opensAt: row.opensAt,
          closesAt: row.closesAt,
          breakStartsAt: row.breakStartsAt,
          breakEndsAt: row.breakEndsAt,
        }
      : null;
  }
  return week;
}

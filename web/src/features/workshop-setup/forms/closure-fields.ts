import * as yup from 'yup';
import type { CreateClosureRequest } from '@/types/api';

/** Mirrors the API's CreateClosureDto: two local dates (both included) and a reason. */
export const CLOSURE_REASON_MAX = 120;
const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

export interface ClosureFormValues {
  startDate: string;
  endDate: string;
  reason: string;
}

export const closureFormFields = ['startDate', 'endDate', 'reason'] as const;

/** A real calendar date written YYYY-MM-DD (not 2027-02-30). */
export function isCalendarDate(text: string): boolean {
  if (!ISO_DATE.test(text)) return false;
  const [year, month, day] = text.split('-').map(Number);
  const date = new Date(Date.UTC(year, month - 1, day));
  return (
    date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day
  );
}

const calendarDate = (required: string) =>
  yup
    .string()
    .required(required)
    .test('date', 'Enter a date, like 2027-01-04.', (value) => !value || isCalendarDate(value));

export const closureSchema = yup.object({
  startDate: calendarDate('Enter the first day the workshop is closed.'),
  endDate: calendarDate('Enter the last day the workshop is closed.').test(
    'not-before-start',
    'The last day cannot be before the first.',
    function notBeforeStart(value) {
      const start = String(this.parent.startDate ?? '');
      return !value || !isCalendarDate(start) || !isCalendarDate(value) || value >= start;
    },
  ),
  reason: yup
    .string()
    .trim()
    .required('Say why, such as Stocktake; customers see it.')
    .max(CLOSURE_REASON_MAX, `Use at most ${CLOSURE_REASON_MAX} characters.`),
});

export function emptyClosure(): ClosureFormValues {
  return { startDate: '', endDate: '', reason: '' };
}

export function closureRequest(values: ClosureFormValues): CreateClosureRequest {
  return { startDate: values.startDate, endDate: values.endDate, reason: values.reason.trim() };
}

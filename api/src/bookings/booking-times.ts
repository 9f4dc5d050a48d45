import { DateTime } from 'luxon';
import type { PlannedSegment, StartOption } from '../scheduling/availability';
import type { PlannedSegmentResponse } from './dto/booking.response';
import type { StartOptionResponse } from './dto/availability.response';

/** An instant in the workshop's zone with its offset: 2026-12-03T07:30:00+11:00. */
export function zonedIso(ms: number, timeZone: string): string {
  return DateTime.fromMillis(ms, { zone: timeZone }).toISO({ suppressMilliseconds: true }) ?? '';
}

export function utcIso(ms: number): string {
  return new Date(ms).toISOString();
}

/** The local date `days` calendar days after `date` (YYYY-MM-DD). */
export function addLocalDays(date: string, days: number): string {
  return DateTime.fromISO(date, { zone: 'utc' }).plus({ days }).toISODate() ?? date;
}

/** A YYYY-MM-DD string that names a real calendar date. */
export function isCalendarDate(date: string): boolean {
  return /^\d{4}-\d{2}-\d{2}$/.test(date) && DateTime.fromISO(date, { zone: 'utc' }).isValid;
}

/** The UTC instant at which the local date begins in the zone. */
export function startOfLocalDate(date: string, timeZone: string): number {
  return DateTime.fromISO(date, { zone: timeZone }).startOf('day').toMillis();
}

export function segmentResponse(segment: PlannedSegment, timeZone: string): PlannedSegmentResponse {
  return {
    bayId: segment.bayId,
    bayName: segment.bayName,
    bayKind: segment.bayKind,
    minutes: segment.minutes,
    start: zonedIso(segment.startsAtMs, timeZone),
    startUtc: utcIso(segment.startsAtMs),
    end: zonedIso(segment.endsAtMs, timeZone),
    endUtc: utcIso(segment.endsAtMs),
  };
}

export function startOptionResponse(option: StartOption, timeZone: string): StartOptionResponse {
  return {
    start: zonedIso(option.startsAtMs, timeZone),
    startUtc: utcIso(option.startsAtMs),
    localTime: DateTime.fromMillis(option.startsAtMs, { zone: timeZone }).toFormat('HH:mm'),
    end: zonedIso(option.endsAtMs, timeZone),
    endUtc: utcIso(option.endsAtMs),
    segments: option.segments.map((segment) => segmentResponse(segment, timeZone)),
  };
}

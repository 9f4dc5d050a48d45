/**
 * Types of the scheduling engine: what a job needs (a job plan of bay segments), the workshop's
 * calendar and bays, and the start times it can offer. Times are UTC instants in milliseconds
 * (`…Ms`); dates are the workshop's local calendar dates as `YYYY-MM-DD`; clock times of the
 * workshop's day are local `HH:mm`.
 */

/** The kinds of bay a job can need; the UI says "hoist bay", "alignment bay", "tyre bay". */
export type BayKind = 'hoist' | 'alignment' | 'tyre';

/** Bay kinds in the order a job visits them: hoist, then tyre, then alignment. */
export const SEGMENT_ORDER: readonly BayKind[] = ['hoist', 'tyre', 'alignment'];

/** A line of workshop time: labour, a service's bay minutes, fitting per wheel. */
export interface JobWorkItem {
  /** The bay the work is done in; null joins the job's first segment (alone: a hoist segment). */
  bayKind: BayKind | null;
  /** Whole minutes; 0 is dropped from the plan. */
  minutes: number;
  description: string;
}

/** A part of the job, for its lead time. */
export interface JobPartItem {
  description: string;
  /** True when the workshop must order it in; only these count towards the lead time. */
  specialOrder: boolean;
  /** Calendar days to get it in (whole, ≥ 0). */
  leadDays: number;
}

export interface JobPlanInput {
  /** Labour lines, service lines (bayMinutes), fitting per wheel. */
  work: JobWorkItem[];
  parts: JobPartItem[];
  /** Calendar days added after the longest special-order lead time. */
  leadTimeBufferDays: number;
  /** YYYY-MM-DD in the workshop zone. */
  todayLocalDate: string;
}

/** One stay in one kind of bay: "hoist bay 3 h 30". */
export interface JobSegment {
  bayKind: BayKind;
  minutes: number;
  /** The descriptions of the work in it, in line order. */
  descriptions: string[];
}

export interface JobPlan {
  /** In order (hoist, tyre, alignment); empty when the quote has no workshop time. */
  segments: JobSegment[];
  totalMinutes: number;
  /** 0 when every part is on the shelf. */
  longestLeadDays: number;
  /** today + longestLeadDays + leadTimeBufferDays. */
  earliestStartDate: string;
}

/** The hours of one weekday, local `HH:mm`; the break is both null or both set. */
export interface DayHours {
  opensAt: string;
  closesAt: string;
  breakStartsAt: string | null;
  breakEndsAt: string | null;
}

/** ISO weekday: 1 = Monday … 7 = Sunday. */
export type IsoWeekday = 1 | 2 | 3 | 4 | 5 | 6 | 7;

export interface WorkshopCalendar {
  /** IANA zone name, e.g. Australia/Sydney. */
  timeZone: string;
  /** Hours per ISO weekday; null = closed that weekday. */
  weeklyHours: Record<IsoWeekday, DayHours | null>;
  /** Local date → why it is closed ("Public holiday: Christmas Day", "Closed: stocktake"). */
  closedDates: ReadonlyMap<string, string>;
  /** Starts are offered at opensAt + k × slotStepMinutes. */
  slotStepMinutes: number;
}

export interface BayRef {
  id: string;
  name: string;
  kind: BayKind;
  /** Lower positions are chosen first. */
  position: number;
}

/** A bay taken over the half-open interval [startsAtMs, endsAtMs). */
export interface BusyInterval {
  bayId: string;
  startsAtMs: number;
  endsAtMs: number;
}

/** A segment placed in a bay: its reservation runs from start to end, breaks and nights included. */
export interface PlannedSegment {
  bayId: string;
  bayName: string;
  bayKind: BayKind;
  /** Working minutes (the segment's own length, not the reservation's). */
  minutes: number;
  startsAtMs: number;
  endsAtMs: number;
}

/** A start time the workshop can offer, with the bays it takes. */
export interface StartOption {
  startsAtMs: number;
  endsAtMs: number;
  segments: PlannedSegment[];
}

/** One local date of an availability answer. */
export interface DayAvailability {
  date: string;
  /** Why the workshop is shut that day; null when open (or before the earliest start date). */
  closedReason: string | null;
  starts: StartOption[];
}

export interface AvailabilityQuery {
  calendar: WorkshopCalendar;
  plan: JobPlan;
  /** The bays that can be booked (active ones). */
  bays: BayRef[];
  busy: BusyInterval[];
  /** The first local date asked about. */
  fromDate: string;
  /** How many local dates: fromDate … fromDate + days − 1. */
  days: number;
  /** Now: no start earlier than this. */
  notBeforeMs: number;
  /** Open days a job may run over, counting its first; default 5. A start needing more is not offered. */
  maxJobDays?: number;
}

/** A public holiday on a local date. */
export interface PublicHoliday {
  date: string;
  name: string;
}

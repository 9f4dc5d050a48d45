import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { DateTime } from 'luxon';
import { useState } from 'react';
import type { Availability, StartOption } from '@/types/api';
import { availabilityQueryOptions } from '../api/get-availability';

/** Days asked for at a time (two weeks of the calendar). */
export const AVAILABILITY_WINDOW_DAYS = 14;

function addDays(isoDate: string, days: number): string {
  return DateTime.fromISO(isoDate, { zone: 'UTC' }).plus({ days }).toISODate() ?? isoDate;
}

function hasStarts(availability: Availability): boolean {
  return availability.days.some((day) => day.starts.length > 0);
}

/** The first day of a window that has a start, or null. */
export function firstDayWithStarts(availability: Availability | undefined): string | null {
  return availability?.days.find((day) => day.starts.length > 0)?.date ?? null;
}

/**
 * The choice of a start for one quote version: which two weeks are shown, the day picked and
 * the start picked. The first window opens on the workshop's today (the API's default); when
 * nothing can start in it because parts are still on order, it opens on the earliest start.
 */
export function useStartChoice(quoteVersionId: string | null) {
  const enabled = Boolean(quoteVersionId);
  const base = useQuery({
    ...availabilityQueryOptions({
      quoteVersionId: quoteVersionId ?? '',
      days: AVAILABILITY_WINDOW_DAYS,
    }),
    enabled,
  });
  const [chosenFrom, setChosenFrom] = useState<string | null>(null);
  const [pickedDate, setPickedDate] = useState<string | null>(null);
  const [start, setStart] = useState<StartOption | null>(null);

  const today = base.data?.days[0]?.date ?? null;
  const baseLast = base.data?.days[base.data.days.length - 1]?.date ?? null;
  const earliest = base.data?.plan.earliestStartDate ?? null;
  const jumpTo =
    base.data && !hasStarts(base.data) && earliest && baseLast && earliest > baseLast
      ? earliest
      : null;
  const from = chosenFrom ?? jumpTo;

  const shifted = useQuery({
    ...availabilityQueryOptions({
      quoteVersionId: quoteVersionId ?? '',
      from: from ?? undefined,
      days: AVAILABILITY_WINDOW_DAYS,
    }),
    enabled: enabled && from !== null,
    placeholderData: keepPreviousData,
  });
  const current = from === null ? base : shifted;
  const availability = current.data;
  const windowStart = availability?.days[0]?.date ?? null;

  const datesWithStarts = new Set(
    (availability?.days ?? []).filter((day) => day.starts.length > 0).map((day) => day.date),
  );
  // The day picked, while the window shows it with starts; otherwise the window's first such day.
  const date =
    pickedDate && datesWithStarts.has(pickedDate) ? pickedDate : firstDayWithStarts(availability);

  const showWindow = (nextFrom: string) => {
    setChosenFrom(nextFrom);
    setPickedDate(null);
  };

  return {
    /** The first answer (from the workshop's today): 409 here means the quote cannot be booked. */
    base,
    /** The answer for the window shown. */
    current,
    availability,
    today,
    windowStart,
    date,
    pickDate: (next: string) => {
      setPickedDate(next);
      setStart(null);
    },
    start,
    /** Picks a start; its day becomes the day shown when the window holds it. */
    pickStart: (next: StartOption | null) => {
      setStart(next);
      if (next && availability) {
        const day = availability.days.find((entry) =>
          entry.starts.some((option) => option.startUtc === next.startUtc),
        );
        if (day) setPickedDate(day.date);
      }
    },
    canGoEarlier: Boolean(today && windowStart && windowStart > today),
    showEarlier: () => {
      if (!today || !windowStart) return;
      const earlier = addDays(windowStart, -AVAILABILITY_WINDOW_DAYS);
      showWindow(earlier < today ? today : earlier);
    },
    showLater: () => {
      if (windowStart) showWindow(addDays(windowStart, AVAILABILITY_WINDOW_DAYS));
    },
  };
}

export type StartChoice = ReturnType<typeof useStartChoice>;

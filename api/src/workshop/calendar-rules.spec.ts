import { describe, expect, it } from 'vitest';
import {
  type OpeningHoursEntry,
  openingHoursEntriesOf,
  openingHoursFieldErrors,
  weeklyHoursOf,
} from './calendar-rules';

const WEEK: OpeningHoursEntry[] = [1, 2, 3, 4, 5, 6, 7].map((weekday) =>
  weekday === 7
    ? { weekday, open: false }
    : {
        weekday,
        open: true,
        opensAt: '07:30',
        closesAt: '17:00',
        breakStartsAt: '12:00',
        breakEndsAt: '12:30',
      },
);

function withMonday(monday: Partial<OpeningHoursEntry>): OpeningHoursEntry[] {
  return [{ ...WEEK[0], ...monday }, ...WEEK.slice(1)];
}

/** The fields named, each with a message. */
function fieldsOf(entries: OpeningHoursEntry[]): string[] {
  const errors = openingHoursFieldErrors(entries);
  for (const messages of Object.values(errors)) {
    expect(messages.length).toBeGreaterThan(0);
    for (const message of messages) expect(message.length).toBeGreaterThan(5);
  }
  return Object.keys(errors);
}

describe('opening hours rules', () => {
  it('accepts a week with breaks, days without and closed days without times', () => {
    expect(openingHoursFieldErrors(WEEK)).toEqual({});
    expect(openingHoursFieldErrors(withMonday({ breakStartsAt: null, breakEndsAt: null }))).toEqual(
      {},
    );
    // A closed day's times are not used, whatever they say.
    expect(
      openingHoursFieldErrors(withMonday({ open: false, opensAt: '17:00', closesAt: '07:00' })),
    ).toEqual({});
  });

  it('names a weekday listed twice at its second place', () => {
    const week = [...WEEK];
    week[4] = { ...week[4], weekday: 2 };
    expect(openingHoursFieldErrors(week)).toEqual({
      'openingHours[4].weekday': ['Tuesday is listed twice'],
    });
  });

  it('wants both times on an open day, the closing one later', () => {
    expect(fieldsOf(withMonday({ opensAt: null }))).toEqual(['openingHours[0].opensAt']);
    expect(fieldsOf(withMonday({ closesAt: undefined }))).toEqual(['openingHours[0].closesAt']);
    expect(fieldsOf(withMonday({ closesAt: '07:30' }))).toEqual(['openingHours[0].closesAt']);
    expect(fieldsOf(withMonday({ opensAt: '18:00' }))).toEqual(['openingHours[0].closesAt']);
  });

  it('wants a break with both ends, inside the open hours, ending after it starts', () => {
    expect(fieldsOf(withMonday({ breakEndsAt: null }))).toEqual(['openingHours[0].breakEndsAt']);
    expect(fieldsOf(withMonday({ breakStartsAt: undefined }))).toEqual([
      'openingHours[0].breakStartsAt',
    ]);
    expect(fieldsOf(withMonday({ breakStartsAt: '07:30' }))).toEqual([
      'openingHours[0].breakStartsAt',
    ]);
    expect(fieldsOf(withMonday({ breakEndsAt: '12:00' }))).toEqual(['openingHours[0].breakEndsAt']);
    expect(fieldsOf(withMonday({ breakStartsAt: '16:30', breakEndsAt: '17:00' }))).toEqual([
      'openingHours[0].breakEndsAt',
    ]);
    // The third entry is keyed by its place in the list, not by its weekday.
    const week = [...WEEK];
    week[2] = { ...week[2], breakStartsAt: '13:00', breakEndsAt: '12:45' };
    expect(fieldsOf(week)).toEqual(['openingHours[2].breakEndsAt']);
  });

  it('turns stored rows into the 7-day week and the engine’s weekday map', () => {
    const rows = [
      { weekday: 6, opensAt: '08:00', closesAt: '12:00', breakStartsAt: null, breakEndsAt: null },
      {
        weekday: 1,
        opensAt: '07:30',
        closesAt: '17:00',
        breakStartsAt: '12:00',
        breakEndsAt: '12:30',
      },
    ];
    const entries = openingHoursEntriesOf(rows);
    expect(entries.map((entry) => [entry.weekday, entry.open])).toEqual([
      [1, true],
      [2, false],
      [3, false],
      [4, false],
      [5, false],
      [6, true],
      [7, false],
    ]);
    expect(entries[1]).toEqual({
      weekday: 2,
      open: false,
      opensAt: null,
      closesAt: null,
      breakStartsAt: null,
      breakEndsAt: null,
    });
    const week = weeklyHoursOf(rows);
    expect(week[1]).toEqual({
      opensAt: '07:30',
      closesAt: '17:00',
      breakStartsAt: '12:00',
      breakEndsAt: '12:30',
    });
    expect(week[6]).toEqual({
      opensAt: '08:00',
      closesAt: '12:00',
      breakStartsAt: null,
      breakEndsAt: null,
    });
    expect(week[7]).toBeNull();
  });
});

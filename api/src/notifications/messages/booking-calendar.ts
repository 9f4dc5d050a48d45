import ical, { ICalCalendarMethod, ICalEventStatus } from 'ical-generator';
import { DateTime, FixedOffsetZone } from 'luxon';
import type { MailAttachment } from '../../mail/templates/mail-content';
import type { WorkshopCard } from './customer-message';

/** The iCalendar domain of our UIDs. */
export const CALENDAR_UID_DOMAIN = 'liftwright.example';

export interface BookingCalendarInput {
  method: 'REQUEST' | 'CANCEL';
  /** The booking's id: the UID is made from it and never changes. */
  bookingId: string;
  sequence: number;
  /** When this version of the event was made (DTSTAMP). */
  stamp: Date;
  startsAt: Date;
  endsAt: Date;
  timeZone: string;
  summary: string;
  description: string;
  workshop: WorkshopCard;
  customer: { name: string; email: string };
}

export function bookingUid(bookingId: string): string {
  return `booking-${bookingId}@${CALENDAR_UID_DOMAIN}`;
}

function offsetText(minutes: number): string {
  const sign = minutes < 0 ? '-' : '+';
  const abs = Math.abs(minutes);
  return `${sign}${String(Math.floor(abs / 60)).padStart(2, '0')}${String(abs % 60).padStart(2, '0')}`;
}

function localStamp(instant: DateTime): string {
  return instant.toFormat("yyyyMMdd'T'HHmmss");
}

/**
 * A VTIMEZONE for the zone (RFC 5545 §3.6.5) from the time zone data Node ships, covering the
 * year before the event to the year after: one observance per offset change, each with its own
 * DTSTART (no RRULE), or a single STANDARD observance for a zone without changes.
 */
export function vtimezone(timeZone: string, around: Date): string {
  const year = DateTime.fromJSDate(around, { zone: timeZone }).year;
  let cursor = DateTime.fromObject({ year: year - 1, month: 1, day: 1 }, { zone: timeZone });
  const end = DateTime.fromObject({ year: year + 2, month: 1, day: 1 }, { zone: timeZone });
  const observances: string[] = [];
  const observance = (from: number, to: DateTime) => {
    const kind = to.isInDST ? 'DAYLIGHT' : 'STANDARD';
    // The onset in the local time in force before it (RFC 5545 §3.6.5, its examples).
    const onset = to.setZone(FixedOffsetZone.instance(from));
    return [
      `BEGIN:${kind}`,
      `DTSTART:${localStamp(onset)}`,
      `TZOFFSETFROM:${offsetText(from)}`,
      `TZOFFSETTO:${offsetText(to.offset)}`,
      `TZNAME:${to.setLocale('en-AU').offsetNameShort ?? offsetText(to.offset)}`,
      `END:${kind}`,
    ].join('\r\n');
  };
  const first = cursor;
  while (cursor < end) {
    const next = cursor.plus({ hours: 1 });
    if (next.offset !== cursor.offset) {
      // Narrow the change down to the minute.
      let low = cursor.toMillis();
      let high = next.toMillis();
      while (high - low > 60_000) {
        const middle = low + Math.floor((high - low) / 120_000) * 60_000;
        if (DateTime.fromMillis(middle, { zone: timeZone }).offset === cursor.offset) low = middle;
        else high = middle;
      }
      observances.push(observance(cursor.offset, DateTime.fromMillis(high, { zone: timeZone })));
    }
    cursor = next;
  }
  if (observances.length === 0) observances.push(observance(first.offset, first));
  return ['BEGIN:VTIMEZONE', `TZID:${timeZone}`, ...observances, 'END:VTIMEZONE'].join('\r\n');
}

/**
 * The booking as an iCalendar object (RFC 5545) for an iTIP message (RFC 5546): METHOD REQUEST
 * for a confirmed or moved booking, CANCEL when it is cancelled; the same UID for the booking's
 * whole life, SEQUENCE raised on every change; times in the workshop's zone with its VTIMEZONE.
 */
export function bookingCalendar(input: BookingCalendarInput): MailAttachment {
  const calendar = ical({
    prodId: { company: 'Liftwright', product: 'Liftwright bookings', language: 'EN' },
    method: input.method === 'CANCEL' ? ICalCalendarMethod.CANCEL : ICalCalendarMethod.REQUEST,
    timezone: { name: input.timeZone, generator: (zone) => vtimezone(zone, input.startsAt) },
  });
  calendar.createEvent({
    id: bookingUid(input.bookingId),
    sequence: input.sequence,
    stamp: DateTime.fromJSDate(input.stamp, { zone: 'utc' }),
    start: DateTime.fromJSDate(input.startsAt, { zone: input.timeZone }),
    end: DateTime.fromJSDate(input.endsAt, { zone: input.timeZone }),
    timezone: input.timeZone,
    summary: input.summary,
    description: input.description,
    location: `${input.workshop.name}, ${input.workshop.addressLine}, ${input.workshop.town}`,
    status: input.method === 'CANCEL' ? ICalEventStatus.CANCELLED : ICalEventStatus.CONFIRMED,
    organizer: { name: input.workshop.name, email: input.workshop.email },
    attendees: [{ name: input.customer.name, email: input.customer.email, rsvp: false }],
  });
  const method = input.method;
  // DTSTAMP is always UTC (RFC 5545 §3.8.7.2); with a calendar time zone set, ical-generator
  // writes it as a local time without the Z, so it is written here.
  const stamp = `${DateTime.fromJSDate(input.stamp, { zone: 'utc' }).toFormat("yyyyMMdd'T'HHmmss")}Z`;
  const content = calendar.toString().replace(/^DTSTAMP:.*$/m, `DTSTAMP:${stamp}`);
  return {
    filename: method === 'CANCEL' ? 'booking-cancelled.ics' : 'booking.ics',
    contentType: `text/calendar; charset=utf-8; method=${method}`,
    content,
  };
}

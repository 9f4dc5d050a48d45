import ICAL from 'ical.js';
import { describe, expect, it } from 'vitest';
import { DEMO_WORKSHOP_CARD } from '../../database/seeders/demo-workshop.seeder';
import { bookingUid, vtimezone } from './booking-calendar';
import {
  type BookingMessageInput,
  bookingCancelledMessage,
  bookingConfirmedMessage,
  bookingMovedMessage,
  bookingReminderMessage,
  bookingRequestedMessage,
  quoteSavedMessage,
  refundIssuedMessage,
} from './booking-messages';
import type { CustomerMessage } from './customer-message';

const BOOKING_ID = '6f1c2a3b-4d5e-4f60-8a71-92b3c4d5e6f7';

const INPUT: BookingMessageInput = {
  customer: { name: 'Robin <Yarrow> & Co', email: 'robin@example.test' },
  workshop: DEMO_WORKSHOP_CARD,
  timeZone: 'Australia/Sydney',
  bookingId: BOOKING_ID,
  bookingReference: 'B-000042',
  quoteReference: 'Q-000123 v1',
  vehicleName: 'Vantrel Strata SR dual cab',
  // 8:30 am to 12:30 pm on Friday 4 December 2026, Sydney (daylight time, UTC+11).
  startsAt: new Date('2026-12-03T21:30:00Z'),
  endsAt: new Date('2026-12-04T01:30:00Z'),
  calendarSequence: 0,
  now: new Date('2026-12-02T07:00:00Z'),
};

function parse(message: CustomerMessage) {
  expect(message.attachments).toHaveLength(1);
  const [attachment] = message.attachments;
  const calendar = new ICAL.Component(ICAL.parse(attachment.content));
  const event = calendar.getFirstSubcomponent('vevent');
  if (!event) throw new Error('no VEVENT');
  return { attachment, calendar, event };
}

function expectCommonParts(message: CustomerMessage) {
  for (const part of [message.text, message.html]) {
    expect(part).toContain('B-000042');
    expect(part).toContain(DEMO_WORKSHOP_CARD.addressLine);
    expect(part).toContain(DEMO_WORKSHOP_CARD.phone);
    expect(part).toContain(DEMO_WORKSHOP_CARD.email);
    // No raw ids in what the customer reads.
    expect(part).not.toContain(BOOKING_ID);
  }
  expect(message.text).toContain('Kestrelmere 4x4 & Tyre');
  expect(message.html).toContain('Kestrelmere 4x4 &amp; Tyre');
  expect(message.html).toContain('Robin &lt;Yarrow&gt; &amp; Co');
  expect(message.html).not.toContain('<Yarrow>');
}

describe('booking messages', () => {
  it('booking requested: the reference, the start in workshop time, no attachment', () => {
    const message = bookingRequestedMessage(INPUT);
    expectCommonParts(message);
    // Source: IANA tz database (Australia/Sydney: AEDT, UTC+11, from the first Sunday in October)
    expect(message.text).toContain('Friday 4 December 2026, 8:30 am AEDT');
    expect(message.attachments).toEqual([]);
  });

  it('booking confirmed: an iCalendar REQUEST with UID, SEQUENCE 0, DTSTAMP, DTSTART/DTEND in the workshop zone', () => {
    const message = bookingConfirmedMessage(INPUT);
    expectCommonParts(message);
    const { attachment, calendar, event } = parse(message);
    expect(attachment.contentType).toBe('text/calendar; charset=utf-8; method=REQUEST');
    // Source: RFC 5545 §3.6.1 (VEVENT), §3.8.7.4 (SEQUENCE); RFC 5546 §3.2 (METHOD REQUEST/CANCEL)
    expect(calendar.getFirstPropertyValue('method')).toBe('REQUEST');
    expect(event.getFirstPropertyValue('uid')).toBe(`booking-${BOOKING_ID}@liftwright.example`);
    expect(event.getFirstPropertyValue('sequence')).toBe(0);
    const stamp = event.getFirstPropertyValue('dtstamp') as ICAL.Time;
    // Source: RFC 5545 §3.8.7.2 (DTSTAMP is in UTC)
    expect(stamp.zone?.tzid).toBe('UTC');
    expect(stamp.toJSDate().toISOString()).toBe('2026-12-02T07:00:00.000Z');
    const start = event.getFirstProperty('dtstart');
    const end = event.getFirstProperty('dtend');
    expect(start?.getParameter('tzid')).toBe('Australia/Sydney');
    expect(end?.getParameter('tzid')).toBe('Australia/Sydney');
    expect(String(start?.getFirstValue())).toBe('2026-12-04T08:30:00');
    expect(String(end?.getFirstValue())).toBe('2026-12-04T12:30:00');
    // The VTIMEZONE turns the local times into the right instants (ical.js does the sums).
    const vtimezone = calendar.getFirstSubcomponent('vtimezone');
    expect(vtimezone?.getFirstPropertyValue('tzid')).toBe('Australia/Sydney');
    const zone = new ICAL.Timezone(vtimezone!);
    const startTime = (start?.getFirstValue() as ICAL.Time).clone();
    startTime.zone = zone;
    // Source: IANA tz database (Australia/Sydney is UTC+11 in December)
    expect(startTime.toJSDate().toISOString()).toBe('2026-12-03T21:30:00.000Z');
    expect(event.getFirstPropertyValue('summary')).toContain('B-000042');
    expect(event.getFirstPropertyValue('location')).toBe(
      'Kestrelmere 4x4 & Tyre, 7 Quarry Flat Road, Tallowgate',
    );
  });

  it('booking moved: the same UID with SEQUENCE raised by one, the new times', () => {
    const first = parse(bookingConfirmedMessage(INPUT)).event;
    const moved = bookingMovedMessage({
      ...INPUT,
      previousStartsAt: INPUT.startsAt,
      startsAt: new Date('2026-12-07T22:00:00Z'),
      endsAt: new Date('2026-12-08T02:00:00Z'),
      calendarSequence: 1,
      withCalendar: true,
    });
    expectCommonParts(moved);
    expect(moved.text).toContain('It was Friday 4 December 2026, 8:30 am AEDT');
    const { calendar, event } = parse(moved);
    // Source: RFC 5545 §3.6.1 (VEVENT), §3.8.7.4 (SEQUENCE); RFC 5546 §3.2 (METHOD REQUEST/CANCEL)
    expect(calendar.getFirstPropertyValue('method')).toBe('REQUEST');
    expect(event.getFirstPropertyValue('uid')).toBe(first.getFirstPropertyValue('uid'));
    expect(event.getFirstPropertyValue('sequence')).toBe(
      Number(first.getFirstPropertyValue('sequence')) + 1,
    );
    expect(String(event.getFirstPropertyValue('dtstart'))).toBe('2026-12-08T09:00:00');
  });

  it('booking moved before it was confirmed: told, without a calendar event', () => {
    const moved = bookingMovedMessage({
      ...INPUT,
      previousStartsAt: INPUT.startsAt,
      calendarSequence: 1,
      withCalendar: false,
    });
    expect(moved.attachments).toEqual([]);
  });

  it('booking cancelled: METHOD:CANCEL, the same UID, SEQUENCE raised', () => {
    const cancelled = bookingCancelledMessage({
      ...INPUT,
      calendarSequence: 2,
      withCalendar: true,
    });
    expectCommonParts(cancelled);
    const { attachment, calendar, event } = parse(cancelled);
    expect(attachment.contentType).toBe('text/calendar; charset=utf-8; method=CANCEL');
    // Source: RFC 5545 §3.6.1 (VEVENT), §3.8.7.4 (SEQUENCE); RFC 5546 §3.2 (METHOD REQUEST/CANCEL)
    expect(calendar.getFirstPropertyValue('method')).toBe('CANCEL');
    expect(event.getFirstPropertyValue('uid')).toBe(bookingUid(BOOKING_ID));
    expect(event.getFirstPropertyValue('sequence')).toBe(2);
    expect(event.getFirstPropertyValue('status')).toBe('CANCELLED');
    expect(event.getFirstPropertyValue('dtstamp')).toBeTruthy();
  });

  it('refund issued and quote saved carry the amounts and the workshop card', () => {
    const refund = refundIssuedMessage({
      customer: INPUT.customer,
      workshop: DEMO_WORKSHOP_CARD,
      timeZone: 'Australia/Sydney',
      bookingReference: 'B-000042',
      currency: 'aud',
      refundCents: 50000,
      paidCents: 100000,
      reason: 'Cancelled less than 48 hours before the start: 50 % of the deposit back.',
      refundedAt: INPUT.now,
    });
    expectCommonParts(refund);
    expect(refund.subject).toBe('Refund of $500.00 AUD for booking B-000042');
    expect(refund.text).toContain('1,000.00 AUD');

    const quote = quoteSavedMessage({
      customer: INPUT.customer,
      workshop: DEMO_WORKSHOP_CARD,
      timeZone: 'Australia/Sydney',
      quoteReference: 'Q-000123 v1',
      vehicleName: 'Vantrel Strata SR dual cab',
      currency: 'AUD',
      totalCents: 512345,
      depositCents: 100000,
      validUntilDate: '2026-12-16',
      quoteUrl: 'https://shop.liftwright.example/account/quotes',
    });
    expect(quote.subject).toBe('Your quote Q-000123 v1 from Kestrelmere 4x4 & Tyre');
    expect(quote.text).toContain('5,123.45 AUD');
    expect(quote.html).toContain('1,000.00 AUD');
    expect(quote.text).toContain(DEMO_WORKSHOP_CARD.phone);
  });

  it('reminder: tomorrow at the local start, where to come, the cautions, no attachment', () => {
    const message = bookingReminderMessage(INPUT);
    expectCommonParts(message);
    // Source: IANA tz database (the zone data the runtime ships): Sydney keeps daylight time
    // (AEDT, UTC+11) in December, so 21:30 UTC on the 3rd is 8:30 am on Friday the 4th.
    expect(message.subject).toBe('Reminder: booking B-000042 tomorrow at 8:30 am');
    for (const part of [message.text, message.html]) {
      expect(part).toContain('Friday 4 December 2026, 8:30 am AEDT');
      expect(part).toContain(DEMO_WORKSHOP_CARD.town);
      expect(part).toContain('licensed technician');
      expect(part).toContain('wheel nuts re-checked');
    }
    expect(message.attachments).toEqual([]);
  });
});

describe('vtimezone', () => {
  it('has the offset changes of the zone around the event', () => {
    const text = vtimezone('Australia/Sydney', new Date('2026-12-03T21:30:00Z'));
    // Source: IANA tz database (Australia/Sydney: daylight time from 2 am on the first Sunday in
    // October, 3 am local daylight time back to standard on the first Sunday in April)
    expect(text).toContain('DTSTART:20261004T020000\r\nTZOFFSETFROM:+1000\r\nTZOFFSETTO:+1100');
    expect(text).toContain('DTSTART:20260405T030000\r\nTZOFFSETFROM:+1100\r\nTZOFFSETTO:+1000');
  });

  it('has one STANDARD observance for a zone without daylight time', () => {
    const text = vtimezone('Australia/Brisbane', new Date('2026-12-03T21:30:00Z'));
    // Source: IANA tz database (Australia/Brisbane: UTC+10 all year)
    expect(text.match(/BEGIN:STANDARD/g)).toHaveLength(1);
    expect(text).toContain('TZOFFSETTO:+1000');
    expect(text).not.toContain('DAYLIGHT');
  });
});

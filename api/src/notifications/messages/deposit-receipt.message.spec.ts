import { describe, expect, it } from 'vitest';
import { DEMO_WORKSHOP_CARD } from '../../database/seeders/demo-workshop.seeder';
import { depositReceiptMail, workshopDateTime } from './deposit-receipt.message';

const INPUT = {
  customerName: 'Robin <Yarrow> & Co',
  workshop: DEMO_WORKSHOP_CARD,
  bookingReference: 'B-000042',
  quoteReference: 'Q-000123 v1',
  vehicleName: 'Vantrel Strata SR dual cab',
  startsAt: new Date('2026-12-02T20:30:00Z'),
  timeZone: 'Australia/Sydney',
  currency: 'aud',
  amountPaidCents: 100000,
  paidAt: new Date('2026-12-01T23:05:00Z'),
  balanceDueCents: 412345,
};

describe('depositReceiptMail', () => {
  it('shows the start in the workshop zone', () => {
    // Source: IANA time zone database, Australia/Sydney: daylight time (AEDT, UTC+11) in
    // December, standard time (AEST, UTC+10) in June.
    expect(workshopDateTime(INPUT.startsAt, 'Australia/Sydney')).toBe(
      'Thursday 3 December 2026, 7:30 am AEDT',
    );
    expect(workshopDateTime(new Date('2027-06-02T20:30:00Z'), 'Australia/Sydney')).toBe(
      'Thursday 3 June 2027, 6:30 am AEST',
    );
  });

  it('has the workshop card, the booking, the amount and the balance in text and HTML', () => {
    const mail = depositReceiptMail(INPUT);
    expect(mail.subject).toBe('Receipt: deposit for booking B-000042');
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain('B-000042');
      expect(part).toContain('Q-000123 v1');
      expect(part).toContain('Thursday 3 December 2026, 7:30 am AEDT');
      expect(part).toContain('$1,000.00 AUD');
      expect(part).toContain('$4,123.45 AUD');
      expect(part).toContain(
        DEMO_WORKSHOP_CARD.name.replace('&', part === mail.html ? '&amp;' : '&'),
      );
      expect(part).toContain(DEMO_WORKSHOP_CARD.addressLine);
      expect(part).toContain(DEMO_WORKSHOP_CARD.phone);
      expect(part).toContain(DEMO_WORKSHOP_CARD.email);
    }
    expect(mail.text).toMatch(/^Balance due: +\$4,123\.45 AUD$/m);
  });

  it('escapes names in the HTML part', () => {
    const mail = depositReceiptMail(INPUT);
    expect(mail.html).toContain('Robin &lt;Yarrow&gt; &amp; Co');
    expect(mail.html).not.toContain('<Yarrow>');
    expect(mail.text).toContain('Hello Robin <Yarrow> & Co,');
  });

  it('says so when a late payment was refunded in full', () => {
    const mail = depositReceiptMail({ ...INPUT, refundedInFullCents: 100000 });
    expect(mail.subject).toBe('Your payment for booking B-000042 has been refunded');
    expect(mail.text).toMatch(/^Refunded: +\$1,000\.00 AUD$/m);
    expect(mail.text).not.toContain('Balance due');
  });

  it('words a top-up as a top-up, with the balance after it', () => {
    const mail = depositReceiptMail({
      ...INPUT,
      kind: 'top-up',
      amountPaidCents: 30000,
      balanceDueCents: 382345,
    });
    expect(mail.subject).toBe('Receipt: deposit top-up for booking B-000042');
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain('deposit top-up of $300.00 AUD');
      expect(part).toContain('$3,823.45 AUD');
    }
    const refunded = depositReceiptMail({ ...INPUT, kind: 'top-up', refundedInFullCents: 30000 });
    expect(refunded.subject).toBe('Your payment for booking B-000042 has been refunded');
    expect(refunded.text).toContain('deposit top-up');
  });
});

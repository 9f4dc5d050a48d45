import { describe, expect, it } from 'vitest';
import { DEMO_WORKSHOP_CARD } from '../../database/seeders/demo-workshop.seeder';
import { revisedQuoteMessage } from './revised-quote.message';

const pdf = Buffer.from('%PDF-1.3 revised quote');

function message(overrides: Partial<Parameters<typeof revisedQuoteMessage>[0]> = {}) {
  return revisedQuoteMessage({
    customer: { name: 'Ada Quillon', email: 'ada@example.test' },
    workshop: DEMO_WORKSHOP_CARD,
    quoteReference: 'Q-000014',
    versionNumber: 2,
    previousVersionNumber: 1,
    vehicleName: 'Brellin Highrange 4.5 wagon',
    currency: 'AUD',
    reason: 'The Trekline is out of stock: swapped for the Ridgeback <same size>.',
    totalCents: 660595,
    previousTotalCents: 621390,
    depositCents: 100000,
    previousDepositCents: 100000,
    validUntilDate: '2027-01-02',
    compareUrl: 'https://shop.example/account/quotes/abc/versions/2/compare',
    bookingLine: 'B-000042, Thursday 10 December 2026, 7:30 am AEDT',
    pdf: { fileName: 'quote-Q-000014-v2.pdf', bytes: pdf },
    ...overrides,
  });
}

describe('the revised-quote message', () => {
  it('gives the new totals beside the old, the reason, the booking and the link', () => {
    const { subject, text, html } = message();
    expect(subject).toBe('Revised quote Q-000014 v2 from Kestrelmere 4x4 & Tyre');
    expect(text).toContain('New total:         $6,605.95 AUD (was $6,213.90 AUD)');
    expect(text).toContain('Deposit:           $1,000.00 AUD (unchanged)');
    expect(text).toContain('Price valid until: 2 January 2027');
    expect(text).toContain('B-000042, Thursday 10 December 2026');
    expect(text).toContain('https://shop.example/account/quotes/abc/versions/2/compare');
    expect(text).toContain(DEMO_WORKSHOP_CARD.phone);
    // The HTML part escapes the reason and makes the address a link.
    expect(html).toContain('Ridgeback &lt;same size&gt;');
    expect(html).toContain('<a href="https://shop.example/account/quotes/abc/versions/2/compare">');
  });

  it('attaches the PDF as base64 of its bytes', () => {
    const [attachment] = message().attachments;
    expect(attachment).toMatchObject({
      filename: 'quote-Q-000014-v2.pdf',
      contentType: 'application/pdf',
      encoding: 'base64',
    });
    expect(Buffer.from(attachment.content, 'base64').equals(pdf)).toBe(true);
  });

  it('leaves the booking out when there is none', () => {
    const { text } = message({ bookingLine: null });
    expect(text).not.toContain('Booking:');
    expect(text).not.toContain('re-plan');
  });
});

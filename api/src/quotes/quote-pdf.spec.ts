import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { checkFitment } from '../fitment/check-fitment';
import { passingUtePackage } from '../fitment/fitment.fixtures';
import { defaultRuleSetLimits } from '../fitment/rule-set-limits';
import { formatCents } from '../pricing/cents';
import { pricePackage } from '../pricing/price-package';
import { demoPackage, packageLine } from '../pricing/pricing.fixtures';
import { LOCAL_RULES_CAUTION, type QuotePdfInput, printable, renderQuotePdf } from './quote-pdf';

function input(overrides: Partial<QuotePdfInput> = {}): QuotePdfInput {
  return {
    card: {
      name: 'Kestrelmere 4x4 & Tyre',
      addressLine: '7 Quarry Flat Road',
      town: 'Tallowgate',
      phone: '0491 570 006',
      email: 'bookings@kestrelmere.example',
    },
    reference: 'Q-000042',
    versionNumber: 1,
    state: 'sent',
    issuedOn: '2026-12-01',
    validUntilDate: '2026-12-31',
    customer: { name: 'Robin Yarrow', email: 'customer@liftwright.example' },
    vehicle: { name: 'Vantrel Strata SR dual cab', year: 2019, rego: 'TLW042', nickname: null },
    revisionReason: null,
    price: pricePackage(demoPackage),
    fitReport: checkFitment(passingUtePackage(), defaultRuleSetLimits),
    createdAt: new Date('2026-12-01T01:00:00Z'),
    ...overrides,
  };
}

/** The text of a PDF, by a general-purpose extractor, with runs of white space made one space. */
async function textOf(bytes: Buffer): Promise<{ text: string; pages: number }> {
  const parser = new PDFParse({ data: bytes });
  const result = await parser.getText();
  await parser.destroy();
  return { text: result.text.replace(/\s+/g, ' '), pages: result.total };
}

describe('quote PDF', () => {
  it('prints the card, the dates, every line and the totals', async () => {
    const data = input();
    const bytes = await renderQuotePdf(data);
    // Source: ISO 32000-1 §7.5.2, a PDF file begins with the header "%PDF-" and its version.
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // Source: pdf-parse 2 (a general-purpose PDF text extractor) reads the text back.
    const { text, pages } = await textOf(bytes);
    // A long description may wrap (after a space or a dash): compare without white space.
    const squashed = text.replace(/\s/g, '');
    for (const description of data.price.lines.map((line) => line.description)) {
      expect(squashed, description).toContain(description.replace(/\s/g, ''));
    }
    for (const expected of [
      'Kestrelmere 4x4 & Tyre',
      '7 Quarry Flat Road, Tallowgate',
      '0491 570 006',
      'bookings@kestrelmere.example',
      'Quote Q-000042, version 1',
      'Issued 1 December 2026',
      'Prices valid until 31 December 2026',
      'Robin Yarrow',
      'Vantrel Strata SR dual cab, 2019, rego TLW042',
      ...data.price.lines.map((line) => formatCents(line.amountCents)),
      // The worked example of docs/pricing.md: total $6,560.47, GST $596.41, deposit capped.
      '$6,560.47',
      'Includes GST of $596.41.',
      '$1,000.00',
      '$5,560.47',
      data.price.roundingNote,
      `Checked against the rule set "${defaultRuleSetLimits.name}".`,
      LOCAL_RULES_CAUTION,
      ...data.fitReport.cautions.map((caution) => caution.message),
    ]) {
      expect(text, expected).toContain(expected);
    }
    expect(text).toContain('−$281.70');
    expect(text).toContain(`Q-000042 v1 · Page ${pages} of ${pages}`);
  });

  it('writes arrows and comparison signs out in words, as the Latin subset of Roboto lacks them', async () => {
    expect(printable('Hub-centric rings 110.1 → 106.1 mm')).toBe(
      'Hub-centric rings 110.1 to 106.1 mm',
    );
    expect(printable('≤ 50 mm, ≥ 2 bolts, ≈ 3 %')).toBe(
      'at most 50 mm, at least 2 bolts, about 3 %',
    );
    const data = input();
    const [first, ...rest] = data.fitReport.checks;
    const withArrow: QuotePdfInput = {
      ...data,
      fitReport: {
        ...data.fitReport,
        checks: [
          {
            ...first,
            verdict: 'advisory',
            message: 'The rings (110.1 → 106.1 mm) are not needed.',
          },
          ...rest,
        ],
      },
    };
    const parser = new PDFParse({ data: await renderQuotePdf(withArrow) });
    const text = (await parser.getText()).text;
    await parser.destroy();
    expect(text).toContain('The rings (110.1 to 106.1 mm) are not needed.');
    expect(text).not.toContain('→');
  });

  it('runs onto more pages when the package is long, numbering every page', async () => {
    const lines = Array.from({ length: 60 }, (_, index) =>
      packageLine({
        sku: `T-LONG-${index}`,
        name: `Test component number ${index + 1} with a long descriptive name that wraps`,
        kind: 'component',
        unitPriceCents: 1995,
      }),
    );
    const price = pricePackage({ ...demoPackage, lines, wheelsFitted: 0, tyresReplaced: 0 });
    const { text, pages } = await textOf(await renderQuotePdf(input({ price })));
    expect(pages).toBeGreaterThanOrEqual(3);
    expect(text).toContain(`Page ${pages} of ${pages}`);
    for (let index = 1; index <= 60; index += 1) {
      expect(text).toContain(`Test component number ${index} with a long descriptive name`);
    }
    // Source: 60 × $19.95 = $1,197.00; GST per invoice = 1,197.00 / 11 = 108.818… → $108.82
    // (A New Tax System (Goods and Services Tax) Act 1999, one eleventh of a GST-inclusive price,
    // s 9-90 rounding to the nearest cent).
    expect(text).toContain('$1,197.00');
    expect(text).toContain('Includes GST of $108.82.');
  });

  it('marks a version that no longer holds and prints GST as a line when prices exclude it', async () => {
    const price = pricePackage({
      ...demoPackage,
      policy: { ...demoPackage.policy, pricesIncludeTax: false },
    });
    const { text } = await textOf(await renderQuotePdf(input({ state: 'expired', price })));
    expect(text).toContain('EXPIRED: these prices no longer hold');
    expect(text).toContain('Subtotal (excluding GST)');
    expect(text).toContain(`GST at 10 % ${formatCents(price.taxCents)}`);
  });
});

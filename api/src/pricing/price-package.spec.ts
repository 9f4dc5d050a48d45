import { describe, expect, it } from 'vitest';
import { pricePackage, workshopDiscountLimitCents } from './price-package';
import {
  alignmentLine,
  demoPackage,
  demoPolicy,
  diffDropLine,
  packageLine,
  policyWith,
  suspensionKitLine,
  tyreLine,
  wheelLine,
} from './pricing.fixtures';
import type { PricedLine, PricingInput } from './pricing.types';

const amounts = (lines: PricedLine[]) => lines.map((line) => [line.kind, line.amountCents]);

/** Three GST-inclusive lines at $19.95 (services: no labour, no discount). */
function threeLinesAt1995(policy = demoPolicy): PricingInput {
  const line = (index: number) =>
    packageLine({ sku: `KW-SVC-${index}`, kind: 'service', unitPriceCents: 1995 });
  return { lines: [line(1), line(2), line(3)], wheelsFitted: 0, tyresReplaced: 0, policy };
}

describe('pricePackage: the worked example (prices include GST, per-invoice)', () => {
  const price = pricePackage(demoPackage);

  it('prices every line', () => {
    // Worked by hand (invented demo prices and policy, docs/pricing.md "Worked example 1"):
    // kit 1 × 1 745.00; wheels 5 × 329.00; tyres 5 × 389.00; diff drop 1 × 299.00; alignment 149.00;
    // labour 270 min × $140/h = 630.00 and 95 min × $140/h = 221.666… → 221.67;
    // fitting 5 × 35.00; disposal 5 × 6.50; bundle −5 % of parts 5 634.00 = −281.70.
    expect(amounts(price.lines)).toEqual([
      ['part', 174500],
      ['part', 164500],
      ['part', 194500],
      ['part', 29900],
      ['service', 14900],
      ['labour', 63000],
      ['labour', 22167],
      ['fitting-balancing', 17500],
      ['tyre-disposal', 3250],
      ['bundle-discount', -28170],
    ]);
    expect(price.breakdown).toEqual({
      partsCents: 563400,
      servicesCents: 14900,
      labourCents: 85167,
      fittingBalancingCents: 17500,
      tyreDisposalCents: 3250,
      bundleDiscountCents: -28170,
      workshopDiscountCents: 0,
    });
  });

  it('adds up to the total, with GST one eleventh of it', () => {
    expect(price.subtotalCents).toBe(656047);
    expect(price.totalCents).toBe(656047);
    // Source: A New Tax System (Goods and Services Tax) Act 1999 (GST-inclusive price ÷ 11, the "1/11th" rule at a 10 % rate) and s 9-90 (rounding): 6 560.47 ÷ 11 = 596.406… → $596.41.
    expect(price.taxCents).toBe(59641);
    expect(price.totalExcludingTaxCents).toBe(596406);
    expect(price.lines.every((line) => line.taxCents === null)).toBe(true);
  });

  it('takes the deposit up to the cap and leaves the balance due', () => {
    // Invented policy numbers (a workshop's own): 20 % of 6 560.47 = 1 312.09, capped at $1,000.00.
    expect(price.deposit).toMatchObject({
      depositCents: 100000,
      percentageCents: 131209,
      basis: 'cap',
      specialOrder: false,
    });
    expect(price.depositCents).toBe(100000);
    expect(price.balanceDueCents).toBe(556047);
  });

  it('states the method in words', () => {
    expect(price.taxRoundingMethod).toBe('per-invoice');
    expect(price.roundingNote).toContain('half a cent rounded up');
    expect(price.roundingNote).toContain('one eleventh of the invoice total');
    expect(price.roundingNote).toContain('(per-invoice method)');
    expect(price.roundingNote).toContain('5 % of the parts total');
    expect(price.roundingNote).toContain('at least $100.00 and at most $1,000.00');
    expect(price.quoteValidDays).toBe(30);
  });

  it('carries what the quote snapshot and the planner need on each line', () => {
    expect(price.lines[0]).toMatchObject({
      kind: 'part',
      productKind: 'suspension-kit',
      sku: 'BR-STR-50-M',
      quantity: 1,
      unitPriceCents: 174500,
      specialOrder: false,
    });
    expect(price.lines[5]).toMatchObject({
      kind: 'labour',
      sku: 'BR-STR-50-M',
      labourMinutes: 270,
      labourRateCentsPerHour: 14000,
      bayKind: 'hoist',
      description: 'Labour: Bramblerock Strata 50 mm kit, medium load (270 min at $140.00/h)',
    });
  });
});

describe('pricePackage: tax rounding methods', () => {
  it('gives $5.44 GST per-invoice and $5.43 per-line on three $19.95 lines', () => {
    // Source: A New Tax System (Goods and Services Tax) Act 1999 s 9-90 (rounding), as in the ATO's worked example: three lines at $19.95 → $5.44 (total method) or $5.43 (line method) (REFERENCES.md, H).
    const perInvoice = pricePackage(threeLinesAt1995());
    expect(perInvoice.totalCents).toBe(5985);
    expect(perInvoice.taxCents).toBe(544);
    const perLine = pricePackage(threeLinesAt1995(policyWith({ taxRoundingMethod: 'per-line' })));
    expect(perLine.totalCents).toBe(5985);
    expect(perLine.taxCents).toBe(543);
    expect(perLine.lines.map((line) => line.taxCents)).toEqual([181, 181, 181]);
    expect(perLine.roundingNote).toContain('(per-line method)');
  });

  it('defaults to per-invoice when the policy does not say', () => {
    const { taxRoundingMethod: _unused, ...policy } = demoPolicy;
    const price = pricePackage(threeLinesAt1995(policy));
    expect(price.taxRoundingMethod).toBe('per-invoice');
    expect(price.taxCents).toBe(544);
  });

  it("takes the discount line's GST as the same percentage of the parts lines' GST", () => {
    const price = pricePackage({
      ...demoPackage,
      policy: policyWith({ taxRoundingMethod: 'per-line' }),
    });
    // Source: A New Tax System (Goods and Services Tax) Act 1999 s 9-90 (rounding) and the 1/11th rule, line by line:
    // 1 745.00 ÷ 11 = 158.636 → 158.64; 1 645.00 ÷ 11 = 149.545 → 149.55; 1 945.00 ÷ 11 = 176.818 → 176.82; 299.00 ÷ 11 = 27.18;
    // 149.00 ÷ 11 = 13.545 → 13.55; 630.00 ÷ 11 = 57.27; 221.67 ÷ 11 = 20.152 → 20.15; 175.00 ÷ 11 = 15.909 → 15.91; 32.50 ÷ 11 = 2.954 → 2.95.
    // Discount (Liftwright's rule): 5 % of the parts GST 512.19 = 25.6095 → −25.61.
    expect(price.lines.map((line) => line.taxCents)).toEqual([
      15864, 14955, 17682, 2718, 1355, 5727, 2015, 1591, 295, -2561,
    ]);
    expect(price.taxCents).toBe(59641);
    expect(price.totalCents).toBe(656047);
  });
  it('reduces the GST by the discount percentage of the parts GST, not by the discount line on its own', () => {
    const kit = { ...suspensionKitLine, unitPriceCents: 179000, labourMinutes: 0 };
    const price = pricePackage({
      lines: [kit, wheelLine, tyreLine],
      wheelsFitted: 0,
      tyresReplaced: 0,
      policy: policyWith({ taxRoundingMethod: 'per-line' }),
    });
    // Source: A New Tax System (Goods and Services Tax) Act 1999 s 9-90 (rounding) and the 1/11th rule, line by line:
    // 1 790.00 ÷ 11 = 162.727 → 162.73; 1 645.00 ÷ 11 → 149.55; 1 945.00 ÷ 11 → 176.82; parts GST 489.10.
    // Discount (Liftwright's rule): 5 % of 5 380.00 = 269.00 off; its GST 5 % of 489.10 = 24.455 → −24.46
    // (the discount line on its own, 269.00 ÷ 11 = 24.4545 → 24.45, would give a cent more GST).
    expect(price.lines.map((line) => [line.kind, line.amountCents, line.taxCents])).toEqual([
      ['part', 179000, 16273],
      ['part', 164500, 14955],
      ['part', 194500, 17682],
      ['bundle-discount', -26900, -2446],
    ]);
    expect(price.taxCents).toBe(46464);
  });

  it('never gives negative GST, even on tiny parts with a large discount', () => {
    const tiny = (line: typeof wheelLine) => ({
      ...line,
      quantity: 1,
      unitPriceCents: 4,
      labourMinutes: 0,
    });
    const price = pricePackage({
      lines: [tiny(suspensionKitLine), tiny(wheelLine), tiny(tyreLine)],
      wheelsFitted: 0,
      tyresReplaced: 0,
      policy: policyWith({
        pricesIncludeTax: false,
        taxRoundingMethod: 'per-line',
        bundleDiscount: { ...demoPolicy.bundleDiscount, percent: 50 },
      }),
    });
    // Worked by hand: each 4 c line has 0.4 c → 0 c GST; 50 % of 12 c = 6 c off. Taxing the 6 c discount
    // line on its own would give −0.6 → −1 c, a negative GST on a positive total; 50 % of 0 c is 0 c.
    expect(price.subtotalCents).toBe(6);
    expect(price.taxCents).toBe(0);
    expect(price.totalCents).toBe(6);
  });
});

describe('pricePackage: prices that exclude GST', () => {
  const price = pricePackage({ ...demoPackage, policy: policyWith({ pricesIncludeTax: false }) });

  it('adds 10 % GST to the subtotal', () => {
    expect(price.subtotalCents).toBe(656047);
    // Source: A New Tax System (Goods and Services Tax) Act 1999 s 9-70 (GST is 10 % of the value of a taxable supply) and s 9-90 (rounding): 10 % of 6 560.47 = 656.047 → $656.05.
    expect(price.taxCents).toBe(65605);
    expect(price.totalCents).toBe(721652);
    expect(price.totalExcludingTaxCents).toBe(656047);
    expect(price.roundingNote).toContain('Prices exclude GST');
  });

  it("rounds each line's GST with per-line rounding and adds it to the subtotal", () => {
    const perLine = pricePackage(
      threeLinesAt1995(policyWith({ pricesIncludeTax: false, taxRoundingMethod: 'per-line' })),
    );
    // Source: same Act s 9-70 and s 9-90: 10 % of $19.95 = 1.995 → $2.00 a line, $6.00 for three; per-invoice 10 % of $59.85 = 5.985 → $5.99.
    expect(perLine.taxCents).toBe(600);
    expect(perLine.totalCents).toBe(6585);
    const perInvoice = pricePackage(threeLinesAt1995(policyWith({ pricesIncludeTax: false })));
    expect(perInvoice.taxCents).toBe(599);
    expect(perInvoice.totalCents).toBe(6584);
  });
});

describe('pricePackage: line rules', () => {
  it('charges labour on every unit of a part', () => {
    const dampers = packageLine({
      sku: 'SC-SD-01',
      name: 'Scrubline steering damper',
      kind: 'component',
      quantity: 2,
      unitPriceCents: 18900,
      labourMinutes: 45,
      bayKind: 'hoist',
    });
    const price = pricePackage({
      ...demoPackage,
      lines: [dampers],
      wheelsFitted: 0,
      tyresReplaced: 0,
    });
    // Worked by hand: 2 × 45 min = 90 min × $140.00/h ÷ 60 = $210.00.
    expect(price.lines[1]).toMatchObject({ kind: 'labour', labourMinutes: 90, amountCents: 21000 });
  });

  it("charges labour for parts only: a service's price includes its work", () => {
    const price = pricePackage({ ...demoPackage, lines: [alignmentLine] });
    expect(amounts(price.lines)).toEqual([
      ['service', 14900],
      ['fitting-balancing', 17500],
      ['tyre-disposal', 3250],
    ]);
    expect(price.lines[0]).toMatchObject({ bayMinutes: 60, bayKind: 'alignment' });
  });

  it('charges a per-wheel service once per wheel fitted', () => {
    const nitrogen = packageLine({
      sku: 'KW-SVC-N2',
      name: 'Nitrogen fill',
      kind: 'service',
      unitPriceCents: 500,
      labourMinutes: 2,
      perWheel: true,
    });
    const price = pricePackage({ ...demoPackage, lines: [nitrogen], wheelsFitted: 4 });
    expect(price.lines[0]).toMatchObject({
      kind: 'service',
      quantity: 4,
      amountCents: 2000,
      bayMinutes: 8,
      description: 'Nitrogen fill (4 for 4 wheels)',
    });
  });

  it('charges fitting and balancing per wheel fitted and the levy per tyre replaced', () => {
    const price = pricePackage({
      ...demoPackage,
      lines: [tyreLine],
      wheelsFitted: 4,
      tyresReplaced: 3,
    });
    expect(price.lines.slice(1)).toMatchObject([
      { kind: 'fitting-balancing', quantity: 4, unitPriceCents: 3500, amountCents: 14000 },
      { kind: 'tyre-disposal', quantity: 3, unitPriceCents: 650, amountCents: 1950 },
    ]);
    const none = pricePackage({
      ...demoPackage,
      lines: [tyreLine],
      wheelsFitted: 0,
      tyresReplaced: 0,
    });
    expect(amounts(none.lines)).toEqual([['part', 194500]]);
  });

  it('gives the bundle discount only with a kit, wheels and tyres', () => {
    const withoutKit = pricePackage({ ...demoPackage, lines: [wheelLine, tyreLine, diffDropLine] });
    expect(withoutKit.bundleDiscountApplied).toBe(false);
    expect(withoutKit.lines.some((line) => line.kind === 'bundle-discount')).toBe(false);
    expect(withoutKit.breakdown.bundleDiscountCents).toBe(0);
    expect(withoutKit.roundingNote).not.toContain('bundle discount');

    const bundle = pricePackage({
      ...demoPackage,
      lines: [suspensionKitLine, wheelLine, tyreLine],
    });
    expect(bundle.bundleDiscountApplied).toBe(true);
    // Worked by hand: 5 % of (1 745.00 + 1 645.00 + 1 945.00) = 5 % of 5 335.00 = 266.75.
    expect(bundle.breakdown.bundleDiscountCents).toBe(-26675);
  });

  it('discounts parts only, never labour, services or levies', () => {
    const price = pricePackage({
      ...demoPackage,
      policy: policyWith({ bundleDiscount: { ...demoPolicy.bundleDiscount, percent: 7.5 } }),
    });
    const discount = price.lines.find((line) => line.kind === 'bundle-discount');
    // Worked by hand: 7.5 % of the parts total 5 634.00 = 422.55.
    expect(discount).toMatchObject({ discountedCents: 563400, amountCents: -42255 });
  });

  it('takes the special-order deposit when a part must be ordered in', () => {
    // Invented policy numbers (a workshop's own): 50 % instead of 20 %, within the $100–$1,000 bounds.
    const backOrderedTyres = { ...tyreLine, quantity: 4, stockQty: 2, leadDays: 3 };
    const price = pricePackage({
      ...demoPackage,
      lines: [backOrderedTyres],
      wheelsFitted: 0,
      tyresReplaced: 0,
    });
    expect(price.totalCents).toBe(155600);
    expect(price.deposit).toMatchObject({
      specialOrder: true,
      specialOrderSkus: ['QD-TRK-2857017'],
      percentApplied: 50,
      depositCents: 77800,
    });
    expect(price.balanceDueCents).toBe(77800);
    expect(price.lines[0]).toMatchObject({ specialOrder: true, leadDays: 3 });
    expect(price.roundingNote).toContain('50 % of the total (the special-order rate');
  });

  it('prices an empty package at zero with no deposit', () => {
    const price = pricePackage({ ...demoPackage, lines: [], wheelsFitted: 0, tyresReplaced: 0 });
    expect(price).toMatchObject({
      lines: [],
      subtotalCents: 0,
      taxCents: 0,
      totalCents: 0,
      depositCents: 0,
      balanceDueCents: 0,
    });
  });
});

describe('pricePackage: a workshop discount on a revised quote', () => {
  it('comes off last and the GST is one eleventh of what is left (prices include GST)', () => {
    const price = pricePackage({ ...threeLinesAt1995(), workshopDiscountCents: 985 });
    expect(price.lines.at(-1)).toMatchObject({
      kind: 'workshop-discount',
      amountCents: -985,
    });
    expect(price.breakdown.workshopDiscountCents).toBe(-985);
    expect(price.subtotalCents).toBe(5985 - 985);
    // Source: A New Tax System (Goods and Services Tax) Act 1999 (GST-inclusive price ÷ 11 at a 10 % rate) and s 9-90 (rounding): $50.00 ÷ 11 = 4.5454… → $4.55.
    expect(price.taxCents).toBe(455);
    expect(price.totalCents).toBe(5000);
  });

  it('takes its share of the per-line GST, so a discount of everything leaves no tax', () => {
    const policy = policyWith({ pricesIncludeTax: false, taxRoundingMethod: 'per-line' });
    const half = pricePackage({ ...threeLinesAt1995(policy), workshopDiscountCents: 2993 });
    // Source: same Act s 9-70 and s 9-90: $2.00 of GST a line, $6.00 for three (above); the discount of 2 993 of 5 985 cents takes 6.00 × 2 993 / 5 985 = 3.0005 → $3.00 of it.
    expect(half.taxCents).toBe(300);
    expect(half.totalCents).toBe(5985 - 2993 + 300);
    const all = pricePackage({ ...threeLinesAt1995(policy), workshopDiscountCents: 5985 });
    expect(all.taxCents).toBe(0);
    expect(all.totalCents).toBe(0);
  });

  it('never takes the package below zero: at most the subtotal before it is applied', () => {
    const input = { ...threeLinesAt1995(), workshopDiscountCents: 1_000_000 };
    expect(workshopDiscountLimitCents(input)).toBe(5985);
    expect(pricePackage(input).totalCents).toBe(0);
  });
});

import { describe, expect, it } from 'vitest';
import type { PricedLine, QuoteLine, QuoteVersion } from '@/types/api';
import { diffVersions, labourMinutesCharged, previousVersion } from './version-diff';

const KIT = '11111111-1111-4111-8111-111111111111';
const TYRE_A = '22222222-2222-4222-8222-222222222222';
const TYRE_B = '33333333-3333-4333-8333-333333333333';
const ALIGN = '44444444-4444-4444-8444-444444444444';

function line(partial: Partial<QuoteLine> & Pick<QuoteLine, 'productId' | 'name'>): QuoteLine {
  return {
    position: 1,
    sku: `SKU-${partial.name}`,
    brand: 'Tarnhill',
    kind: 'component',
    quantity: 1,
    unitPriceCents: 0,
    labourMinutes: 0,
    bayKind: null,
    leadDays: 0,
    stockQty: 1,
    perWheel: false,
    ...partial,
  };
}

/** The priced line of a product line: quantity × unit price (the API's part line). */
function partLine(source: QuoteLine): PricedLine {
  return {
    kind: source.kind === 'service' ? 'service' : 'part',
    description: source.name,
    productId: source.productId ?? undefined,
    quantity: source.quantity,
    unitPriceCents: source.unitPriceCents,
    amountCents: source.quantity * source.unitPriceCents,
    taxCents: null,
  };
}

function version(
  number: number,
  lines: QuoteLine[],
  extra: {
    labour?: { productId: string; minutes: number; amountCents: number }[];
    workshopDiscountCents?: number;
    depositCents: number;
  },
): QuoteVersion {
  const priced: PricedLine[] = lines.map(partLine);
  for (const labour of extra.labour ?? []) {
    priced.push({
      kind: 'labour',
      description: 'Labour',
      productId: labour.productId,
      labourMinutes: labour.minutes,
      amountCents: labour.amountCents,
      taxCents: null,
    });
  }
  const discount = extra.workshopDiscountCents ?? 0;
  if (discount !== 0) {
    priced.push({
      kind: 'workshop-discount',
      description: 'Workshop discount',
      amountCents: discount,
      taxCents: null,
    });
  }
  const subtotal = priced.reduce((sum, entry) => sum + entry.amountCents, 0);
  // Only the fields the comparison reads are filled in; the rest of a version is not needed.
  return {
    number,
    lines,
    price: {
      lines: priced,
      breakdown: { bundleDiscountCents: 0, workshopDiscountCents: discount },
      subtotalCents: subtotal,
      totalCents: subtotal,
      depositCents: extra.depositCents,
      balanceDueCents: subtotal - extra.depositCents,
    },
  } as unknown as QuoteVersion;
}

const kit = line({
  productId: KIT,
  name: 'Highrange 50 mm kit',
  kind: 'suspension-kit',
  position: 1,
  unitPriceCents: 209000,
  labourMinutes: 270,
  bayKind: 'hoist',
});
const tyreA = line({
  productId: TYRE_A,
  name: 'Trailgrip A/T',
  kind: 'tyre',
  position: 2,
  quantity: 4,
  unitPriceCents: 36900,
});
const alignment = line({
  productId: ALIGN,
  name: 'Wheel alignment',
  kind: 'service',
  position: 3,
  unitPriceCents: 14900,
  labourMinutes: 60,
  bayKind: 'alignment',
});

describe('what changed between two versions of a quote', () => {
  const before = version(1, [kit, tyreA, alignment], {
    labour: [{ productId: KIT, minutes: 270, amountCents: 63000 }],
    depositCents: 100000,
  });
  // Version 2: the tyre swapped for another (out of stock), five of them; the kit's labour
  // raised from 270 to 300 minutes; the alignment unchanged; a $50.00 workshop discount.
  const tyreB = line({
    productId: TYRE_B,
    name: 'Ridgeback M/T',
    kind: 'tyre',
    position: 2,
    quantity: 5,
    unitPriceCents: 41500,
  });
  const slowerKit = { ...kit, labourMinutes: 300 };
  const after = version(2, [slowerKit, tyreB, alignment], {
    labour: [{ productId: KIT, minutes: 300, amountCents: 70000 }],
    workshopDiscountCents: -5000,
    depositCents: 100000,
  });
  const diff = diffVersions(before, after);

  it('marks each line added, removed, changed or unchanged, newest order first', () => {
    expect(diff.lines.map((entry) => [entry.name, entry.change])).toEqual([
      ['Highrange 50 mm kit', 'changed'],
      ['Ridgeback M/T', 'added'],
      ['Wheel alignment', 'unchanged'],
      ['Trailgrip A/T', 'removed'],
    ]);
    expect(diff.linesChanged).toBe(true);
  });

  it('names the figures of a changed line and keeps both sides', () => {
    const changedKit = diff.lines[0];
    expect(changedKit.changedFields).toEqual(['labourMinutes']);
    expect(changedKit.before?.labourMinutes).toBe(270);
    expect(changedKit.after?.labourMinutes).toBe(300);
    // 5 × 41500 = 207500 cents; 4 × 36900 = 147600 cents.
    expect(diff.lines[1].after).toEqual({
      quantity: 5,
      unitPriceCents: 41500,
      labourMinutes: 0,
      amountCents: 207500,
    });
    expect(diff.lines[3].before?.amountCents).toBe(147600);
    expect(diff.lines[3].after).toBeNull();
  });

  it('compares the totals, the deposit, the workshop discount and the time', () => {
    const byKey = Object.fromEntries(diff.totals.map((total) => [total.key, total]));
    // Version 1: 209000 + 147600 + 14900 + 63000 = 434500.
    // Version 2: 209000 + 207500 + 14900 + 70000 − 5000 = 496400.
    expect(byKey.total).toMatchObject({ before: 434500, after: 496400, difference: 61900 });
    expect(byKey.deposit).toMatchObject({ before: 100000, after: 100000, difference: 0 });
    expect(byKey['workshop-discount']).toMatchObject({ before: 0, after: -5000 });
    expect(byKey.labour).toMatchObject({ before: 270, after: 300, difference: 30 });
    // Workshop time is quantity × minutes of every line: 270 + 60 → 300 + 60.
    expect(byKey['workshop-time']).toMatchObject({ before: 330, after: 360 });
    expect(diff.bayMinutes).toEqual([
      { bayKind: 'alignment', before: 60, after: 60 },
      { bayKind: 'hoist', before: 270, after: 300 },
    ]);
  });

  it('finds nothing changed in a version compared with itself', () => {
    const same = diffVersions(before, before);
    expect(same.linesChanged).toBe(false);
    expect(same.totals.every((total) => total.difference === 0)).toBe(true);
  });

  it('matches a line whose product was deleted since by its SKU', () => {
    const gone = { ...tyreA, productId: null };
    const withDeleted = diffVersions(
      version(1, [gone], { depositCents: 0 }),
      version(2, [{ ...gone, quantity: 5 }], { depositCents: 0 }),
    );
    expect(withDeleted.lines).toHaveLength(1);
    expect(withDeleted.lines[0].change).toBe('changed');
    expect(withDeleted.lines[0].changedFields).toEqual(['quantity', 'amountCents']);
  });
});

describe('the helpers of the comparison', () => {
  it('adds up the labour lines only', () => {
    const priced = version(1, [alignment], {
      labour: [
        { productId: KIT, minutes: 270, amountCents: 63000 },
        { productId: TYRE_A, minutes: 40, amountCents: 9333 },
      ],
      depositCents: 0,
    });
    expect(labourMinutesCharged(priced.price)).toBe(310);
  });

  it('finds the version a revision replaced', () => {
    const versions = [3, 1, 2].map((number) => version(number, [], { depositCents: 0 }));
    expect(previousVersion(versions, 3)?.number).toBe(2);
    expect(previousVersion(versions, 2)?.number).toBe(1);
    expect(previousVersion(versions, 1)).toBeNull();
  });
});

import { describe, expect, it } from 'vitest';
import type { Quote } from '@/types/api';
import {
  PLANNER_STORAGE_KEY,
  WALK_IN_STORAGE_KEY,
  buildFromQuote,
  loadStoredBuild,
  reviseStorageKey,
  saveBuild,
} from './build';
import {
  revisionFieldName,
  revisionFormSchema,
  revisionFormValues,
  revisionTermsFrom,
  toRevisionRequest,
} from './revision';

const MODEL = '0a0a0a0a-0000-4000-8000-000000000001';
const KIT = '11111111-1111-4111-8111-111111111111';
const TYRE = '22222222-2222-4222-8222-222222222222';

// Only the fields a revision is prefilled from.
const quote = {
  id: '99999999-9999-4999-8999-999999999999',
  reference: 'Q-000123',
  customer: { id: 'c0c0c0c0-0000-4000-8000-000000000001', name: 'Rowan', email: 'r@x.test' },
  vehicle: { vehicleModelId: MODEL, name: 'Brellin Highrange', year: 2021, customerVehicle: null },
  uses: ['daily', 'towing'],
  constantLoadKg: 120,
  versions: [
    { number: 1, lines: [] },
    {
      number: 2,
      lines: [
        {
          position: 2,
          productId: TYRE,
          name: 'Trailgrip A/T',
          brand: 'Quendra',
          kind: 'tyre',
          quantity: 5,
          unitPriceCents: 36900,
          labourMinutes: 0,
        },
        {
          position: 1,
          productId: KIT,
          name: 'Highrange kit',
          brand: 'Tarnhill',
          kind: 'suspension-kit',
          quantity: 1,
          unitPriceCents: 209000,
          labourMinutes: 270,
        },
        {
          position: 3,
          productId: null,
          name: 'Deleted since',
          brand: '',
          kind: 'component',
          quantity: 1,
          unitPriceCents: 100,
          labourMinutes: 0,
        },
      ],
    },
  ],
} as unknown as Quote;

describe('a revision prefilled from the quote', () => {
  const build = buildFromQuote(quote);

  it('starts from the latest version, every step done, its own revision terms empty', () => {
    expect(build.vehicleModelId).toBe(MODEL);
    expect(build.year).toBe(2021);
    expect(build.uses).toEqual(['daily', 'towing']);
    expect(build.constantLoadKg).toBe(120);
    expect(build.items.map((item) => [item.productId, item.quantity, item.labourMinutes])).toEqual([
      [KIT, 1, 270],
      [TYRE, 5, 0],
    ]);
    expect(build.wheelQuantity).toBe(5);
    expect(build.completed).toHaveLength(6);
    expect(build.customer?.name).toBe('Rowan');
    expect(build.revision).toMatchObject({ quoteId: quote.id, baseVersionNumber: 2, reason: '' });
  });

  it('sends only the labour the desk changed, the discount in cents and the reason', () => {
    const values = revisionFormValues(build);
    const kitIndex = values.lines.findIndex((line) => line.productId === KIT);
    values.lines[kitIndex].labourMinutes = '300';
    values.discount = '49.95';
    values.reason = '  Kit takes longer on this model.  ';
    const body = toRevisionRequest(build, values);
    expect(body?.items).toContainEqual({ productId: KIT, quantity: 1, labourMinutes: 300 });
    expect(body?.items).toContainEqual({ productId: TYRE, quantity: 5 });
    // "49.95" dollars is 4995 cents (string arithmetic, no floating point).
    expect(body?.discountCents).toBe(4995);
    expect(body?.reason).toBe('Kit takes longer on this model.');
    expect(revisionTermsFrom(build, values).labourOverrides).toEqual({ [KIT]: 300 });
  });

  it('lists the lines in the order of the request, so server errors land on the right field', () => {
    const values = revisionFormValues(build);
    const body = toRevisionRequest(build, values);
    expect(body?.items.map((item) => item.productId)).toEqual(
      values.lines.map((line) => line.productId),
    );
    expect(revisionFieldName('items[1].labourMinutes')).toBe('lines[1].labourMinutes');
    expect(revisionFieldName('items[0].quantity')).toBe('lines[0].quantity');
    expect(revisionFieldName('discountCents')).toBe('discount');
    expect(revisionFieldName('reason')).toBe('reason');
    expect(revisionFieldName('vehicleModelId')).toBeNull();
  });
});

describe('the rules of the revision form (as ReviseQuoteDto)', () => {
  const valid = {
    lines: [{ productId: KIT, quantity: '1', labourMinutes: '270' }],
    discount: '',
    reason: 'Tyre out of stock',
  };

  it('accepts a reason of 5 to 500 characters and refuses one outside', () => {
    expect(revisionFormSchema.isValidSync(valid)).toBe(true);
    expect(revisionFormSchema.isValidSync({ ...valid, reason: 'a'.repeat(500) })).toBe(true);
    expect(revisionFormSchema.isValidSync({ ...valid, reason: 'abcd' })).toBe(false);
    expect(revisionFormSchema.isValidSync({ ...valid, reason: 'a'.repeat(501) })).toBe(false);
    expect(revisionFormSchema.isValidSync({ ...valid, reason: '    ' })).toBe(false);
  });

  it('takes whole quantities 1 to 24, labour 0 to 1440 min and dollars with two decimals', () => {
    const withLine = (quantity: string, labourMinutes: string) => ({
      ...valid,
      lines: [{ productId: KIT, quantity, labourMinutes }],
    });
    expect(revisionFormSchema.isValidSync(withLine('24', '1440'))).toBe(true);
    expect(revisionFormSchema.isValidSync(withLine('0', '60'))).toBe(false);
    expect(revisionFormSchema.isValidSync(withLine('25', '60'))).toBe(false);
    expect(revisionFormSchema.isValidSync(withLine('2.5', '60'))).toBe(false);
    expect(revisionFormSchema.isValidSync(withLine('2', '1441'))).toBe(false);
    expect(revisionFormSchema.isValidSync({ ...valid, discount: '50' })).toBe(true);
    expect(revisionFormSchema.isValidSync({ ...valid, discount: '49.999' })).toBe(false);
    expect(revisionFormSchema.isValidSync({ ...valid, discount: '-5' })).toBe(false);
  });
});

describe('a revision kept on the device', () => {
  it('is read back as it was saved, under a key of its own per quote', () => {
    const store = new Map<string, string>();
    const localStorage = {
      getItem: (key: string) => store.get(key) ?? null,
      setItem: (key: string, value: string) => void store.set(key, value),
      removeItem: (key: string) => void store.delete(key),
    };
    const previous = (globalThis as { window?: unknown }).window;
    (globalThis as { window?: unknown }).window = { localStorage };
    try {
      const build = buildFromQuote(quote);
      const edited = {
        ...build,
        revision: build.revision && {
          ...build.revision,
          labourOverrides: { [KIT]: 300 },
          discountText: '20',
          reason: 'Kit takes longer on this model.',
        },
      };
      const key = reviseStorageKey(quote.id);
      expect(key).not.toBe(PLANNER_STORAGE_KEY);
      expect(key).not.toBe(WALK_IN_STORAGE_KEY);
      expect(reviseStorageKey('another-quote')).not.toBe(key);
      saveBuild(key, edited);
      expect(loadStoredBuild(key)).toEqual(edited);
      // The customer's planner and the walk-in's build are untouched.
      expect(store.has(PLANNER_STORAGE_KEY)).toBe(false);
      expect(store.has(WALK_IN_STORAGE_KEY)).toBe(false);
      // A build without a revision (the customer's) still reads back; a broken override does not.
      saveBuild(PLANNER_STORAGE_KEY, { ...edited, revision: undefined });
      expect(loadStoredBuild(PLANNER_STORAGE_KEY)?.revision).toBeUndefined();
      store.set(
        key,
        JSON.stringify({
          ...edited,
          revision: { ...edited.revision, labourOverrides: { [KIT]: -5 } },
        }),
      );
      expect(loadStoredBuild(key)).toBeNull();
    } finally {
      (globalThis as { window?: unknown }).window = previous;
    }
  });
});

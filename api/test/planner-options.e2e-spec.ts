import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { productId, productIds, vehicleModelId } from './support/catalogue';
import { anonymousSession, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

interface Option {
  product: { id: string; sku: string; kind: string; priceCents: number; active: boolean };
  verdict: string;
  summary: string;
  metrics: {
    newDiameterMm: number | null;
    diameterChangePercent: number | null;
    speedometerAtTrue100Kmh: number | null;
    combinedLiftMm: number;
    trackChangeMm: number;
  };
  suggestedBy: string[];
}
interface Options {
  items: Option[];
  suggestedAdditions: Array<{
    role: string;
    required: boolean;
    variantId?: string;
    numbers?: Record<string, number>;
  }>;
}

const BEST_FIRST = ['ok', 'advisory', 'needs-certification', 'does-not-fit'];

describe('planner options (POST /api/planner/options)', () => {
  let testApp: TestApp;
  let visitor: Session;
  let strata: string;

  async function options(body: object): Promise<Options> {
    const response = await visitor.agent
      .post('/api/planner/options')
      .set('x-csrf-token', visitor.csrfToken)
      .send(body);
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    return response.body as Options;
  }

  function option(result: Options, sku: string): Option {
    const found = result.items.find((item) => item.product.sku === sku);
    if (!found) throw new Error(`No option ${sku}`);
    return found;
  }

  /** Made for the vehicle: linked to it, or to no vehicle at all. */
  async function madeForStrata(kind: string): Promise<string[]> {
    const result = await testApp.db.query<{ sku: string }>(
      `select sku from product p where kind = $1 and active
         and (not exists (select 1 from product_fits_vehicle_model f where f.product_id = p.id)
              or exists (select 1 from product_fits_vehicle_model f where f.product_id = p.id and f.vehicle_model_id = $2))
       order by sku`,
      [kind, strata],
    );
    return result.rows.map((row) => row.sku);
  }

  beforeAll(async () => {
    testApp = await startTestApp();
    visitor = await anonymousSession(testApp);
    strata = await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab');
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('lists every active tyre made for the vehicle, best verdict first, then price', async () => {
    const kit = await productId(testApp.db, 'BR-STR-50-M');
    const result = await options({
      vehicleModelId: strata,
      constantLoadKg: 200,
      items: [{ productId: kit, quantity: 1 }],
      kind: 'tyre',
    });
    expect(result.items.map((item) => item.product.sku).sort()).toEqual(
      await madeForStrata('tyre'),
    );
    expect(result.items.every((item) => item.product.kind === 'tyre' && item.product.active)).toBe(
      true,
    );
    for (let index = 1; index < result.items.length; index += 1) {
      const [previous, current] = [result.items[index - 1], result.items[index]];
      const order = BEST_FIRST.indexOf(previous.verdict) - BEST_FIRST.indexOf(current.verdict);
      expect(order).toBeLessThanOrEqual(0);
      if (order === 0) {
        expect(previous.product.priceCents).toBeLessThanOrEqual(current.product.priceCents);
      }
    }
    const trailgrip = option(result, 'QD-TG-2657017');
    // Source: ISO 4000-1 / ETRTO nominal dimensions (REFERENCES.md): 265/70R17 = 17 × 25.4 +
    // 2 × 265 × 0.70 = 802.8 mm; the stock 265/65R17 is 776.3 mm, so +3.4 %.
    expect(trailgrip.metrics.newDiameterMm).toBeCloseTo(802.8, 1);
    expect(trailgrip.metrics.diameterChangePercent).toBeCloseTo(3.4, 1);
    // Source: UN ECE Regulation No. 39 relation in REFERENCES.md (true / indicated = D_new /
    // D_old): at a true 100 km/h the speedometer shows 100 × 776.3 / 802.8 = 96.7 km/h.
    expect(trailgrip.metrics.speedometerAtTrue100Kmh).toBeCloseTo(96.7, 1);
    // Source: VicRoads VSI 8 §13.3 as quoted in REFERENCES.md: combined lift = suspension lift +
    // half the diameter increase = 50 + 26.5 / 2 = 63.25 mm (shown to 0.1 mm).
    expect(Math.abs(trailgrip.metrics.combinedLiftMm - 63.25)).toBeLessThanOrEqual(0.051);
    // The stock wheels stay: the track does not change.
    expect(trailgrip.metrics.trackChangeMm).toBe(0);
    expect(trailgrip.summary.length).toBeGreaterThan(0);
  });

  it('evaluates each option in place of the selected one of its kind', async () => {
    const [kit, stockSize] = await productIds(testApp.db, ['BR-STR-50-M', 'QD-HT-2656517']);
    const result = await options({
      vehicleModelId: strata,
      constantLoadKg: 200,
      items: [
        { productId: kit, quantity: 1 },
        { productId: stockSize, quantity: 4 },
      ],
      kind: 'tyre',
    });
    // Source: ISO 4000-1 geometry as above: 265/65R17 = 17 × 25.4 + 2 × 265 × 0.65 = 776.3 mm.
    expect(option(result, 'QD-HT-2656517').metrics.newDiameterMm).toBeCloseTo(776.3, 1);
    expect(option(result, 'QD-HT-2656517').metrics.diameterChangePercent).toBe(0);
    // Source: as above, 285/70R17 = 17 × 25.4 + 2 × 285 × 0.70 = 830.8 mm (not the selected tyre's).
    expect(option(result, 'QD-TG-LT2857017').metrics.newDiameterMm).toBeCloseTo(830.8, 1);
  });

  it('marks the add-ons the current package asks for, and leaves out what the policy charges', async () => {
    const kit = await productId(testApp.db, 'BR-STR-50-M');
    const selection = {
      vehicleModelId: strata,
      constantLoadKg: 200,
      items: [{ productId: kit, quantity: 1 }],
    };
    const services = await options({ ...selection, kind: 'service' });
    expect(services.suggestedAdditions.map((addition) => addition.role)).toEqual(
      expect.arrayContaining(['alignment', 'greasable-shackles', 'headlight-re-aim']),
    );
    expect(
      services.suggestedAdditions.find((addition) => addition.role === 'alignment')?.required,
    ).toBe(true);
    expect(option(services, 'KW-SVC-ALIGN').suggestedBy).toEqual(['alignment']);
    expect(option(services, 'KW-SVC-HEADLIGHT').suggestedBy).toEqual(['headlight-re-aim']);
    expect(option(services, 'KW-SVC-SPEEDO').suggestedBy).toEqual([]);
    const skus = services.items.map((item) => item.product.sku);
    expect(skus).not.toContain('KW-SVC-FITBAL');
    expect(skus).not.toContain('KW-SVC-DISPOSAL');

    const components = await options({ ...selection, kind: 'component' });
    expect(option(components, 'BR-GPS-LEAF').suggestedBy).toEqual(['greasable-shackles']);
    expect(components.items.map((item) => item.product.sku).sort()).toEqual(
      await madeForStrata('component'),
    );
  });

  it('marks only hub-centric rings of the suggested sizes (a 108.1 mm hub)', async () => {
    const highrange = await vehicleModelId(testApp.db, 'Brellin', 'Highrange', '4.5 wagon');
    const wheel = await productId(testApp.db, 'IW-STK-1785-00');
    const onHighrange = await options({
      vehicleModelId: highrange,
      items: [{ productId: wheel, quantity: 4 }],
      kind: 'component',
    });
    // Common practice (no published source): a 110.1 mm bore wheel on a 108.1 mm hub takes
    // rings of 110.1 mm outside and 108.1 mm inside.
    expect(
      onHighrange.suggestedAdditions.find((addition) => addition.role === 'hub-rings'),
    ).toMatchObject({
      required: false,
      numbers: { wheelBoreMm: 110.1, hubBoreMm: 108.1, ringOuterMm: 110.1, ringInnerMm: 108.1 },
    });
    const rightRings = option(onHighrange, 'IW-HR-1101-1081');
    expect(rightRings.suggestedBy).toEqual(['hub-rings']);
    expect(rightRings.verdict).not.toBe('does-not-fit');
    const wrongRings = option(onHighrange, 'IW-HR-1101-1061');
    expect(wrongRings.suggestedBy).toEqual([]);
    expect(wrongRings.verdict).toBe('does-not-fit');
    expect(wrongRings.summary).toContain(
      'The hub-centric rings (110.1 → 106.1 mm) do not match this wheel and hub (110.1 → 108.1 mm)',
    );

    // The same wheel on the Strata's 106.1 mm hub: the other way round.
    const onStrata = await options({
      vehicleModelId: strata,
      items: [{ productId: wheel, quantity: 4 }],
      kind: 'component',
    });
    expect(option(onStrata, 'IW-HR-1101-1061').suggestedBy).toEqual(['hub-rings']);
    expect(option(onStrata, 'IW-HR-1101-1081').suggestedBy).toEqual([]);
    expect(option(onStrata, 'IW-HR-1101-1081').verdict).toBe('does-not-fit');

    // With the stock wheels nothing asks for rings, and rings are not needed.
    const stock = await options({ vehicleModelId: highrange, items: [], kind: 'component' });
    expect(stock.suggestedAdditions.some((addition) => addition.role === 'hub-rings')).toBe(false);
    expect(option(stock, 'IW-HR-1101-1081').suggestedBy).toEqual([]);
  });

  it('points to the kit rating that carries the declared load', async () => {
    const [light, medium] = await productIds(testApp.db, ['BR-STR-50-L', 'BR-STR-50-M']);
    const result = await options({
      vehicleModelId: strata,
      constantLoadKg: 200,
      items: [{ productId: light, quantity: 1 }],
      kind: 'suspension-kit',
    });
    const spring = result.suggestedAdditions.find((addition) => addition.role === 'spring-rating');
    expect(spring?.variantId).toBe(medium);
    expect(option(result, 'BR-STR-50-M').suggestedBy).toEqual(['spring-rating']);
    expect(option(result, 'BR-STR-50-L').verdict).toBe('does-not-fit');
    // Kits made only for other vehicles are not offered.
    expect(result.items.map((item) => item.product.sku).sort()).toEqual(
      await madeForStrata('suspension-kit'),
    );
    expect(result.items.some((item) => item.product.sku.startsWith('TH-BAR'))).toBe(false);
  });

  it('puts a wheel that cannot be bolted on last, as does-not-fit', async () => {
    const result = await options({ vehicleModelId: strata, items: [], kind: 'wheel' });
    const wrongPattern = option(result, 'SL-GIB-1780-P35');
    expect(wrongPattern.verdict).toBe('does-not-fit');
    expect(wrongPattern.summary).toMatch(/6x114\.3/);
    const last = result.items.slice(result.items.indexOf(wrongPattern));
    expect(last.every((item) => item.verdict === 'does-not-fit')).toBe(true);
    // Source: REFERENCES.md, wheel offset and track (definitions, H): the track at the wheel
    // centrelines changes by 2 × (ET_old − ET_new); the Strata's stock ET+30 to ET+20 is +20 mm.
    const stockman = option(result, 'IW-STK-1780-P20');
    expect(stockman.metrics.trackChangeMm).toBeCloseTo(20, 1);
  });

  it('refuses bad input with field errors', async () => {
    const [wheel, otherWheel] = await productIds(testApp.db, ['IW-STK-1780-P20', 'IW-STK-1785-00']);
    const cases: Array<{ body: object; keys: string[] }> = [
      {
        body: { vehicleModelId: '00000000-0000-4000-8000-000000000000', items: [], kind: 'tyre' },
        keys: ['vehicleModelId'],
      },
      { body: { vehicleModelId: strata, items: [], kind: 'gizmo' }, keys: ['kind'] },
      {
        body: {
          vehicleModelId: strata,
          items: [{ productId: '00000000-0000-4000-8000-000000000000', quantity: 1 }],
          kind: 'tyre',
        },
        keys: ['items[0].productId'],
      },
      {
        body: {
          vehicleModelId: strata,
          items: [
            { productId: wheel, quantity: 4 },
            { productId: otherWheel, quantity: 4 },
          ],
          kind: 'tyre',
        },
        keys: ['items'],
      },
      {
        body: { vehicleModelId: strata, items: [{ productId: wheel }], kind: 'tyre' },
        keys: ['items[0].quantity'],
      },
    ];
    for (const { body, keys } of cases) {
      const response = await visitor.agent
        .post('/api/planner/options')
        .set('x-csrf-token', visitor.csrfToken)
        .send(body);
      expect(response.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(response.body.fieldErrors as object), JSON.stringify(body)).toEqual(keys);
    }
  });
});

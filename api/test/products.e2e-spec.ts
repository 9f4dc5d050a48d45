import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { productId, uniqueSku, vehicleModelId } from './support/catalogue';
import { signInAs, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

interface Product {
  id: string;
  sku: string;
  kind: string;
  name: string;
  priceCents: number;
  active: boolean;
  fitsVehicleModelIds: string[];
  attributes: Record<string, unknown>;
  fit?: { verdict: string; summary: string };
}

const GOOD_WHEEL = {
  diameterIn: 17,
  widthIn: 8,
  offsetMm: 10,
  boltPattern: '6x139.7',
  centreBoreMm: 106.1,
  studThread: 'M12x1.5',
  loadRatingKg: 1200,
};

describe('products (HTTP)', () => {
  let testApp: TestApp;
  let manager: Session;
  let customer: Session;
  let strata: string;
  let barrow: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    manager = await signInAs(testApp, 'manager');
    customer = await signInAs(testApp, 'customer');
    strata = await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab');
    barrow = await vehicleModelId(testApp.db, 'Oskerra', 'Barrow', 'GLX dual cab');
  });

  afterAll(async () => {
    await testApp.close();
  });

  const list = async (query: Record<string, string | number | boolean>): Promise<Product[]> => {
    const response = await request(testApp.server).get('/api/products').query(query).expect(200);
    return (response.body as { items: Product[] }).items;
  };

  const create = (body: Record<string, unknown>) =>
    manager.agent.post('/api/products').set('x-csrf-token', manager.csrfToken).send(body);

  const countSku = async (sku: string) =>
    Number(
      (await testApp.db.query('select count(*) from product where sku = $1', [sku])).rows[0].count,
    );

  describe('GET /api/products', () => {
    it('lists the active catalogue without fit verdicts when no vehicle is named', async () => {
      const items = await list({});
      expect(items.length).toBeGreaterThanOrEqual(40);
      expect(items.every((item) => item.active && item.fit === undefined)).toBe(true);
      expect(new Set(items.map((item) => item.kind))).toEqual(
        new Set(['wheel', 'tyre', 'suspension-kit', 'component', 'service']),
      );
    });

    it("gives each product its own verdict on the vehicle's stock set-up", async () => {
      const items = await list({ vehicleModelId: strata });
      const bySku = new Map(items.map((item) => [item.sku, item]));
      expect(items.every((item) => item.fit !== undefined)).toBe(true);
      // A 6x114.3 wheel cannot be bolted to a 6x139.7 hub.
      expect(bySku.get('SL-GIB-1780-P35')?.fit).toEqual({
        verdict: 'does-not-fit',
        summary:
          "Does not fit: The wheel's 6x114.3 bolt pattern does not match the vehicle's 6x139.7: it cannot be bolted on.",
      });
      expect(bySku.get('IW-STK-1780-P20')?.fit).toEqual({
        verdict: 'ok',
        summary: 'Fits on the stock set-up.',
      });
      // A tyre on the stock 17 in wheel: a larger size needs a speedometer recalibration.
      expect(bySku.get('QD-TG-2657017')?.fit?.verdict).toBe('advisory');
      // +54.5 mm over the stock size is over the +50 mm limit (REFERENCES.md boundary example).
      expect(bySku.get('QD-TG-LT2857017')?.fit?.verdict).toBe('needs-certification');
    });

    it('leaves out products made only for other vehicles', async () => {
      const strataSkus = (await list({ vehicleModelId: strata, kind: 'suspension-kit' })).map(
        (i) => i.sku,
      );
      expect(strataSkus).toContain('BR-STR-50-L');
      expect(strataSkus).not.toContain('TH-BAR-50-L');
      const barrowSkus = (await list({ vehicleModelId: barrow, kind: 'suspension-kit' })).map(
        (i) => i.sku,
      );
      expect(barrowSkus.sort()).toEqual([
        'TH-BAR-40-L',
        'TH-BAR-50-H',
        'TH-BAR-50-L',
        'TH-BAR-50-M',
      ]);
    });

    it('rates kits for a declared constant load', async () => {
      const unladen = await list({ vehicleModelId: strata, kind: 'suspension-kit' });
      expect(unladen.find((item) => item.sku === 'BR-STR-50-M')?.fit?.verdict).toBe('does-not-fit');
      const laden = await list({
        vehicleModelId: strata,
        kind: 'suspension-kit',
        constantLoadKg: 200,
      });
      expect(laden.find((item) => item.sku === 'BR-STR-50-M')?.fit?.verdict).toBe('advisory');
      expect(laden.find((item) => item.sku === 'BR-STR-50-L')?.fit?.verdict).toBe('does-not-fit');
    });

    it('filters by kind and by words in the SKU, name or brand', async () => {
      const tyres = await list({ kind: 'tyre', q: 'mudhook' });
      expect(tyres.map((item) => item.sku).sort()).toEqual([
        'SP-MH-331250R17',
        'SP-MH-351250R17',
        'SP-MH-LT2857516',
        'SP-MH-LT2857517',
      ]);
      expect((await list({ q: 'stockman 17x8.5' })).map((item) => item.sku)).toEqual([
        'IW-STK-1785-00',
      ]);
      expect(await list({ q: '100%_' })).toEqual([]);
    });

    it('refuses an unknown vehicle, a bad kind and a bad flag with field errors', async () => {
      const response = await request(testApp.server)
        .get('/api/products')
        .query({ vehicleModelId: '00000000-0000-4000-8000-000000000000' })
        .expect(400);
      expect(response.body.fieldErrors).toEqual({
        vehicleModelId: ['no vehicle model has this id'],
      });
      const bad = await request(testApp.server)
        .get('/api/products')
        .query({ kind: 'gizmo', includeInactive: 'maybe' })
        .expect(400);
      expect(Object.keys(bad.body.fieldErrors).sort()).toEqual(['includeInactive', 'kind']);
    });

    it('shows switched-off products to managers only', async () => {
      const sku = uniqueSku('T-OFF');
      await create({
        sku,
        kind: 'wheel',
        name: 'Retired wheel',
        brand: 'Ironwattle',
        priceCents: 100,
        active: false,
        attributes: GOOD_WHEEL,
      }).expect(201);
      const id = await productId(testApp.db, sku);
      expect((await list({})).map((item) => item.sku)).not.toContain(sku);
      const forManager = await manager.agent
        .get('/api/products')
        .query({ includeInactive: true })
        .expect(200);
      expect((forManager.body as { items: Product[] }).items.map((item) => item.sku)).toContain(
        sku,
      );
      await customer.agent.get('/api/products').query({ includeInactive: true }).expect(403);
      await request(testApp.server).get(`/api/products/${id}`).expect(404);
      await manager.agent.get(`/api/products/${id}`).expect(200);
    });
  });

  describe('POST and PATCH /api/products', () => {
    it('creates a product with its attributes in canonical form', async () => {
      const sku = uniqueSku();
      const response = await create({
        sku,
        kind: 'tyre',
        name: 'Trailgrip A/T 275/70R17',
        brand: 'Quendra',
        priceCents: 35900,
        fitsVehicleModelIds: [strata],
        attributes: { designation: 'lt275/70 r17 121/118s', treadType: 'all-terrain' },
      }).expect(201);
      expect(response.body).toMatchObject({
        sku,
        kind: 'tyre',
        priceCents: 35900,
        labourMinutes: 0,
        bayKind: null,
        stockQty: 0,
        leadDays: 0,
        active: true,
        description: '',
        fitsVehicleModelIds: [strata],
        attributes: { designation: 'LT275/70R17 121/118S', treadType: 'all-terrain' },
      });
      const fetched = await request(testApp.server)
        .get(`/api/products/${response.body.id}`)
        .expect(200);
      expect(fetched.body).toEqual(response.body);
    });

    it('refuses bad wheel attributes field by field and creates nothing', async () => {
      const sku = uniqueSku();
      const response = await create({
        sku,
        kind: 'wheel',
        name: 'Odd wheel',
        brand: 'Ironwattle',
        priceCents: 100,
        attributes: {
          ...GOOD_WHEEL,
          offsetMm: 12.5,
          boltPattern: '6-139.7',
          diameterIn: 17.3,
          colour: 'black',
        },
      }).expect(400);
      expect(response.body.fieldErrors).toEqual({
        'attributes.diameterIn': ['must be in whole or half inches'],
        'attributes.offsetMm': ['must be a whole number'],
        'attributes.boltPattern': ['must be stud count x PCD in mm, like 6x139.7'],
        'attributes.colour': ['is not an expected field'],
      });
      expect(await countSku(sku)).toBe(0);
    });

    it('validates attributes for the kind given', async () => {
      const tyre = await create({
        sku: uniqueSku(),
        kind: 'tyre',
        name: 'Bad tyre',
        brand: 'Quendra',
        priceCents: 100,
        attributes: { designation: '265/72R17 115T', treadType: 'slick' },
      }).expect(400);
      expect(tyre.body.fieldErrors['attributes.treadType']).toEqual([
        'must be one of highway, all-terrain, mud-terrain',
      ]);
      // The parser's message names the wrong part of the size.
      expect(tyre.body.fieldErrors['attributes.designation'][0]).toMatch(/aspect ratio/);
      const noService = await create({
        sku: uniqueSku(),
        kind: 'tyre',
        name: 'No service description',
        brand: 'Quendra',
        priceCents: 100,
        attributes: { designation: '265/70R17', treadType: 'highway' },
      }).expect(400);
      expect(noService.body.fieldErrors).toEqual({
        'attributes.designation': [
          'must carry the load index and speed symbol, e.g. 265/70R17 115T',
        ],
      });
      const kit = await create({
        sku: uniqueSku(),
        kind: 'suspension-kit',
        name: 'Upside-down kit',
        brand: 'Tarnhill',
        priceCents: 100,
        attributes: {
          frontLiftMm: 50,
          rearLiftMm: 50,
          constantLoadMinKg: 300,
          constantLoadMaxKg: 150,
          keepsTwoThirdsTravel: true,
          includesGreasableShackles: false,
          includesExtendedBrakeLines: 'no',
        },
      }).expect(400);
      expect(kit.body.fieldErrors).toEqual({
        'attributes.includesExtendedBrakeLines': ['must be true or false'],
      });
      const drop = await create({
        sku: uniqueSku(),
        kind: 'component',
        name: 'Drop without a size',
        brand: 'Diffwell',
        priceCents: 100,
        attributes: { role: 'diff-drop' },
      }).expect(400);
      expect(drop.body.fieldErrors).toEqual({
        'attributes.diffDropMm': ['is required for a diff drop'],
      });
      const ringsSku = uniqueSku();
      const rings = await create({
        sku: ringsSku,
        kind: 'component',
        name: 'Rings without sizes',
        brand: 'Ironwattle',
        priceCents: 100,
        attributes: { role: 'hub-rings', ringOuterMm: 110.1 },
      }).expect(400);
      expect(rings.body.fieldErrors).toEqual({
        'attributes.ringInnerMm': ['is required for hub-centric rings'],
      });
      const backwards = await create({
        sku: ringsSku,
        kind: 'component',
        name: 'Rings the wrong way round',
        brand: 'Ironwattle',
        priceCents: 100,
        attributes: { role: 'hub-rings', ringOuterMm: 106.1, ringInnerMm: 110.1 },
      }).expect(400);
      expect(backwards.body.fieldErrors).toEqual({
        'attributes.ringInnerMm': ['must be less than ringOuterMm'],
      });
      const damper = await create({
        sku: ringsSku,
        kind: 'component',
        name: 'Damper with ring sizes',
        brand: 'Tarnhill',
        priceCents: 100,
        attributes: { role: 'steering-damper', ringOuterMm: 110.1, ringInnerMm: 106.1 },
      }).expect(400);
      expect(damper.body.fieldErrors).toEqual({
        'attributes.ringOuterMm': ['is only for hub-centric rings'],
        'attributes.ringInnerMm': ['is only for hub-centric rings'],
      });
      expect(await countSku(ringsSku)).toBe(0);
      const sized = await create({
        sku: ringsSku,
        kind: 'component',
        name: 'Hub-centric rings 106.1 to 93.1 mm',
        brand: 'Ironwattle',
        priceCents: 3900,
        // Switched off, so the other specs' planner lists do not change.
        active: false,
        attributes: { ringInnerMm: 93.1, ringOuterMm: 106.1, role: 'hub-rings' },
      }).expect(201);
      expect(sized.body.attributes).toEqual({
        role: 'hub-rings',
        ringOuterMm: 106.1,
        ringInnerMm: 93.1,
      });
      const service = await create({
        sku: uniqueSku(),
        kind: 'service',
        name: 'Service',
        brand: 'Kestrelmere Workshop',
        priceCents: 100,
        attributes: 'alignment',
      }).expect(400);
      expect(service.body.fieldErrors).toEqual({ attributes: ['must be an object'] });
    });

    it('refuses bad product fields, a taken SKU and unknown vehicles', async () => {
      const fields = await create({
        sku: 'lower case',
        kind: 'gizmo',
        name: '=HYPERLINK("x")',
        brand: '',
        priceCents: 12.5,
        attributes: {},
      }).expect(400);
      expect(Object.keys(fields.body.fieldErrors).sort()).toEqual([
        'brand',
        'kind',
        'name',
        'priceCents',
        'sku',
      ]);
      expect(fields.body.fieldErrors.name).toEqual([
        'must not start with =, +, - or @ (a spreadsheet would run it as a formula)',
      ]);
      const taken = await create({
        sku: 'IW-STK-1780-P20',
        kind: 'wheel',
        name: 'Copy',
        brand: 'Ironwattle',
        priceCents: 1,
        attributes: GOOD_WHEEL,
      }).expect(409);
      expect(taken.body.fieldErrors).toEqual({ sku: ['another product has this SKU'] });
      const unknownVehicle = await create({
        sku: uniqueSku(),
        kind: 'wheel',
        name: 'Wheel',
        brand: 'Ironwattle',
        priceCents: 1,
        attributes: GOOD_WHEEL,
        fitsVehicleModelIds: ['00000000-0000-4000-8000-000000000000'],
      }).expect(400);
      expect(unknownVehicle.body.fieldErrors.fitsVehicleModelIds).toHaveLength(1);
    });

    it('changes a product, validating the result as a whole, and changes nothing on a refusal', async () => {
      const sku = uniqueSku();
      const created = await create({
        sku,
        kind: 'wheel',
        name: 'Wheel',
        brand: 'Ironwattle',
        priceCents: 1000,
        attributes: GOOD_WHEEL,
      }).expect(201);
      const id = created.body.id as string;
      const patch = (body: Record<string, unknown>) =>
        manager.agent
          .patch(`/api/products/${id}`)
          .set('x-csrf-token', manager.csrfToken)
          .send(body);

      const changed = await patch({
        priceCents: 1250,
        attributes: { ...GOOD_WHEEL, offsetMm: -12 },
        fitsVehicleModelIds: [strata, barrow],
      }).expect(200);
      expect(changed.body).toMatchObject({ priceCents: 1250, attributes: { offsetMm: -12 } });
      expect(changed.body.fitsVehicleModelIds).toEqual([strata, barrow].sort());

      const before = await testApp.db.query('select xmin::text, * from product where id = $1', [
        id,
      ]);
      const refused = await patch({
        priceCents: 1,
        attributes: { ...GOOD_WHEEL, loadRatingKg: 'heavy' },
      }).expect(400);
      expect(refused.body.fieldErrors).toEqual({
        'attributes.loadRatingKg': ['must be a whole number'],
      });
      // A new kind must come with that kind's attributes.
      const wrongKind = await patch({ kind: 'tyre' }).expect(400);
      expect(Object.keys(wrongKind.body.fieldErrors)).toContain('attributes.designation');
      await patch({ name: null }).expect(400);
      const after = await testApp.db.query('select xmin::text, * from product where id = $1', [id]);
      expect(after.rows).toEqual(before.rows);

      await manager.agent
        .patch('/api/products/00000000-0000-4000-8000-000000000000')
        .set('x-csrf-token', manager.csrfToken)
        .send({ priceCents: 1 })
        .expect(404);
    });
  });
});

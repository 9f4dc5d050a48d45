import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_VEHICLE_MODELS } from '../src/database/seeders/demo-vehicle-models.data';
import { vehicleModelId } from './support/catalogue';
import { signInAs, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

interface VehicleModel {
  id: string;
  make: string;
  model: string;
  variant: string;
  yearFrom: number;
  yearTo: number;
  [key: string]: unknown;
}

describe('vehicle models (HTTP)', () => {
  let testApp: TestApp;
  let manager: Session;

  beforeAll(async () => {
    testApp = await startTestApp();
    manager = await signInAs(testApp, 'manager');
  });

  afterAll(async () => {
    await testApp.close();
  });

  const search = async (query: Record<string, string | number>): Promise<string[]> => {
    const response = await request(testApp.server)
      .get('/api/vehicle-models')
      .query(query)
      .expect(200);
    return (response.body as { items: VehicleModel[] }).items.map(
      (item) => `${item.make} ${item.model} ${item.variant}`,
    );
  };

  function newModel(overrides: Record<string, unknown> = {}): Record<string, unknown> {
    return {
      ...DEMO_VEHICLE_MODELS['strata-sr'],
      make: 'Testmake',
      model: `Model ${Date.now()}-${Math.floor(Math.random() * 1e6)}`,
      ...overrides,
    };
  }

  describe('search', () => {
    it('finds models by make, model and variant words, in any case', async () => {
      expect(await search({ q: 'vantrel' })).toEqual([
        'Vantrel Strata SR dual cab',
        'Vantrel Strata Workmate single cab',
      ]);
      expect(await search({ q: 'STRATA sr' })).toEqual(['Vantrel Strata SR dual cab']);
      expect(await search({ q: 'wagon brellin' })).toEqual([
        'Brellin Highrange 4.5 wagon',
        'Brellin Outrider GXL wagon',
      ]);
      expect(await search({ q: 'nothing-like-this' })).toEqual([]);
    });

    it('filters by exact make and by a year within the model years', async () => {
      expect(await search({ make: 'korrabin' })).toEqual([
        'Korrabin Quarry 76 GXL wagon',
        'Korrabin Quarry 79 dual cab',
      ]);
      expect(await search({ make: 'Korr' })).toEqual([]);
      // 2011: the Quarry 76 (2010–2023) and the Highrange (2008–2021); the Quarry 79 starts in 2012.
      expect(await search({ year: 2011, q: 'quarry' })).toEqual(['Korrabin Quarry 76 GXL wagon']);
      expect(await search({ year: 2011, make: 'Brellin' })).toEqual([
        'Brellin Highrange 4.5 wagon',
      ]);
      expect(await search({ year: 2025 })).toEqual(['Oskerra Barrow GLX dual cab']);
    });

    it('refuses a year that is not a number', async () => {
      const response = await request(testApp.server)
        .get('/api/vehicle-models')
        .query({ year: 'old' })
        .expect(400);
      expect(Object.keys(response.body.fieldErrors)).toEqual(['year']);
    });

    it('lists the makes A to Z', async () => {
      const response = await request(testApp.server).get('/api/vehicle-models/makes').expect(200);
      const makes = (response.body as { items: string[] }).items;
      expect(makes).toEqual(expect.arrayContaining(['Brellin', 'Korrabin', 'Oskerra', 'Vantrel']));
      expect([...makes].sort()).toEqual(makes);
      expect(new Set(makes).size).toBe(makes.length);
    });

    it('answers one model by id, 404 for an unknown id and 400 for a malformed one', async () => {
      const id = await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab');
      const response = await request(testApp.server).get(`/api/vehicle-models/${id}`).expect(200);
      expect(response.body).toEqual({ id, ...DEMO_VEHICLE_MODELS['strata-sr'] });
      await request(testApp.server)
        .get('/api/vehicle-models/00000000-0000-4000-8000-000000000000')
        .expect(404);
      const malformed = await request(testApp.server)
        .get('/api/vehicle-models/not-an-id')
        .expect(400);
      expect(malformed.body.fieldErrors).toEqual({ id: ['must be a UUID'] });
    });
  });

  describe('create and change (manager)', () => {
    const post = (body: Record<string, unknown>) =>
      manager.agent.post('/api/vehicle-models').set('x-csrf-token', manager.csrfToken).send(body);

    it('creates a model, normalising the tyre, pattern and thread', async () => {
      const body = newModel({
        stockTyre: '265/70 r17 115t',
        boltPattern: '6 X 139.7',
        studThread: 'm12 x 1.5',
      });
      const response = await post(body).expect(201);
      expect(response.body).toMatchObject({
        stockTyre: '265/70R17 115T',
        boltPattern: '6x139.7',
        studThread: 'M12x1.5',
      });
      await post(body).expect(409);
    });

    it('refuses bad spec values field by field', async () => {
      const response = await post(
        newModel({
          yearFrom: 2020,
          yearTo: 2019,
          stockTyre: '265/70R17 115X',
          boltPattern: 'six',
          placardLoadIndex: 200,
          stockWheel: { diameterIn: 17, widthIn: 7.5 },
          bodyType: 'van',
        }),
      ).expect(400);
      expect(Object.keys(response.body.fieldErrors).sort()).toEqual([
        'bodyType',
        'boltPattern',
        'placardLoadIndex',
        'stockTyre',
        'stockWheel.offsetMm',
      ]);
      expect(response.body.fieldErrors.stockTyre[0]).toMatch(/speed symbol/i);
      const years = await post(newModel({ yearFrom: 2020, yearTo: 2019 })).expect(400);
      expect(years.body.fieldErrors).toEqual({ yearTo: ['must not be before yearFrom'] });
      const masses = await post(newModel({ gvmKg: 2000, kerbMassKg: 2100 })).expect(400);
      expect(masses.body.fieldErrors.gvmKg).toEqual(['must be more than kerbMassKg']);
    });

    it('changes part of a model, validating the whole, and leaves it unchanged on a refusal', async () => {
      const created = await post(newModel()).expect(201);
      const id = created.body.id as string;
      const patch = (body: Record<string, unknown>) =>
        manager.agent
          .patch(`/api/vehicle-models/${id}`)
          .set('x-csrf-token', manager.csrfToken)
          .send(body);
      const changed = await patch({
        frontHalfShaftLengthMm: 470,
        largestSpecifiedTyre: '265/70R17 115S',
      }).expect(200);
      expect(changed.body).toMatchObject({
        frontHalfShaftLengthMm: 470,
        largestSpecifiedTyre: '265/70R17 115S',
      });
      const cleared = await patch({ largestSpecifiedTyre: null }).expect(200);
      expect(cleared.body.largestSpecifiedTyre).toBeNull();

      const before = await testApp.db.query(
        'select xmin::text, * from vehicle_model where id = $1',
        [id],
      );
      const refused = await patch({ yearFrom: 2030 }).expect(400);
      expect(refused.body.fieldErrors).toEqual({ yearTo: ['must not be before yearFrom'] });
      await patch({ make: null }).expect(400);
      await patch({ colour: 'blue' }).expect(400);
      const after = await testApp.db.query(
        'select xmin::text, * from vehicle_model where id = $1',
        [id],
      );
      expect(after.rows).toEqual(before.rows);
    });
  });
});

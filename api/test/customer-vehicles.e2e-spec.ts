import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { vehicleModelId } from './support/catalogue';
import { registerCustomer, signInAs, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

interface CustomerVehicle {
  id: string;
  vehicleModelId: string;
  vehicleModel: { make: string; model: string; variant: string };
  nickname: string | null;
  rego: string | null;
  year: number | null;
}

describe('my vehicles (HTTP, customers)', () => {
  let testApp: TestApp;
  let demoCustomer: Session;
  let strata: string;
  let quarry: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    demoCustomer = await signInAs(testApp, 'customer');
    strata = await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab');
    quarry = await vehicleModelId(testApp.db, 'Korrabin', 'Quarry', '76 GXL wagon');
  });

  afterAll(async () => {
    await testApp.close();
  });

  const mine = async (session: Session): Promise<CustomerVehicle[]> =>
    ((await session.agent.get('/api/my/vehicles').expect(200)).body as { items: CustomerVehicle[] })
      .items;

  const add = (session: Session, body: Record<string, unknown>) =>
    session.agent.post('/api/my/vehicles').set('x-csrf-token', session.csrfToken).send(body);

  it("shows the demo customer's seeded vehicle with its model", async () => {
    const items = await mine(demoCustomer);
    expect(items).toContainEqual(
      expect.objectContaining({
        vehicleModelId: strata,
        nickname: 'The blue ute',
        rego: 'TGW 42K',
        year: 2019,
        vehicleModel: expect.objectContaining({
          make: 'Vantrel',
          model: 'Strata',
          variant: 'SR dual cab',
        }),
      }),
    );
  });

  it("adds a vehicle that only its owner sees; another customer's id is 404", async () => {
    const owner = await registerCustomer(testApp);
    const other = await registerCustomer(testApp);
    const created = await add(owner, {
      vehicleModelId: quarry,
      nickname: '  Weekend  wagon ',
      rego: 'abc 123',
      year: 2015,
    }).expect(201);
    expect(created.body).toMatchObject({
      vehicleModelId: quarry,
      nickname: 'Weekend wagon',
      rego: 'ABC 123',
      year: 2015,
    });
    const id = created.body.id as string;

    expect((await mine(owner)).map((vehicle) => vehicle.id)).toEqual([id]);
    expect(await mine(other)).toEqual([]);
    expect((await mine(demoCustomer)).map((vehicle) => vehicle.id)).not.toContain(id);

    const before = await testApp.db.query(
      'select xmin::text, * from customer_vehicle where id = $1',
      [id],
    );
    const stolen = await other.agent
      .patch(`/api/my/vehicles/${id}`)
      .set('x-csrf-token', other.csrfToken)
      .send({ nickname: 'Mine now' })
      .expect(404);
    expect(stolen.body.message).toBe('You have no vehicle with this id');
    expect(
      (await testApp.db.query('select xmin::text, * from customer_vehicle where id = $1', [id]))
        .rows,
    ).toEqual(before.rows);

    const changed = await owner.agent
      .patch(`/api/my/vehicles/${id}`)
      .set('x-csrf-token', owner.csrfToken)
      .send({ nickname: null, rego: '', year: 2020 })
      .expect(200);
    expect(changed.body).toMatchObject({ nickname: null, rego: null, year: 2020 });
  });

  it('refuses an unknown model and a year outside the model years', async () => {
    const owner = await registerCustomer(testApp);
    const unknown = await add(owner, {
      vehicleModelId: '00000000-0000-4000-8000-000000000000',
    }).expect(400);
    expect(unknown.body.fieldErrors).toEqual({ vehicleModelId: ['no vehicle model has this id'] });
    const year = await add(owner, { vehicleModelId: strata, year: 2010 }).expect(400);
    expect(year.body.fieldErrors).toEqual({
      year: ['must be from 2016 to 2024 for the Vantrel Strata SR dual cab'],
    });
    const rego = await add(owner, { vehicleModelId: strata, rego: 'TOO-LONG-PLATE-42' }).expect(
      400,
    );
    expect(Object.keys(rego.body.fieldErrors)).toEqual(['rego']);
    expect(await mine(owner)).toEqual([]);
  });
});

import { MikroORM } from '@mikro-orm/postgresql';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  DEMO_PRICING_POLICY,
  DEMO_WORKSHOP_CARD,
  DemoWorkshopSeeder,
} from '../src/database/seeders/demo-workshop.seeder';
import { createOrmConfig } from '../src/mikro-orm.config';
import { signInAs, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';
import { testDatabaseUrl } from './support/test-database';

interface Policy {
  labourRateCentsPerHour: number;
  pricesIncludeTax: boolean;
  taxRatePercent: number;
  taxRoundingMethod: string;
  fittingBalancingCentsPerWheel: number;
  tyreDisposalCentsPerTyre: number;
  bundleDiscount: { enabled: boolean; percent: number; requiresKinds: string[] };
  deposit: { percent: number; floorCents: number; capCents: number; specialOrderPercent: number };
  quoteValidDays: number;
  updatedAt?: string;
}

const DEMO_BODY: Policy = {
  ...DEMO_PRICING_POLICY,
  taxRoundingMethod: 'per-invoice',
  bundleDiscount: {
    ...DEMO_PRICING_POLICY.bundleDiscount,
    requiresKinds: [...DEMO_PRICING_POLICY.bundleDiscount.requiresKinds],
  },
  deposit: { ...DEMO_PRICING_POLICY.deposit },
};

describe('workshop card and pricing policy', () => {
  let testApp: TestApp;
  let manager: Session;
  let desk: Session;

  const workshopRow = async () =>
    (await testApp.db.query('select xmin::text as xmin, * from workshop')).rows;

  beforeAll(async () => {
    testApp = await startTestApp();
    manager = await signInAs(testApp, 'manager');
    desk = await signInAs(testApp, 'desk');
  });

  afterAll(async () => {
    await manager.agent.put('/api/policies').set('x-csrf-token', manager.csrfToken).send(DEMO_BODY);
    await testApp.close();
  });

  it('shows the workshop card to anyone', async () => {
    const response = await request(testApp.server).get('/api/workshop').expect(200);
    expect(response.body).toEqual(DEMO_WORKSHOP_CARD);
  });

  it('shows the policy to the desk and the manager, percentages as numbers', async () => {
    for (const session of [desk, manager]) {
      const response = await session.agent.get('/api/policies').expect(200);
      const { updatedAt, ...policy } = response.body as Policy;
      expect(policy).toEqual(DEMO_BODY);
      expect(new Date(updatedAt as string).toISOString()).toBe(updatedAt);
    }
    const stored = (await workshopRow())[0] as Record<string, unknown>;
    // Percentages are kept as whole basis points: 10 % = 1000, 5 % = 500, 20 % = 2000.
    expect(stored.tax_rate_basis_points).toBe(1000);
    expect(stored.bundle_discount_basis_points).toBe(500);
    expect(stored.deposit_basis_points).toBe(2000);
    expect(stored.deposit_special_order_basis_points).toBe(5000);
  });

  it('lets the manager replace the policy, two decimals allowed', async () => {
    const changed: Policy = {
      ...DEMO_BODY,
      labourRateCentsPerHour: 16500,
      taxRoundingMethod: 'per-line',
      bundleDiscount: { enabled: true, percent: 7.25, requiresKinds: ['wheel', 'tyre'] },
      deposit: { percent: 12.5, floorCents: 5000, capCents: 150000, specialOrderPercent: 40 },
      quoteValidDays: 14,
    };
    const response = await manager.agent
      .put('/api/policies')
      .set('x-csrf-token', manager.csrfToken)
      .send(changed)
      .expect(200);
    const { updatedAt, ...policy } = response.body as Policy;
    expect(policy).toEqual(changed);
    const stored = (await workshopRow())[0] as Record<string, unknown>;
    expect(stored.bundle_discount_basis_points).toBe(725);
    expect(stored.deposit_basis_points).toBe(1250);
    expect(stored.labour_rate_cents_per_hour).toBe(16500);
    const again = await desk.agent.get('/api/policies').expect(200);
    expect(again.body).toEqual({ ...changed, updatedAt });
  });

  it('refuses an inconsistent policy with field errors and changes nothing', async () => {
    const before = await workshopRow();
    const cases: Array<{ body: unknown; keys: string[] }> = [
      {
        body: {
          ...DEMO_BODY,
          deposit: { ...DEMO_BODY.deposit, floorCents: 20000, capCents: 10000 },
        },
        keys: ['deposit.capCents'],
      },
      {
        body: { ...DEMO_BODY, deposit: { ...DEMO_BODY.deposit, specialOrderPercent: 10 } },
        keys: ['deposit.specialOrderPercent'],
      },
      {
        body: { ...DEMO_BODY, bundleDiscount: { ...DEMO_BODY.bundleDiscount, percent: 5.125 } },
        keys: ['bundleDiscount.percent'],
      },
      {
        body: { ...DEMO_BODY, bundleDiscount: { enabled: true, percent: 5, requiresKinds: [] } },
        keys: ['bundleDiscount.requiresKinds'],
      },
      {
        body: {
          ...DEMO_BODY,
          bundleDiscount: { enabled: true, percent: 5, requiresKinds: ['wheel', 'gizmo'] },
        },
        keys: ['bundleDiscount.requiresKinds'],
      },
      { body: { ...DEMO_BODY, taxRatePercent: 101 }, keys: ['taxRatePercent'] },
      { body: { ...DEMO_BODY, labourRateCentsPerHour: 140.5 }, keys: ['labourRateCentsPerHour'] },
      { body: { ...DEMO_BODY, taxRoundingMethod: 'per-month' }, keys: ['taxRoundingMethod'] },
      { body: { ...DEMO_BODY, quoteValidDays: 0 }, keys: ['quoteValidDays'] },
      {
        body: (({ deposit: _deposit, ...rest }) => rest)(DEMO_BODY),
        keys: ['deposit'],
      },
      {
        body: { ...DEMO_BODY, deposit: { percent: 20, floorCents: 10000, capCents: 100000 } },
        keys: ['deposit.specialOrderPercent'],
      },
      { body: { ...DEMO_BODY, updatedAt: new Date().toISOString() }, keys: ['updatedAt'] },
    ];
    for (const { body, keys } of cases) {
      const response = await manager.agent
        .put('/api/policies')
        .set('x-csrf-token', manager.csrfToken)
        .send(body as object);
      expect(response.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(response.body.fieldErrors as object), JSON.stringify(body)).toEqual(keys);
    }
    const missing = await manager.agent
      .put('/api/policies')
      .set('x-csrf-token', manager.csrfToken)
      .send((({ quoteValidDays: _days, ...rest }) => rest)(DEMO_BODY))
      .expect(400);
    expect(missing.body.fieldErrors.quoteValidDays).toContain('is required');
    // xmin is the transaction that last wrote the row: equal means nothing was written.
    expect(await workshopRow()).toEqual(before);
  });

  it('does not let the desk change the policy', async () => {
    const before = await workshopRow();
    await desk.agent
      .put('/api/policies')
      .set('x-csrf-token', desk.csrfToken)
      .send(DEMO_BODY)
      .expect(403);
    expect(await workshopRow()).toEqual(before);
  });

  it('seeds the workshop once and leaves the manager’s policy alone when seeded again', async () => {
    const before = await workshopRow();
    expect(before).toHaveLength(1);
    const orm = await MikroORM.init(createOrmConfig(testDatabaseUrl(), { writeSnapshot: false }));
    try {
      await orm.getSeeder().seed(DemoWorkshopSeeder);
    } finally {
      await orm.close(true);
    }
    expect(await workshopRow()).toEqual(before);
  });
});

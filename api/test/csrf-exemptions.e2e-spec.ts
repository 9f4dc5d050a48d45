import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COMPUTES_ONLY_PATHS } from '../src/common/decorators/computes-only.decorator';
import { type TestApp, startTestApp } from './support/test-app';

/**
 * Public POST routes that only compute (a price preview, planner options) need no CSRF token;
 * every other state-changing route still does. The list of exempt routes is fixed here, so a new
 * exemption is a deliberate change to this test.
 */
describe('CSRF exemptions for routes that only compute', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('marks exactly the preview and the planner options as computing only', async () => {
    const document = (await request(testApp.server).get('/api/docs-json').expect(200)).body as {
      paths: Record<string, Record<string, { 'x-computes-only'?: boolean; 'x-access'?: string }>>;
    };
    const exempt: string[] = [];
    for (const [path, operations] of Object.entries(document.paths)) {
      for (const [method, operation] of Object.entries(operations)) {
        if (operation['x-computes-only'] === true) {
          exempt.push(`${method.toUpperCase()} ${path}`);
          expect(operation['x-access']).toBe('public');
        }
      }
    }
    expect(exempt.sort()).toEqual(['POST /api/planner/options', 'POST /api/quotes/preview']);
    // The session middleware skips exactly these paths for a request without a session cookie.
    expect(exempt.map((route) => route.replace(/^POST /, '')).sort()).toEqual(
      [...COMPUTES_ONLY_PATHS].sort(),
    );
  });

  it('answers the preview without a session or token, and sets no cookie', async () => {
    const models = await request(testApp.server).get('/api/vehicle-models').expect(200);
    const vehicleModelId = (models.body as { items: { id: string }[] }).items[0].id;
    const products = await request(testApp.server)
      .get(`/api/products?vehicleModelId=${vehicleModelId}&kind=tyre`)
      .expect(200);
    const tyre = (
      products.body as { items: { id: string; fit: { verdict: string } }[] }
    ).items.find((item) => item.fit.verdict !== 'does-not-fit');
    expect(tyre).toBeDefined();
    const sessionsBefore = await testApp.db.query<{ count: string }>(
      'select count(*) from session',
    );
    const response = await request(testApp.server)
      .post('/api/quotes/preview')
      .send({ vehicleModelId, uses: ['daily'], items: [{ productId: tyre!.id, quantity: 4 }] })
      .expect(200);
    expect(response.headers['set-cookie']).toBeUndefined();
    expect(response.headers['cache-control']).toBe('no-store');
    const sessionsAfter = await testApp.db.query<{ count: string }>('select count(*) from session');
    expect(sessionsAfter.rows[0].count).toBe(sessionsBefore.rows[0].count);
    expect((response.body as { price: { totalCents: number } }).price.totalCents).toBeGreaterThan(
      0,
    );
  });

  it('still refuses a state-changing public POST without the token', async () => {
    const before = await testApp.db.query<{ count: string }>('select count(*) from "user"');
    await request(testApp.server)
      .post('/api/auth/register')
      .send({ name: 'No Token', email: 'no-token@liftwright.example', password: 'long-enough-1' })
      .expect(403);
    const after = await testApp.db.query<{ count: string }>('select count(*) from "user"');
    expect(after.rows[0].count).toBe(before.rows[0].count);
  });
});

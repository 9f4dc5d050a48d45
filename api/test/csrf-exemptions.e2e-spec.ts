import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import Stripe from 'stripe';
import { COMPUTES_ONLY_PATHS } from '../src/common/decorators/computes-only.decorator';
import { type TestApp, startTestApp } from './support/test-app';

/**
 * Public POST routes that only compute (a price preview, planner options) need no CSRF token,
 * nor does the payment provider's webhook (a server-to-server call that proves itself by its
 * signature); every other state-changing route still does. The list of exempt routes is fixed
 * here, so a new exemption is a deliberate change to this test.
 */
describe('CSRF exemptions for routes that only compute, and the signed webhook', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('exempts exactly the preview, the planner options and the provider webhook', async () => {
    const document = (await request(testApp.server).get('/api/docs-json').expect(200)).body as {
      paths: Record<
        string,
        Record<
          string,
          { 'x-computes-only'?: boolean; 'x-signed-by-provider'?: boolean; 'x-access'?: string }
        >
      >;
    };
    const computesOnly: string[] = [];
    const signed: string[] = [];
    for (const [path, operations] of Object.entries(document.paths)) {
      for (const [method, operation] of Object.entries(operations)) {
        const route = `${method.toUpperCase()} ${path}`;
        if (operation['x-computes-only'] === true) computesOnly.push(route);
        if (operation['x-signed-by-provider'] === true) signed.push(route);
        if (operation['x-computes-only'] === true || operation['x-signed-by-provider'] === true) {
          expect(operation['x-access'], route).toBe('public');
        }
      }
    }
    expect([...computesOnly, ...signed].sort()).toEqual([
      'POST /api/payments/webhook',
      'POST /api/planner/options',
      'POST /api/quotes/preview',
    ]);
    expect(signed).toEqual(['POST /api/payments/webhook']);
    // The session middleware skips exactly the compute-only paths for a request without a
    // session cookie.
    expect(computesOnly.map((route) => route.replace(/^POST /, '')).sort()).toEqual(
      [...COMPUTES_ONLY_PATHS].sort(),
    );
  });

  it('lets a signed event reach the webhook without a session or token, and nothing else', async () => {
    const { webhookSecret } = testApp.payments;
    const payload = JSON.stringify({
      id: `evt_csrf_${Date.now()}`,
      object: 'event',
      type: 'customer.created',
      created: Math.floor(Date.now() / 1000),
      data: { object: { id: 'cus_csrf', object: 'customer' } },
    });
    const count = async () =>
      (await testApp.db.query<{ count: string }>('select count(*) from processed_webhook_event'))
        .rows[0].count;
    const before = await count();
    // Without a signature: refused by the handler (400), not by the CSRF guard (403).
    const unsigned = await request(testApp.server)
      .post('/api/payments/webhook')
      .set('Content-Type', 'application/json')
      .send(payload);
    expect(unsigned.status).toBe(400);
    expect(await count()).toBe(before);
    // Source: the provider's webhook signature scheme (Stripe-Signature t=…,v1=…, HMAC-SHA256 of
    // "t.payload"), as implemented by its official SDK.
    const header = new Stripe(testApp.payments.secretKey).webhooks.generateTestHeaderString({
      payload,
      secret: webhookSecret,
    });
    const signed = await request(testApp.server)
      .post('/api/payments/webhook')
      .set('Content-Type', 'application/json')
      .set('Stripe-Signature', header)
      .send(payload);
    expect(signed.status, JSON.stringify(signed.body)).toBe(200);
    expect(signed.headers['set-cookie']).toBeUndefined();
    expect(Number(await count())).toBe(Number(before) + 1);
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

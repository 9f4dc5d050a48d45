import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type TestApp, startTestApp } from './support/test-app';

interface Preview {
  price: { totalCents: number; lines: { kind: string; sku?: string; unitPriceCents?: number }[] };
}

/**
 * The preview and the planner options read a copy of the catalogue kept per process and
 * checked against the catalogue revision before each use. A write through any path — another
 * API process, a migration, psql — must be seen by the very next request.
 */
describe('the catalogue copy behind the preview', () => {
  let testApp: TestApp;
  let vehicleModelId: string;
  let tyre: { id: string; sku: string };

  beforeAll(async () => {
    testApp = await startTestApp();
    const models = await request(testApp.server).get('/api/vehicle-models').expect(200);
    vehicleModelId = (models.body as { items: { id: string }[] }).items[0].id;
    const products = await request(testApp.server)
      .get(`/api/products?vehicleModelId=${vehicleModelId}&kind=tyre`)
      .expect(200);
    const items = (
      products.body as { items: { id: string; sku: string; fit: { verdict: string } }[] }
    ).items;
    tyre = items.find((item) => item.fit.verdict !== 'does-not-fit')!;
  });

  afterAll(async () => {
    await testApp.close();
  });

  async function tyreUnitPrice(): Promise<number> {
    const response = await request(testApp.server)
      .post('/api/quotes/preview')
      .send({ vehicleModelId, uses: ['daily'], items: [{ productId: tyre.id, quantity: 4 }] })
      .expect(200);
    const line = (response.body as Preview).price.lines.find(
      (candidate) => candidate.kind === 'part' && candidate.sku === tyre.sku,
    );
    return line!.unitPriceCents!;
  }

  it('sees a price written straight to the database on the next preview', async () => {
    const before = await tyreUnitPrice();
    const revision = async () =>
      (
        await testApp.db.query<{ revision: string }>(
          'select revision::text from catalogue_revision',
        )
      ).rows[0].revision;
    const revisionBefore = await revision();
    await testApp.db.query('update product set price_cents = price_cents + 1234 where id = $1', [
      tyre.id,
    ]);
    expect(BigInt(await revision())).toBeGreaterThan(BigInt(revisionBefore));
    expect(await tyreUnitPrice()).toBe(before + 1234);
    await testApp.db.query('update product set price_cents = price_cents - 1234 where id = $1', [
      tyre.id,
    ]);
    expect(await tyreUnitPrice()).toBe(before);
  });

  it('raises the revision for every table the preview reads, and not for others', async () => {
    const revision = async () =>
      BigInt(
        (
          await testApp.db.query<{ revision: string }>(
            'select revision::text from catalogue_revision',
          )
        ).rows[0].revision,
      );
    for (const statement of [
      'update vehicle_model set updated_at = updated_at',
      'update rule_set set updated_at = updated_at',
      'update workshop set updated_at = updated_at',
      'delete from product_fits_vehicle_model where false',
    ]) {
      const before = await revision();
      await testApp.db.query(statement);
      expect(await revision(), statement).toBe(before + 1n);
    }
    const before = await revision();
    await testApp.db.query('update "user" set updated_at = updated_at where false');
    expect(await revision()).toBe(before);
  });
});

import request from 'supertest';
import { expect } from 'vitest';
import { vehicleModelId } from './catalogue';
import type { TestApp } from './test-app';

/**
 * A package of four tyres that fit the demo Vantrel Strata SR dual cab: a short job in the one
 * tyre bay, so one start holds one booking (the bookings, desk and payments specs use it).
 */
export async function tyreOnlyPackage(testApp: TestApp): Promise<object> {
  const strata = await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab');
  const products = await request(testApp.server)
    .get(`/api/products?vehicleModelId=${strata}&kind=tyre`)
    .expect(200);
  const tyre = (products.body as { items: { id: string; fit: { verdict: string } }[] }).items.find(
    (item) => item.fit.verdict !== 'does-not-fit',
  );
  expect(tyre, 'a tyre that fits the Strata').toBeDefined();
  return {
    vehicleModelId: strata,
    uses: ['daily'],
    constantLoadKg: 0,
    items: [{ productId: tyre!.id, quantity: 4 }],
  };
}

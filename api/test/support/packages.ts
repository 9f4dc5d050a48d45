import type { Pool } from 'pg';
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

/**
 * Deletes the quotes a spec made, with their bookings' refunds, payments and bookings (their
 * reservations and audit events go with the booking).
 */
export async function deleteQuotesAndBookings(db: Pool, quoteIds: string[]): Promise<void> {
  const bookings = `select b.id from booking b join quote_version v on v.id = b.quote_version_id
                     where v.quote_id = any($1::uuid[])`;
  await db.query(
    `delete from refund where payment_id in (select id from payment where booking_id in (${bookings}))`,
    [quoteIds],
  );
  await db.query(`delete from payment where booking_id in (${bookings})`, [quoteIds]);
  await db.query(`delete from booking where id in (${bookings})`, [quoteIds]);
  await db.query('delete from quote where id = any($1::uuid[])', [quoteIds]);
}

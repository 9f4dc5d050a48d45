import type { Pool } from 'pg';

/** The id of a seeded (or test-made) product, by SKU. */
export async function productId(db: Pool, sku: string): Promise<string> {
  const result = await db.query<{ id: string }>('select id from product where sku = $1', [sku]);
  if (result.rows.length !== 1) throw new Error(`No product with SKU ${sku}`);
  return result.rows[0].id;
}

/** Product ids by SKU, in the order given. */
export async function productIds(db: Pool, skus: string[]): Promise<string[]> {
  return Promise.all(skus.map((sku) => productId(db, sku)));
}

/** The id of a vehicle model, by its natural key. */
export async function vehicleModelId(
  db: Pool,
  make: string,
  model: string,
  variant: string,
): Promise<string> {
  const result = await db.query<{ id: string }>(
    'select id from vehicle_model where make = $1 and model = $2 and variant = $3',
    [make, model, variant],
  );
  if (result.rows.length !== 1) throw new Error(`No vehicle model ${make} ${model} ${variant}`);
  return result.rows[0].id;
}

export async function ruleSetId(db: Pool, name: string): Promise<string> {
  const result = await db.query<{ id: string }>('select id from rule_set where name = $1', [name]);
  if (result.rows.length !== 1) throw new Error(`No rule set ${name}`);
  return result.rows[0].id;
}

/**
 * Every row of the products table and its vehicle links, with each row's xmin (the transaction
 * that last wrote it): equal snapshots mean nothing was written, not even an unchanged value.
 */
export async function productsSnapshot(db: Pool): Promise<string> {
  const products = await db.query('select xmin::text as xmin, * from product order by sku');
  const links = await db.query(
    'select xmin::text as xmin, * from product_fits_vehicle_model order by product_id, vehicle_model_id',
  );
  return JSON.stringify({ products: products.rows, links: links.rows });
}

/** A SKU no other test uses. */
export function uniqueSku(prefix = 'T'): string {
  return `${prefix}-${Date.now().toString(36).toUpperCase()}-${Math.floor(Math.random() * 1e6)}`;
}

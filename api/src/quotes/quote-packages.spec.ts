import { describe, expect, it } from 'vitest';
import { Product, type ProductFields } from '../catalogue/entities/product.entity';
import { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import { DEMO_VEHICLE_MODELS } from '../database/seeders/demo-vehicle-models.data';
import {
  isPolicyChargedService,
  packageLineOf,
  selectionErrors,
  wheelAndTyreCounts,
} from './quote-packages.service';

function product(fields: Partial<ProductFields> & Pick<ProductFields, 'sku' | 'kind'>): Product {
  const attributes: Record<ProductFields['kind'], ProductFields['attributes']> = {
    wheel: {
      diameterIn: 17,
      widthIn: 8,
      offsetMm: 20,
      boltPattern: '6x139.7',
      centreBoreMm: 106.1,
      studThread: 'M12x1.5',
      loadRatingKg: 1000,
    },
    tyre: { designation: '265/70R17 115T', treadType: 'all-terrain' },
    'suspension-kit': {
      frontLiftMm: 50,
      rearLiftMm: 50,
      constantLoadMinKg: 0,
      constantLoadMaxKg: 150,
      keepsTwoThirdsTravel: true,
      includesGreasableShackles: false,
      includesExtendedBrakeLines: false,
    },
    component: { role: 'accessory' },
    service: { role: 'alignment', perWheel: false },
  };
  return new Product({
    name: `Test ${fields.sku}`,
    brand: 'Testbrand',
    priceCents: 1995,
    labourMinutes: 0,
    bayKind: null,
    stockQty: 4,
    leadDays: 0,
    active: true,
    attributes: attributes[fields.kind],
    ...fields,
  });
}

const strata = new VehicleModel(DEMO_VEHICLE_MODELS['strata-sr']);

describe('package rules', () => {
  const wheel = product({ sku: 'T-WHEEL', kind: 'wheel' });
  const otherWheel = product({ sku: 'T-WHEEL-2', kind: 'wheel' });
  const tyre = product({ sku: 'T-TYRE', kind: 'tyre' });
  const old = product({ sku: 'T-OLD', kind: 'component', active: false });
  const fitting = product({
    sku: 'T-FIT',
    kind: 'service',
    attributes: { role: 'fitting-balancing', perWheel: true },
  });
  const products = new Map(
    [wheel, otherWheel, tyre, old, fitting].map((entry) => [entry.id, entry]),
  );

  it('accepts a package of products made for the vehicle', () => {
    const result = selectionErrors(
      strata,
      [
        { productId: wheel.id, quantity: 4 },
        { productId: tyre.id, quantity: 5 },
      ],
      products,
    );
    expect(result.errors).toEqual({});
    expect(result.selected.map((entry) => entry.product.sku)).toEqual(['T-WHEEL', 'T-TYRE']);
  });

  // "Not made for this vehicle" needs the ORM's collections: test/quotes.e2e-spec.ts checks it.
  it('names each bad item by its position', () => {
    const { errors } = selectionErrors(
      strata,
      [
        { productId: wheel.id, quantity: 4 },
        { productId: wheel.id, quantity: 1 },
        { productId: '00000000-0000-4000-8000-000000000000', quantity: 1 },
        { productId: old.id, quantity: 1 },
        { productId: fitting.id, quantity: 1 },
      ],
      products,
    );
    expect(Object.keys(errors)).toEqual([
      'items[1].productId',
      'items[2].productId',
      'items[3].productId',
      'items[4].productId',
    ]);
    expect(errors['items[1].productId'][0]).toMatch(/already in the package \(items\[0\]\)/);
    expect(errors['items[2].productId']).toEqual(['no product has this id']);
    expect(errors['items[3].productId'][0]).toMatch(/not sold any more/);
    expect(errors['items[4].productId'][0]).toMatch(/leave it out of the package/);
  });

  it('holds one wheel, one tyre and one kit at most', () => {
    const { errors } = selectionErrors(
      strata,
      [
        { productId: wheel.id, quantity: 4 },
        { productId: otherWheel.id, quantity: 4 },
      ],
      products,
    );
    expect(errors).toEqual({ items: ['a package holds one wheel, not 2'] });
  });

  it('counts wheels fitted as the larger of the wheel and tyre lines, tyres replaced as the tyre line', () => {
    expect(
      wheelAndTyreCounts([
        { product: wheel, quantity: 4 },
        { product: tyre, quantity: 5 },
      ]),
    ).toEqual({ wheelsFitted: 5, tyresReplaced: 5 });
    expect(wheelAndTyreCounts([{ product: wheel, quantity: 4 }])).toEqual({
      wheelsFitted: 4,
      tyresReplaced: 0,
    });
    expect(wheelAndTyreCounts([{ product: tyre, quantity: 2 }])).toEqual({
      wheelsFitted: 2,
      tyresReplaced: 2,
    });
    expect(wheelAndTyreCounts([])).toEqual({ wheelsFitted: 0, tyresReplaced: 0 });
  });

  it('prices from the catalogue values and marks per-wheel services', () => {
    expect(packageLineOf(wheel, 4)).toMatchObject({
      sku: 'T-WHEEL',
      name: 'Testbrand Test T-WHEEL',
      kind: 'wheel',
      quantity: 4,
      unitPriceCents: 1995,
    });
    expect(packageLineOf(wheel, 4).perWheel).toBeUndefined();
    expect(packageLineOf(fitting, 1)).toMatchObject({ name: 'Test T-FIT', perWheel: true });
    expect(isPolicyChargedService(fitting)).toBe(true);
    expect(isPolicyChargedService(wheel)).toBe(false);
  });
});

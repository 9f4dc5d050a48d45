import { describe, expect, it } from 'vitest';
import { Product } from '../catalogue/entities/product.entity';
import type { SuspensionKitAttributes } from '../catalogue/product-attributes';
import { DEMO_VEHICLE_MODELS } from '../database/seeders/demo-vehicle-models.data';
import { checkFitment } from '../fitment/check-fitment';
import { defaultRuleSetLimits } from '../fitment/rule-set-limits';
import { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import {
  componentSpecOf,
  isOtherRatingOf,
  parseBoltPattern,
  suspensionKitSpecOf,
  vehicleSpecOf,
} from './fitment-input.mapper';

function kit(sku: string, brand: string, liftMm: number, minKg: number, maxKg: number): Product {
  const attributes: SuspensionKitAttributes = {
    frontLiftMm: liftMm,
    rearLiftMm: liftMm,
    constantLoadMinKg: minKg,
    constantLoadMaxKg: maxKg,
    keepsTwoThirdsTravel: true,
    includesGreasableShackles: false,
    includesExtendedBrakeLines: false,
  };
  return new Product({
    sku,
    kind: 'suspension-kit',
    name: sku,
    brand,
    priceCents: 100,
    labourMinutes: 0,
    bayKind: 'hoist',
    stockQty: 0,
    leadDays: 0,
    active: true,
    attributes,
  });
}

describe('fitment input mapper', () => {
  it('reads bolt patterns', () => {
    expect(parseBoltPattern('6x139.7')).toEqual({ studCount: 6, pcdMm: 139.7 });
    expect(parseBoltPattern('5x150')).toEqual({ studCount: 5, pcdMm: 150 });
    expect(() => parseBoltPattern('six')).toThrow();
  });

  it('maps a vehicle model, leaving out what is not recorded', () => {
    const spec = vehicleSpecOf(new VehicleModel(DEMO_VEHICLE_MODELS['quarry-76']));
    expect(spec).toMatchObject({
      boltPattern: { studCount: 5, pcdMm: 150 },
      largestSpecifiedTyre: '265/75R16 116S',
      placardSpeedSymbol: 'S',
    });
    expect('frontHalfShaftLengthMm' in spec).toBe(false);
    // The mapped stock vehicle passes the engine without a problem of its own.
    expect(checkFitment({ vehicle: spec }, defaultRuleSetLimits).verdict).toBe('ok');
  });

  it('offers the other ratings of the same brand and lift as variants', () => {
    const light = kit('A-50-L', 'Bramblerock', 50, 0, 150);
    const heavy = kit('A-50-H', 'Bramblerock', 50, 300, 600);
    const medium = kit('A-50-M', 'Bramblerock', 50, 150, 300);
    const otherLift = kit('A-40-M', 'Bramblerock', 40, 150, 300);
    const otherBrand = kit('B-50-M', 'Tarnhill', 50, 150, 300);
    const ratings = [heavy, medium, otherLift, otherBrand, light].filter((c) =>
      isOtherRatingOf(light, c),
    );
    expect(ratings.map((p) => p.sku)).toEqual(['A-50-H', 'A-50-M']);
    expect(suspensionKitSpecOf(light, ratings).variants?.map((v) => v.name)).toEqual([
      'A-50-M',
      'A-50-H',
    ]);
  });

  it('maps services to engine roles, and leaves out those the report does not use', () => {
    const service = (role: string) =>
      new Product({
        sku: `S-${role}`.toUpperCase(),
        kind: 'service',
        name: role,
        brand: 'Kestrelmere Workshop',
        priceCents: 100,
        labourMinutes: 0,
        bayKind: null,
        stockQty: 0,
        leadDays: 0,
        active: true,
        attributes: { role: role as 'alignment', perWheel: false },
      });
    expect(componentSpecOf(service('alignment'))?.role).toBe('alignment');
    expect(componentSpecOf(service('speedometer-recalibration'))?.role).toBe(
      'speedometer-recalibration',
    );
    expect(componentSpecOf(service('tyre-disposal'))).toBeNull();
  });
});

import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable, InternalServerErrorException } from '@nestjs/common';
import { Product } from '../catalogue/entities/product.entity';
import { CustomerVehicle } from '../customer-vehicles/entities/customer-vehicle.entity';
import type { RuleSetLimits } from '../fitment/rule-set-limits';
import { validateRuleSetLimits } from '../fitment/rule-set-limits';
import { RuleSet } from '../rule-sets/entities/rule-set.entity';
import { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import { Workshop } from '../workshop/entities/workshop.entity';

/** Everything pricing and fit-checking a package needs, read in one round trip. */
export interface PackageData {
  vehicle: VehicleModel | null;
  customerVehicle: CustomerVehicle | null;
  /** The requested products, with fitsVehicleModels loaded. */
  products: Product[];
  /** Active kits of the same brands as any requested kit (other spring ratings), loaded alike. */
  brandKits: Product[];
  ruleSet: RuleSetLimits;
  workshop: Workshop;
}

interface PackageDataRow {
  vehicle: Record<string, unknown> | null;
  customer_vehicle: Record<string, unknown> | null;
  products: Array<Record<string, unknown> & { fits: string[] }>;
  brand_kits: Array<Record<string, unknown> & { fits: string[] }>;
  rule_set: Record<string, unknown> | null;
  workshop: Record<string, unknown> | null;
}

/** A product row as JSON, with the ids of the vehicle models it is made for. */
const PRODUCT_JSON = `to_jsonb(p) || jsonb_build_object('fits', coalesce((
  select jsonb_agg(f.vehicle_model_id) from product_fits_vehicle_model f where f.product_id = p.id
), '[]'::jsonb))`;

/**
 * One SQL statement instead of five ORM queries: the price preview runs on every step of the
 * planner and is benchmarked (docs/performance.md), and each ORM query costs about a
 * millisecond of CPU here against a tenth of that for the rows themselves. The rows are turned
 * into entities with `em.map`, so the mappers and the save path see ordinary managed entities.
 * Runs on the entity manager's connection, inside its transaction when there is one.
 */
const PACKAGE_DATA_SQL = `
with selected as (select * from product where id = any(?::uuid[]))
select
  (select to_jsonb(v) from vehicle_model v where v.id = ?) as vehicle,
  (select to_jsonb(c) from customer_vehicle c where c.id = ?) as customer_vehicle,
  (select coalesce(jsonb_agg(${PRODUCT_JSON}), '[]'::jsonb) from selected p) as products,
  (select coalesce(jsonb_agg(${PRODUCT_JSON}), '[]'::jsonb) from product p
     where p.kind = 'suspension-kit' and p.active
       and p.brand in (select brand from selected where kind = 'suspension-kit')
       and p.id not in (select id from selected)) as brand_kits,
  (select to_jsonb(r) from rule_set r where r.is_default) as rule_set,
  (select to_jsonb(w) from workshop w order by w.created_at, w.id limit 1) as workshop`;

@Injectable()
export class PackageDataLoader {
  constructor(private readonly em: EntityManager) {}

  async load(
    vehicleModelId: string,
    productIds: readonly string[],
    customerVehicleId?: string,
  ): Promise<PackageData> {
    const [row] = await this.em.execute<PackageDataRow[]>(PACKAGE_DATA_SQL, [
      `{${productIds.join(',')}}`,
      vehicleModelId,
      customerVehicleId ?? null,
    ]);
    if (!row.rule_set) throw new InternalServerErrorException('No default rule set is stored');
    if (!row.workshop) {
      throw new InternalServerErrorException(
        'The workshop is not set up: run the database seed first',
      );
    }
    const ruleSet = this.em.map(RuleSet, row.rule_set);
    const validation = validateRuleSetLimits(ruleSet.toEngineCandidate());
    if (!validation.ok) {
      throw new InternalServerErrorException(`Rule set "${ruleSet.name}" is not valid`);
    }
    return {
      vehicle: row.vehicle ? this.em.map(VehicleModel, row.vehicle) : null,
      customerVehicle: row.customer_vehicle
        ? this.em.map(CustomerVehicle, row.customer_vehicle)
        : null,
      products: row.products.map((product) => this.product(product)),
      brandKits: row.brand_kits.map((product) => this.product(product)),
      ruleSet: validation.ruleSet,
      workshop: this.em.map(Workshop, row.workshop),
    };
  }

  private product({ fits, ...columns }: Record<string, unknown> & { fits: string[] }): Product {
    const product = this.em.map(Product, columns);
    if (!product.fitsVehicleModels.isInitialized()) {
      product.fitsVehicleModels.hydrate(fits.map((id) => this.em.getReference(VehicleModel, id)));
    }
    return product;
  }
}

import type { EntityManager } from '@mikro-orm/core';
import { Seeder } from '@mikro-orm/seeder';
import { Product } from '../../catalogue/entities/product.entity';
import { validateProductFields } from '../../catalogue/product-validation';
import { FieldErrorsException } from '../../common/errors/field-errors.exception';
import { CustomerVehicle } from '../../customer-vehicles/entities/customer-vehicle.entity';
import { defaultRuleSetLimits, stricterRuleSetLimits } from '../../fitment/rule-set-limits';
import { RuleSet, storedLimitsOf } from '../../rule-sets/entities/rule-set.entity';
import { User } from '../../users/entities/user.entity';
import { VehicleModel, type VehicleModelSpec } from '../../vehicles/entities/vehicle-model.entity';
import { validVehicleSpec } from '../../vehicles/vehicle-spec-validation';
import { DEMO_PRODUCTS } from './demo-products.data';
import {
  DEMO_CUSTOMER_VEHICLE,
  DEMO_VEHICLE_MODELS,
  type DemoVehicleKey,
} from './demo-vehicle-models.data';

export const DEMO_RULE_SETS = [
  {
    limits: defaultRuleSetLimits,
    isDefault: true,
    description:
      'The national code values as quoted, each with its source. Used by the fit report unless another rule set is chosen. Confirm the limits with your road authority.',
  },
  {
    limits: stricterRuleSetLimits,
    isDefault: false,
    description:
      'An illustrative stricter set (smaller lifts, the ±7 % diameter rule, placard speed symbol enforced, no off-road exemption). Not any jurisdiction’s law.',
  },
] as const;

function validDemoSpec(key: string, demo: VehicleModelSpec): VehicleModelSpec {
  try {
    return validVehicleSpec({ ...demo });
  } catch (error) {
    const detail = error instanceof FieldErrorsException ? JSON.stringify(error.fieldErrors) : '';
    throw new Error(`Demo vehicle model ${key} is not valid ${detail}`);
  }
}

function sameIds(a: string[], b: string[]): boolean {
  return a.length === b.length && [...a].sort().join() === [...b].sort().join();
}

/**
 * The demo catalogue, vehicle models, rule sets and the demo customer's vehicle. Upserts by
 * natural key (rule set name; make + model + variant; SKU): running it again changes nothing,
 * and it puts back demo values that were edited. Every record goes through the same validation
 * as the API.
 */
export class DemoCatalogueSeeder extends Seeder {
  async run(em: EntityManager): Promise<void> {
    await this.seedRuleSets(em);
    const vehicles = await this.seedVehicleModels(em);
    await this.seedProducts(em, vehicles);
    await this.seedCustomerVehicle(em, vehicles);
    await em.flush();
  }

  private async seedRuleSets(em: EntityManager): Promise<void> {
    for (const demo of DEMO_RULE_SETS) {
      const limits = storedLimitsOf(demo.limits);
      const ruleSet =
        (await em.findOne(RuleSet, { name: demo.limits.name })) ??
        new RuleSet(demo.limits.name, demo.limits.jurisdiction, limits);
      ruleSet.jurisdiction = demo.limits.jurisdiction;
      ruleSet.description = demo.description;
      ruleSet.isDefault = demo.isDefault;
      ruleSet.setLimits(limits);
      em.persist(ruleSet);
    }
    await em.flush();
  }

  private async seedVehicleModels(em: EntityManager): Promise<Map<DemoVehicleKey, VehicleModel>> {
    const vehicles = new Map<DemoVehicleKey, VehicleModel>();
    for (const [key, demo] of Object.entries(DEMO_VEHICLE_MODELS) as Array<
      [DemoVehicleKey, (typeof DEMO_VEHICLE_MODELS)[DemoVehicleKey]]
    >) {
      const spec = validDemoSpec(key, demo);
      const existing = await em.findOne(VehicleModel, {
        make: spec.make,
        model: spec.model,
        variant: spec.variant,
      });
      if (existing) existing.applySpec(spec);
      const vehicle = existing ?? new VehicleModel(spec);
      em.persist(vehicle);
      vehicles.set(key, vehicle);
    }
    await em.flush();
    return vehicles;
  }

  private async seedProducts(
    em: EntityManager,
    vehicles: Map<DemoVehicleKey, VehicleModel>,
  ): Promise<void> {
    const existing = new Map(
      (
        await em.find(
          Product,
          { sku: { $in: DEMO_PRODUCTS.map((demo) => demo.sku) } },
          { populate: ['fitsVehicleModels'] },
        )
      ).map((product) => [product.sku, product]),
    );
    for (const demo of DEMO_PRODUCTS) {
      const { description, fits, ...fields } = demo;
      const validation = validateProductFields({ ...fields, active: true });
      if (!validation.ok) {
        throw new Error(
          `Demo product ${demo.sku} is not valid: ${JSON.stringify(validation.fieldErrors)}`,
        );
      }
      const product = existing.get(demo.sku) ?? new Product(validation.fields);
      product.assignFields(validation.fields);
      product.description = description;
      const fitsVehicles = fits.map((key) => {
        const vehicle = vehicles.get(key);
        if (!vehicle) throw new Error(`Demo product ${demo.sku} names an unknown vehicle ${key}`);
        return vehicle;
      });
      const currentIds = product.fitsVehicleModels.isInitialized()
        ? product.fitsVehicleModels.getItems().map((vehicle) => vehicle.id)
        : [];
      if (
        !sameIds(
          currentIds,
          fitsVehicles.map((vehicle) => vehicle.id),
        )
      ) {
        product.fitsVehicleModels.set(fitsVehicles);
      }
      em.persist(product);
    }
    await em.flush();
  }

  private async seedCustomerVehicle(
    em: EntityManager,
    vehicles: Map<DemoVehicleKey, VehicleModel>,
  ): Promise<void> {
    const owner = await em.findOne(User, { email: DEMO_CUSTOMER_VEHICLE.ownerEmail });
    const model = vehicles.get(DEMO_CUSTOMER_VEHICLE.vehicle);
    if (!owner || !model) return;
    const vehicle =
      (await em.findOne(CustomerVehicle, {
        owner,
        vehicleModel: model,
        nickname: DEMO_CUSTOMER_VEHICLE.nickname,
      })) ?? new CustomerVehicle(owner, model);
    vehicle.nickname = DEMO_CUSTOMER_VEHICLE.nickname;
    vehicle.rego = DEMO_CUSTOMER_VEHICLE.rego;
    vehicle.year = DEMO_CUSTOMER_VEHICLE.year;
    em.persist(vehicle);
  }
}

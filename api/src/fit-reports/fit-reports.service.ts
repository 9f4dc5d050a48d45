import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import { Product } from '../catalogue/entities/product.entity';
import type { ProductKind } from '../catalogue/product-kinds';
import { FieldErrorsException, type FieldErrors } from '../common/errors/field-errors.exception';
import { checkFitment } from '../fitment/check-fitment';
import type { FitReport, FitVerdict, FitmentInput } from '../fitment/fitment.types';
import type { RuleSetLimits } from '../fitment/rule-set-limits';
import {
  type TyreDesignationPart,
  formatTyreDesignation,
  parseTyreDesignation,
} from '../fitment/tyre-designation';
import { mmToInches, tyreGeometry } from '../fitment/tyre-geometry';
import { RuleSetsService } from '../rule-sets/rule-sets.service';
import { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import type { CheckFitmentDto } from './dto/check-fitment.dto';
import { FitReportResponse } from './dto/fit-report.response';
import type { TyreSizeResponse } from './dto/tyre-size.dto';
import {
  componentSpecOf,
  isOtherRatingOf,
  suspensionKitSpecOf,
  tyreSpecOf,
  vehicleSpecOf,
  wheelSpecOf,
} from './fitment-input.mapper';

/** The fit verdict of one product on a vehicle's stock set-up, for catalogue lists. */
export interface ProductFit {
  verdict: FitVerdict;
  summary: string;
}

const PART_NAMES: Record<TyreDesignationPart, string> = {
  width: 'section width',
  aspect: 'aspect ratio',
  overallDiameter: 'overall diameter',
  construction: 'construction letter',
  rim: 'rim diameter',
  loadIndex: 'load index',
  speedSymbol: 'speed symbol',
  format: 'layout',
};

/** Main parts a package holds at most one of. */
const SINGLE_PARTS: Array<{ kind: ProductKind; name: string }> = [
  { kind: 'wheel', name: 'wheel' },
  { kind: 'tyre', name: 'tyre' },
  { kind: 'suspension-kit', name: 'suspension kit' },
];

function round(value: number, digits: number): number {
  const factor = 10 ** digits;
  return Math.round(value * factor) / factor;
}

/** Empty fitsVehicleModels: any vehicle (the checks decide). Needs the collection loaded. */
export function isMadeFor(product: Product, vehicleId: string): boolean {
  const fits = product.fitsVehicleModels.getItems();
  return fits.length === 0 || fits.some((vehicle) => vehicle.id === vehicleId);
}

export function vehicleName(vehicle: VehicleModel): string {
  return `${vehicle.make} ${vehicle.model} ${vehicle.variant}`;
}

const VERDICT_OPENINGS: Record<Exclude<FitVerdict, 'ok'>, string> = {
  'does-not-fit': 'Does not fit',
  'needs-certification': "Needs an engineer's certificate",
  advisory: 'Fits, with advice',
};

/** One line for a list: the verdict and the message of the first check that decided it. */
export function summaryOf(report: FitReport): string {
  if (report.verdict === 'ok') return 'Fits on the stock set-up.';
  const deciding = report.checks.find((check) => check.verdict === report.verdict);
  return `${VERDICT_OPENINGS[report.verdict]}: ${deciding?.message ?? ''}`.trim();
}

/** The engine's input for a package of loaded products (at most one wheel, tyre and kit). */
export function fitmentInputOf(
  vehicle: VehicleModel,
  products: Product[],
  kitOtherRatings: Product[],
  constantLoadKg?: number,
): FitmentInput {
  const kit = products.find((product) => product.kind === 'suspension-kit');
  const wheel = products.find((product) => product.kind === 'wheel');
  const tyre = products.find((product) => product.kind === 'tyre');
  return {
    vehicle: vehicleSpecOf(vehicle),
    ...(wheel ? { wheel: wheelSpecOf(wheel) } : {}),
    ...(tyre ? { tyre: tyreSpecOf(tyre) } : {}),
    ...(kit ? { suspensionKit: suspensionKitSpecOf(kit, kitOtherRatings) } : {}),
    components: products
      .map((product) => componentSpecOf(product))
      .filter((component) => component !== null),
    ...(constantLoadKg !== undefined ? { usage: { constantLoadKg } } : {}),
  };
}

@Injectable()
export class FitReportsService {
  constructor(
    private readonly em: EntityManager,
    private readonly ruleSets: RuleSetsService,
  ) {}

  tyreSize(designation: string): TyreSizeResponse {
    const parsed = parseTyreDesignation(designation);
    if (!parsed.ok) {
      throw new FieldErrorsException(
        { designation: [parsed.error.message] },
        `The ${PART_NAMES[parsed.error.part]} of the tyre size is not right`,
      );
    }
    const geometry = tyreGeometry(parsed.size);
    return {
      designation: formatTyreDesignation(parsed.size),
      size: { ...parsed.size },
      geometry: {
        sectionWidthMm: round(geometry.sectionWidthMm, 1),
        sidewallHeightMm: round(geometry.sidewallHeightMm, 1),
        rimDiameterMm: round(geometry.rimDiameterMm, 1),
        overallDiameterMm: round(geometry.overallDiameterMm, 1),
        overallDiameterIn: round(mmToInches(geometry.overallDiameterMm), 2),
        circumferenceMm: round(geometry.circumferenceMm, 1),
        revolutionsPerKm: round(geometry.revolutionsPerKm, 1),
        aspectRatioPercent: round(geometry.aspectRatioPercent, 1),
      },
    };
  }

  async check(dto: CheckFitmentDto): Promise<FitReportResponse> {
    const errors: FieldErrors = {};
    const vehicle = await this.em.findOne(VehicleModel, { id: dto.vehicleModelId });
    if (!vehicle) errors.vehicleModelId = ['no vehicle model has this id'];

    const productIds = [...new Set(dto.productIds)];
    const products = await this.em.find(
      Product,
      { id: { $in: productIds } },
      { populate: ['fitsVehicleModels'] },
    );
    const productErrors: string[] = [];
    const unknownIds = productIds.filter((id) => !products.some((product) => product.id === id));
    if (unknownIds.length > 0) productErrors.push(`no product has the id ${unknownIds.join(', ')}`);
    for (const part of SINGLE_PARTS) {
      const count = products.filter((product) => product.kind === part.kind).length;
      if (count > 1) productErrors.push(`a package holds one ${part.name}, not ${count}`);
    }
    if (vehicle) {
      for (const product of products.filter((candidate) => !isMadeFor(candidate, vehicle.id))) {
        productErrors.push(
          `${product.name} (${product.sku}) is not made for the ${vehicleName(vehicle)}`,
        );
      }
    }
    if (productErrors.length > 0) errors.productIds = productErrors;

    const ruleSet = await this.ruleSets.engineRuleSet(dto.ruleSetId);
    if (!ruleSet) errors.ruleSetId = ['no rule set has this id'];
    if (Object.keys(errors).length > 0 || !vehicle || !ruleSet) {
      throw new FieldErrorsException(errors);
    }

    return FitReportResponse.from(
      await this.reportFor(vehicle, products, ruleSet, dto.constantLoadKg),
    );
  }

  /**
   * The fit report of products already loaded (at most one wheel, tyre and kit; checked by the
   * caller). The kit's other spring ratings are looked up in the catalogue (one query).
   */
  async reportFor(
    vehicle: VehicleModel,
    products: Product[],
    ruleSet: RuleSetLimits,
    constantLoadKg?: number,
  ): Promise<FitReport> {
    const kit = products.find((product) => product.kind === 'suspension-kit');
    const otherRatings = kit ? await this.otherRatingsOf(kit, vehicle) : [];
    return checkFitment(fitmentInputOf(vehicle, products, otherRatings, constantLoadKg), ruleSet);
  }

  /**
   * As `reportFor`, without a query: the kit's other spring ratings are found in
   * `catalogueKits` (active kits with fitsVehicleModels loaded). For callers that check many
   * packages (the planner) or must stay within a few queries (the quote preview).
   */
  reportWith(
    vehicle: VehicleModel,
    products: Product[],
    ruleSet: RuleSetLimits,
    catalogueKits: Product[],
    constantLoadKg?: number,
  ): FitReport {
    const kit = products.find((product) => product.kind === 'suspension-kit');
    const otherRatings = kit
      ? catalogueKits.filter(
          (candidate) => isOtherRatingOf(kit, candidate) && isMadeFor(candidate, vehicle.id),
        )
      : [];
    return checkFitment(fitmentInputOf(vehicle, products, otherRatings, constantLoadKg), ruleSet);
  }

  /**
   * Each product checked alone on the vehicle's stock set-up (a wheel with the stock tyre, a
   * tyre on the stock wheel, a kit on its own, a component or service added to the stock
   * vehicle). `products` must have fitsVehicleModels loaded; `catalogue` is where other spring
   * ratings of a kit are looked for.
   */
  productFits(
    vehicle: VehicleModel,
    products: Product[],
    catalogue: Product[],
    ruleSet: RuleSetLimits,
    constantLoadKg?: number,
  ): Map<string, ProductFit> {
    const vehicleSpec = vehicleSpecOf(vehicle);
    const usage = constantLoadKg !== undefined ? { usage: { constantLoadKg } } : {};
    const fits = new Map<string, ProductFit>();
    for (const product of products) {
      const input: FitmentInput = { vehicle: vehicleSpec, ...usage };
      if (product.kind === 'wheel') input.wheel = wheelSpecOf(product);
      else if (product.kind === 'tyre') input.tyre = tyreSpecOf(product);
      else if (product.kind === 'suspension-kit') {
        const otherRatings = catalogue.filter(
          (candidate) => isOtherRatingOf(product, candidate) && isMadeFor(candidate, vehicle.id),
        );
        input.suspensionKit = suspensionKitSpecOf(product, otherRatings);
      } else {
        const component = componentSpecOf(product);
        input.components = component ? [component] : [];
      }
      const report = checkFitment(input, ruleSet);
      fits.set(product.id, { verdict: report.verdict, summary: summaryOf(report) });
    }
    return fits;
  }

  /** The engine's rule set: the one named, or the default; null for an unknown id. */
  engineRuleSet(id?: string): Promise<RuleSetLimits | null> {
    return this.ruleSets.engineRuleSet(id);
  }

  /**
   * The kit's other spring ratings made for the vehicle: the active kits of the same brand and
   * lifts (one query; the vehicle links are loaded as ids only).
   */
  async otherRatingsOf(kit: Product, vehicle: VehicleModel): Promise<Product[]> {
    const candidates = await this.em.find(
      Product,
      { kind: 'suspension-kit', brand: kit.brand, active: true, id: { $ne: kit.id } },
      { populate: ['fitsVehicleModels:ref'] },
    );
    return candidates.filter(
      (candidate) => isOtherRatingOf(kit, candidate) && isMadeFor(candidate, vehicle.id),
    );
  }
}

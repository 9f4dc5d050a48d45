import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable, InternalServerErrorException } from '@nestjs/common';
import { Product } from '../catalogue/entities/product.entity';
import type { ProductKind } from '../catalogue/product-kinds';
import { FieldErrorsException, type FieldErrors } from '../common/errors/field-errors.exception';
import { CustomerVehicle } from '../customer-vehicles/entities/customer-vehicle.entity';
import { FitReportsService, isMadeFor, vehicleName } from '../fit-reports/fit-reports.service';
import { attributesOf } from '../fit-reports/fitment-input.mapper';
import type { FitReport } from '../fitment/fitment.types';
import { formatCents } from '../pricing/cents';
import { pricePackage, workshopDiscountLimitCents } from '../pricing/price-package';
import { validatePricingInput } from '../pricing/pricing-input';
import type { PackageLine, PackagePrice, PricingInput } from '../pricing/pricing.types';
import { quoteValidUntilDate } from '../pricing/quote-validity';
import type { User } from '../users/entities/user.entity';
import { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import { type WorkshopSettings, settingsOf } from '../workshop/workshop.service';
import { CatalogueSnapshotService } from './catalogue-snapshot.service';
import { PackageDataLoader } from './package-data.loader';
import { endOfLocalDay, localDateOf } from '../workshop/workshop-time';

/** Main parts a package holds at most one of. */
export const SINGLE_KINDS: ReadonlyArray<{ kind: ProductKind; name: string }> = [
  { kind: 'wheel', name: 'wheel' },
  { kind: 'tyre', name: 'tyre' },
  { kind: 'suspension-kit', name: 'suspension kit' },
];

export function isSingleKind(kind: ProductKind): boolean {
  return SINGLE_KINDS.some((single) => single.kind === kind);
}

/** Services the policy charges itself (per wheel fitted, per tyre replaced): never package lines. */
export function isPolicyChargedService(product: Product): boolean {
  if (product.kind !== 'service') return false;
  const role = attributesOf(product, 'service').role;
  return role === 'fitting-balancing' || role === 'tyre-disposal';
}

/** One line of the request: a product id and a quantity (and, on a revision, its labour). */
export interface PackageItem {
  productId: string;
  quantity: number;
  /** The desk's labour minutes per unit on a revised quote, instead of the catalogue's. */
  labourMinutes?: number;
}

export interface SelectedItem {
  product: Product;
  quantity: number;
  labourMinutes?: number;
}

/**
 * Checks the items against the loaded products: each known, switched on, made for the vehicle,
 * listed once, not a policy-charged service; at most one wheel, tyre and kit. Field errors are
 * keyed `items[2].productId` (or `items` for the package as a whole).
 */
export function selectionErrors(
  vehicle: VehicleModel | null,
  items: readonly PackageItem[],
  products: ReadonlyMap<string, Product>,
): { errors: FieldErrors; selected: SelectedItem[] } {
  const errors: FieldErrors = {};
  const add = (key: string, message: string) => (errors[key] ??= []).push(message);
  const selected: SelectedItem[] = [];
  const firstIndex = new Map<string, number>();
  items.forEach((item, index) => {
    const key = `items[${index}].productId`;
    const earlier = firstIndex.get(item.productId);
    if (earlier !== undefined) {
      add(key, `is already in the package (items[${earlier}]): list each product once`);
      return;
    }
    firstIndex.set(item.productId, index);
    const product = products.get(item.productId);
    if (!product) {
      add(key, 'no product has this id');
      return;
    }
    if (!product.active) {
      add(key, `${product.name} (${product.sku}) is not sold any more`);
      return;
    }
    if (isPolicyChargedService(product)) {
      add(
        key,
        `${product.name} (${product.sku}) is charged by the workshop for every wheel fitted or tyre replaced: leave it out of the package`,
      );
      return;
    }
    if (vehicle && !isMadeFor(product, vehicle.id)) {
      add(key, `${product.name} (${product.sku}) is not made for the ${vehicleName(vehicle)}`);
      return;
    }
    selected.push({
      product,
      quantity: item.quantity,
      ...(item.labourMinutes !== undefined ? { labourMinutes: item.labourMinutes } : {}),
    });
  });
  for (const single of SINGLE_KINDS) {
    const count = selected.filter((entry) => entry.product.kind === single.kind).length;
    if (count > 1) add('items', `a package holds one ${single.name}, not ${count}`);
  }
  return { errors, selected };
}

/**
 * The pricing engine's line for a product at today's catalogue values; a revision may give the
 * labour minutes per unit instead of the catalogue's.
 */
export function packageLineOf(
  product: Product,
  quantity: number,
  labourMinutes: number = product.labourMinutes,
): PackageLine {
  const isService = product.kind === 'service';
  return {
    productId: product.id,
    sku: product.sku,
    // Parts carry their maker's brand; services are the workshop's own.
    name: isService ? product.name : `${product.brand} ${product.name}`,
    kind: product.kind,
    quantity,
    unitPriceCents: product.priceCents,
    labourMinutes,
    bayKind: product.bayKind,
    leadDays: product.leadDays,
    stockQty: product.stockQty,
    ...(isService ? { perWheel: attributesOf(product, 'service').perWheel } : {}),
  };
}

/** Wheels fitted: the larger of the wheel and tyre quantities; tyres replaced: the tyre quantity. */
export function wheelAndTyreCounts(selected: readonly SelectedItem[]): {
  wheelsFitted: number;
  tyresReplaced: number;
} {
  const quantityOf = (kind: ProductKind) =>
    selected.find((entry) => entry.product.kind === kind)?.quantity ?? 0;
  return {
    wheelsFitted: Math.max(quantityOf('wheel'), quantityOf('tyre')),
    tyresReplaced: quantityOf('tyre'),
  };
}

/** Who may name a customer vehicle in the package. */
export type VehicleOwnerRule =
  | { kind: 'owner'; owner: User; ownerIsCaller: boolean }
  | { kind: 'anonymous' }
  /** Staff previewing: the vehicle must exist and be of the model; its owner is checked on save. */
  | { kind: 'staff' };

export interface PackageRequest {
  vehicleModelId: string;
  customerVehicleId?: string;
  vehicleYear?: number;
  constantLoadKg?: number;
  items: readonly PackageItem[];
  /** A revision's workshop discount, whole cents. */
  discountCents?: number;
}

/** A checked, priced and fit-checked package, ready to preview or to save as a version. */
export interface PricedPackage {
  vehicle: VehicleModel;
  customerVehicle: CustomerVehicle | null;
  selected: SelectedItem[];
  lines: PackageLine[];
  wheelsFitted: number;
  tyresReplaced: number;
  constantLoadKg: number;
  fitReport: FitReport;
  price: PackagePrice;
  settings: WorkshopSettings;
  issuedOn: string;
  validUntilDate: string;
  validUntil: Date;
}

/**
 * Turns a package request into the priced package: the catalogue values now, the workshop's
 * policy now, the default rule set. One query whatever the size (PackageDataLoader: vehicle,
 * customer vehicle, the items with their vehicle links, the kits' other spring ratings, rule set,
 * workshop); nothing is written.
 */
@Injectable()
export class QuotePackagesService {
  constructor(
    private readonly em: EntityManager,
    private readonly fitReports: FitReportsService,
    private readonly data: PackageDataLoader,
    private readonly snapshots: CatalogueSnapshotService,
  ) {}

  async price(
    request: PackageRequest,
    ownerRule: VehicleOwnerRule,
    now = new Date(),
  ): Promise<PricedPackage> {
    const ids = [...new Set(request.items.map((item) => item.productId))];
    // Saving reads inside its transaction; a preview uses the revision-checked snapshot.
    const data = this.em.isInTransaction()
      ? await this.data.load(request.vehicleModelId, ids, request.customerVehicleId)
      : await this.snapshots.packageData(request.vehicleModelId, ids, request.customerVehicleId);
    const { vehicle, customerVehicle, ruleSet } = data;
    const loaded = data.products;
    const settings = settingsOf(data.workshop);

    const errors: FieldErrors = {};
    if (!vehicle) errors.vehicleModelId = ['no vehicle model has this id'];
    if (request.customerVehicleId) {
      const problem = customerVehicleProblem(customerVehicle, vehicle, ownerRule);
      if (problem) errors.customerVehicleId = [problem];
    }
    if (vehicle && request.vehicleYear !== undefined) {
      if (request.vehicleYear < vehicle.yearFrom || request.vehicleYear > vehicle.yearTo) {
        errors.vehicleYear = [
          `must be from ${vehicle.yearFrom} to ${vehicle.yearTo} for the ${vehicleName(vehicle)}`,
        ];
      }
    }
    const products = new Map(loaded.map((product) => [product.id, product]));
    const selection = selectionErrors(vehicle, request.items, products);
    Object.assign(errors, selection.errors);
    if (Object.keys(errors).length > 0 || !vehicle) {
      throw new FieldErrorsException(errors, 'The package cannot be priced');
    }

    const { selected } = selection;
    const lines = selected.map((entry) =>
      packageLineOf(entry.product, entry.quantity, entry.labourMinutes),
    );
    const { wheelsFitted, tyresReplaced } = wheelAndTyreCounts(selected);
    const constantLoadKg = request.constantLoadKg ?? 0;
    // With a kit, one more query finds its other spring ratings (the report may suggest one).
    const fitReport = this.fitReports.reportWith(
      vehicle,
      selected.map((entry) => entry.product),
      ruleSet,
      data.brandKits,
      constantLoadKg,
    );

    const input: PricingInput = {
      lines,
      wheelsFitted,
      tyresReplaced,
      policy: settings.pricingPolicy,
      ...(request.discountCents ? { workshopDiscountCents: request.discountCents } : {}),
    };
    const issues = validatePricingInput(input);
    if (issues.length > 0) {
      // Catalogue values are validated on every write, so this is the stored policy's fault.
      const lineIssues: FieldErrors = {};
      for (const issue of issues) {
        const match = /^lines\[(\d+)\]/.exec(issue.field);
        if (!match) {
          throw new InternalServerErrorException(
            `The stored pricing policy cannot be used: ${issue.field} ${issue.message}`,
          );
        }
        (lineIssues[`items[${match[1]}].productId`] ??= []).push(
          `cannot be priced: ${issue.field.replace(/^lines\[\d+\]\./, '')} ${issue.message}`,
        );
      }
      throw new FieldErrorsException(lineIssues, 'The package cannot be priced');
    }
    if (input.workshopDiscountCents !== undefined) {
      const limit = workshopDiscountLimitCents(input);
      if (input.workshopDiscountCents > limit) {
        throw new FieldErrorsException(
          {
            discountCents: [
              `must not be more than ${formatCents(limit)}, the package before the discount`,
            ],
          },
          'The package cannot be priced',
        );
      }
    }
    const price = pricePackage(input);

    const issuedOn = localDateOf(now, settings.timeZone);
    const validUntilDate = quoteValidUntilDate(issuedOn, settings.pricingPolicy.quoteValidDays);
    return {
      vehicle,
      customerVehicle: request.customerVehicleId ? customerVehicle : null,
      selected,
      lines,
      wheelsFitted,
      tyresReplaced,
      constantLoadKg,
      fitReport,
      price,
      settings,
      issuedOn,
      validUntilDate,
      validUntil: endOfLocalDay(validUntilDate, settings.timeZone),
    };
  }
}

function customerVehicleProblem(
  customerVehicle: CustomerVehicle | null,
  vehicle: VehicleModel | null,
  rule: VehicleOwnerRule,
): string | null {
  if (rule.kind === 'anonymous') return 'sign in to choose one of your vehicles';
  const notFound =
    rule.kind === 'owner' && !rule.ownerIsCaller
      ? 'the customer has no vehicle with this id'
      : 'you have no vehicle with this id';
  if (!customerVehicle) return notFound;
  if (rule.kind === 'owner' && customerVehicle.owner.id !== rule.owner.id) return notFound;
  if (vehicle && customerVehicle.vehicleModel.id !== vehicle.id) {
    return `is not a ${vehicleName(vehicle)}: choose the vehicle model it is`;
  }
  return null;
}

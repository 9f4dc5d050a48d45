/**
 * From stored records to the fit engine's input types. The engine stays pure; this is the one
 * place that knows how vehicle models and products are stored.
 */
import type { Product } from '../catalogue/entities/product.entity';
import type { ProductAttributesByKind } from '../catalogue/product-attributes';
import type { ProductKind } from '../catalogue/product-kinds';
import type {
  AdditionRole,
  BoltPattern,
  ComponentSpec,
  SuspensionKitSpec,
  TyreSpec,
  VehicleSpec,
  WheelSpec,
} from '../fitment/fitment.types';
import { isSpeedSymbol } from '../fitment/speed-symbols';
import type { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import { BOLT_PATTERN_PATTERN } from '../vehicles/vehicle-kinds';

/** "6x139.7" → { studCount: 6, pcdMm: 139.7 }. Stored patterns are validated on write. */
export function parseBoltPattern(text: string): BoltPattern {
  const match = BOLT_PATTERN_PATTERN.exec(text);
  if (!match) throw new Error(`Stored bolt pattern "${text}" is not readable`);
  return { studCount: Number(match[1]), pcdMm: Number(match[2]) };
}

export function vehicleSpecOf(vehicle: VehicleModel): VehicleSpec {
  if (!isSpeedSymbol(vehicle.placardSpeedSymbol)) {
    throw new Error(`Stored speed symbol "${vehicle.placardSpeedSymbol}" is not readable`);
  }
  return {
    make: vehicle.make,
    model: vehicle.model,
    variant: vehicle.variant,
    frontSuspension: vehicle.frontSuspension,
    rearSuspension: vehicle.rearSuspension,
    boltPattern: parseBoltPattern(vehicle.boltPattern),
    studThread: vehicle.studThread,
    centreBoreMm: vehicle.centreBoreMm,
    stockTyre: vehicle.stockTyre,
    ...(vehicle.largestSpecifiedTyre ? { largestSpecifiedTyre: vehicle.largestSpecifiedTyre } : {}),
    stockWheel: {
      diameterIn: vehicle.stockWheel.diameterIn,
      widthIn: vehicle.stockWheel.widthIn,
      offsetMm: vehicle.stockWheel.offsetMm,
    },
    gvmKg: vehicle.gvmKg,
    frontAxleKg: vehicle.frontAxleKg,
    rearAxleKg: vehicle.rearAxleKg,
    kerbMassKg: vehicle.kerbMassKg,
    placardLoadIndex: vehicle.placardLoadIndex,
    placardSpeedSymbol: vehicle.placardSpeedSymbol,
    ...(vehicle.frontHalfShaftLengthMm !== null
      ? { frontHalfShaftLengthMm: vehicle.frontHalfShaftLengthMm }
      : {}),
    offRoadCategory: vehicle.offRoadCategory,
    ...(vehicle.topSpeedKmh !== null ? { topSpeedKmh: vehicle.topSpeedKmh } : {}),
  };
}

/** A product's attributes, typed by its kind (they are validated per kind on every write). */
export function attributesOf<K extends ProductKind>(
  product: Product,
  kind: K,
): ProductAttributesByKind[K] {
  if (product.kind !== kind) {
    throw new Error(`Product ${product.sku} is a ${product.kind}, not a ${kind}`);
  }
  return product.attributes as ProductAttributesByKind[K];
}

export function wheelSpecOf(product: Product): WheelSpec {
  const wheel = attributesOf(product, 'wheel');
  return {
    id: product.id,
    diameterIn: wheel.diameterIn,
    widthIn: wheel.widthIn,
    offsetMm: wheel.offsetMm,
    boltPattern: parseBoltPattern(wheel.boltPattern),
    centreBoreMm: wheel.centreBoreMm,
    studThread: wheel.studThread,
    loadRatingKg: wheel.loadRatingKg,
  };
}

export function tyreSpecOf(product: Product): TyreSpec {
  const tyre = attributesOf(product, 'tyre');
  return {
    id: product.id,
    designation: tyre.designation,
    ...(tyre.approvedRimWidthMinIn !== undefined && tyre.approvedRimWidthMaxIn !== undefined
      ? {
          approvedRimWidthMinIn: tyre.approvedRimWidthMinIn,
          approvedRimWidthMaxIn: tyre.approvedRimWidthMaxIn,
        }
      : {}),
  };
}

/**
 * The kit, with the other spring ratings of the same kit as variants: the catalogue holds each
 * rating as its own product, so `otherRatings` are the active kits of the same brand and lift.
 */
export function suspensionKitSpecOf(product: Product, otherRatings: Product[]): SuspensionKitSpec {
  const kit = attributesOf(product, 'suspension-kit');
  return {
    id: product.id,
    name: product.name,
    frontLiftMm: kit.frontLiftMm,
    rearLiftMm: kit.rearLiftMm,
    constantLoadMinKg: kit.constantLoadMinKg,
    constantLoadMaxKg: kit.constantLoadMaxKg,
    keepsTwoThirdsTravel: kit.keepsTwoThirdsTravel,
    includesGreasableShackles: kit.includesGreasableShackles,
    includesExtendedBrakeLines: kit.includesExtendedBrakeLines,
    variants: otherRatings
      .filter((other) => other.id !== product.id)
      .map((other) => {
        const rating = attributesOf(other, 'suspension-kit');
        return {
          id: other.id,
          name: other.name,
          constantLoadMinKg: rating.constantLoadMinKg,
          constantLoadMaxKg: rating.constantLoadMaxKg,
        };
      })
      .sort((a, b) => a.constantLoadMinKg - b.constantLoadMinKg),
  };
}

/** Same brand and lifts: another spring rating of the same kit. */
export function isOtherRatingOf(kit: Product, candidate: Product): boolean {
  if (candidate.kind !== 'suspension-kit' || candidate.id === kit.id || !candidate.active) {
    return false;
  }
  const a = attributesOf(kit, 'suspension-kit');
  const b = attributesOf(candidate, 'suspension-kit');
  return (
    candidate.brand === kit.brand &&
    a.frontLiftMm === b.frontLiftMm &&
    a.rearLiftMm === b.rearLiftMm
  );
}

/** Services that stand for an engine role; fitting-balancing and tyre disposal have none. */
const SERVICE_ENGINE_ROLES: Partial<Record<string, AdditionRole>> = {
  alignment: 'alignment',
  'headlight-re-aim': 'headlight-re-aim',
  'speedometer-recalibration': 'speedometer-recalibration',
};

/** A component or service as the engine sees it; null when it plays no part in the report. */
export function componentSpecOf(product: Product): ComponentSpec | null {
  if (product.kind === 'component') {
    const component = attributesOf(product, 'component');
    return {
      id: product.id,
      role: component.role,
      name: product.name,
      ...(component.diffDropMm !== undefined ? { diffDropMm: component.diffDropMm } : {}),
      ...(component.ringOuterMm !== undefined ? { ringOuterMm: component.ringOuterMm } : {}),
      ...(component.ringInnerMm !== undefined ? { ringInnerMm: component.ringInnerMm } : {}),
      ...(component.massKg !== undefined ? { massKg: component.massKg } : {}),
    };
  }
  if (product.kind === 'service') {
    const role = SERVICE_ENGINE_ROLES[attributesOf(product, 'service').role];
    return role ? { id: product.id, role, name: product.name } : null;
  }
  return null;
}

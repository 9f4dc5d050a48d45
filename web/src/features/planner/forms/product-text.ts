import { formatOneDecimal, formatSignedPercent, formatWholeNumber } from '@/lib/format';
import type {
  ComponentAttributes,
  PlannerOptionMetrics,
  Product,
  ServiceAttributes,
  SuspensionKitAttributes,
  TreadType,
  TyreAttributes,
  WheelAttributes,
} from '@/types/api';

/** Product attributes by kind (the API validates them per kind). */
export function kitAttributes(product: Product): SuspensionKitAttributes | null {
  return product.kind === 'suspension-kit' ? (product.attributes as SuspensionKitAttributes) : null;
}

export function wheelAttributes(product: Product): WheelAttributes | null {
  return product.kind === 'wheel' ? (product.attributes as WheelAttributes) : null;
}

export function tyreAttributes(product: Product): TyreAttributes | null {
  return product.kind === 'tyre' ? (product.attributes as TyreAttributes) : null;
}

export function componentAttributes(product: Product): ComponentAttributes | null {
  return product.kind === 'component' ? (product.attributes as ComponentAttributes) : null;
}

export function serviceAttributes(product: Product): ServiceAttributes | null {
  return product.kind === 'service' ? (product.attributes as ServiceAttributes) : null;
}

const treadWords: Record<TreadType, string> = {
  highway: 'highway tread',
  'all-terrain': 'all-terrain tread',
  'mud-terrain': 'mud-terrain tread',
};

export function kitSpecText(product: Product): string {
  const kit = kitAttributes(product);
  if (!kit) return '';
  const lift =
    kit.frontLiftMm === kit.rearLiftMm
      ? `${kit.frontLiftMm} mm lift front and rear`
      : `${kit.frontLiftMm} mm lift front, ${kit.rearLiftMm} mm rear`;
  return `${lift}; for a constant load of ${formatWholeNumber(kit.constantLoadMinKg)}–${formatWholeNumber(kit.constantLoadMaxKg)} kg`;
}

export function wheelSpecText(product: Product): string {
  const wheel = wheelAttributes(product);
  if (!wheel) return '';
  return `${wheel.diameterIn} × ${wheel.widthIn} in, offset ${wheel.offsetMm} mm, ${wheel.boltPattern}, rated ${formatWholeNumber(wheel.loadRatingKg)} kg`;
}

export function tyreSpecText(product: Product): string {
  const tyre = tyreAttributes(product);
  if (!tyre) return '';
  return `${tyre.designation}, ${treadWords[tyre.treadType]}`;
}

/** What a wheel or tyre does to the vehicle, in one line. */
export function metricsText(metrics: PlannerOptionMetrics): string {
  const parts: string[] = [];
  if (metrics.newDiameterMm !== null) {
    const change =
      metrics.diameterChangePercent !== null
        ? ` (${formatSignedPercent(metrics.diameterChangePercent)})`
        : '';
    parts.push(`${formatOneDecimal(metrics.newDiameterMm)} mm tall${change}`);
  }
  if (metrics.speedometerAtTrue100Kmh !== null) {
    parts.push(
      `speedo reads ${formatOneDecimal(metrics.speedometerAtTrue100Kmh)} at a true 100 km/h`,
    );
  }
  parts.push(`combined lift ${formatOneDecimal(metrics.combinedLiftMm)} mm`);
  return parts.join('; ');
}

/** What a wheel does on its own: the track change its offset and width make. */
export function wheelMetricsText(metrics: PlannerOptionMetrics): string {
  const track =
    metrics.trackChangeMm === 0
      ? 'the wheel track stays as it is'
      : `the wheel track ${metrics.trackChangeMm > 0 ? 'widens' : 'narrows'} by ${formatOneDecimal(Math.abs(metrics.trackChangeMm))} mm`;
  return `With it, ${track}`;
}

/**
 * Whether the workshop has the product on the shelf, for the front desk choosing parts: "In
 * stock (4)", or how long ordering it in takes. Services are not stocked: null.
 */
export function availabilityText(
  product: Pick<Product, 'kind' | 'stockQty' | 'leadDays'>,
): string | null {
  if (product.kind === 'service') return null;
  if (product.stockQty > 0) return `In stock (${formatWholeNumber(product.stockQty)})`;
  if (product.leadDays > 0) {
    return `Out of stock: ordered in, about ${product.leadDays} ${product.leadDays === 1 ? 'day' : 'days'}`;
  }
  return 'Out of stock';
}

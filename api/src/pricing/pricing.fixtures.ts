/**
 * Fictional policy, products and fast-check arbitraries for the pricing specs. The workshop,
 * brands and SKUs are invented; the policy numbers are invented too (a workshop sets its own).
 */
import fc from 'fast-check';
import type { PackageLine, PricingInput, PricingPolicy, PricingProductKind } from './pricing.types';
import { PRICING_BAY_KINDS, PRICING_PRODUCT_KINDS, TAX_ROUNDING_METHODS } from './pricing.types';

/** An invented GST-inclusive policy: $140/h, 20 % deposit ($100–$1,000), 50 % for special orders. */
export const demoPolicy: PricingPolicy = {
  labourRateCentsPerHour: 14000,
  pricesIncludeTax: true,
  taxRatePercent: 10,
  taxRoundingMethod: 'per-invoice',
  fittingBalancingCentsPerWheel: 3500,
  tyreDisposalCentsPerTyre: 650,
  bundleDiscount: {
    enabled: true,
    percent: 5,
    requiresKinds: ['suspension-kit', 'wheel', 'tyre'],
  },
  deposit: { percent: 20, floorCents: 10000, capCents: 100000, specialOrderPercent: 50 },
  quoteValidDays: 30,
};

export function policyWith(overrides: Partial<PricingPolicy>): PricingPolicy {
  return { ...demoPolicy, ...overrides };
}

type LineFields = Partial<PackageLine> & Pick<PackageLine, 'sku' | 'kind' | 'unitPriceCents'>;

export function packageLine(fields: LineFields): PackageLine {
  return {
    productId: `product-${fields.sku.toLowerCase()}`,
    name: fields.sku,
    quantity: 1,
    labourMinutes: 0,
    bayKind: null,
    leadDays: 0,
    stockQty: 10,
    ...fields,
  };
}

export const suspensionKitLine = packageLine({
  sku: 'BR-STR-50-M',
  name: 'Bramblerock Strata 50 mm kit, medium load',
  kind: 'suspension-kit',
  unitPriceCents: 174500,
  labourMinutes: 270,
  bayKind: 'hoist',
  stockQty: 2,
});

export const wheelLine = packageLine({
  sku: 'IW-STK-1780-P20',
  name: 'Ironwattle Stockman 17x8 ET+20',
  kind: 'wheel',
  quantity: 5,
  unitPriceCents: 32900,
  stockQty: 8,
});

export const tyreLine = packageLine({
  sku: 'QD-TRK-2857017',
  name: 'Quendra Trekline 285/70R17 121/118Q',
  kind: 'tyre',
  quantity: 5,
  unitPriceCents: 38900,
  stockQty: 12,
});

/** 95 minutes of labour: 95 × $140 / 60 = $221.666…, a labour line that must round. */
export const diffDropLine = packageLine({
  sku: 'DW-DD-25',
  name: 'Diffwell 25 mm diff drop',
  kind: 'component',
  unitPriceCents: 29900,
  labourMinutes: 95,
  bayKind: 'hoist',
  stockQty: 1,
});

export const alignmentLine = packageLine({
  sku: 'KW-SVC-ALIGN',
  name: 'Wheel alignment (camber, caster and toe)',
  kind: 'service',
  unitPriceCents: 14900,
  labourMinutes: 60,
  bayKind: 'alignment',
  stockQty: 0,
});

/** The worked example of docs/pricing.md: kit, five wheels, five tyres, diff drop, alignment. */
export const demoPackage: PricingInput = {
  lines: [suspensionKitLine, wheelLine, tyreLine, diffDropLine, alignmentLine],
  wheelsFitted: 5,
  tyresReplaced: 5,
  policy: demoPolicy,
};

// ---- fast-check arbitraries -------------------------------------------------------------

/** A percentage with at most two decimals, 0–100. */
export const percentArb = fc
  .integer({ min: 0, max: 10_000 })
  .map((basisPoints) => basisPoints / 100);

const kindArb = fc.constantFrom<PricingProductKind>(...PRICING_PRODUCT_KINDS);

export const packageLineArb: fc.Arbitrary<PackageLine> = fc
  .record({
    index: fc.integer({ min: 0, max: 9999 }),
    kind: kindArb,
    quantity: fc.integer({ min: 1, max: 12 }),
    // Mostly shop-sized prices, sometimes tiny ones (where rounding dominates) or large ones.
    unitPriceCents: fc.oneof(
      fc.integer({ min: 0, max: 500_000 }),
      fc.integer({ min: 0, max: 20 }),
      fc.integer({ min: 0, max: 1_000_000_000 }),
    ),
    labourMinutes: fc.integer({ min: 0, max: 600 }),
    bayKind: fc.constantFrom(null, ...PRICING_BAY_KINDS),
    leadDays: fc.integer({ min: 0, max: 30 }),
    stockQty: fc.integer({ min: 0, max: 20 }),
    perWheel: fc.boolean(),
  })
  .map(({ index, perWheel, ...fields }) => ({
    productId: `product-${index}`,
    sku: `SKU-${index}`,
    name: `Invented product ${index}`,
    ...fields,
    ...(fields.kind === 'service' ? { perWheel } : {}),
  }));

export const policyArb: fc.Arbitrary<PricingPolicy> = fc
  .record({
    labourRateCentsPerHour: fc.oneof(
      fc.integer({ min: 0, max: 40_000 }),
      fc.integer({ min: 0, max: 1_000_000 }),
    ),
    pricesIncludeTax: fc.boolean(),
    taxRatePercent: fc.oneof(fc.constant(10), percentArb),
    taxRoundingMethod: fc.constantFrom(undefined, ...TAX_ROUNDING_METHODS),
    fittingBalancingCentsPerWheel: fc.integer({ min: 0, max: 10_000 }),
    tyreDisposalCentsPerTyre: fc.integer({ min: 0, max: 2_000 }),
    bundleDiscount: fc.record({
      enabled: fc.boolean(),
      percent: percentArb,
      requiresKinds: fc.subarray([...PRICING_PRODUCT_KINDS], { minLength: 1 }),
    }),
    depositPercents: fc.tuple(percentArb, percentArb),
    depositBoundsCents: fc.tuple(
      fc.integer({ min: 0, max: 500_000 }),
      fc.integer({ min: 0, max: 500_000 }),
    ),
    quoteValidDays: fc.integer({ min: 1, max: 365 }),
  })
  .map(({ depositPercents, depositBoundsCents, taxRoundingMethod, ...policy }) => {
    const [percent, specialOrderPercent] = [...depositPercents].sort((a, b) => a - b);
    const [floorCents, capCents] = [...depositBoundsCents].sort((a, b) => a - b);
    return {
      ...policy,
      ...(taxRoundingMethod === undefined ? {} : { taxRoundingMethod }),
      deposit: { percent, specialOrderPercent, floorCents, capCents },
    };
  });

export const pricingInputArb: fc.Arbitrary<PricingInput> = fc.record(
  {
    lines: fc.array(packageLineArb, { maxLength: 12 }),
    wheelsFitted: fc.integer({ min: 0, max: 6 }),
    tyresReplaced: fc.integer({ min: 0, max: 6 }),
    policy: policyArb,
    // Small, large and beyond-the-package discounts (the engine applies at most the subtotal).
    workshopDiscountCents: fc.oneof(
      fc.integer({ min: 0, max: 5_000 }),
      fc.integer({ min: 0, max: 5_000_000 }),
    ),
  },
  { requiredKeys: ['lines', 'wheelsFitted', 'tyresReplaced', 'policy'] },
);

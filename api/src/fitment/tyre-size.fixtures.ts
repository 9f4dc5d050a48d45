/** fast-check generators of valid tyre sizes, shared by the property specs. */
import fc from 'fast-check';
import { SPEED_SYMBOLS_ASCENDING } from './speed-symbols';
import type { FlotationTyreSize, MetricTyreSize } from './tyre-designation';

const speedSymbolArb = fc.option(fc.constantFrom(...SPEED_SYMBOLS_ASCENDING), { nil: null });

const loadIndicesArb = fc
  .option(
    fc.integer({ min: 60, max: 150 }).chain((single) =>
      fc.record({
        loadIndexSingle: fc.constant(single),
        loadIndexDual:
          single > 60
            ? fc.option(fc.integer({ min: 60, max: single - 1 }), { nil: null })
            : fc.constant(null),
      }),
    ),
    { nil: null },
  )
  .map((indices) => indices ?? { loadIndexSingle: null, loadIndexDual: null });

export const metricSizeArb: fc.Arbitrary<MetricTyreSize> = fc
  .record({
    serviceType: fc.constantFrom('passenger', 'light-truck', 'commercial', 'unmarked' as const),
    sectionWidthMm: fc.integer({ min: 10, max: 45 }).map((tens) => tens * 10 + 5),
    aspectRatioPercent: fc.integer({ min: 4, max: 19 }).map((steps) => steps * 5),
    construction: fc.constantFrom('radial', 'diagonal' as const),
    zRated: fc.boolean(),
    rimDiameterIn: fc.integer({ min: 20, max: 60 }).map((halves) => halves / 2),
    loads: loadIndicesArb,
    speedSymbol: speedSymbolArb,
  })
  .map(({ zRated, loads, ...rest }) => ({
    kind: 'metric' as const,
    ...rest,
    zRatedMarking: zRated && rest.construction === 'radial',
    ...loads,
  }));

export const flotationSizeArb: fc.Arbitrary<FlotationTyreSize> = fc
  .record({
    overallDiameterIn: fc.integer({ min: 44, max: 120 }).map((halves) => halves / 2),
    sectionWidthIn: fc.integer({ min: 500, max: 2000 }).map((hundredths) => hundredths / 100),
    construction: fc.constantFrom('radial', 'diagonal' as const),
    rimDiameterIn: fc.integer({ min: 20, max: 42 }).map((halves) => halves / 2),
    lightTruck: fc.boolean(),
    loads: loadIndicesArb,
    speedSymbol: speedSymbolArb,
  })
  .map(({ loads, ...rest }) => ({ kind: 'flotation' as const, ...rest, ...loads }));

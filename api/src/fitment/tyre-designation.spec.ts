import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { flotationSizeArb, metricSizeArb } from './tyre-size.fixtures';
import {
  type FlotationTyreSize,
  type MetricTyreSize,
  type TyreDesignationPart,
  type TyreSize,
  formatTyreDesignation,
  isLightTruckConstruction,
  isPassengerMetric,
  parseTyreDesignation,
} from './tyre-designation';

function parsed(designation: string): TyreSize {
  const result = parseTyreDesignation(designation);
  if (!result.ok) throw new Error(`${designation}: ${result.error.part}: ${result.error.message}`);
  return result.size;
}

function errorPart(designation: string): TyreDesignationPart {
  const result = parseTyreDesignation(designation);
  if (result.ok) throw new Error(`${designation} parsed, expected an error`);
  expect(result.error.message.length).toBeGreaterThan(10);
  return result.error.part;
}

const metric = (overrides: Partial<MetricTyreSize>): MetricTyreSize => ({
  kind: 'metric',
  serviceType: 'unmarked',
  sectionWidthMm: 265,
  aspectRatioPercent: 70,
  construction: 'radial',
  zRatedMarking: false,
  rimDiameterIn: 17,
  loadIndexSingle: null,
  loadIndexDual: null,
  speedSymbol: null,
  ...overrides,
});

const flotation = (overrides: Partial<FlotationTyreSize>): FlotationTyreSize => ({
  kind: 'flotation',
  overallDiameterIn: 33,
  sectionWidthIn: 12.5,
  construction: 'radial',
  rimDiameterIn: 15,
  lightTruck: false,
  loadIndexSingle: null,
  loadIndexDual: null,
  speedSymbol: null,
  ...overrides,
});

// Source: ISO 4000-1 / ETRTO size designation and service description (REFERENCES.md, H):
// width/aspect, R radial, rim inches, load index (single/dual), speed symbol; P and LT prefixes.
describe('parseTyreDesignation: metric sizes', () => {
  it('reads a bare size', () => {
    expect(parsed('265/70R17')).toEqual(metric({}));
  });

  it('reads a size with a space before the construction and a service description', () => {
    expect(parsed('265/70 R17 115T')).toEqual(metric({ loadIndexSingle: 115, speedSymbol: 'T' }));
  });

  it('reads an LT size in lower case with a dual load index', () => {
    expect(parsed('lt285/75r16 126/123Q')).toEqual(
      metric({
        serviceType: 'light-truck',
        sectionWidthMm: 285,
        aspectRatioPercent: 75,
        rimDiameterIn: 16,
        loadIndexSingle: 126,
        loadIndexDual: 123,
        speedSymbol: 'Q',
      }),
    );
  });

  it('reads a P-metric size', () => {
    expect(parsed('P225/75R15 102S')).toEqual(
      metric({
        serviceType: 'passenger',
        sectionWidthMm: 225,
        aspectRatioPercent: 75,
        rimDiameterIn: 15,
        loadIndexSingle: 102,
        speedSymbol: 'S',
      }),
    );
  });

  it('tolerates ZR, extra spaces and a C (commercial) suffix', () => {
    expect(parsed('  245/40ZR18 97Y ')).toEqual(
      metric({
        sectionWidthMm: 245,
        aspectRatioPercent: 40,
        zRatedMarking: true,
        rimDiameterIn: 18,
        loadIndexSingle: 97,
        speedSymbol: 'Y',
      }),
    );
    expect(parsed('LT 285 / 75 R 16 126 / 123 Q')).toEqual(parsed('LT285/75R16 126/123Q'));
    expect(parsed('195/70R15C 104/102R')).toMatchObject({
      serviceType: 'commercial',
      loadIndexSingle: 104,
      loadIndexDual: 102,
      speedSymbol: 'R',
    });
    expect(parsed('205/80D16')).toMatchObject({ construction: 'diagonal' });
  });

  it('reads H as a speed symbol and a speed symbol without a load index', () => {
    expect(parsed('225/45R17 94H').speedSymbol).toBe('H');
    expect(parsed('265/70R17 T')).toEqual(metric({ speedSymbol: 'T' }));
  });
});

describe('parseTyreDesignation: flotation sizes', () => {
  it('reads 33x12.50R15LT 108Q', () => {
    expect(parsed('33x12.50R15LT 108Q')).toEqual(
      flotation({ lightTruck: true, loadIndexSingle: 108, speedSymbol: 'Q' }),
    );
  });

  it('reads an upper-case X and no LT suffix', () => {
    expect(parsed('35X12.50R17 121Q')).toEqual(
      flotation({
        overallDiameterIn: 35,
        rimDiameterIn: 17,
        loadIndexSingle: 121,
        speedSymbol: 'Q',
      }),
    );
  });

  it('reads a bare flotation size and the trade bias marking', () => {
    expect(parsed('31x10.50R15')).toEqual(
      flotation({ overallDiameterIn: 31, sectionWidthIn: 10.5 }),
    );
    expect(parsed('33x12.50-15LT')).toEqual(
      flotation({ construction: 'diagonal', lightTruck: true }),
    );
    expect(parsed('38.5 x 13.50 R 17 LT 126/123Q')).toMatchObject({
      overallDiameterIn: 38.5,
      sectionWidthIn: 13.5,
      loadIndexDual: 123,
    });
  });
});

describe('parseTyreDesignation: errors name the wrong part', () => {
  it('rejects the dash in a metric size as a construction error', () => {
    expect(errorPart('265/70-17')).toBe('construction');
  });

  it.each<[string, TyreDesignationPart]>([
    ['', 'format'],
    ['   ', 'format'],
    ['hello', 'format'],
    ['265 70R17', 'format'],
    ['265/70R17 115T XL', 'format'],
    ['265/75R16LT', 'format'],
    ['P33x12.50R15', 'format'],
    ['LT/70R17', 'width'],
    ['260/70R17', 'width'],
    ['26/70R17', 'width'],
    ['995/70R17', 'width'],
    ['265.5/70R17', 'width'],
    ['265/R17', 'aspect'],
    ['265/72R17', 'aspect'],
    ['265/700R17', 'aspect'],
    ['265/10R17', 'aspect'],
    ['265/70Z17', 'construction'],
    ['265/70 17', 'construction'],
    ['265/70R', 'rim'],
    ['265/70R8', 'rim'],
    ['265/70R17.3', 'rim'],
    ['265/70R17115T', 'rim'],
    ['265/70R17 300T', 'loadIndex'],
    ['265/70R17 15T', 'loadIndex'],
    ['LT285/75R16 126/', 'loadIndex'],
    ['LT285/75R16 123/126Q', 'loadIndex'],
    ['265/70R17 115Z', 'speedSymbol'],
    ['265/70R17 115K', 'speedSymbol'],
    ['265/70R17 115TX', 'speedSymbol'],
    ['33x12.50R33', 'rim'],
    ['33xR15', 'width'],
    ['33x40R15', 'width'],
    ['33x12.505R15', 'width'],
    ['33x12.50Q15', 'construction'],
    ['33x12.50ZR15', 'construction'],
    ['99x12.50R15', 'overallDiameter'],
    ['33.3x12.50R15', 'overallDiameter'],
  ])('%j → %s', (designation, part) => {
    expect(errorPart(designation)).toBe(part);
  });

  it('tells the customer how to write the size', () => {
    const result = parseTyreDesignation('265/70-17');
    expect(result).toMatchObject({ ok: false, error: { part: 'construction' } });
    if (!result.ok) expect(result.error.message).toContain('265/70R17');
  });

  it('returns an error for non-string input from untyped callers', () => {
    const untyped: unknown = 265;
    expect(parseTyreDesignation(untyped as string)).toMatchObject({
      ok: false,
      error: { part: 'format' },
    });
  });
});

describe('formatTyreDesignation', () => {
  it.each([
    ['265/70R17', '265/70R17'],
    ['265/70 R17 115T', '265/70R17 115T'],
    ['lt285/75r16 126/123Q', 'LT285/75R16 126/123Q'],
    ['P225/75R15 102S', 'P225/75R15 102S'],
    ['33x12.50R15LT 108Q', '33x12.50R15LT 108Q'],
    ['35X12.5R17 121Q', '35x12.50R17 121Q'],
    ['31x10.50R15', '31x10.50R15'],
    ['245/40zr18 97y', '245/40ZR18 97Y'],
    ['195/70 R15 C 104/102 R', '195/70R15C 104/102R'],
    ['265/70R17 t', '265/70R17 T'],
  ])('%j → %j', (input, canonical) => {
    expect(formatTyreDesignation(parsed(input))).toBe(canonical);
  });
});

describe('tyre construction helpers', () => {
  it('tells LT and P-metric tyres apart', () => {
    expect(isLightTruckConstruction(parsed('LT285/75R16'))).toBe(true);
    expect(isLightTruckConstruction(parsed('33x12.50R15LT'))).toBe(true);
    expect(isLightTruckConstruction(parsed('35x12.50R17'))).toBe(false);
    expect(isLightTruckConstruction(parsed('265/70R17'))).toBe(false);
    expect(isPassengerMetric(parsed('P225/75R15'))).toBe(true);
    expect(isPassengerMetric(parsed('225/75R15'))).toBe(false);
  });
});

describe('properties', () => {
  it('parses any string without throwing and returns a typed result', () => {
    const parts: TyreDesignationPart[] = [
      'width',
      'aspect',
      'overallDiameter',
      'construction',
      'rim',
      'loadIndex',
      'speedSymbol',
      'format',
    ];
    const tyreLikeArb = fc
      .array(
        fc.constantFrom(
          'LT',
          'P',
          'p',
          '265',
          '70',
          '12.50',
          '33',
          '17',
          '/',
          'x',
          'X',
          '×',
          'R',
          'ZR',
          'D',
          'C',
          '-',
          ' ',
          '121',
          '118',
          'Q',
          'H',
          'Z',
          '.',
          '0',
          '9999999999999999999999',
          '\u00a0',
          'ß',
          '\ud83d\ude97',
        ),
        { maxLength: 12 },
      )
      .map((tokens) => tokens.join(''));
    fc.assert(
      fc.property(fc.oneof(fc.string(), fc.string({ unit: 'binary' }), tyreLikeArb), (text) => {
        const result = parseTyreDesignation(text);
        if (result.ok) {
          expect(['metric', 'flotation']).toContain(result.size.kind);
        } else {
          expect(parts).toContain(result.error.part);
          expect(typeof result.error.message).toBe('string');
          expect(result.error.message.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 3000 },
    );
  });

  it('round-trips format → parse for generated valid sizes', () => {
    fc.assert(
      fc.property(fc.oneof(metricSizeArb, flotationSizeArb), (size) => {
        fc.pre(
          size.kind === 'metric' ||
            (size.sectionWidthIn < size.overallDiameterIn &&
              size.rimDiameterIn < size.overallDiameterIn),
        );
        const text = formatTyreDesignation(size);
        expect(parseTyreDesignation(text)).toEqual({ ok: true, size });
        // Case and the spaces around the service description do not matter.
        expect(parseTyreDesignation(` ${text.toLowerCase()} `)).toEqual({ ok: true, size });
      }),
      { numRuns: 2000 },
    );
  });
});

import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { productId, productIds, ruleSetId, vehicleModelId } from './support/catalogue';
import { anonymousSession, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

interface FitCheck {
  code: string;
  verdict: string;
  message: string;
  numbers: Record<string, number>;
  rule: { source: string; keys: string[] };
}

interface FitReport {
  verdict: string;
  ruleSetName: string;
  checks: FitCheck[];
  skippedChecks: Array<{ code: string; reason: string; message: string }>;
  metrics: Record<string, number | null>;
  suggestedAdditions: Array<{
    role: string;
    reason: string;
    required: boolean;
    variantId?: string;
    numbers?: Record<string, number>;
  }>;
  cautions: Array<{ code: string; message: string }>;
}

const WORST_FIRST = ['does-not-fit', 'needs-certification', 'advisory', 'ok'];

/** Numbers come rounded to 0.1: equal to the hand-worked value within that rounding. */
function expectAbout(actual: number | null | undefined, expected: number): void {
  expect(actual).toBeTypeOf('number');
  expect(Math.abs((actual as number) - expected)).toBeLessThanOrEqual(0.051);
}

describe('fit report through POST /api/fitment/check (seeded catalogue)', () => {
  let testApp: TestApp;
  let visitor: Session;
  let strata: string;
  let outrider: string;
  let highrange: string;
  let stricter: string;
  let badTyreId: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    visitor = await anonymousSession(testApp);
    strata = await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab');
    outrider = await vehicleModelId(testApp.db, 'Brellin', 'Outrider', 'GXL wagon');
    highrange = await vehicleModelId(testApp.db, 'Brellin', 'Highrange', '4.5 wagon');
    stricter = await ruleSetId(testApp.db, 'Stricter example');
    // The catalogue refuses unreadable designations, so this one is written past the API.
    const inserted = await testApp.db.query<{ id: string }>(
      `insert into product (id, created_at, updated_at, sku, kind, name, brand, price_cents, labour_minutes, stock_qty, lead_days, active, attributes)
       values (gen_random_uuid(), now(), now(), 'T-BAD-DESIGNATION', 'tyre', 'Unreadable tyre', 'Test', 10000, 0, 0, 0, false, $1) returning id`,
      [JSON.stringify({ designation: '265/70-17 115T', treadType: 'highway' })],
    );
    badTyreId = inserted.rows[0].id;
  });

  afterAll(async () => {
    await testApp.db.query('delete from product where id = $1', [badTyreId]);
    await testApp.close();
  });

  async function report(
    vehicle: string,
    skus: string[],
    extra: { constantLoadKg?: number; ruleSetId?: string; productIds?: string[] } = {},
  ): Promise<FitReport> {
    const ids = [...(await productIds(testApp.db, skus)), ...(extra.productIds ?? [])];
    const response = await visitor.agent
      .post('/api/fitment/check')
      .set('x-csrf-token', visitor.csrfToken)
      .send({
        vehicleModelId: vehicle,
        productIds: ids,
        ...(extra.constantLoadKg !== undefined ? { constantLoadKg: extra.constantLoadKg } : {}),
        ...(extra.ruleSetId ? { ruleSetId: extra.ruleSetId } : {}),
      });
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    const body = response.body as FitReport;
    // The report's verdict is always the worst verdict of its checks.
    const worst = WORST_FIRST.find((verdict) => body.checks.some((c) => c.verdict === verdict));
    expect(body.verdict).toBe(worst ?? 'ok');
    return body;
  }

  function check(body: FitReport, code: string): FitCheck {
    const found = body.checks.find((candidate) => candidate.code === code);
    if (!found) {
      throw new Error(`${code} did not run: ${JSON.stringify(body.skippedChecks)}`);
    }
    return found;
  }

  function addition(body: FitReport, role: string) {
    return body.suggestedAdditions.find((candidate) => candidate.role === role);
  }

  describe('bolt-pattern', () => {
    it('passes a 6x139.7 wheel on a 6x139.7 hub', async () => {
      const result = check(await report(strata, ['IW-STK-1780-P20']), 'bolt-pattern');
      expect(result.verdict).toBe('ok');
      expect(result.numbers).toMatchObject({
        vehicleStudCount: 6,
        vehiclePcdMm: 139.7,
        wheelStudCount: 6,
        wheelPcdMm: 139.7,
      });
      expect(result.rule.keys).toEqual(['boltPatternMatch']);
    });

    it('refuses a 6x114.3 wheel on a 6x139.7 hub', async () => {
      const body = await report(strata, ['SL-GIB-1780-P35']);
      const result = check(body, 'bolt-pattern');
      expect(result.verdict).toBe('does-not-fit');
      expect(result.numbers).toMatchObject({ vehiclePcdMm: 139.7, wheelPcdMm: 114.3 });
      expect(body.verdict).toBe('does-not-fit');
    });
  });

  describe('centre-bore', () => {
    it('passes a bore equal to the hub', async () => {
      const result = check(await report(strata, ['IW-STK-1780-P20']), 'centre-bore');
      expect(result.verdict).toBe('ok');
      expect(result.numbers).toMatchObject({
        hubBoreMm: 106.1,
        wheelBoreMm: 106.1,
        differenceMm: 0,
      });
    });

    it('refuses a bore smaller than the hub', async () => {
      const result = check(await report(strata, ['SL-GIB-1780-P35']), 'centre-bore');
      expect(result.verdict).toBe('does-not-fit');
      expect(result.numbers).toMatchObject({
        hubBoreMm: 106.1,
        wheelBoreMm: 93.1,
        differenceMm: -13,
      });
    });

    it('advises hub rings for a larger bore, and stops suggesting them once they are in', async () => {
      const body = await report(strata, ['IW-STK-1785-00']);
      const result = check(body, 'centre-bore');
      expect(result.verdict).toBe('advisory');
      expect(result.numbers.differenceMm).toBe(4);
      // Common practice (no published source): hub-centric rings centre a larger bore.
      expect(addition(body, 'hub-rings')).toMatchObject({
        required: false,
        numbers: { wheelBoreMm: 110.1, hubBoreMm: 106.1 },
      });
      const withRings = await report(strata, ['IW-STK-1785-00', 'IW-HR-1101-1061']);
      expect(addition(withRings, 'hub-rings')).toBeUndefined();
      expect(check(withRings, 'centre-bore')).toMatchObject({
        verdict: 'advisory',
        numbers: { ringOuterMm: 110.1, ringInnerMm: 106.1 },
      });
      expect(check(withRings, 'centre-bore').message).toContain(
        'the hub-centric rings (110.1 → 106.1 mm) centre the wheel on the hub',
      );
    });

    it('on a 108.1 mm hub: suggests 110.1 → 108.1 mm rings and refuses 110.1 → 106.1 mm ones', async () => {
      const bare = await report(highrange, ['IW-STK-1785-00']);
      expect(check(bare, 'centre-bore')).toMatchObject({
        verdict: 'advisory',
        numbers: { hubBoreMm: 108.1, wheelBoreMm: 110.1, differenceMm: 2 },
      });
      // Common practice (no published source): a hub-centric ring's outer side matches the
      // wheel's bore and its inner side the hub: 110.1 → 108.1 mm here.
      expect(addition(bare, 'hub-rings')).toMatchObject({
        required: false,
        numbers: { wheelBoreMm: 110.1, hubBoreMm: 108.1, ringOuterMm: 110.1, ringInnerMm: 108.1 },
      });
      expect(addition(bare, 'hub-rings')?.reason).toContain('110.1 → 108.1 mm');

      // Common practice (no published source): a 106.1 mm ring does not go over a 108.1 mm hub.
      const wrong = await report(highrange, ['IW-STK-1785-00', 'IW-HR-1101-1061']);
      expect(check(wrong, 'centre-bore')).toMatchObject({
        verdict: 'does-not-fit',
        message:
          'The hub-centric rings (110.1 → 106.1 mm) do not match this wheel and hub (110.1 → 108.1 mm): choose rings of those sizes.',
        numbers: { hubBoreMm: 108.1, wheelBoreMm: 110.1, ringOuterMm: 110.1, ringInnerMm: 106.1 },
        rule: { keys: ['centreBoreFit'] },
      });
      expect(wrong.verdict).toBe('does-not-fit');

      const right = await report(highrange, ['IW-STK-1785-00', 'IW-HR-1101-1081']);
      expect(check(right, 'centre-bore')).toMatchObject({
        verdict: 'advisory',
        numbers: { ringOuterMm: 110.1, ringInnerMm: 108.1 },
      });
      expect(check(right, 'centre-bore').message).toContain(
        'the hub-centric rings (110.1 → 108.1 mm) centre the wheel on the hub',
      );
      expect(addition(right, 'hub-rings')).toBeUndefined();
    });

    it('says rings are not needed with a bore that matches the hub, or with the stock wheels', async () => {
      const matching = await report(strata, ['IW-STK-1780-P20', 'IW-HR-1101-1061']);
      expect(check(matching, 'centre-bore')).toMatchObject({
        verdict: 'advisory',
        message:
          "The wheel's centre bore matches the hub (106.1 mm): the hub-centric rings (110.1 → 106.1 mm) are not needed.",
      });
      const stock = await report(highrange, ['IW-HR-1101-1081']);
      expect(check(stock, 'centre-bore')).toMatchObject({
        verdict: 'advisory',
        numbers: { hubBoreMm: 108.1, ringOuterMm: 110.1, ringInnerMm: 108.1 },
      });
      expect(check(stock, 'centre-bore').message).toContain('are not needed');
      const nothing = await report(highrange, []);
      expect(nothing.skippedChecks.find((skip) => skip.code === 'centre-bore')?.reason).toBe(
        'not-applicable',
      );
    });
  });

  describe('stud-thread', () => {
    it('passes M12x1.5 nuts on M12x1.5 studs', async () => {
      const result = check(await report(strata, ['IW-STK-1780-P20']), 'stud-thread');
      expect(result.verdict).toBe('ok');
      expect(result.numbers).toMatchObject({
        vehicleThreadDiameterMm: 12,
        wheelThreadDiameterMm: 12,
        wheelThreadPitchMm: 1.5,
      });
    });

    it('refuses M14x1.5 nuts on M12x1.5 studs', async () => {
      const result = check(await report(strata, ['IW-CLP-1780-P20']), 'stud-thread');
      expect(result.verdict).toBe('does-not-fit');
      expect(result.numbers).toMatchObject({
        vehicleThreadDiameterMm: 12,
        wheelThreadDiameterMm: 14,
      });
    });
  });

  describe('wheel-load-rating', () => {
    it('passes a 1250 kg wheel: the heaviest axle (1870 kg rear) needs 935 kg per wheel', async () => {
      const result = check(await report(strata, ['IW-STK-1780-P20']), 'wheel-load-rating');
      expect(result.verdict).toBe('ok');
      // Common practice (no published source): each wheel carries half the heaviest axle rating.
      expect(result.numbers).toMatchObject({ wheelLoadRatingKg: 1250, requiredPerWheelKg: 935 });
    });

    it('refuses a 900 kg wheel', async () => {
      const result = check(await report(strata, ['SL-TWN-1770-P35']), 'wheel-load-rating');
      expect(result.verdict).toBe('does-not-fit');
      expect(result.numbers).toMatchObject({ wheelLoadRatingKg: 900, requiredPerWheelKg: 935 });
    });
  });

  describe('rim-diameter', () => {
    it('passes a 17 in wheel with the stock 265/65R17 tyre', async () => {
      const result = check(await report(strata, ['IW-STK-1780-P20']), 'rim-diameter');
      expect(result.verdict).toBe('ok');
      expect(result.numbers).toEqual({ wheelDiameterIn: 17, tyreRimDiameterIn: 17 });
    });

    it('refuses a 16 in wheel under the stock 17 in tyre', async () => {
      const result = check(await report(strata, ['IW-STK-1680-N12']), 'rim-diameter');
      expect(result.verdict).toBe('does-not-fit');
      // Source: ISO 4000-1 / ETRTO size designation (the 17 in 265/65R17 is the rim diameter).
      expect(result.numbers).toEqual({ wheelDiameterIn: 16, tyreRimDiameterIn: 17 });
    });
  });

  describe('rim-width', () => {
    it('passes an 8 in rim for 265/70R17 (measuring rim 8.0 in, range 7.0–9.0 in)', async () => {
      const result = check(await report(strata, ['IW-STK-1780-P20', 'QD-TG-2657017']), 'rim-width');
      expect(result.verdict).toBe('ok');
      // Source: Tire and Rim Association measuring rims via REFERENCES.md (M): 265/70R17 → 8.0 in.
      // From memory: the approved range of about 7.0–9.0 in for 265/70R17 (MEM in REFERENCES.md).
      expect(result.numbers).toMatchObject({
        wheelWidthIn: 8,
        measuringRimIn: 8,
        rangeMinIn: 7,
        rangeMaxIn: 9,
      });
    });

    it("uses the tyre maker's range when the catalogue holds one", async () => {
      const result = check(
        await report(strata, ['IW-STK-1785-00', 'SP-MH-331250R17']),
        'rim-width',
      );
      expect(result.verdict).toBe('ok');
      expect(result.numbers).toMatchObject({ wheelWidthIn: 8.5, rangeMinIn: 8.5, rangeMaxIn: 11 });
    });

    it('refuses an 8 in rim for 35x12.50R17LT (measuring rim 10.0 in)', async () => {
      const result = check(
        await report(strata, ['IW-STK-1780-P20', 'SP-MH-351250R17']),
        'rim-width',
      );
      expect(result.verdict).toBe('does-not-fit');
      // From memory: flotation measuring rim K = 0.80 (TRA), 12.50 in section → 10.0 in; ±1.0 in is
      // Liftwright's own allowance (no published source).
      expect(result.numbers).toMatchObject({
        wheelWidthIn: 8,
        measuringRimIn: 10,
        rangeMinIn: 9,
        rangeMaxIn: 11,
      });
    });
  });

  describe('tyre-load-capacity', () => {
    it('passes load index 115 (1215 kg) against 935 kg per tyre and the placard 112 (1120 kg)', async () => {
      const result = check(await report(strata, ['QD-TG-2657017']), 'tyre-load-capacity');
      expect(result.verdict).toBe('ok');
      // Source: ISO 4000-1 / ETRTO load index table: 115 → 1215 kg, 112 → 1120 kg.
      expect(result.numbers).toMatchObject({
        loadIndexSingle: 115,
        capacityPerTyreKg: 1215,
        requiredPerTyreKg: 935,
        placardLoadIndex: 112,
        placardCapacityKg: 1120,
      });
    });

    it('reads an LT dual mark: 121/118 carries 1450 kg single', async () => {
      const result = check(await report(strata, ['QD-TG-LT2657017']), 'tyre-load-capacity');
      expect(result.verdict).toBe('ok');
      // Source: ISO 4000-1 / ETRTO load index table: 121 → 1450 kg (first index, single fitment).
      expect(result.numbers).toMatchObject({
        loadIndexSingle: 121,
        loadIndexDual: 118,
        capacityPerTyreKg: 1450,
      });
    });

    it('refuses P265/70R17 113T on a light truck: 1150 kg ÷ 1.10 is below the placard', async () => {
      const result = check(await report(strata, ['QD-MH-P2657017']), 'tyre-load-capacity');
      expect(result.verdict).toBe('does-not-fit');
      // Source: ISO 4000-1 / ETRTO load index 113 → 1150 kg; US practice, Tire and Rim Association
      // P-metric derate 1.10 on light trucks (M): 1150 / 1.1 = 1045.45 kg < 1120 kg.
      expectAbout(result.numbers.capacityPerTyreKg, 1045.45);
      expect(result.numbers).toMatchObject({ derateFactor: 1.1, placardCapacityKg: 1120 });
      expect(result.rule.keys).toEqual(['tyreLoadCapacity', 'passengerTyreLightTruckDerateFactor']);
    });
  });

  describe('speed-symbol', () => {
    it('passes T (190 km/h) against the placard S (180 km/h)', async () => {
      const result = check(await report(strata, ['QD-TG-2657017']), 'speed-symbol');
      expect(result.verdict).toBe('ok');
      // Source: ISO 4000-1 / ETRTO speed symbols: T 190, S 180 km/h; WA Road Traffic (Vehicle
      // Standards) Rules 2002 r46: 140 km/h minimum with off-road features.
      expect(result.numbers).toEqual({
        tyreSpeedKmh: 190,
        placardSpeedKmh: 180,
        minimumSpeedKmh: 140,
      });
    });

    it('advises on Q (160 km/h) below the placard under the off-road exemption', async () => {
      const result = check(await report(strata, ['QD-TG-LT2857017']), 'speed-symbol');
      expect(result.verdict).toBe('advisory');
      // Source: ISO 4000-1 / ETRTO: Q 160 km/h; WA r46 / SA r52 off-road exemption down to 140 km/h.
      expect(result.numbers).toMatchObject({ tyreSpeedKmh: 160, minimumSpeedKmh: 140 });
      expect(result.rule.source).toMatch(/r46/);
    });

    it('refuses M (130 km/h), below the 140 km/h minimum', async () => {
      const result = check(await report(strata, ['SP-BM-351250R17']), 'speed-symbol');
      expect(result.verdict).toBe('does-not-fit');
      // Source: ISO 4000-1 / ETRTO: M 130 km/h; WA Road Traffic (Vehicle Standards) Rules 2002 r46.
      expect(result.numbers).toMatchObject({ tyreSpeedKmh: 130, minimumSpeedKmh: 140 });
    });

    it('refuses Q under the stricter rule set (no exemption: 180 km/h minimum)', async () => {
      const body = await report(strata, ['QD-TG-LT2857017'], { ruleSetId: stricter });
      expect(body.ruleSetName).toBe('Stricter example');
      const result = check(body, 'speed-symbol');
      expect(result.verdict).toBe('does-not-fit');
      expect(result.numbers).toMatchObject({ tyreSpeedKmh: 160, minimumSpeedKmh: 180 });
    });
  });

  describe('tyre-diameter-change', () => {
    it('passes 265/65R17 → 265/70R17: 776.3 → 802.8 mm, +26.5 mm', async () => {
      const result = check(await report(strata, ['QD-TG-2657017']), 'tyre-diameter-change');
      expect(result.verdict).toBe('ok');
      // Source: ISO 4000-1 / ETRTO nominal dimensions: 265/65R17 776.3 mm, 265/70R17 802.8 mm.
      expect(result.numbers).toMatchObject({
        stockDiameterMm: 776.3,
        newDiameterMm: 802.8,
        limitMm: 50,
      });
      expectAbout(result.numbers.changeMm, 26.5);
    });

    it('needs a certificate for 265/65R17 → 285/70R17: +54.5 mm, over +50 mm', async () => {
      const result = check(await report(strata, ['QD-TG-LT2857017']), 'tyre-diameter-change');
      expect(result.verdict).toBe('needs-certification');
      // Source: REFERENCES.md boundary example (VSB 14 Section LS as quoted): 776.3 → 830.8 mm is
      // +54.5 mm, over the +50 mm off-road limit.
      expect(result.numbers).toMatchObject({ newDiameterMm: 830.8, limitMm: 50 });
      expectAbout(result.numbers.changeMm, 54.5);
      expect(result.rule.source).toMatch(/VSB 14/);
    });
  });

  describe('speedometer', () => {
    it('passes the stock size (reads 100 at a true 100 km/h)', async () => {
      const result = check(await report(strata, ['QD-HT-2656517']), 'speedometer');
      expect(result.verdict).toBe('ok');
      expect(result.numbers).toMatchObject({
        indicatedAtTrue100Kmh: 100,
        allowedMinKmh: 100,
        allowedMaxKmh: 114,
      });
    });

    it('requires a recalibration when larger tyres make it read low (96.7 at a true 100)', async () => {
      const body = await report(strata, ['QD-TG-2657017']);
      const result = check(body, 'speedometer');
      expect(result.verdict).toBe('advisory');
      // Source: UN ECE Regulation No. 39 §5.3 / ADR 18/03: 0 ≤ V1 − V2 ≤ 0.1·V2 + 4, so a true 100
      // allows 100–114 indicated; 100 × 776.3 / 802.8 = 96.70 reads below true speed.
      expect(result.numbers).toMatchObject({
        indicatedAtTrue100Kmh: 96.7,
        allowedMinKmh: 100,
        allowedMaxKmh: 114,
      });
      expect(addition(body, 'speedometer-recalibration')).toMatchObject({ required: true });
      expect(body.metrics.speedometerAtTrue100Kmh).toBe(96.7);
    });

    it('passes once the recalibration is in the package', async () => {
      const body = await report(strata, ['QD-TG-2657017', 'KW-SVC-SPEEDO']);
      expect(check(body, 'speedometer').verdict).toBe('ok');
      expect(addition(body, 'speedometer-recalibration')).toBeUndefined();
    });
  });

  describe('tyre-clearance', () => {
    it('passes +26.5 mm of tyre with a 50 mm lift (clears about 50 mm)', async () => {
      const result = check(
        await report(strata, ['QD-TG-2657017', 'BR-STR-50-L']),
        'tyre-clearance',
      );
      expect(result.verdict).toBe('ok');
      // Common practice (no published source): about 25 mm of diameter per 25 mm of lift.
      expect(result.numbers).toMatchObject({ suspensionLiftMm: 50, clearAllowanceMm: 50 });
    });

    it('advises a trial fit for +26.5 mm of tyre without a lift', async () => {
      const result = check(await report(strata, ['QD-TG-2657017']), 'tyre-clearance');
      expect(result.verdict).toBe('advisory');
      expect(result.numbers).toMatchObject({ suspensionLiftMm: 0, clearAllowanceMm: 0 });
      expectAbout(result.numbers.diameterIncreaseMm, 26.5);
    });
  });

  describe('suspension-lift', () => {
    it('passes a 50 mm kit (the 50 mm limit)', async () => {
      const result = check(await report(strata, ['BR-STR-50-L']), 'suspension-lift');
      expect(result.verdict).toBe('ok');
      // Source: VicRoads VSI 8 §13.2 quoting VSB 14 Section LS: up to 50 mm without certification.
      expect(result.numbers).toMatchObject({
        frontLiftMm: 50,
        rearLiftMm: 50,
        largestChangeMm: 50,
        limitMm: 50,
      });
      expect(result.rule.source).toMatch(/VSI 8 §13\.2/);
    });

    it('needs a certificate for a 75 mm kit', async () => {
      const result = check(
        await report(strata, ['BR-STR-75-M'], { constantLoadKg: 200 }),
        'suspension-lift',
      );
      expect(result.verdict).toBe('needs-certification');
      expect(result.numbers).toMatchObject({ largestChangeMm: 75, limitMm: 50 });
    });

    it('needs a certificate for a 50 mm kit under the stricter 40 mm rule set', async () => {
      const result = check(
        await report(strata, ['BR-STR-50-L'], { ruleSetId: stricter }),
        'suspension-lift',
      );
      expect(result.verdict).toBe('needs-certification');
      expect(result.numbers).toMatchObject({ largestChangeMm: 50, limitMm: 40 });
    });
  });

  describe('combined-lift', () => {
    it('passes 50 mm + half of 26.5 mm = 63.3 mm (limit 75 mm)', async () => {
      const body = await report(strata, ['BR-STR-50-L', 'QD-TG-2657017']);
      const result = check(body, 'combined-lift');
      expect(result.verdict).toBe('ok');
      // Source: VicRoads VSI 8 §13.3: suspension lift plus half the tyre diameter increase ≤ 75 mm.
      expect(result.numbers).toMatchObject({ suspensionLiftMm: 50, limitMm: 75 });
      expectAbout(result.numbers.combinedLiftMm, 63.25);
      expectAbout(body.metrics.combinedLiftMm, 63.25);
    });

    it('needs a certificate for 50 mm + half of 54.5 mm = 77.3 mm', async () => {
      const result = check(
        await report(strata, ['BR-STR-50-L', 'QD-TG-LT2857017']),
        'combined-lift',
      );
      expect(result.verdict).toBe('needs-certification');
      expectAbout(result.numbers.combinedLiftMm, 77.25);
      expect(result.rule.source).toMatch(/VSI 8 §13\.3/);
    });
  });

  describe('wheel-track-change', () => {
    it('passes 7.5J ET+30 → 8J ET+20: track +20 mm (limit +25 mm)', async () => {
      const body = await report(strata, ['IW-STK-1780-P20']);
      const result = check(body, 'wheel-track-change');
      expect(result.verdict).toBe('ok');
      // Source: offset definition (REFERENCES.md): track change = 2 × (ET_old − ET_new); outer edge
      // (W_new − W_old)/2 + (ET_old − ET_new) = 6.35 + 10 mm.
      expect(result.numbers).toMatchObject({ trackChangeMm: 20, limitMm: 25 });
      expectAbout(result.numbers.outerEdgeChangePerSideMm, 16.35);
      expect(body.metrics.trackChangeMm).toBe(20);
    });

    it('needs a certificate for 7.5J ET+30 → 8.5J ET0: track +60 mm, outer edge +42.7 mm', async () => {
      const result = check(await report(strata, ['IW-STK-1785-00']), 'wheel-track-change');
      expect(result.verdict).toBe('needs-certification');
      // Source: REFERENCES.md worked example (half an inch wider, 30 mm less offset): track +60 mm,
      // outer edge +42.7 mm per side; VSB 14 Section LS as quoted: +25 mm limit.
      expect(result.numbers).toMatchObject({
        trackChangeMm: 60,
        outerEdgeChangePerSideMm: 42.7,
        limitMm: 25,
      });
    });
  });

  describe('joint-angle', () => {
    it('passes 50 mm on a 450 mm half-shaft: about +6.3°', async () => {
      const result = check(
        await report(outrider, ['BR-OUT-50-M'], { constantLoadKg: 200 }),
        'joint-angle',
      );
      expect(result.verdict).toBe('ok');
      // Source: REFERENCES.md derived geometry: 50 mm on a 450 mm shaft ≈ +6.3° (atan(50/450)).
      expect(result.numbers).toMatchObject({
        frontLiftMm: 50,
        halfShaftLengthMm: 450,
        addedAngleDeg: 6.3,
        thresholdDeg: 6.5,
      });
    });

    it('suggests a 25 mm diff drop for 75 mm on a 455 mm half-shaft (+9.4°)', async () => {
      const body = await report(strata, ['BR-STR-75-M'], { constantLoadKg: 200 });
      const result = check(body, 'joint-angle');
      expect(result.verdict).toBe('advisory');
      // atan(75/455) = 9.36°; drop = 75 − 455·tan(6.5°) = 23.2 mm, rounded up to 25 mm.
      // Common practice (no published source): the 6.5° threshold.
      expect(result.numbers).toMatchObject({ addedAngleDeg: 9.4, suggestedDropMm: 25 });
      expect(addition(body, 'diff-drop')).toMatchObject({
        required: false,
        numbers: { suggestedDropMm: 25 },
      });
      expect(body.metrics.jointAngleAddedDeg).toBe(9.4);
    });

    it('passes once the 25 mm diff drop is in the package (atan(50/455) = 6.3°)', async () => {
      const body = await report(strata, ['BR-STR-75-M', 'DW-DD-25'], { constantLoadKg: 200 });
      const result = check(body, 'joint-angle');
      expect(result.verdict).toBe('ok');
      expect(result.numbers).toMatchObject({ diffDropMm: 25, addedAngleDeg: 6.3 });
      expect(addition(body, 'diff-drop')).toBeUndefined();
    });

    it('is not run on a solid front axle', async () => {
      const body = await report(highrange, ['TH-HRG-50-L']);
      expect(body.skippedChecks).toContainEqual(
        expect.objectContaining({ code: 'joint-angle', reason: 'not-applicable' }),
      );
    });
  });

  describe('spring-rating', () => {
    it('passes a 0–150 kg kit for a 100 kg constant load', async () => {
      const result = check(
        await report(strata, ['BR-STR-50-L'], { constantLoadKg: 100 }),
        'spring-rating',
      );
      expect(result.verdict).toBe('ok');
      expect(result.numbers).toEqual({
        declaredLoadKg: 100,
        kitConstantLoadMinKg: 0,
        kitConstantLoadMaxKg: 150,
      });
    });

    it('refuses a 0–150 kg kit for 250 kg and requires the 150–300 kg rating of the same kit', async () => {
      const body = await report(strata, ['BR-STR-50-L'], { constantLoadKg: 250 });
      const result = check(body, 'spring-rating');
      expect(result.verdict).toBe('does-not-fit');
      expect(result.numbers).toMatchObject({ declaredLoadKg: 250, kitConstantLoadMaxKg: 150 });
      expect(addition(body, 'spring-rating')).toMatchObject({
        required: true,
        variantId: await productId(testApp.db, 'BR-STR-50-M'),
        numbers: { declaredLoadKg: 250, constantLoadMinKg: 150, constantLoadMaxKg: 300 },
      });
    });

    it('suggests no rating when none of the kit covers the load', async () => {
      const body = await report(strata, ['BR-STR-50-L'], { constantLoadKg: 700 });
      expect(check(body, 'spring-rating').verdict).toBe('does-not-fit');
      expect(addition(body, 'spring-rating')).toBeUndefined();
    });
  });

  describe('gross-vehicle-mass', () => {
    it('passes the unladen vehicle: 2110 kg kerb + 75 kg driver = 2185 kg of 3100 kg', async () => {
      const result = check(await report(strata, ['IW-STK-1780-P20']), 'gross-vehicle-mass');
      expect(result.verdict).toBe('ok');
      expect(result.numbers).toMatchObject({
        kerbMassKg: 2110,
        occupantMassKg: 75,
        totalMassKg: 2185,
        gvmKg: 3100,
        marginKg: 915,
      });
    });

    it('needs a certificate when a 68 kg bull bar and 950 kg of load go over the GVM', async () => {
      const result = check(
        await report(strata, ['TH-BB-STR'], { constantLoadKg: 950 }),
        'gross-vehicle-mass',
      );
      expect(result.verdict).toBe('needs-certification');
      expect(result.numbers).toMatchObject({
        kerbMassKg: 2110,
        accessoriesMassKg: 68,
        declaredLoadKg: 950,
        occupantMassKg: 75,
        totalMassKg: 3203,
        marginKg: -103,
      });
    });
  });

  describe('alignment', () => {
    it('needs none when neither the suspension nor the tyre size changes', async () => {
      const body = await report(strata, ['IW-STK-1780-P20']);
      expect(check(body, 'alignment').verdict).toBe('ok');
      expect(addition(body, 'alignment')).toBeUndefined();
    });

    it('adds a required alignment after a tyre-size change', async () => {
      const body = await report(strata, ['QD-TG-2657017']);
      expect(check(body, 'alignment').verdict).toBe('advisory');
      // Common practice (no published source): an alignment after any suspension or tyre-size change.
      expect(addition(body, 'alignment')).toMatchObject({ required: true });
    });

    it('is satisfied by the alignment service in the package', async () => {
      const body = await report(strata, ['BR-STR-50-L', 'KW-SVC-ALIGN']);
      expect(check(body, 'alignment').verdict).toBe('ok');
      expect(addition(body, 'alignment')).toBeUndefined();
    });
  });

  describe('tyre-designation', () => {
    it('is not reported when every designation reads', async () => {
      const body = await report(strata, ['QD-TG-2657017']);
      expect(body.checks.map((c) => c.code)).not.toContain('tyre-designation');
      expect(body.skippedChecks.map((c) => c.code)).not.toContain('tyre-designation');
    });

    it('refuses a tyre whose designation cannot be read and skips the checks that need it', async () => {
      const body = await report(strata, [], { productIds: [badTyreId] });
      const result = check(body, 'tyre-designation');
      expect(result.verdict).toBe('does-not-fit');
      // Source: ISO 4000-1 / ETRTO size designation: a construction letter (R or D) is required.
      expect(result.message).toMatch(/265\/70-17/);
      expect(body.skippedChecks).toContainEqual(
        expect.objectContaining({ code: 'tyre-diameter-change', reason: 'missing-data' }),
      );
    });
  });

  describe('the report as a whole', () => {
    it('takes the worst verdict of a package with several problems', async () => {
      const body = await report(strata, ['SL-GIB-1780-P35', 'QD-TG-LT2857017', 'BR-STR-50-L'], {
        constantLoadKg: 100,
      });
      const verdicts = body.checks.map((c) => c.verdict);
      expect(verdicts).toContain('does-not-fit');
      expect(verdicts).toContain('needs-certification');
      expect(verdicts).toContain('advisory');
      expect(body.verdict).toBe('does-not-fit');
    });

    it('suggests brake lines, shackles and a headlight re-aim with a 75 mm leaf-rear lift', async () => {
      const body = await report(strata, ['BR-STR-50-L'], { constantLoadKg: 100 });
      expect(addition(body, 'greasable-shackles')).toMatchObject({ required: false });
      expect(addition(body, 'headlight-re-aim')).toMatchObject({ required: false });
      expect(addition(body, 'extended-brake-lines')).toBeUndefined();
      const big = await report(strata, ['BR-STR-75-M'], { constantLoadKg: 200 });
      // Common practice (no published source): extended brake lines past a 50 mm lift.
      expect(addition(big, 'extended-brake-lines')).toMatchObject({
        required: false,
        numbers: { suspensionLiftMm: 75, thresholdMm: 50 },
      });
      // The 75 mm kit includes greasable shackles, so they are not suggested again.
      expect(addition(big, 'greasable-shackles')).toBeUndefined();
    });

    it('suggests a steering damper for 35 in tyres on a solid front axle', async () => {
      const body = await report(highrange, ['SP-MH-351250R17']);
      // 889.0 − 802.3 mm (35 in against 285/65R17) is over the 50 mm rule of thumb.
      expect(addition(body, 'steering-damper')).toMatchObject({ required: false });
      expectAbout(addition(body, 'steering-damper')?.numbers?.diameterChangeMm, 86.7);
    });

    it('shows every caution with a lift, and only the fitting ones without', async () => {
      const lifted = await report(strata, ['BR-STR-50-L']);
      expect(lifted.cautions.map((c) => c.code)).toEqual([
        'handling-and-rollover',
        'modification-limits',
        'insurer',
        'wheel-nut-retorque',
        'qualified-fitting',
        'guide-only',
      ]);
      const wheelsOnly = await report(strata, ['IW-STK-1780-P20']);
      expect(wheelsOnly.cautions.map((c) => c.code)).toEqual([
        'wheel-nut-retorque',
        'qualified-fitting',
        'guide-only',
      ]);
      expect(lifted.ruleSetName).toBe('National code defaults');
    });

    it('reports the metrics of the change', async () => {
      const body = await report(strata, ['BR-STR-50-L', 'QD-TG-2657017', 'IW-STK-1780-P20']);
      expect(body.metrics).toMatchObject({
        stockDiameterMm: 776.3,
        newDiameterMm: 802.8,
        trackChangeMm: 20,
        speedometerAtTrue100Kmh: 96.7,
      });
      expectAbout(body.metrics.diameterChangeMm, 26.5);
      // Independent front: the diff rises with the lift plus half the tyre growth; the leaf rear
      // axle only by half the tyre growth (13.25 mm), which is the lowest point.
      expectAbout(body.metrics.groundClearanceGainRearMm, 13.25);
      expectAbout(body.metrics.groundClearanceGainMm, 13.25);
    });
  });

  describe('refusals', () => {
    async function refused(body: Record<string, unknown>) {
      const response = await visitor.agent
        .post('/api/fitment/check')
        .set('x-csrf-token', visitor.csrfToken)
        .send(body)
        .expect(400);
      return response.body as { fieldErrors: Record<string, string[]> };
    }

    it('names an unknown vehicle, product or rule set', async () => {
      const unknown = '00000000-0000-4000-8000-000000000000';
      const body = await refused({
        vehicleModelId: unknown,
        productIds: [unknown],
        ruleSetId: unknown,
      });
      expect(body.fieldErrors).toEqual({
        vehicleModelId: ['no vehicle model has this id'],
        productIds: [`no product has the id ${unknown}`],
        ruleSetId: ['no rule set has this id'],
      });
    });

    it('refuses two wheels, and a kit made for another vehicle', async () => {
      const body = await refused({
        vehicleModelId: strata,
        productIds: await productIds(testApp.db, [
          'IW-STK-1780-P20',
          'IW-STK-1785-00',
          'TH-BAR-50-L',
        ]),
      });
      expect(body.fieldErrors.productIds).toEqual([
        'a package holds one wheel, not 2',
        'Barrow 50 mm lift kit, light load (0–150 kg) (TH-BAR-50-L) is not made for the Vantrel Strata SR dual cab',
      ]);
    });

    it('checks the body fields', async () => {
      const body = await refused({ vehicleModelId: 'nope', productIds: 'x', constantLoadKg: -1 });
      expect(Object.keys(body.fieldErrors).sort()).toEqual([
        'constantLoadKg',
        'productIds',
        'vehicleModelId',
      ]);
    });
  });
});

describe('GET /api/fitment/tyre-size', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('reads 265/70R17 115T: 802.8 mm overall', async () => {
    const response = await request(testApp.server)
      .get('/api/fitment/tyre-size')
      .query({ designation: '265/70 r17 115t' })
      .expect(200);
    expect(response.body.designation).toBe('265/70R17 115T');
    expect(response.body.size).toMatchObject({
      kind: 'metric',
      sectionWidthMm: 265,
      aspectRatioPercent: 70,
      rimDiameterIn: 17,
      loadIndexSingle: 115,
      speedSymbol: 'T',
    });
    // Source: ISO 4000-1 / ETRTO nominal dimensions: 265/70R17 → 802.8 mm (31.61 in).
    expect(response.body.geometry).toMatchObject({
      overallDiameterMm: 802.8,
      overallDiameterIn: 31.61,
      sidewallHeightMm: 185.5,
      rimDiameterMm: 431.8,
    });
  });

  it('reads a flotation size: 33x12.50R15LT is 838.2 mm', async () => {
    const response = await request(testApp.server)
      .get('/api/fitment/tyre-size')
      .query({ designation: '33x12.50R15LT 108Q' })
      .expect(200);
    // Source: REFERENCES.md flotation sizes: 33 in overall (838.2 mm), 12.50 in section (317.5 mm).
    expect(response.body.geometry).toMatchObject({
      overallDiameterMm: 838.2,
      sectionWidthMm: 317.5,
    });
    expect(response.body.size).toMatchObject({ kind: 'flotation', lightTruck: true });
  });

  it.each([
    ['265/72R17', 'aspect ratio', /aspect ratio/],
    ['265/70-17', 'construction letter', /R \(radial\)/],
    ['266/70R17', 'section width', /section width/],
    ['265/70R17 115X', 'speed symbol', /speed symbol/i],
  ])('answers %s with 400 naming the %s', async (designation, partName, detail) => {
    const response = await request(testApp.server)
      .get('/api/fitment/tyre-size')
      .query({ designation })
      .expect(400);
    expect(response.body.message).toBe(`The ${partName} of the tyre size is not right`);
    expect(response.body.fieldErrors.designation).toHaveLength(1);
    expect(response.body.fieldErrors.designation[0]).toMatch(detail);
  });

  it('answers a missing designation with 400', async () => {
    const response = await request(testApp.server).get('/api/fitment/tyre-size').expect(400);
    expect(Object.keys(response.body.fieldErrors)).toEqual(['designation']);
  });
});

import { describe, expect, it } from 'vitest';
import { buildFitmentContext } from '../fitment-context';
import {
  tarvelleTrackerWagon,
  quillmoorKit50,
  korrinRidgebackUte,
  ranCheck,
  skippedCheck,
  trailhandWheel,
  wenlowMarlinHatch,
} from '../fitment.fixtures';
import type { FitmentInput, VehicleSpec } from '../fitment.types';
import {
  type RuleSetLimits,
  defaultRuleSetLimits,
  stricterRuleSetLimits,
} from '../rule-set-limits';
import {
  checkRimDiameter,
  checkRimWidth,
  checkSpeedSymbol,
  checkSpeedometer,
  checkTyreClearance,
  checkTyreDiameterChange,
  checkTyreLoadCapacity,
} from './tyre-checks';

function context(
  designation: string,
  extra: Partial<FitmentInput> = {},
  vehicle: VehicleSpec = korrinRidgebackUte,
) {
  return buildFitmentContext({ vehicle, tyre: { designation }, ...extra });
}

function rules(overrides: Partial<RuleSetLimits>): RuleSetLimits {
  return { ...defaultRuleSetLimits, ...overrides };
}

describe('rim diameter', () => {
  it('passes a 17 in tyre on a 17 in wheel', () => {
    expect(
      ranCheck(checkRimDiameter(context('265/70R17 116S'), defaultRuleSetLimits)).verdict,
    ).toBe('ok');
  });

  it('fails a 16 in tyre on the 17 in stock wheel', () => {
    const check = ranCheck(checkRimDiameter(context('LT285/75R16 126/123Q'), defaultRuleSetLimits));
    expect(check).toMatchObject({
      verdict: 'does-not-fit',
      numbers: { wheelDiameterIn: 17, tyreRimDiameterIn: 16 },
    });
  });
});

describe('rim width', () => {
  // Source: Tire and Rim Association measuring rims via REFERENCES.md (M): 265/70R17 → 8.0 in; derived range ±1 in (MEM 7.0–9.0).
  it('passes an 8 in wheel for 265/70R17 and says the range is derived', () => {
    const check = ranCheck(
      checkRimWidth(context('265/70R17', { wheel: trailhandWheel }), defaultRuleSetLimits),
    );
    expect(check).toMatchObject({
      verdict: 'ok',
      numbers: { wheelWidthIn: 8, rangeMinIn: 7, rangeMaxIn: 9, measuringRimIn: 8 },
    });
    expect(check.message).toContain('estimate');
  });

  it('fails a 10 in wheel for 265/70R17', () => {
    const wide = { ...trailhandWheel, widthIn: 10 };
    expect(
      ranCheck(checkRimWidth(context('265/70R17', { wheel: wide }), defaultRuleSetLimits)).verdict,
    ).toBe('does-not-fit');
  });

  it("uses the tyre maker's range when the catalogue has it", () => {
    // From memory: 33x12.50R15LT approved on 8.5–11.0 in rims (REFERENCES.md, MEM).
    const input: FitmentInput = {
      vehicle: { ...korrinRidgebackUte, stockWheel: { diameterIn: 15, widthIn: 7, offsetMm: 10 } },
      tyre: {
        designation: '33x12.50R15LT 108Q',
        approvedRimWidthMinIn: 8.5,
        approvedRimWidthMaxIn: 11,
      },
      wheel: { ...trailhandWheel, diameterIn: 15, widthIn: 11 },
    };
    expect(ranCheck(checkRimWidth(buildFitmentContext(input), defaultRuleSetLimits)).verdict).toBe(
      'ok',
    );
    const narrow = { ...input, wheel: { ...trailhandWheel, diameterIn: 15, widthIn: 8 } };
    const check = ranCheck(checkRimWidth(buildFitmentContext(narrow), defaultRuleSetLimits));
    expect(check.verdict).toBe('does-not-fit');
    expect(check.message).toContain("tyre maker's approved range");
  });

  it('is an advisory when no range can be derived (below the 40 series)', () => {
    const input: FitmentInput = {
      vehicle: {
        ...wenlowMarlinHatch,
        stockWheel: { diameterIn: 20, widthIn: 9.5, offsetMm: 40 },
      },
      tyre: { designation: '285/35R20 100Y' },
    };
    expect(ranCheck(checkRimWidth(buildFitmentContext(input), defaultRuleSetLimits)).verdict).toBe(
      'advisory',
    );
  });
});

describe('tyre load capacity', () => {
  it('passes an LT tyre with enough capacity for the axles and the placard', () => {
    // Source: ISO 4000-1 / ETRTO load index table: 121 → 1450 kg ≥ 1900 / 2 and ≥ placard 112 → 1120 kg (REFERENCES.md, H).
    const check = ranCheck(
      checkTyreLoadCapacity(context('265/70R17 121/118S'), defaultRuleSetLimits),
    );
    expect(check).toMatchObject({
      verdict: 'ok',
      numbers: {
        capacityPerTyreKg: 1450,
        requiredPerTyreKg: 950,
        placardCapacityKg: 1120,
        loadIndexDual: 118,
      },
    });
  });

  it('fails a tyre below the placard load index', () => {
    // Source: ISO 4000-1 / ETRTO load index table: 110 → 1060 kg, below placard 112 → 1120 kg (REFERENCES.md, H).
    const check = ranCheck(checkTyreLoadCapacity(context('265/70R17 110S'), defaultRuleSetLimits));
    expect(check.verdict).toBe('does-not-fit');
    expect(check.message).toContain('placard');
  });

  it('fails a tyre below half the heaviest axle', () => {
    // Source: ISO 4000-1 / ETRTO load index table: 113 → 1150 kg per tyre; a 2400 kg axle needs 1200 kg (REFERENCES.md, H).
    const heavy = { ...korrinRidgebackUte, rearAxleKg: 2400 };
    const check = ranCheck(
      checkTyreLoadCapacity(context('265/70R17 113S', {}, heavy), defaultRuleSetLimits),
    );
    expect(check).toMatchObject({
      verdict: 'does-not-fit',
      numbers: { requiredPerTyreKg: 1200, capacityPerTyreKg: 1150 },
    });
  });

  it('derates a P-metric tyre on a light truck by 1.10', () => {
    // Source: US practice, Tire and Rim Association: P-metric on a light truck derated by 1.10 (REFERENCES.md, M).
    // 116 → 1250 kg / 1.10 = 1136.4 kg ≥ placard 1120 kg; 113 → 1150 / 1.10 = 1045.5 kg < 1120 kg.
    const derated = ranCheck(
      checkTyreLoadCapacity(context('P265/70R17 116S'), defaultRuleSetLimits),
    );
    expect(derated).toMatchObject({
      verdict: 'ok',
      numbers: { capacityPerTyreKg: 1136.4, derateFactor: 1.1 },
    });
    expect(derated.rule.keys).toContain('passengerTyreLightTruckDerateFactor');
    const tooWeak = ranCheck(
      checkTyreLoadCapacity(context('P265/70R17 113S'), defaultRuleSetLimits),
    );
    expect(tooWeak.verdict).toBe('does-not-fit');
    const noDerate = rules({
      passengerTyreLightTruckDerateFactor: {
        ...defaultRuleSetLimits.passengerTyreLightTruckDerateFactor,
        enabled: false,
      },
    });
    expect(ranCheck(checkTyreLoadCapacity(context('P265/70R17 113S'), noDerate)).verdict).toBe(
      'ok',
    );
    const car = { ...korrinRidgebackUte, offRoadCategory: false, lightTruck: false };
    expect(
      ranCheck(checkTyreLoadCapacity(context('P265/70R17 113S', {}, car), defaultRuleSetLimits))
        .verdict,
    ).toBe('ok');
  });

  it('uses the dual index on dual rear wheels', () => {
    // Source: LT dual marking 121/118 → 1320 kg each in dual fitment (REFERENCES.md, H); rear 5000 kg / 4 = 1250 kg.
    const dually = { ...korrinRidgebackUte, dualRearWheels: true, rearAxleKg: 5000 };
    const dual = ranCheck(
      checkTyreLoadCapacity(context('LT265/70R17 121/118S', {}, dually), defaultRuleSetLimits),
    );
    expect(dual).toMatchObject({
      verdict: 'ok',
      numbers: { dualCapacityPerTyreKg: 1320, requiredPerDualTyreKg: 1250 },
    });
    // Source: ISO 4000-1 / ETRTO load index table: 115 → 1215 kg < 1250 kg needed in dual fitment (REFERENCES.md, H).
    const weak = ranCheck(
      checkTyreLoadCapacity(context('LT265/70R17 118/115S', {}, dually), defaultRuleSetLimits),
    );
    expect(weak.verdict).toBe('does-not-fit');
    const singleOnly = ranCheck(
      checkTyreLoadCapacity(context('265/70R17 121S', {}, dually), defaultRuleSetLimits),
    );
    expect(singleOnly.verdict).toBe('does-not-fit');
    expect(singleOnly.message).toContain('dual-fitment');
  });

  it('is an advisory when the tyre carries no load index', () => {
    expect(
      ranCheck(checkTyreLoadCapacity(context('265/70R17'), defaultRuleSetLimits)).verdict,
    ).toBe('advisory');
  });
});

describe('speed symbol', () => {
  // Source: WA Road Traffic (Vehicle Standards) Rules 2002 r46; SA rules r52 (REFERENCES.md, H): at least 140 km/h (N)
  // with off-road features, 180 km/h for other cars, or the vehicle's top speed if lower.
  // Source: ISO 4000-1 / ETRTO speed symbols: N 140, Q 160, R 170, S 180, T 190, H 210, V 240.
  it('passes a tyre at least the placard symbol', () => {
    // Source: ISO 4000-1 / ETRTO speed symbols: S 180 km/h, the placard's S.
    expect(
      ranCheck(checkSpeedSymbol(context('265/70R17 116S'), defaultRuleSetLimits)).verdict,
    ).toBe('ok');
  });

  it('advises on an off-road vehicle running a tyre below the placard but at least N', () => {
    // Source: WA r46 / SA r52 off-road minimum 140 km/h (N); ISO 4000-1 / ETRTO: Q 160 km/h, placard S 180 km/h.
    const check = ranCheck(checkSpeedSymbol(context('265/70R17 121/118Q'), defaultRuleSetLimits));
    expect(check).toMatchObject({
      verdict: 'advisory',
      numbers: { tyreSpeedKmh: 160, placardSpeedKmh: 180, minimumSpeedKmh: 140 },
    });
    expect(
      ranCheck(checkSpeedSymbol(context('265/70R17 116N'), defaultRuleSetLimits)).verdict,
    ).toBe('advisory');
  });

  it('fails a tyre below the off-road minimum of 140 km/h', () => {
    // Source: WA r46 / SA r52 off-road minimum 140 km/h; ISO 4000-1 / ETRTO: M 130 km/h.
    expect(
      ranCheck(checkSpeedSymbol(context('265/70R17 116M'), defaultRuleSetLimits)).verdict,
    ).toBe('does-not-fit');
  });

  it('holds other cars to 180 km/h, or their top speed if lower', () => {
    // Source: WA r46 / SA r52: 180 km/h for other cars, or the top speed if lower; ISO 4000-1 / ETRTO: R 170, S 180, V 240, P 150, Q 160.
    const hatch = (designation: string, vehicle: VehicleSpec = wenlowMarlinHatch) =>
      ranCheck(checkSpeedSymbol(context(designation, {}, vehicle), defaultRuleSetLimits));
    expect(hatch('205/55R16 91R').verdict).toBe('does-not-fit');
    expect(hatch('205/55R16 91S')).toMatchObject({
      verdict: 'advisory',
      numbers: { minimumSpeedKmh: 180 },
    });
    expect(hatch('205/55R16 91V').verdict).toBe('ok');
    const slowCar = { ...wenlowMarlinHatch, topSpeedKmh: 165, placardSpeedSymbol: 'Q' as const };
    expect(hatch('205/55R16 91R', slowCar)).toMatchObject({
      verdict: 'ok',
      numbers: { minimumSpeedKmh: 165 },
    });
    expect(hatch('205/55R16 91Q', slowCar).verdict).toBe('does-not-fit');
    expect(hatch('205/55R16 91P', slowCar).verdict).toBe('does-not-fit');
  });

  it('enforces the placard and drops the exemption under the stricter rule set', () => {
    // Source: ISO 4000-1 / ETRTO: Q 160 km/h < placard S 180 km/h; H 210 km/h < placard V 240 km/h.
    const check = ranCheck(checkSpeedSymbol(context('265/70R17 121/118Q'), stricterRuleSetLimits));
    expect(check.verdict).toBe('does-not-fit');
    // Without the exemption the 180 km/h minimum is capped at the ute's 175 km/h top speed.
    expect(check.numbers.minimumSpeedKmh).toBe(175);
    const hatch = ranCheck(
      checkSpeedSymbol(context('205/55R16 91H', {}, wenlowMarlinHatch), stricterRuleSetLimits),
    );
    expect(hatch.verdict).toBe('does-not-fit');
    expect(hatch.rule.keys).toEqual(['placardSpeedSymbolEnforced']);
  });
});

describe('overall diameter change', () => {
  it('needs certification for 265/65R17 → 285/70R17: +54.5 mm is over +50 mm', () => {
    // Source: VSB 14 National Code of Practice, Section LS (as quoted in VicRoads VSI 8 §13.3): +50 mm tyre diameter limit: 265/65R17 (776.3) → 285/70R17 (830.8) is +54.5 mm, over +50 mm.
    const check = ranCheck(
      checkTyreDiameterChange(context('285/70R17 121/118Q'), defaultRuleSetLimits),
    );
    expect(check).toMatchObject({
      verdict: 'needs-certification',
      numbers: { stockDiameterMm: 776.3, newDiameterMm: 830.8, changeMm: 54.5, limitMm: 50 },
    });
    expect(check.rule.source).toContain('+50 mm');
  });

  it('passes 265/65R17 → 265/70R17 (+26.5 mm) and a re-limited +60 mm rule', () => {
    expect(
      ranCheck(checkTyreDiameterChange(context('265/70R17 116S'), defaultRuleSetLimits)).verdict,
    ).toBe('ok');
    const sixty = rules({
      tyreDiameterIncreaseMaxMm: { ...defaultRuleSetLimits.tyreDiameterIncreaseMaxMm, value: 60 },
    });
    expect(ranCheck(checkTyreDiameterChange(context('285/70R17 121/118Q'), sixty)).verdict).toBe(
      'ok',
    );
  });

  it('measures from the largest size the maker specifies', () => {
    // Tarvelle: stock 265/70R16 (777.4 mm), largest specified 265/75R16 (803.9 mm); 285/75R16 is 833.9 mm:
    // +30 mm over the largest specified (within +50), although +56.5 mm over stock.
    const check = ranCheck(
      checkTyreDiameterChange(
        context('285/75R16 126/123Q', {}, tarvelleTrackerWagon),
        defaultRuleSetLimits,
      ),
    );
    expect(check).toMatchObject({
      verdict: 'ok',
      numbers: { ruleBaseDiameterMm: 803.9, changeMm: 30 },
    });
    expect(check.message).toContain('largest size the maker specifies');
  });

  it('holds ordinary cars to +15 mm', () => {
    // Source: VSB 14 Section LS as quoted: ordinary passenger cars +15 mm (REFERENCES.md, M).
    // 205/55R16 631.9 mm → 215/55R16 642.9 mm (+11) passes; → 225/55R16 653.9 mm (+22) does not.
    const hatch = (designation: string) =>
      ranCheck(
        checkTyreDiameterChange(context(designation, {}, wenlowMarlinHatch), defaultRuleSetLimits),
      );
    expect(hatch('215/55R16 93V')).toMatchObject({
      verdict: 'ok',
      numbers: { changeMm: 11, limitMm: 15 },
    });
    expect(hatch('225/55R16 95V').verdict).toBe('needs-certification');
  });

  it('limits a decrease to 26 mm', () => {
    // Source: VSB 14 Section LS as quoted: −26 mm (REFERENCES.md, M). 235/60R17 is 713.8 mm: −62.5 mm against 776.3 mm.
    const check = ranCheck(
      checkTyreDiameterChange(context('235/60R17 106S'), defaultRuleSetLimits),
    );
    expect(check.verdict).toBe('needs-certification');
    expect(check.rule.keys).toEqual(['tyreDiameterDecreaseMaxMm']);
  });

  it('applies a percentage rule when the rule set enables it', () => {
    // Source: one state code: ±7 % of the largest specified size (REFERENCES.md, M). +30 mm on 803.9 mm is +3.7 %.
    const threePercent = rules({
      diameterChangeMaxPercent: {
        ...defaultRuleSetLimits.diameterChangeMaxPercent,
        enabled: true,
        value: 3,
      },
    });
    const check = ranCheck(
      checkTyreDiameterChange(
        context('285/75R16 126/123Q', {}, tarvelleTrackerWagon),
        threePercent,
      ),
    );
    expect(check).toMatchObject({
      verdict: 'needs-certification',
      numbers: { changePercent: 3.7, limitPercent: 3 },
    });
    expect(check.rule.keys).toEqual(['diameterChangeMaxPercent']);
    const sevenPercent = rules({
      diameterChangeMaxPercent: { ...defaultRuleSetLimits.diameterChangeMaxPercent, enabled: true },
    });
    expect(
      ranCheck(
        checkTyreDiameterChange(
          context('285/75R16 126/123Q', {}, tarvelleTrackerWagon),
          sevenPercent,
        ),
      ).verdict,
    ).toBe('ok');
  });

  it('is skipped with the stock tyres', () => {
    expect(
      skippedCheck(
        checkTyreDiameterChange(
          buildFitmentContext({ vehicle: korrinRidgebackUte }),
          defaultRuleSetLimits,
        ),
      ).reason,
    ).toBe('not-applicable');
  });
});

describe('speedometer after the tyre change', () => {
  // Source: UN ECE Regulation No. 39 §5.3; ADR 18/03: 0 ≤ V1 − V2 ≤ 0.1·V2 + 4 (REFERENCES.md, H);
  // true / indicated = D_new / D_old, assuming a stock speedometer that read exactly true.
  it('flags larger tyres that make it read low and adds a recalibration', () => {
    const outcome = checkSpeedometer(context('285/70R17 121/118Q'), defaultRuleSetLimits);
    // Worked by hand: 100 × 776.3 / 830.8 = 93.4 km/h.
    expect(ranCheck(outcome)).toMatchObject({
      verdict: 'advisory',
      numbers: { indicatedAtTrue100Kmh: 93.4, allowedMinKmh: 100, allowedMaxKmh: 114 },
    });
    expect(outcome.ran && outcome.additions).toEqual([
      expect.objectContaining({ role: 'speedometer-recalibration', required: true }),
    ]);
  });

  it('passes when the package already recalibrates it', () => {
    const recalibrated = context('285/70R17 121/118Q', {
      components: [{ role: 'speedometer-recalibration' }],
    });
    const outcome = checkSpeedometer(recalibrated, defaultRuleSetLimits);
    expect(ranCheck(outcome).verdict).toBe('ok');
    expect(outcome.ran && outcome.additions).toEqual([]);
  });

  it('passes a same-size or slightly smaller tyre and fails a much smaller one', () => {
    expect(
      ranCheck(checkSpeedometer(context('265/65R17 116S'), defaultRuleSetLimits)).numbers
        .indicatedAtTrue100Kmh,
    ).toBe(100);
    // 265/60R17 is 749.8 mm: 100 × 776.3 / 749.8 = 103.5 km/h, within 100–114.
    expect(
      ranCheck(checkSpeedometer(context('265/60R17 116S'), defaultRuleSetLimits)),
    ).toMatchObject({ verdict: 'ok', numbers: { indicatedAtTrue100Kmh: 103.5 } });
    // 225/45R17 is 634.3 mm: 100 × 776.3 / 634.3 = 122.4 km/h, over 114.
    expect(ranCheck(checkSpeedometer(context('225/45R17 94V'), defaultRuleSetLimits)).verdict).toBe(
      'advisory',
    );
  });

  it('can be switched off', () => {
    const off = rules({
      speedometerAccuracy: { ...defaultRuleSetLimits.speedometerAccuracy, enabled: false },
    });
    expect(skippedCheck(checkSpeedometer(context('285/70R17 121/118Q'), off)).reason).toBe(
      'disabled-by-rule-set',
    );
  });
});

describe('tyre-to-body clearance', () => {
  // Common practice (no published source): about 25 mm of extra diameter per 25 mm of lift usually clears.
  it('passes +26.5 mm on a 50 mm lift', () => {
    // Common practice (no published source): 50 mm of lift usually clears 50 mm of extra diameter.
    const check = ranCheck(
      checkTyreClearance(
        context('265/70R17 116S', { suspensionKit: quillmoorKit50 }),
        defaultRuleSetLimits,
      ),
    );
    expect(check).toMatchObject({
      verdict: 'ok',
      numbers: { diameterIncreaseMm: 26.5, clearAllowanceMm: 50 },
    });
  });

  it('advises on +54.5 mm with a 50 mm lift, or +26.5 mm with none', () => {
    // Common practice (no published source): 25 mm of extra diameter per 25 mm of lift.
    expect(
      ranCheck(
        checkTyreClearance(
          context('285/70R17 121/118Q', { suspensionKit: quillmoorKit50 }),
          defaultRuleSetLimits,
        ),
      ).verdict,
    ).toBe('advisory');
    expect(
      ranCheck(checkTyreClearance(context('265/70R17 116S'), defaultRuleSetLimits)).verdict,
    ).toBe('advisory');
  });

  it('takes its allowance from the rule set and the lower end of the lift', () => {
    // Common practice (no published source): the allowance is rule-set data; 30 mm per 25 mm gives 60 mm on a 50 mm lift.
    const generous = rules({
      clearanceAllowanceMmPer25mmLift: {
        ...defaultRuleSetLimits.clearanceAllowanceMmPer25mmLift,
        value: 30,
      },
    });
    expect(
      ranCheck(
        checkTyreClearance(
          context('285/70R17 121/118Q', { suspensionKit: quillmoorKit50 }),
          generous,
        ),
      ).verdict,
    ).toBe('ok');
    const raked = { ...quillmoorKit50, frontLiftMm: 25, rearLiftMm: 50 };
    expect(
      ranCheck(
        checkTyreClearance(
          context('265/70R17 116S', { suspensionKit: raked }),
          defaultRuleSetLimits,
        ),
      ),
    ).toMatchObject({
      verdict: 'advisory',
      numbers: { suspensionLiftMm: 25, clearAllowanceMm: 25 },
    });
  });
});

describe('unreadable new tyre', () => {
  it('skips the tyre checks with missing data', () => {
    const broken = context('265/70-17');
    for (const check of [
      checkTyreLoadCapacity,
      checkSpeedSymbol,
      checkTyreDiameterChange,
      checkSpeedometer,
      checkRimWidth,
    ]) {
      expect(skippedCheck(check(broken, defaultRuleSetLimits)).reason).toBe('missing-data');
    }
  });
});

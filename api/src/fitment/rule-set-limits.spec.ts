import { describe, expect, it } from 'vitest';
import {
  RULE_KEYS,
  RULE_KEY_SHAPES,
  type RuleLimit,
  type RuleSetLimits,
  defaultRuleSetLimits,
  stricterRuleSetLimits,
  validateRuleSetLimits,
} from './rule-set-limits';

function limit(ruleSet: RuleSetLimits, key: (typeof RULE_KEYS)[number]): RuleLimit {
  const rule = ruleSet[key];
  if (!('value' in rule)) throw new Error(`${key} is not a numeric limit`);
  return rule;
}

describe('default rule set', () => {
  it('carries the modification limits as quoted', () => {
    // Source: VicRoads VSI 8 §13.2 quoting VSB 14 Section LS: suspension up to 50 mm without certification (REFERENCES.md, M).
    expect(limit(defaultRuleSetLimits, 'suspensionLiftMaxMm')).toMatchObject({
      enabled: true,
      value: 50,
      unit: 'mm',
    });
    // Source: VicRoads VSI 8 §13.3: combined lift up to 75 mm (REFERENCES.md, M).
    expect(limit(defaultRuleSetLimits, 'combinedLiftMaxMm').value).toBe(75);
    // Source: VSB 14 Section LS as quoted: off-road vehicles +50 mm; ordinary cars +15 mm / −26 mm (REFERENCES.md, M).
    expect(limit(defaultRuleSetLimits, 'tyreDiameterIncreaseMaxMm').value).toBe(50);
    expect(limit(defaultRuleSetLimits, 'tyreDiameterIncreaseMaxMmOther').value).toBe(15);
    expect(limit(defaultRuleSetLimits, 'tyreDiameterDecreaseMaxMm').value).toBe(26);
    // Source: one state code: ±7 % of the largest specified size (REFERENCES.md, M); off by default.
    expect(limit(defaultRuleSetLimits, 'diameterChangeMaxPercent')).toMatchObject({
      enabled: false,
      value: 7,
    });
    // Source: VSB 14 Section LS as quoted: track increase +25 mm; spacers not permitted unless maker-fitted (REFERENCES.md, M).
    expect(limit(defaultRuleSetLimits, 'trackIncreaseMaxMm').value).toBe(25);
    expect(defaultRuleSetLimits.wheelSpacersProhibited.enabled).toBe(true);
    // Source: WA Road Traffic (Vehicle Standards) Rules 2002 r46; SA rules r52: 140 km/h off-road, 180 km/h other cars (REFERENCES.md, H).
    expect(limit(defaultRuleSetLimits, 'minSpeedKmhOffRoad').value).toBe(140);
    expect(limit(defaultRuleSetLimits, 'minSpeedKmhOther').value).toBe(180);
    expect(defaultRuleSetLimits.speedSymbolOffRoadExemption.enabled).toBe(true);
    // Source: US practice, Tire and Rim Association: P-metric on light trucks derated by 1.10 (REFERENCES.md, M).
    expect(limit(defaultRuleSetLimits, 'passengerTyreLightTruckDerateFactor').value).toBe(1.1);
    // Common practice (no published source): about 25 mm diameter per 25 mm of lift.
    expect(limit(defaultRuleSetLimits, 'clearanceAllowanceMmPer25mmLift').value).toBe(25);
  });

  it('names the source of every rule, with the unit its shape requires', () => {
    for (const ruleSet of [defaultRuleSetLimits, stricterRuleSetLimits]) {
      for (const key of RULE_KEYS) {
        const rule = ruleSet[key];
        expect(rule.source.length, key).toBeGreaterThan(20);
        const shape = RULE_KEY_SHAPES[key];
        if (shape.kind === 'limit') expect(limit(ruleSet, key).unit, key).toBe(shape.unit);
        else expect('value' in rule, key).toBe(false);
      }
    }
    expect(defaultRuleSetLimits.suspensionLiftMaxMm.source).toContain('VSI 8 §13.2');
    expect(defaultRuleSetLimits.combinedLiftMaxMm.source).toContain('VSI 8 §13.3');
    expect(defaultRuleSetLimits.minSpeedKmhOffRoad.source).toContain('r46');
    expect(defaultRuleSetLimits.speedometerAccuracy.source).toContain('Regulation No. 39 §5.3');
    expect(defaultRuleSetLimits.trackIncreaseMaxMm.source).toContain('Section LS');
  });
});

describe('stricter example rule set', () => {
  it('is at least as strict as the default for every "max" limit', () => {
    const maxima = RULE_KEYS.filter((key) => /Max|max/.test(key));
    expect(maxima.length).toBeGreaterThanOrEqual(7);
    for (const key of maxima) {
      expect(limit(stricterRuleSetLimits, key).value, key).toBeLessThanOrEqual(
        limit(defaultRuleSetLimits, key).value,
      );
    }
    expect(limit(stricterRuleSetLimits, 'jointAngleThresholdDeg').value).toBeLessThan(
      limit(defaultRuleSetLimits, 'jointAngleThresholdDeg').value,
    );
    expect(stricterRuleSetLimits.placardSpeedSymbolEnforced.enabled).toBe(true);
    expect(stricterRuleSetLimits.speedSymbolOffRoadExemption.enabled).toBe(false);
    expect(stricterRuleSetLimits.diameterChangeMaxPercent.enabled).toBe(true);
    expect(stricterRuleSetLimits.suspensionLiftMaxMm.source).toContain('Illustrative');
  });
});

describe('validateRuleSetLimits', () => {
  it('accepts both seeded rule sets', () => {
    expect(validateRuleSetLimits(defaultRuleSetLimits)).toEqual({
      ok: true,
      ruleSet: defaultRuleSetLimits,
    });
    expect(validateRuleSetLimits(JSON.parse(JSON.stringify(stricterRuleSetLimits)))).toMatchObject({
      ok: true,
    });
  });

  it('names every field that is wrong', () => {
    const broken: Record<string, unknown> = JSON.parse(JSON.stringify(defaultRuleSetLimits));
    delete broken.centreBoreFit;
    broken.suspensionLiftMaxMm = { enabled: 'yes', value: -5, unit: 'in', source: '' };
    broken.jointAngleThresholdDeg = { ...defaultRuleSetLimits.jointAngleThresholdDeg, value: 95 };
    broken.passengerTyreLightTruckDerateFactor = {
      ...defaultRuleSetLimits.passengerTyreLightTruckDerateFactor,
      value: 0.9,
    };
    broken.name = '';
    broken.madeUpRule = { enabled: true, source: 'x' };
    const result = validateRuleSetLimits(broken);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors.map((error) => error.key).sort()).toEqual(
      [
        'centreBoreFit',
        'jointAngleThresholdDeg.value',
        'madeUpRule',
        'name',
        'passengerTyreLightTruckDerateFactor.value',
        'suspensionLiftMaxMm.enabled',
        'suspensionLiftMaxMm.source',
        'suspensionLiftMaxMm.unit',
        'suspensionLiftMaxMm.value',
      ].sort(),
    );
  });

  it('rejects what is not an object', () => {
    expect(validateRuleSetLimits(null)).toMatchObject({ ok: false });
    expect(validateRuleSetLimits([])).toMatchObject({ ok: false });
    expect(validateRuleSetLimits('rules')).toMatchObject({ ok: false });
  });
});

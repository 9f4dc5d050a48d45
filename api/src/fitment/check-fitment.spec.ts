import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkFitment } from './check-fitment';
import {
  tarvelleTrackerWagon,
  quillmoorKit50,
  korrinRidgebackUte,
  passingUtePackage,
  stockUte,
  trailhandWheel,
} from './fitment.fixtures';
import {
  type FitVerdict,
  type FitmentInput,
  VERDICTS_WORST_FIRST,
  worstVerdict,
} from './fitment.types';
import { defaultRuleSetLimits, stricterRuleSetLimits } from './rule-set-limits';

const LIFT_CAUTIONS = [
  'handling-and-rollover',
  'modification-limits',
  'insurer',
  'wheel-nut-retorque',
  'qualified-fitting',
  'guide-only',
];

function verdictOf(report: ReturnType<typeof checkFitment>, code: string): FitVerdict | undefined {
  return report.checks.find((check) => check.code === code)?.verdict;
}

describe('worstVerdict', () => {
  it('orders does-not-fit, needs-certification, advisory, ok', () => {
    expect(VERDICTS_WORST_FIRST).toEqual(['does-not-fit', 'needs-certification', 'advisory', 'ok']);
    expect(worstVerdict(['ok', 'advisory', 'ok'])).toBe('advisory');
    expect(worstVerdict(['advisory', 'needs-certification'])).toBe('needs-certification');
    expect(worstVerdict(['needs-certification', 'does-not-fit', 'ok'])).toBe('does-not-fit');
    expect(worstVerdict([])).toBe('ok');
  });
});

describe('checkFitment', () => {
  it('passes a package that meets every rule', () => {
    const report = checkFitment(passingUtePackage(), defaultRuleSetLimits);
    expect(report.checks.filter((check) => check.verdict !== 'ok')).toEqual([]);
    expect(report.verdict).toBe('ok');
    expect(report.checks).toHaveLength(18);
    expect(report.skippedChecks).toEqual([]);
    expect(report.ruleSetName).toBe(defaultRuleSetLimits.name);
  });

  it('takes the worst check as its verdict', () => {
    const base = passingUtePackage();
    const certification = checkFitment(
      { ...base, suspensionKit: { ...quillmoorKit50, frontLiftMm: 60 } },
      defaultRuleSetLimits,
    );
    expect(verdictOf(certification, 'suspension-lift')).toBe('needs-certification');
    expect(verdictOf(certification, 'joint-angle')).toBe('advisory');
    expect(certification.verdict).toBe('needs-certification');

    const wrongStuds = checkFitment(
      {
        ...base,
        suspensionKit: { ...quillmoorKit50, frontLiftMm: 60 },
        wheel: { ...trailhandWheel, boltPattern: { studCount: 5, pcdMm: 150 } },
      },
      defaultRuleSetLimits,
    );
    expect(wrongStuds.verdict).toBe('does-not-fit');
    expect(wrongStuds.verdict).toBe(worstVerdict(wrongStuds.checks.map((check) => check.verdict)));
  });

  it('shows every lift caution with a lift, and only the guide note without one', () => {
    // The guide note is the product's deferral to local codes and licensed practice (DESIGN.md "Fit report").
    const lifted = checkFitment(
      { vehicle: korrinRidgebackUte, suspensionKit: quillmoorKit50 },
      defaultRuleSetLimits,
    );
    expect(lifted.cautions.map((caution) => caution.code)).toEqual(LIFT_CAUTIONS);
    expect(lifted.cautions.find((caution) => caution.code === 'guide-only')?.message).toContain(
      'local codes and licensed practice decide',
    );
    expect(
      lifted.cautions.find((caution) => caution.code === 'wheel-nut-retorque')?.message,
    ).toContain('100 km');
    const biggerTyres = checkFitment(
      { vehicle: korrinRidgebackUte, tyre: { designation: '265/70R17 116S' } },
      defaultRuleSetLimits,
    );
    expect(biggerTyres.cautions.map((caution) => caution.code)).toEqual(LIFT_CAUTIONS);
    const untouched = checkFitment(stockUte(), defaultRuleSetLimits);
    expect(untouched.cautions.map((caution) => caution.code)).toEqual(['guide-only']);
    expect(untouched.verdict).toBe('ok');
  });

  it('reports the metrics of 265/65R17 → 285/70R17 with a 50 mm lift on independent front suspension', () => {
    const report = checkFitment(
      {
        vehicle: korrinRidgebackUte,
        tyre: { designation: '285/70R17 121/118Q' },
        suspensionKit: quillmoorKit50,
        wheel: { ...trailhandWheel, widthIn: 8.5, offsetMm: 20 },
      },
      defaultRuleSetLimits,
    );
    // Source: ISO 4000-1 / ETRTO nominal dimensions (REFERENCES.md, H): 776.3 → 830.8 mm, +54.5 mm.
    // Source: UN ECE Regulation No. 39 §5.3 relation (REFERENCES.md, H): 100 × 776.3 / 830.8 = 93.4 km/h indicated.
    // Source: right-triangle geometry of the half-shaft (angle = atan(rise ÷ shaft length)), derived: atan(50 / 450) = 6.3°. Track: 2 × (30 − 20) = +20 mm.
    expect(report.metrics).toEqual({
      stockDiameterMm: 776.3,
      newDiameterMm: 830.8,
      diameterChangeMm: 54.5,
      diameterChangePercent: 7,
      speedometerAtTrue100Kmh: 93.4,
      // Front diff (chassis-mounted, independent front): 27.25 + 50 mm; rear diff (leaf axle): 27.25 mm only.
      groundClearanceGainMm: 27.3,
      groundClearanceGainFrontMm: 77.3,
      groundClearanceGainRearMm: 27.3,
      combinedLiftMm: 77.3,
      trackChangeMm: 20,
      outerEdgeChangePerSideMm: 22.7,
      jointAngleAddedDeg: 6.3,
    });
    expect(report.verdict).toBe('needs-certification');
  });

  it('raises a solid axle only by half the diameter change', () => {
    // Common practice (no published source): a solid axle's diff housing moves with the wheels, so a suspension
    // lift does not raise it; 265/70R16 777.4 mm → 285/75R16 833.9 mm raises it by 28.25 mm.
    const report = checkFitment(
      {
        vehicle: tarvelleTrackerWagon,
        tyre: { designation: '285/75R16 126/123Q' },
        suspensionKit: quillmoorKit50,
      },
      defaultRuleSetLimits,
    );
    expect(report.metrics.groundClearanceGainFrontMm).toBe(28.3);
    expect(report.metrics.groundClearanceGainRearMm).toBe(28.3);
    expect(report.metrics.jointAngleAddedDeg).toBeNull();
    expect(report.skippedChecks.find((skip) => skip.code === 'joint-angle')?.reason).toBe(
      'not-applicable',
    );
    // +56.5 mm over stock on a solid front axle: a steering damper is suggested.
    expect(report.suggestedAdditions.map((addition) => addition.role)).toContain('steering-damper');
  });

  it('collects the companion additions once each, skipping what the package already has', () => {
    const report = checkFitment(
      {
        vehicle: korrinRidgebackUte,
        wheel: { ...trailhandWheel, centreBoreMm: 110.1 },
        tyre: { designation: '285/70R17 121/118Q' },
        suspensionKit: { ...quillmoorKit50, frontLiftMm: 60, rearLiftMm: 60 },
        usage: { constantLoadKg: 250 },
      },
      defaultRuleSetLimits,
    );
    const byRole = new Map(report.suggestedAdditions.map((addition) => [addition.role, addition]));
    expect([...byRole.keys()].sort()).toEqual(
      [
        'alignment',
        'diff-drop',
        'extended-brake-lines',
        'greasable-shackles',
        'headlight-re-aim',
        'hub-rings',
        'speedometer-recalibration',
        'spring-rating',
      ].sort(),
    );
    expect(report.suggestedAdditions).toHaveLength(byRole.size);
    expect(byRole.get('alignment')?.required).toBe(true);
    expect(byRole.get('speedometer-recalibration')?.required).toBe(true);
    expect(byRole.get('spring-rating')).toMatchObject({
      required: true,
      variantId: 'kit-quillmoor-50-medium',
    });
    expect(byRole.get('diff-drop')).toMatchObject({
      required: false,
      numbers: { suggestedDropMm: 10 },
    });
    expect(byRole.get('extended-brake-lines')?.required).toBe(false);

    const complete = checkFitment(
      {
        vehicle: korrinRidgebackUte,
        tyre: { designation: '285/70R17 121/118Q' },
        suspensionKit: {
          ...quillmoorKit50,
          frontLiftMm: 60,
          rearLiftMm: 60,
          includesExtendedBrakeLines: true,
          includesGreasableShackles: true,
        },
        components: [
          { role: 'alignment' },
          { role: 'diff-drop', diffDropMm: 25 },
          { role: 'headlight-re-aim' },
          { role: 'speedometer-recalibration' },
        ],
      },
      defaultRuleSetLimits,
    );
    expect(complete.suggestedAdditions).toEqual([]);
  });

  it('suggests extended brake lines only past the rule-set lift', () => {
    const roles = (liftMm: number, ruleSet = defaultRuleSetLimits) =>
      checkFitment(
        {
          vehicle: korrinRidgebackUte,
          suspensionKit: { ...quillmoorKit50, frontLiftMm: liftMm, rearLiftMm: liftMm },
        },
        ruleSet,
      ).suggestedAdditions.map((addition) => addition.role);
    // Common practice (no published source): extended brake lines past a 50 mm lift (rule-set data).
    expect(roles(50)).not.toContain('extended-brake-lines');
    expect(roles(55)).toContain('extended-brake-lines');
    expect(roles(45, stricterRuleSetLimits)).toContain('extended-brake-lines');
  });

  it('does not run a check the rule set switches off', () => {
    const ruleSet = {
      ...defaultRuleSetLimits,
      suspensionLiftMaxMm: { ...defaultRuleSetLimits.suspensionLiftMaxMm, enabled: false },
    };
    const report = checkFitment(
      { vehicle: korrinRidgebackUte, suspensionKit: { ...quillmoorKit50, frontLiftMm: 70 } },
      ruleSet,
    );
    expect(report.checks.map((check) => check.code)).not.toContain('suspension-lift');
    expect(report.skippedChecks).toContainEqual({
      code: 'suspension-lift',
      reason: 'disabled-by-rule-set',
      message: 'This check is switched off in the rule set.',
    });
    const strict = checkFitment(
      { vehicle: korrinRidgebackUte, suspensionKit: { ...quillmoorKit50, frontLiftMm: 70 } },
      defaultRuleSetLimits,
    );
    expect(verdictOf(strict, 'suspension-lift')).toBe('needs-certification');
  });

  it('reports an unreadable tyre size instead of throwing', () => {
    const report = checkFitment(
      { vehicle: korrinRidgebackUte, tyre: { designation: '265/70-17' } },
      defaultRuleSetLimits,
    );
    expect(report.verdict).toBe('does-not-fit');
    const designation = report.checks.find((check) => check.code === 'tyre-designation');
    expect(designation?.message).toContain('265/70-17');
    expect(
      report.skippedChecks
        .filter((skip) => skip.reason === 'missing-data')
        .map((skip) => skip.code),
    ).toEqual(
      expect.arrayContaining([
        'tyre-load-capacity',
        'speed-symbol',
        'tyre-diameter-change',
        'speedometer',
        'combined-lift',
      ]),
    );
    const badVehicle = checkFitment(
      { vehicle: { ...korrinRidgebackUte, stockTyre: 'unknown' } },
      defaultRuleSetLimits,
    );
    expect(badVehicle.checks.find((check) => check.code === 'tyre-designation')?.verdict).toBe(
      'advisory',
    );
  });

  it('reads the stricter rule set differently from the default', () => {
    const input: FitmentInput = {
      ...passingUtePackage(),
      tyre: { designation: '265/70R17 121/118Q' },
    };
    expect(checkFitment(input, defaultRuleSetLimits).verdict).toBe('advisory');
    const strict = checkFitment(input, stricterRuleSetLimits);
    expect(strict.verdict).toBe('does-not-fit');
    expect(verdictOf(strict, 'speed-symbol')).toBe('does-not-fit');
    expect(verdictOf(strict, 'suspension-lift')).toBe('needs-certification');
  });

  describe('properties', () => {
    const inputArb = fc.record({
      designation: fc.oneof(
        fc.constantFrom(
          '265/70R17 121/118Q',
          '285/70R17 116S',
          '265/65R17 112S',
          '33x12.50R17LT 114Q',
          '35x12.50R17 121Q',
          'P265/70R17 113T',
          '255/55R17 104H',
        ),
        fc.string(),
      ),
      frontLiftMm: fc.integer({ min: -60, max: 120 }),
      rearLiftMm: fc.integer({ min: -60, max: 120 }),
      offsetMm: fc.integer({ min: -40, max: 50 }),
      widthIn: fc.integer({ min: 12, max: 24 }).map((halves) => halves / 2),
      loadKg: fc.integer({ min: 0, max: 900 }),
      diffDropMm: fc.integer({ min: 0, max: 40 }),
      strict: fc.boolean(),
    });

    it('never throws, and its verdict is always the worst of its checks', () => {
      fc.assert(
        fc.property(inputArb, (values) => {
          const report = checkFitment(
            {
              vehicle: korrinRidgebackUte,
              tyre: { designation: values.designation },
              wheel: { ...trailhandWheel, offsetMm: values.offsetMm, widthIn: values.widthIn },
              suspensionKit: {
                ...quillmoorKit50,
                frontLiftMm: values.frontLiftMm,
                rearLiftMm: values.rearLiftMm,
              },
              components:
                values.diffDropMm > 0 ? [{ role: 'diff-drop', diffDropMm: values.diffDropMm }] : [],
              usage: { constantLoadKg: values.loadKg },
            },
            values.strict ? stricterRuleSetLimits : defaultRuleSetLimits,
          );
          expect(report.verdict).toBe(worstVerdict(report.checks.map((check) => check.verdict)));
          expect(report.checks.length + report.skippedChecks.length).toBeGreaterThanOrEqual(18);
          if (values.frontLiftMm !== 0 || values.rearLiftMm !== 0) {
            expect(report.suggestedAdditions.map((addition) => addition.role)).toContain(
              'alignment',
            );
          }
          expect(report.cautions.at(-1)?.code).toBe('guide-only');
          for (const check of report.checks) {
            expect(check.message.length).toBeGreaterThan(10);
            if (check.code !== 'tyre-designation')
              expect(check.rule.source.length).toBeGreaterThan(10);
            for (const value of Object.values(check.numbers))
              expect(Number.isFinite(value)).toBe(true);
          }
        }),
        { numRuns: 400 },
      );
    });
  });
});

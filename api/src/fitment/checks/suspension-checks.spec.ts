import { describe, expect, it } from 'vitest';
import { buildFitmentContext } from '../fitment-context';
import {
  tarvelleTrackerWagon,
  quillmoorKit50,
  korrinRidgebackUte,
  ranCheck,
  skippedCheck,
} from '../fitment.fixtures';
import type { FitmentInput, SuspensionKitSpec } from '../fitment.types';
import {
  type RuleSetLimits,
  defaultRuleSetLimits,
  stricterRuleSetLimits,
} from '../rule-set-limits';
import {
  checkAlignment,
  checkCombinedLift,
  checkJointAngle,
  checkSpringRating,
  checkSuspensionLift,
} from './suspension-checks';

function withKit(kit: Partial<SuspensionKitSpec>, extra: Partial<FitmentInput> = {}) {
  return buildFitmentContext({
    vehicle: korrinRidgebackUte,
    suspensionKit: { ...quillmoorKit50, ...kit },
    ...extra,
  });
}

function rules(overrides: Partial<RuleSetLimits>): RuleSetLimits {
  return { ...defaultRuleSetLimits, ...overrides };
}

describe('suspension lift', () => {
  // Source: VicRoads VSI 8 §13.2 quoting VSB 14 Section LS: raised or lowered up to 50 mm without
  // certification, keeping at least two thirds of the original travel (REFERENCES.md, M).
  it('passes a 50 mm lift', () => {
    // Source: VicRoads VSI 8 §13.2 quoting VSB 14 Section LS: up to 50 mm without certification.
    expect(ranCheck(checkSuspensionLift(withKit({}), defaultRuleSetLimits))).toMatchObject({
      verdict: 'ok',
      numbers: { limitMm: 50 },
    });
  });

  it('needs certification past 50 mm, raised or lowered', () => {
    // Source: VicRoads VSI 8 §13.2 quoting VSB 14 Section LS: raised or lowered up to 50 mm.
    expect(
      ranCheck(checkSuspensionLift(withKit({ frontLiftMm: 60 }), defaultRuleSetLimits)).verdict,
    ).toBe('needs-certification');
    expect(
      ranCheck(
        checkSuspensionLift(withKit({ frontLiftMm: -55, rearLiftMm: -55 }), defaultRuleSetLimits),
      ).verdict,
    ).toBe('needs-certification');
  });

  it('needs certification when less than two thirds of the travel remains', () => {
    // Source: VicRoads VSI 8 §13.2: keeping at least two thirds of the original travel.
    const check = ranCheck(
      checkSuspensionLift(withKit({ keepsTwoThirdsTravel: false }), defaultRuleSetLimits),
    );
    expect(check.verdict).toBe('needs-certification');
    expect(check.message).toContain('two thirds');
  });

  it('is re-limited by the stricter rule set and skipped without a kit', () => {
    expect(ranCheck(checkSuspensionLift(withKit({}), stricterRuleSetLimits)).verdict).toBe(
      'needs-certification',
    );
    expect(
      skippedCheck(
        checkSuspensionLift(
          buildFitmentContext({ vehicle: korrinRidgebackUte }),
          defaultRuleSetLimits,
        ),
      ).reason,
    ).toBe('not-applicable');
  });
});

describe('combined lift', () => {
  // Source: VicRoads VSI 8 §13.3: combined lift up to 75 mm, the tyres counting half their diameter increase (REFERENCES.md, M).
  it('passes 50 mm + half of +26.5 mm = 63.3 mm', () => {
    // Source: VicRoads VSI 8 §13.3: up to 75 mm; ISO 4000-1 / ETRTO: 265/65R17 776.3 mm → 265/70R17 802.8 mm.
    const check = ranCheck(
      checkCombinedLift(
        withKit({}, { tyre: { designation: '265/70R17 116S' } }),
        defaultRuleSetLimits,
      ),
    );
    expect(check).toMatchObject({
      verdict: 'ok',
      numbers: { tyreContributionMm: 13.3, combinedLiftMm: 63.3, limitMm: 75 },
    });
  });

  it('needs certification for 50 mm + half of +54.5 mm = 77.25 mm', () => {
    // Source: VicRoads VSI 8 §13.3: up to 75 mm; REFERENCES.md boundary example: 265/65R17 → 285/70R17 is +54.5 mm.
    const context = withKit({}, { tyre: { designation: '285/70R17 121/118Q' } });
    expect(ranCheck(checkCombinedLift(context, defaultRuleSetLimits)).verdict).toBe(
      'needs-certification',
    );
    // At exactly the limit it passes: the limit is "up to".
    const atLimit = rules({
      combinedLiftMaxMm: { ...defaultRuleSetLimits.combinedLiftMaxMm, value: 77.25 },
    });
    expect(ranCheck(checkCombinedLift(context, atLimit)).verdict).toBe('ok');
  });

  it('counts only a diameter increase, and runs for tyres alone', () => {
    const smaller = buildFitmentContext({
      vehicle: korrinRidgebackUte,
      tyre: { designation: '265/60R17 116S' },
    });
    expect(ranCheck(checkCombinedLift(smaller, defaultRuleSetLimits)).numbers).toMatchObject({
      tyreContributionMm: 0,
      combinedLiftMm: 0,
    });
    expect(
      skippedCheck(
        checkCombinedLift(
          buildFitmentContext({ vehicle: korrinRidgebackUte }),
          defaultRuleSetLimits,
        ),
      ).reason,
    ).toBe('not-applicable');
  });
});

describe('front drive-shaft joint angle', () => {
  // Source: right-triangle geometry of the half-shaft (angle = atan(rise ÷ shaft length)), derived: atan(Δh / L); 50 mm on 450 mm ≈ +6.3°;
  // a drop d reduces it to atan((Δh − d) / L). The threshold is rule-set data (common practice, no published source).
  it('passes 50 mm on a 450 mm shaft (6.3°) under a 6.5° threshold', () => {
    // Source: right-triangle geometry of the half-shaft (angle = atan(rise ÷ shaft length)), derived: 50 mm on a 450 mm shaft ≈ +6.3°.
    const check = ranCheck(checkJointAngle(withKit({}), defaultRuleSetLimits));
    expect(check).toMatchObject({
      verdict: 'ok',
      numbers: { addedAngleDeg: 6.3, thresholdDeg: 6.5 },
    });
  });

  it('suggests a diff drop past the threshold', () => {
    const outcome = checkJointAngle(withKit({ frontLiftMm: 60 }), defaultRuleSetLimits);
    // atan(60 / 450) = 7.6°; the drop needed is 60 − 450 × tan 6.5° = 8.7 mm, suggested as 10 mm.
    expect(ranCheck(outcome)).toMatchObject({
      verdict: 'advisory',
      numbers: { addedAngleDeg: 7.6, suggestedDropMm: 10 },
    });
    expect(outcome.ran && outcome.additions).toEqual([
      expect.objectContaining({
        role: 'diff-drop',
        required: false,
        numbers: { suggestedDropMm: 10 },
      }),
    ]);
  });

  it('counts a diff drop in the package: 25 mm roughly halves the angle', () => {
    // Source: right-triangle geometry of the half-shaft (angle = atan(rise ÷ shaft length)), derived: atan((50 − 25) / 450) = 3.2°, about half of 6.3°.
    const check = ranCheck(
      checkJointAngle(
        withKit({}, { components: [{ role: 'diff-drop', diffDropMm: 25 }] }),
        stricterRuleSetLimits,
      ),
    );
    expect(check).toMatchObject({
      verdict: 'ok',
      numbers: { angleWithoutDropDeg: 6.3, addedAngleDeg: 3.2 },
    });
    expect(ranCheck(checkJointAngle(withKit({}), stricterRuleSetLimits)).verdict).toBe('advisory');
  });

  it('does not apply to a solid front axle or without a front lift', () => {
    const solid = buildFitmentContext({
      vehicle: tarvelleTrackerWagon,
      suspensionKit: quillmoorKit50,
    });
    expect(skippedCheck(checkJointAngle(solid, defaultRuleSetLimits)).reason).toBe(
      'not-applicable',
    );
    expect(
      skippedCheck(checkJointAngle(withKit({ frontLiftMm: 0 }), defaultRuleSetLimits)).reason,
    ).toBe('not-applicable');
  });

  it('is an advisory when the half-shaft length is not recorded', () => {
    const unknownShaft = buildFitmentContext({
      vehicle: { ...korrinRidgebackUte, frontHalfShaftLengthMm: undefined },
      suspensionKit: quillmoorKit50,
    });
    expect(ranCheck(checkJointAngle(unknownShaft, defaultRuleSetLimits)).verdict).toBe('advisory');
  });
});

describe('spring rating for the declared constant load', () => {
  // Source: Hooke's law for springs (deflection = load ÷ rate); kit constant-load rating as the suspension trade states it: a kit's constant-load rating is the permanent extra mass at which it reaches its stated ride height.
  it('passes a load inside the kit rating', () => {
    // Source: Hooke's law for springs (deflection = load ÷ rate); kit constant-load rating as the suspension trade states it: the kit's constant-load rating must cover the permanent extra mass.
    const check = ranCheck(
      checkSpringRating(withKit({}, { usage: { constantLoadKg: 150 } }), defaultRuleSetLimits),
    );
    expect(check).toMatchObject({
      verdict: 'ok',
      numbers: { declaredLoadKg: 150, kitConstantLoadMaxKg: 150 },
    });
  });

  it('fails a load outside it and picks the variant that covers it', () => {
    // Source: Hooke's law for springs (deflection = load ÷ rate); kit constant-load rating as the suspension trade states it: 250 kg is outside 0–150 kg and inside the 150–300 kg rating.
    const outcome = checkSpringRating(
      withKit({}, { usage: { constantLoadKg: 250 } }),
      defaultRuleSetLimits,
    );
    expect(ranCheck(outcome).verdict).toBe('does-not-fit');
    expect(outcome.ran && outcome.additions).toEqual([
      expect.objectContaining({
        role: 'spring-rating',
        required: true,
        variantId: 'kit-quillmoor-50-medium',
      }),
    ]);
  });

  it('says so when no variant covers the load', () => {
    const outcome = checkSpringRating(
      withKit({}, { usage: { constantLoadKg: 700 } }),
      defaultRuleSetLimits,
    );
    expect(ranCheck(outcome).verdict).toBe('does-not-fit');
    expect(ranCheck(outcome).message).toContain('No rating of this kit covers it');
    expect(outcome.ran && outcome.additions).toEqual([]);
  });
});

describe('alignment after a change', () => {
  // Common practice (no published source): a wheel alignment after any suspension or tyre-size change.
  it('adds a required alignment after a suspension change', () => {
    // Common practice (no published source): alignment after any suspension change.
    const outcome = checkAlignment(withKit({}), defaultRuleSetLimits);
    expect(ranCheck(outcome).verdict).toBe('advisory');
    expect(outcome.ran && outcome.additions).toEqual([
      expect.objectContaining({ role: 'alignment', required: true }),
    ]);
  });

  it('adds it after a tyre-size change, not after same-size tyres', () => {
    // Common practice (no published source): alignment after a tyre-size change.
    const bigger = buildFitmentContext({
      vehicle: korrinRidgebackUte,
      tyre: { designation: '265/70R17 116S' },
    });
    expect(ranCheck(checkAlignment(bigger, defaultRuleSetLimits)).verdict).toBe('advisory');
    const sameSize = buildFitmentContext({
      vehicle: korrinRidgebackUte,
      tyre: { designation: '265/65R17 116T' },
    });
    const outcome = checkAlignment(sameSize, defaultRuleSetLimits);
    expect(ranCheck(outcome).verdict).toBe('ok');
    expect(outcome.ran && outcome.additions).toEqual([]);
  });

  it('is satisfied by an alignment already in the package', () => {
    const outcome = checkAlignment(
      withKit({}, { components: [{ role: 'alignment' }] }),
      defaultRuleSetLimits,
    );
    expect(ranCheck(outcome).verdict).toBe('ok');
    expect(outcome.ran && outcome.additions).toEqual([]);
  });
});

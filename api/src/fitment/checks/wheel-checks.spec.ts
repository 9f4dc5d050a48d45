import { describe, expect, it } from 'vitest';
import { buildFitmentContext } from '../fitment-context';
import {
  korrinRidgebackUte,
  ranCheck,
  skippedCheck,
  stockUte,
  trailhandWheel,
} from '../fitment.fixtures';
import type { ComponentSpec, FitmentInput, WheelSpec } from '../fitment.types';
import { type RuleSetLimits, defaultRuleSetLimits } from '../rule-set-limits';
import {
  checkBoltPattern,
  checkCentreBore,
  checkStudThread,
  checkWheelLoadRating,
  checkWheelTrackChange,
  hubRingsMatch,
  normaliseThread,
  parseMetricThread,
} from './wheel-checks';

function withWheel(wheel: Partial<WheelSpec>, input: FitmentInput = stockUte()) {
  return buildFitmentContext({ ...input, wheel: { ...trailhandWheel, ...wheel } });
}

function rules(overrides: Partial<RuleSetLimits>): RuleSetLimits {
  return { ...defaultRuleSetLimits, ...overrides };
}

describe('bolt pattern', () => {
  it('passes a 6x139.7 wheel on a 6x139.7 hub', () => {
    const check = ranCheck(checkBoltPattern(withWheel({}), defaultRuleSetLimits));
    expect(check).toMatchObject({
      code: 'bolt-pattern',
      verdict: 'ok',
      numbers: { wheelPcdMm: 139.7, vehicleStudCount: 6 },
    });
    expect(check.rule.source).toBe(defaultRuleSetLimits.boltPatternMatch.source);
  });

  it('fails a different PCD or stud count', () => {
    const pcd = ranCheck(
      checkBoltPattern(
        withWheel({ boltPattern: { studCount: 6, pcdMm: 114.3 } }),
        defaultRuleSetLimits,
      ),
    );
    expect(pcd.verdict).toBe('does-not-fit');
    expect(pcd.message).toContain('6x114.3');
    expect(pcd.message).toContain('6x139.7');
    const studs = checkBoltPattern(
      withWheel({ boltPattern: { studCount: 5, pcdMm: 139.7 } }),
      defaultRuleSetLimits,
    );
    expect(ranCheck(studs).verdict).toBe('does-not-fit');
  });

  it('does not run with the stock wheels, or when switched off', () => {
    expect(
      skippedCheck(checkBoltPattern(buildFitmentContext(stockUte()), defaultRuleSetLimits)).reason,
    ).toBe('not-applicable');
    const off = rules({
      boltPatternMatch: { ...defaultRuleSetLimits.boltPatternMatch, enabled: false },
    });
    const wrong = withWheel({ boltPattern: { studCount: 5, pcdMm: 150 } });
    expect(skippedCheck(checkBoltPattern(wrong, off)).reason).toBe('disabled-by-rule-set');
  });
});

describe('centre bore', () => {
  it('passes a bore equal to the hub', () => {
    expect(
      ranCheck(checkCentreBore(withWheel({ centreBoreMm: 106.1 }), defaultRuleSetLimits)).verdict,
    ).toBe('ok');
  });

  it('advises hub-centric rings for a larger bore, with the ring sizes to look for', () => {
    const outcome = checkCentreBore(withWheel({ centreBoreMm: 110.1 }), defaultRuleSetLimits);
    expect(ranCheck(outcome)).toMatchObject({ verdict: 'advisory', numbers: { differenceMm: 4 } });
    expect(ranCheck(outcome).message).toContain('hub-centric rings (110.1 → 106.1 mm)');
    // Common practice (no published source): the ring's outer side fits the wheel's bore and its
    // inner side the hub, so 110.1 mm bore on a 106.1 mm hub takes 110.1 → 106.1 mm rings.
    expect(outcome.ran && outcome.additions).toEqual([
      expect.objectContaining({
        role: 'hub-rings',
        required: false,
        numbers: { wheelBoreMm: 110.1, hubBoreMm: 106.1, ringOuterMm: 110.1, ringInnerMm: 106.1 },
      }),
    ]);
  });

  it('fails a bore smaller than the hub', () => {
    expect(
      ranCheck(checkCentreBore(withWheel({ centreBoreMm: 100 }), defaultRuleSetLimits)).verdict,
    ).toBe('does-not-fit');
  });

  describe('with hub-centric rings in the package', () => {
    /** The ute on a 108.1 mm hub, a 110.1 mm bore wheel and these rings. */
    function ringed(rings: ComponentSpec[], wheel: Partial<WheelSpec> = { centreBoreMm: 110.1 }) {
      return withWheel(wheel, {
        vehicle: { ...korrinRidgebackUte, centreBoreMm: 108.1 },
        components: rings,
      });
    }
    const rings = (ringOuterMm: number, ringInnerMm: number): ComponentSpec => ({
      role: 'hub-rings',
      name: `Rings ${ringOuterMm} to ${ringInnerMm}`,
      ringOuterMm,
      ringInnerMm,
    });

    it('says matching rings centre the wheel, and suggests no more rings', () => {
      // Common practice (no published source): 110.1 → 108.1 mm rings centre a 110.1 mm bore
      // wheel on a 108.1 mm hub.
      const outcome = checkCentreBore(ringed([rings(110.1, 108.1)]), defaultRuleSetLimits);
      const check = ranCheck(outcome);
      expect(check).toMatchObject({
        verdict: 'advisory',
        numbers: {
          hubBoreMm: 108.1,
          wheelBoreMm: 110.1,
          differenceMm: 2,
          ringOuterMm: 110.1,
          ringInnerMm: 108.1,
        },
        rule: { keys: ['centreBoreFit'] },
      });
      expect(check.message).toContain('the hub-centric rings (110.1 → 108.1 mm) centre the wheel');
      expect(outcome.ran && outcome.additions).toEqual([]);
    });

    it('accepts ring sizes within the bore tolerance of 0.05 mm', () => {
      const within = ranCheck(
        checkCentreBore(
          ringed([rings(110.1, 108.1)], { centreBoreMm: 110.14 }),
          defaultRuleSetLimits,
        ),
      );
      expect(within.verdict).toBe('advisory');
      const past = ranCheck(
        checkCentreBore(
          ringed([rings(110.1, 108.1)], { centreBoreMm: 110.16 }),
          defaultRuleSetLimits,
        ),
      );
      expect(past.verdict).toBe('does-not-fit');
    });

    it('refuses rings whose inner side does not match the hub (110.1 → 106.1 mm on 108.1 mm)', () => {
      // Common practice (no published source): a 106.1 mm ring does not go over a 108.1 mm hub.
      const outcome = checkCentreBore(ringed([rings(110.1, 106.1)]), defaultRuleSetLimits);
      const check = ranCheck(outcome);
      expect(check.verdict).toBe('does-not-fit');
      expect(check.message).toBe(
        'The hub-centric rings (110.1 → 106.1 mm) do not match this wheel and hub (110.1 → 108.1 mm): choose rings of those sizes.',
      );
      expect(check.numbers).toMatchObject({ ringOuterMm: 110.1, ringInnerMm: 106.1 });
      expect(outcome.ran && outcome.additions).toEqual([]);
    });

    it('refuses rings whose outer side does not match the wheel bore', () => {
      // Common practice (no published source): a 112.1 mm ring does not go into a 110.1 mm bore,
      // and a 108.5 mm ring leaves the wheel loose on it.
      for (const wrong of [rings(112.1, 108.1), rings(108.5, 108.1)]) {
        const check = ranCheck(checkCentreBore(ringed([wrong]), defaultRuleSetLimits));
        expect(check.verdict).toBe('does-not-fit');
        expect(check.message).toContain('do not match this wheel and hub (110.1 → 108.1 mm)');
        expect(check.numbers.ringOuterMm).toBe(wrong.ringOuterMm);
      }
    });

    it('refuses a package with one matching and one wrong set, naming the wrong one', () => {
      const check = ranCheck(
        checkCentreBore(ringed([rings(110.1, 108.1), rings(110.1, 106.1)]), defaultRuleSetLimits),
      );
      expect(check.verdict).toBe('does-not-fit');
      expect(check.message).toContain('(110.1 → 106.1 mm) do not match');
    });

    it('says rings are not needed when the wheel bore matches the hub', () => {
      const check = ranCheck(
        checkCentreBore(
          ringed([rings(110.1, 108.1)], { centreBoreMm: 108.1 }),
          defaultRuleSetLimits,
        ),
      );
      expect(check.verdict).toBe('advisory');
      expect(check.message).toBe(
        "The wheel's centre bore matches the hub (108.1 mm): the hub-centric rings (110.1 → 108.1 mm) are not needed.",
      );
    });

    it('says rings are not needed with the stock wheels (the check runs for them)', () => {
      const input: FitmentInput = {
        vehicle: { ...korrinRidgebackUte, centreBoreMm: 108.1 },
        components: [rings(110.1, 108.1)],
      };
      const check = ranCheck(checkCentreBore(buildFitmentContext(input), defaultRuleSetLimits));
      expect(check).toMatchObject({
        verdict: 'advisory',
        numbers: { hubBoreMm: 108.1, ringOuterMm: 110.1, ringInnerMm: 108.1 },
      });
      expect(check.message).toContain('are not needed');
      expect(
        skippedCheck(checkCentreBore(buildFitmentContext(stockUte()), defaultRuleSetLimits)).reason,
      ).toBe('not-applicable');
    });

    it('does not make a bore smaller than the hub fit', () => {
      const check = ranCheck(
        checkCentreBore(
          ringed([rings(110.1, 108.1)], { centreBoreMm: 106.1 }),
          defaultRuleSetLimits,
        ),
      );
      expect(check.verdict).toBe('does-not-fit');
      expect(check.message).toContain('smaller than the hub');
    });

    it('advises checking rings whose sizes are not recorded', () => {
      const check = ranCheck(
        checkCentreBore(ringed([{ role: 'hub-rings', name: 'Old rings' }]), defaultRuleSetLimits),
      );
      expect(check.verdict).toBe('advisory');
      expect(check.message).toContain('could not be checked');
      expect(check.message).toContain('110.1 → 108.1 mm');
    });

    it('is skipped when the rule set switches it off', () => {
      const off = rules({
        centreBoreFit: { ...defaultRuleSetLimits.centreBoreFit, enabled: false },
      });
      expect(skippedCheck(checkCentreBore(ringed([rings(110.1, 106.1)]), off)).reason).toBe(
        'disabled-by-rule-set',
      );
    });
  });

  describe('hubRingsMatch', () => {
    it('needs both sides within 0.05 mm', () => {
      const sizes = { ringOuterMm: 110.1, ringInnerMm: 108.1 };
      expect(hubRingsMatch(sizes, 110.1, 108.1)).toBe(true);
      expect(hubRingsMatch(sizes, 110.1, 108.14)).toBe(true);
      expect(hubRingsMatch(sizes, 110.1, 106.1)).toBe(false);
      expect(hubRingsMatch(sizes, 112.1, 108.1)).toBe(false);
    });
  });
});

describe('stud thread', () => {
  it('reads thread notations alike', () => {
    expect(normaliseThread('m12 x 1.5')).toBe('M12X1.5');
    expect(parseMetricThread('M14×1.50')).toEqual({ diameterMm: 14, pitchMm: 1.5 });
    expect(parseMetricThread('1/2-20 UNF')).toBeNull();
  });

  it('passes matching threads written differently', () => {
    expect(
      ranCheck(checkStudThread(withWheel({ studThread: 'm12 x 1.5' }), defaultRuleSetLimits))
        .verdict,
    ).toBe('ok');
  });

  it('fails M14x1.5 nuts on M12x1.5 studs', () => {
    const check = ranCheck(
      checkStudThread(withWheel({ studThread: 'M14x1.5' }), defaultRuleSetLimits),
    );
    expect(check).toMatchObject({
      verdict: 'does-not-fit',
      numbers: { vehicleThreadDiameterMm: 12, wheelThreadDiameterMm: 14 },
    });
    expect(
      ranCheck(checkStudThread(withWheel({ studThread: 'M12x1.25' }), defaultRuleSetLimits))
        .verdict,
    ).toBe('does-not-fit');
  });
});

describe('wheel load rating', () => {
  // Common practice (no published source): each wheel rated for at least half the heaviest axle (1900 kg rear → 950 kg).
  it('passes a wheel rated for half the heaviest axle', () => {
    const check = ranCheck(
      checkWheelLoadRating(withWheel({ loadRatingKg: 950 }), defaultRuleSetLimits),
    );
    expect(check).toMatchObject({
      verdict: 'ok',
      numbers: { requiredPerWheelKg: 950, wheelLoadRatingKg: 950 },
    });
  });

  it('fails a wheel rated below it', () => {
    expect(
      ranCheck(checkWheelLoadRating(withWheel({ loadRatingKg: 949 }), defaultRuleSetLimits))
        .verdict,
    ).toBe('does-not-fit');
  });

  it('shares the rear axle over four wheels with dual rear wheels', () => {
    const dual: FitmentInput = { vehicle: { ...korrinRidgebackUte, dualRearWheels: true } };
    // Front 1350 / 2 = 675 kg now decides (rear 1900 / 4 = 475 kg).
    const check = ranCheck(
      checkWheelLoadRating(withWheel({ loadRatingKg: 700 }, dual), defaultRuleSetLimits),
    );
    expect(check).toMatchObject({ verdict: 'ok', numbers: { requiredPerWheelKg: 675 } });
  });
});

describe('wheel track change', () => {
  it('reports the 7J ET+30 → 8J ET0 example: +60 mm track, +42.7 mm outer edge', () => {
    // Source: the definition of wheel offset (ET, Einpresstiefe: mounting face to rim centreline, positive outboard); track formula derived from it: track +60 mm, outer edge +42.7 mm per side.
    const input: FitmentInput = {
      vehicle: { ...korrinRidgebackUte, stockWheel: { diameterIn: 17, widthIn: 7, offsetMm: 30 } },
    };
    const check = ranCheck(
      checkWheelTrackChange(withWheel({ widthIn: 8, offsetMm: 0 }, input), defaultRuleSetLimits),
    );
    expect(check.numbers).toMatchObject({
      trackChangeMm: 60,
      outerEdgeChangePerSideMm: 42.7,
      limitMm: 25,
    });
    // Source: VSB 14 Section LS as quoted: wheel track increase up to +25 mm (REFERENCES.md, M).
    expect(check.verdict).toBe('needs-certification');
    expect(check.rule.source).toBe(defaultRuleSetLimits.trackIncreaseMaxMm.source);
  });

  it('passes a track increase at the limit and fails one just past it', () => {
    // Stock ET+30: ET+17.5 widens the track 25 mm (at the limit), ET+17 widens it 26 mm.
    expect(
      ranCheck(checkWheelTrackChange(withWheel({ offsetMm: 17.5 }), defaultRuleSetLimits)).verdict,
    ).toBe('ok');
    expect(
      ranCheck(checkWheelTrackChange(withWheel({ offsetMm: 17 }), defaultRuleSetLimits)).verdict,
    ).toBe('needs-certification');
  });

  it('can be re-limited by the rule set', () => {
    const offRoadState = rules({
      trackIncreaseMaxMm: { ...defaultRuleSetLimits.trackIncreaseMaxMm, value: 50 },
    });
    expect(ranCheck(checkWheelTrackChange(withWheel({ offsetMm: 10 }), offRoadState)).verdict).toBe(
      'ok',
    );
    expect(
      ranCheck(checkWheelTrackChange(withWheel({ offsetMm: 10 }), defaultRuleSetLimits)).verdict,
    ).toBe('needs-certification');
  });

  it('does not permit wheel spacers unless the rule set allows them', () => {
    // Source: VSB 14 Section LS as quoted: wheel spacers not permitted unless fitted by the maker (REFERENCES.md, M).
    const spaced = withWheel({ offsetMm: 25, isSpacer: true });
    expect(ranCheck(checkWheelTrackChange(spaced, defaultRuleSetLimits)).verdict).toBe(
      'does-not-fit',
    );
    const allowed = rules({
      wheelSpacersProhibited: { ...defaultRuleSetLimits.wheelSpacersProhibited, enabled: false },
    });
    expect(ranCheck(checkWheelTrackChange(spaced, allowed)).verdict).toBe('ok');
  });

  it('is skipped when both of its rules are off', () => {
    const off = rules({
      trackIncreaseMaxMm: { ...defaultRuleSetLimits.trackIncreaseMaxMm, enabled: false },
      wheelSpacersProhibited: { ...defaultRuleSetLimits.wheelSpacersProhibited, enabled: false },
    });
    expect(skippedCheck(checkWheelTrackChange(withWheel({ offsetMm: -20 }), off)).reason).toBe(
      'disabled-by-rule-set',
    );
  });
});

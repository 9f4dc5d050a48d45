/**
 * Checks of the suspension change: suspension lift, combined lift, front drive-shaft joint angle,
 * spring rating for the declared constant load and the alignment that follows any change.
 */
import { checked, show, showSigned, skipped, switchedOff } from '../check-outcome';
import {
  type FitmentContext,
  combinedLiftMm,
  diameterChangeOverStockMm,
  diameterIncreaseOverRuleBaseMm,
} from '../fitment-context';
import type { CheckOutcome, SuspensionKitVariant } from '../fitment.types';
import { addedHalfShaftAngleDeg, diffDropNeededMm } from '../joint-angle';
import type { RuleSetLimits } from '../rule-set-limits';

/** Diff-drop suggestions are rounded up to this step, mm. */
const DIFF_DROP_STEP_MM = 5;

export function checkSuspensionLift(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'suspension-lift';
  const limit = ruleSet.suspensionLiftMaxMm;
  if (!limit.enabled) return switchedOff(code);
  const kit = context.input.suspensionKit;
  if (!kit) return skipped(code, 'not-applicable', 'The suspension is not changed.');
  const largestChangeMm = Math.max(Math.abs(kit.frontLiftMm), Math.abs(kit.rearLiftMm));
  const numbers = {
    frontLiftMm: kit.frontLiftMm,
    rearLiftMm: kit.rearLiftMm,
    largestChangeMm,
    limitMm: limit.value,
  };
  const described = `The kit changes the ride height by ${showSigned(kit.frontLiftMm)} mm at the front and ${showSigned(kit.rearLiftMm)} mm at the rear`;
  if (largestChangeMm > limit.value) {
    return checked(ruleSet, {
      code,
      verdict: 'needs-certification',
      message: `${described}: more than the ${show(limit.value)} mm allowed without certification, so the vehicle needs an engineer's certificate.`,
      numbers,
      keys: ['suspensionLiftMaxMm'],
    });
  }
  if (kit.keepsTwoThirdsTravel === false) {
    return checked(ruleSet, {
      code,
      verdict: 'needs-certification',
      message: `${described}, but it keeps less than two thirds of the original suspension travel, so the vehicle needs an engineer's certificate.`,
      numbers,
      keys: ['suspensionLiftMaxMm'],
    });
  }
  return checked(ruleSet, {
    code,
    verdict: 'ok',
    message: `${described}: within the ${show(limit.value)} mm allowed without certification.`,
    numbers,
    keys: ['suspensionLiftMaxMm'],
  });
}

export function checkCombinedLift(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'combined-lift';
  const limit = ruleSet.combinedLiftMaxMm;
  if (!limit.enabled) return switchedOff(code);
  if (!context.input.suspensionKit && !context.tyreReplaced) {
    return skipped(code, 'not-applicable', 'Neither the suspension nor the tyres change.');
  }
  if (context.tyreReplaced && context.newTyre === null) {
    return skipped(
      code,
      'missing-data',
      'The new tyre size could not be read, so this was not checked.',
    );
  }
  const increaseMm = diameterIncreaseOverRuleBaseMm(context) ?? 0;
  const tyreContributionMm = Math.max(0, increaseMm) / 2;
  const totalMm = combinedLiftMm(context);
  const numbers = {
    suspensionLiftMm: context.suspensionLiftMm,
    tyreDiameterIncreaseMm: increaseMm,
    tyreContributionMm,
    combinedLiftMm: totalMm,
    limitMm: limit.value,
  };
  const described = `Suspension lift ${show(context.suspensionLiftMm)} mm plus half the tyre diameter increase (${show(tyreContributionMm)} mm) makes a combined lift of ${show(totalMm)} mm`;
  const over = totalMm > limit.value;
  return checked(ruleSet, {
    code,
    verdict: over ? 'needs-certification' : 'ok',
    message: over
      ? `${described}: over the ${show(limit.value)} mm limit, so the vehicle needs an engineer's certificate.`
      : `${described}: within the ${show(limit.value)} mm limit.`,
    numbers,
    keys: ['combinedLiftMaxMm'],
  });
}

export function checkJointAngle(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'joint-angle';
  const threshold = ruleSet.jointAngleThresholdDeg;
  if (!threshold.enabled) return switchedOff(code);
  const { vehicle } = context;
  if (vehicle.frontSuspension !== 'independent') {
    return skipped(
      code,
      'not-applicable',
      'A solid front axle moves with its wheels: a lift does not change its drive-shaft angles.',
    );
  }
  if (context.frontLiftMm <= 0) {
    return skipped(code, 'not-applicable', 'The front suspension is not raised.');
  }
  const halfShaftLengthMm = vehicle.frontHalfShaftLengthMm;
  if (halfShaftLengthMm === undefined || halfShaftLengthMm <= 0) {
    return checked(ruleSet, {
      code,
      verdict: 'advisory',
      message:
        "Could not check the front drive-shaft angle: the vehicle's half-shaft length is not recorded. Ask the workshop whether a diff drop is needed.",
      numbers: { frontLiftMm: context.frontLiftMm },
      keys: ['jointAngleThresholdDeg'],
    });
  }
  const diffDropMm = context.diffDropMm;
  const angleWithoutDropDeg = addedHalfShaftAngleDeg(context.frontLiftMm, halfShaftLengthMm);
  const addedAngleDeg = addedHalfShaftAngleDeg(context.frontLiftMm, halfShaftLengthMm, diffDropMm);
  const numbers: Record<string, number> = {
    frontLiftMm: context.frontLiftMm,
    halfShaftLengthMm,
    diffDropMm,
    angleWithoutDropDeg,
    addedAngleDeg,
    thresholdDeg: threshold.value,
  };
  const dropText = diffDropMm > 0 ? ` with the ${show(diffDropMm)} mm diff drop` : '';
  const described = `A ${show(context.frontLiftMm)} mm front lift adds about ${show(addedAngleDeg)}° to the front drive-shaft angle${dropText}`;
  if (addedAngleDeg <= threshold.value) {
    return checked(ruleSet, {
      code,
      verdict: 'ok',
      message: `${described}: within the ${show(threshold.value)}° the workshop accepts.`,
      numbers,
      keys: ['jointAngleThresholdDeg'],
    });
  }
  const neededMm = diffDropNeededMm(context.frontLiftMm, halfShaftLengthMm, threshold.value);
  // The drop already fitted counts; suggest the whole drop needed, rounded up to a 5 mm step.
  const suggestedDropMm = Math.ceil(neededMm / DIFF_DROP_STEP_MM) * DIFF_DROP_STEP_MM;
  numbers.suggestedDropMm = suggestedDropMm;
  return checked(ruleSet, {
    code,
    verdict: 'advisory',
    message: `${described}: more than the ${show(threshold.value)}° the workshop accepts. A diff drop of about ${show(suggestedDropMm)} mm brings the joints back within it and saves CV joint wear.`,
    numbers,
    keys: ['jointAngleThresholdDeg'],
    additions: [
      {
        role: 'diff-drop',
        reason: `A ${show(context.frontLiftMm)} mm lift on independent front suspension adds about ${show(addedAngleDeg)}° to the drive-shaft angle; a diff drop of about ${show(suggestedDropMm)} mm brings it within ${show(threshold.value)}°.`,
        required: false,
        numbers: { suggestedDropMm },
      },
    ],
  });
}

function covers(range: { constantLoadMinKg: number; constantLoadMaxKg: number }, loadKg: number) {
  return loadKg >= range.constantLoadMinKg && loadKg <= range.constantLoadMaxKg;
}

export function checkSpringRating(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'spring-rating';
  if (!ruleSet.springRatingForLoad.enabled) return switchedOff(code);
  const kit = context.input.suspensionKit;
  if (!kit) return skipped(code, 'not-applicable', 'The suspension is not changed.');
  const loadKg = context.declaredLoadKg;
  const numbers = {
    declaredLoadKg: loadKg,
    kitConstantLoadMinKg: kit.constantLoadMinKg,
    kitConstantLoadMaxKg: kit.constantLoadMaxKg,
  };
  const kitRange = `${show(kit.constantLoadMinKg)}–${show(kit.constantLoadMaxKg)} kg`;
  if (covers(kit, loadKg)) {
    return checked(ruleSet, {
      code,
      verdict: 'ok',
      message: `The springs are rated for a constant load of ${kitRange}, which covers the declared ${show(loadKg)} kg.`,
      numbers,
      keys: ['springRatingForLoad'],
    });
  }
  const variant: SuspensionKitVariant | undefined = (kit.variants ?? []).find((candidate) =>
    covers(candidate, loadKg),
  );
  const mismatch = `The springs are rated for a constant load of ${kitRange}, but the declared load is ${show(loadKg)} kg: the vehicle would ${loadKg > kit.constantLoadMaxKg ? 'sit low and may bottom out' : 'sit high and ride hard'}.`;
  if (!variant) {
    return checked(ruleSet, {
      code,
      verdict: 'does-not-fit',
      message: `${mismatch} No rating of this kit covers it; ask the workshop for springs rated for the load.`,
      numbers,
      keys: ['springRatingForLoad'],
    });
  }
  return checked(ruleSet, {
    code,
    verdict: 'does-not-fit',
    message: `${mismatch} Choose the ${variant.name} rating (${show(variant.constantLoadMinKg)}–${show(variant.constantLoadMaxKg)} kg) instead.`,
    numbers,
    keys: ['springRatingForLoad'],
    additions: [
      {
        role: 'spring-rating',
        reason: `The ${variant.name} rating (${show(variant.constantLoadMinKg)}–${show(variant.constantLoadMaxKg)} kg constant load) covers the declared ${show(loadKg)} kg.`,
        required: true,
        variantId: variant.id,
        numbers: {
          declaredLoadKg: loadKg,
          constantLoadMinKg: variant.constantLoadMinKg,
          constantLoadMaxKg: variant.constantLoadMaxKg,
        },
      },
    ],
  });
}

export function checkAlignment(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'alignment';
  if (!ruleSet.alignmentAfterChange.enabled) return switchedOff(code);
  const kit = context.input.suspensionKit;
  const suspensionChanged = kit !== undefined && (kit.frontLiftMm !== 0 || kit.rearLiftMm !== 0);
  const changes: string[] = [];
  if (suspensionChanged) changes.push('the suspension');
  if (context.tyreSizeChanged) changes.push('the tyre size');
  const numbers: Record<string, number> = {
    frontLiftMm: context.frontLiftMm,
    rearLiftMm: context.rearLiftMm,
  };
  const diameterChangeMm = diameterChangeOverStockMm(context);
  if (diameterChangeMm !== null) numbers.diameterChangeMm = diameterChangeMm;
  if (changes.length === 0) {
    return checked(ruleSet, {
      code,
      verdict: 'ok',
      message:
        'Neither the suspension nor the tyre size changes, so no alignment is needed for this package.',
      numbers,
      keys: ['alignmentAfterChange'],
    });
  }
  const changed = changes.join(' and ');
  if (context.includedRoles.has('alignment')) {
    return checked(ruleSet, {
      code,
      verdict: 'ok',
      message: `A wheel alignment is required after changing ${changed}; it is in the package.`,
      numbers,
      keys: ['alignmentAfterChange'],
    });
  }
  return checked(ruleSet, {
    code,
    verdict: 'advisory',
    message: `A wheel alignment is required after changing ${changed} (camber, caster and toe to the vehicle's specification); it has been added to the package.`,
    numbers,
    keys: ['alignmentAfterChange'],
    additions: [
      {
        role: 'alignment',
        reason: `Changing ${changed} moves camber, caster and toe; a wheel alignment is required afterwards.`,
        required: true,
      },
    ],
  });
}

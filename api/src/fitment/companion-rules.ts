/**
 * Companion rules: parts and services a package usually needs alongside its main parts. Check
 * outcomes bring their own (diff drop, alignment, hub rings, speedometer recalibration, spring
 * rating); the rules here follow from the package itself.
 */
import { roundNumbers, show } from './check-outcome';
import { type FitmentContext, diameterChangeOverStockMm } from './fitment-context';
import type { AdditionRole, SuggestedAddition } from './fitment.types';
import type { RuleSetLimits } from './rule-set-limits';

/**
 * Common practice (no published source): a steering damper is suggested on a solid front axle
 * when the tyres grow by this much over stock (heavier, larger tyres feed more kick-back).
 */
export const STEERING_DAMPER_DIAMETER_INCREASE_MM = 50;

export function packageCompanionAdditions(
  context: FitmentContext,
  ruleSet: RuleSetLimits,
): SuggestedAddition[] {
  const additions: SuggestedAddition[] = [];
  const kit = context.input.suspensionKit;
  const brakeLineThreshold = ruleSet.brakeLineLiftThresholdMm;

  if (
    kit &&
    brakeLineThreshold.enabled &&
    context.suspensionLiftMm > brakeLineThreshold.value &&
    kit.includesExtendedBrakeLines !== true
  ) {
    additions.push({
      role: 'extended-brake-lines',
      reason: `A ${show(context.suspensionLiftMm)} mm lift is past ${show(brakeLineThreshold.value)} mm: extended brake lines keep slack in the hoses at full droop.`,
      required: false,
      numbers: {
        suspensionLiftMm: context.suspensionLiftMm,
        thresholdMm: brakeLineThreshold.value,
      },
    });
  }

  // Common practice (no published source): greasable shackles and pins with a rear leaf lift.
  if (
    kit &&
    context.vehicle.rearSuspension === 'leaf' &&
    kit.rearLiftMm > 0 &&
    kit.includesGreasableShackles !== true
  ) {
    additions.push({
      role: 'greasable-shackles',
      reason: 'Greasable shackles and pins suit raised leaf springs and keep them quiet and free.',
      required: false,
    });
  }

  // Common practice (no published source): re-aim the headlights after a ride-height change.
  if (kit && (kit.frontLiftMm !== 0 || kit.rearLiftMm !== 0)) {
    additions.push({
      role: 'headlight-re-aim',
      reason:
        'The ride height changes, so the headlights are re-aimed so they do not dazzle others.',
      required: false,
    });
  }

  const diameterChangeMm = diameterChangeOverStockMm(context);
  if (
    context.vehicle.frontSuspension === 'solid-axle' &&
    diameterChangeMm !== null &&
    diameterChangeMm >= STEERING_DAMPER_DIAMETER_INCREASE_MM
  ) {
    additions.push({
      role: 'steering-damper',
      reason: `Tyres ${show(diameterChangeMm)} mm larger on a solid front axle feed more kick-back through the steering; a steering damper calms it.`,
      required: false,
      numbers: { diameterChangeMm },
    });
  }
  return additions;
}

/**
 * Merge additions from the checks and the package rules: one per role (the first wins; a
 * required one wins over an optional one), and none for a role already in the package.
 */
export function mergeAdditions(
  additions: SuggestedAddition[],
  includedRoles: ReadonlySet<AdditionRole | 'accessory'>,
): SuggestedAddition[] {
  const byRole = new Map<AdditionRole, SuggestedAddition>();
  for (const addition of additions) {
    if (includedRoles.has(addition.role)) continue;
    const existing = byRole.get(addition.role);
    if (!existing || (addition.required && !existing.required)) byRole.set(addition.role, addition);
  }
  return [...byRole.values()].map((addition) =>
    addition.numbers ? { ...addition, numbers: roundNumbers(addition.numbers) } : addition,
  );
}

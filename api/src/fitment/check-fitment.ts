/**
 * The fit report: every check of a package (vehicle + wheels + tyres + suspension kit +
 * components + declared use) against a rule set. Pure: input in, report out.
 */
import { checkTyreDesignations } from './checks/designation-check';
import { checkGrossVehicleMass } from './checks/mass-checks';
import {
  checkAlignment,
  checkCombinedLift,
  checkJointAngle,
  checkSpringRating,
  checkSuspensionLift,
} from './checks/suspension-checks';
import {
  checkRimDiameter,
  checkRimWidth,
  checkSpeedSymbol,
  checkSpeedometer,
  checkTyreClearance,
  checkTyreDiameterChange,
  checkTyreLoadCapacity,
} from './checks/tyre-checks';
import {
  checkBoltPattern,
  checkCentreBore,
  checkStudThread,
  checkWheelLoadRating,
  checkWheelTrackChange,
} from './checks/wheel-checks';
import { mergeAdditions, packageCompanionAdditions } from './companion-rules';
import { fitmentCautions } from './fitment-cautions';
import { type FitmentContext, buildFitmentContext } from './fitment-context';
import { fitmentMetrics } from './fitment-metrics';
import {
  type CheckOutcome,
  type FitCheck,
  type FitReport,
  type FitmentInput,
  type SkippedCheck,
  type SuggestedAddition,
  worstVerdict,
} from './fitment.types';
import type { RuleSetLimits } from './rule-set-limits';

export type FitmentCheck = (context: FitmentContext, ruleSet: RuleSetLimits) => CheckOutcome;

/** Every check, in the order the report lists them. */
export const FITMENT_CHECKS: readonly FitmentCheck[] = [
  checkBoltPattern,
  checkCentreBore,
  checkStudThread,
  checkWheelLoadRating,
  checkRimDiameter,
  checkRimWidth,
  checkTyreLoadCapacity,
  checkSpeedSymbol,
  checkTyreDiameterChange,
  checkSpeedometer,
  checkTyreClearance,
  checkSuspensionLift,
  checkCombinedLift,
  checkWheelTrackChange,
  checkJointAngle,
  checkSpringRating,
  checkGrossVehicleMass,
  checkAlignment,
];

/** Check a package against a rule set. Never throws for well-typed input. */
export function checkFitment(input: FitmentInput, ruleSet: RuleSetLimits): FitReport {
  const context = buildFitmentContext(input);
  const outcomes: CheckOutcome[] = [];
  const designationOutcome = checkTyreDesignations(context);
  if (designationOutcome) outcomes.push(designationOutcome);
  for (const check of FITMENT_CHECKS) outcomes.push(check(context, ruleSet));

  const checks: FitCheck[] = [];
  const skippedChecks: SkippedCheck[] = [];
  const additions: SuggestedAddition[] = [];
  for (const outcome of outcomes) {
    if (outcome.ran) {
      checks.push(outcome.check);
      additions.push(...outcome.additions);
    } else {
      skippedChecks.push(outcome.skipped);
    }
  }
  additions.push(...packageCompanionAdditions(context, ruleSet));

  return {
    verdict: worstVerdict(checks.map((check) => check.verdict)),
    ruleSetName: ruleSet.name,
    checks,
    skippedChecks,
    metrics: fitmentMetrics(context),
    suggestedAdditions: mergeAdditions(additions, context.includedRoles),
    cautions: fitmentCautions(context),
  };
}

/** Gross vehicle mass with the accessories, declared load and occupants. */
import { checked, show, switchedOff } from '../check-outcome';
import type { FitmentContext } from '../fitment-context';
import type { CheckOutcome } from '../fitment.types';
import type { RuleKey, RuleSetLimits } from '../rule-set-limits';

export interface GrossMassBreakdownKg {
  kerbMassKg: number;
  accessoriesMassKg: number;
  declaredLoadKg: number;
  occupantMassKg: number;
  totalMassKg: number;
}

/** Kerb mass + accessories + declared load + occupants × the rule set's allowance. */
export function grossMassBreakdownKg(
  context: FitmentContext,
  ruleSet: RuleSetLimits,
): GrossMassBreakdownKg {
  const allowance = ruleSet.occupantAllowanceKg;
  const occupantMassKg = allowance.enabled ? context.occupantCount * allowance.value : 0;
  const kerbMassKg = context.vehicle.kerbMassKg;
  return {
    kerbMassKg,
    accessoriesMassKg: context.accessoriesMassKg,
    declaredLoadKg: context.declaredLoadKg,
    occupantMassKg,
    totalMassKg: kerbMassKg + context.accessoriesMassKg + context.declaredLoadKg + occupantMassKg,
  };
}

export function checkGrossVehicleMass(
  context: FitmentContext,
  ruleSet: RuleSetLimits,
): CheckOutcome {
  const code = 'gross-vehicle-mass';
  if (!ruleSet.grossVehicleMass.enabled) return switchedOff(code);
  const mass = grossMassBreakdownKg(context, ruleSet);
  const gvmKg = context.vehicle.gvmKg;
  const marginKg = gvmKg - mass.totalMassKg;
  const keys: RuleKey[] = ruleSet.occupantAllowanceKg.enabled
    ? ['grossVehicleMass', 'occupantAllowanceKg']
    : ['grossVehicleMass'];
  const described = `Kerb mass ${show(mass.kerbMassKg)} kg + accessories ${show(mass.accessoriesMassKg)} kg + load ${show(mass.declaredLoadKg)} kg + occupants ${show(mass.occupantMassKg)} kg = ${show(mass.totalMassKg)} kg`;
  const over = marginKg < 0;
  return checked(ruleSet, {
    code,
    verdict: over ? 'needs-certification' : 'ok',
    message: over
      ? `${described}: ${show(-marginKg)} kg over the ${show(gvmKg)} kg GVM. Carry less, or the vehicle needs a certified GVM upgrade.`
      : `${described}: ${show(marginKg)} kg under the ${show(gvmKg)} kg GVM.`,
    numbers: { ...mass, gvmKg, marginKg },
    keys,
  });
}

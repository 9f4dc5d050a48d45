import * as yup from 'yup';
import { numberFromText, textFromNumber } from '@/lib/number-fields';
import type { RuleLimitChange, RuleSet, UpdateRuleSetRequest } from '@/types/api';

/** The rules in groups, in the fit report's order; a key the client does not know goes last. */
const ruleGroups: readonly { title: string; keys: readonly string[] }[] = [
  {
    title: 'Wheel fitment',
    keys: ['boltPatternMatch', 'centreBoreFit', 'studThreadMatch', 'wheelLoadRating'],
  },
  {
    title: 'Tyre load, speed and rim',
    keys: [
      'tyreLoadCapacity',
      'passengerTyreLightTruckDerateFactor',
      'placardSpeedSymbolEnforced',
      'minSpeedKmhOther',
      'minSpeedKmhOffRoad',
      'speedSymbolOffRoadExemption',
      'rimDiameterMatch',
      'rimWidthForSection',
    ],
  },
  {
    title: 'Tyre diameter and speedometer',
    keys: [
      'tyreDiameterIncreaseMaxMm',
      'tyreDiameterIncreaseMaxMmOther',
      'tyreDiameterDecreaseMaxMm',
      'diameterChangeMaxPercent',
      'speedometerAccuracy',
      'clearanceAllowanceMmPer25mmLift',
    ],
  },
  {
    title: 'Suspension and driveline',
    keys: [
      'suspensionLiftMaxMm',
      'combinedLiftMaxMm',
      'jointAngleThresholdDeg',
      'alignmentAfterChange',
      'springRatingForLoad',
      'brakeLineLiftThresholdMm',
    ],
  },
  { title: 'Wheel track', keys: ['trackIncreaseMaxMm', 'wheelSpacersProhibited'] },
  { title: 'Mass', keys: ['grossVehicleMass', 'occupantAllowanceKg'] },
];

export interface RuleGroup {
  title: string;
  keys: string[];
}

/** The rule set's keys grouped for the editor, each key once, in the API's order within a group. */
export function groupRules(ruleSet: RuleSet): RuleGroup[] {
  const keys = Object.keys(ruleSet.limits);
  const placed = new Set<string>();
  const groups: RuleGroup[] = [];
  for (const group of ruleGroups) {
    const present = keys.filter((key) => group.keys.includes(key));
    present.forEach((key) => placed.add(key));
    if (present.length > 0) groups.push({ title: group.title, keys: present });
  }
  const rest = keys.filter((key) => !placed.has(key));
  if (rest.length > 0) groups.push({ title: 'Other rules', keys: rest });
  return groups;
}

export function isNumeric(ruleSet: RuleSet, key: string): boolean {
  return ruleSet.limits[key]?.value !== null && ruleSet.limits[key]?.value !== undefined;
}

export interface RuleLimitValues {
  enabled: boolean;
  /** The number as typed; '' for a switch. */
  value: string;
}

export interface RuleSetFormValues {
  limits: Record<string, RuleLimitValues>;
}

export function ruleSetValues(ruleSet: RuleSet): RuleSetFormValues {
  const limits: Record<string, RuleLimitValues> = {};
  for (const [key, limit] of Object.entries(ruleSet.limits)) {
    limits[key] = { enabled: limit.enabled, value: textFromNumber(limit.value) };
  }
  return { limits };
}

/** Only the rules whose switch or value changed, as PATCH takes them. */
export function ruleSetChanges(ruleSet: RuleSet, values: RuleSetFormValues): UpdateRuleSetRequest {
  const limits: Record<string, RuleLimitChange> = {};
  for (const [key, stored] of Object.entries(ruleSet.limits)) {
    const edited = values.limits[key];
    if (!edited) continue;
    const change: RuleLimitChange = {};
    if (edited.enabled !== stored.enabled) change.enabled = edited.enabled;
    if (stored.value !== null) {
      const value = numberFromText(edited.value);
      if (value !== null && value !== stored.value) change.value = value;
    }
    if (Object.keys(change).length > 0) limits[key] = change;
  }
  return { limits };
}

/**
 * Every form field (for placing server errors such as "limits.suspensionLiftMaxMm.value"). An
 * error about a whole rule has no field and goes to the form's message.
 */
export function ruleSetFormFields(ruleSet: RuleSet): string[] {
  return Object.keys(ruleSet.limits).flatMap((key) => [
    `limits.${key}.enabled`,
    `limits.${key}.value`,
  ]);
}

/** A server error that lands on no field is told with the rule it is about. */
export function ruleFieldFor(property: string): string {
  return property;
}

/** The value rule for a limit, mirroring the API: zero or more; a factor 1 or more; an angle below 90°. */
function valueSchema(unit: string | null) {
  let schema = yup
    .number()
    .typeError('Enter a number, like 50.')
    .required('Enter a value (switch the rule off rather than leaving it empty).')
    .min(0, 'Use zero or more.');
  if (unit === 'factor') schema = schema.min(1, 'A derate factor must be 1 or more.');
  if (unit === 'deg') schema = schema.lessThan(90, 'An angle must be below 90°.');
  return schema;
}

/** Mirrors the API's rule set validation for the rules this set holds. */
export function ruleSetSchema(ruleSet: RuleSet) {
  const shape: Record<string, yup.AnyObjectSchema> = {};
  for (const [key, limit] of Object.entries(ruleSet.limits)) {
    shape[key] = yup.object({
      enabled: yup.boolean().required(),
      value: limit.value === null ? yup.string().optional() : valueSchema(limit.unit),
    });
  }
  return yup.object({ limits: yup.object(shape) });
}

/** Small builders shared by the checks, so every outcome carries its rule source the same way. */
import type {
  CheckOutcome,
  FitCheckCode,
  FitVerdict,
  SkipReason,
  SuggestedAddition,
} from './fitment.types';
import type { RuleKey, RuleSetLimits } from './rule-set-limits';

export interface CheckedArgs {
  code: FitCheckCode;
  verdict: FitVerdict;
  message: string;
  numbers: Record<string, number>;
  /** The rule-set keys whose sources are quoted (the ones that decided the verdict). */
  keys: RuleKey[];
  additions?: SuggestedAddition[];
}

/** A check that ran. Numbers are rounded to 0.1 for display; verdicts are decided before rounding. */
export function checked(ruleSet: RuleSetLimits, args: CheckedArgs): CheckOutcome {
  const numbers = roundNumbers(args.numbers);
  return {
    ran: true,
    check: {
      code: args.code,
      verdict: args.verdict,
      message: args.message,
      numbers,
      rule: { source: args.keys.map((key) => ruleSet[key].source).join(' '), keys: args.keys },
    },
    additions: args.additions ?? [],
  };
}

export function skipped(code: FitCheckCode, reason: SkipReason, message: string): CheckOutcome {
  return { ran: false, skipped: { code, reason, message } };
}

export function switchedOff(code: FitCheckCode): CheckOutcome {
  return skipped(code, 'disabled-by-rule-set', 'This check is switched off in the rule set.');
}

/** Every value of a numbers record rounded to 0.1. */
export function roundNumbers(values: Readonly<Record<string, number>>): Record<string, number> {
  const rounded: Record<string, number> = {};
  for (const [key, value] of Object.entries(values)) rounded[key] = roundTenth(value);
  return rounded;
}

export function roundTenth(value: number): number {
  const rounded = Math.round(value * 10) / 10;
  return Object.is(rounded, -0) ? 0 : rounded;
}

/** A number for a message: at most `digits` decimals, no trailing zeros. */
export function show(value: number, digits = 1): string {
  const factor = 10 ** digits;
  const rounded = Math.round(value * factor) / factor;
  return String(Object.is(rounded, -0) ? 0 : rounded);
}

/** A signed number for a message, e.g. "+54.5" or "−3". */
export function showSigned(value: number, digits = 1): string {
  const text = show(Math.abs(value), digits);
  if (text === '0') return '0';
  return value > 0 ? `+${text}` : `−${text}`;
}

import * as yup from 'yup';

/**
 * Yup rules for numbers typed into text fields (the form keeps the text; Formik hands the
 * schema `undefined` for an empty field). Messages say what to type, with the unit.
 */
export interface NumberRule {
  min: number;
  max: number;
  /** Shown after the numbers in messages: "mm", "kg". */
  unit?: string;
  /** Whole numbers only. */
  whole?: boolean;
  /** Whole or half steps (rim sizes in inches). */
  halfSteps?: boolean;
  /** Most decimals allowed (when not whole). */
  decimals?: number;
}

function withUnit(value: number, unit?: string): string {
  return unit ? `${value} ${unit}` : String(value);
}

function hasAtMostDecimals(value: number, decimals: number): boolean {
  const scaled = value * 10 ** decimals;
  return Math.abs(scaled - Math.round(scaled)) < 1e-6;
}

/** A number from min to max; optional unless `.required()` is added. */
export function numberInRange(rule: NumberRule) {
  const range = `${withUnit(rule.min, rule.unit)} to ${withUnit(rule.max, rule.unit)}`;
  let schema = yup
    .number()
    .typeError(rule.whole ? 'Enter a whole number.' : 'Enter a number, like 8.5.')
    .min(rule.min, `Use ${range}.`)
    .max(rule.max, `Use ${range}.`);
  if (rule.whole) schema = schema.integer('Enter a whole number.');
  if (rule.halfSteps) {
    schema = schema.test(
      'half-steps',
      'Use whole or half steps, like 8 or 8.5.',
      (value) => value === undefined || Number.isInteger(value * 2),
    );
  }
  if (rule.decimals !== undefined && !rule.whole) {
    const decimals = rule.decimals;
    schema = schema.test(
      'decimals',
      `Use at most ${decimals} decimal${decimals === 1 ? '' : 's'}.`,
      (value) => value === undefined || hasAtMostDecimals(value, decimals),
    );
  }
  return schema;
}

/** The text of a number field as the number to send; null when the field is empty. */
export function numberFromText(text: string): number | null {
  const trimmed = text.trim();
  return trimmed === '' ? null : Number(trimmed);
}

/** A number (or nothing) as the text its field edits. */
export function textFromNumber(value: number | null | undefined): string {
  return value === null || value === undefined ? '' : String(value);
}

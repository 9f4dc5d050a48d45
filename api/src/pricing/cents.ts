/**
 * Money as integer cents. Every amount the pricing engine reads or returns is a safe integer
 * number of cents. Multiplication and division go through BigInt, so no binary floating point
 * ever touches an amount and no product can overflow before it is rounded.
 *
 * Rounding is half-up to the nearest cent: A New Tax System (Goods and Services Tax) Act 1999
 * s 9-90 as summarised in REFERENCES.md ("to the nearest cent, half a cent up"). A negative
 * amount (a discount) rounds as the mirror image of the positive one (half a cent away from
 * zero), so a discount of x cents and a charge of x cents round to the same magnitude.
 */

/** A whole number of cents (a safe integer). The alias documents intent; `assertCents` enforces it. */
export type Cents = number;

/** Percentages are held as whole basis points (1 % = 100 bp), so 12.5 % is 1250. */
export type BasisPoints = number;

export const BASIS_POINTS_PER_PERCENT = 100;
export const BASIS_POINTS_PER_WHOLE = 10_000;

/** Thrown when a value that must be a whole number of cents is not one. */
export class NotCentsError extends RangeError {
  constructor(label: string, value: unknown) {
    super(`${label} must be a whole number of cents, got ${String(value)}`);
    this.name = 'NotCentsError';
  }
}

/** True for a finite, safe integer (the only numbers the engine accepts as cents or counts). */
export function isWholeNumber(value: unknown): value is number {
  return typeof value === 'number' && Number.isSafeInteger(value);
}

/** Returns the value unchanged when it is a safe integer; throws a RangeError otherwise. */
export function assertWholeNumber(value: number, label = 'value'): number {
  if (!isWholeNumber(value)) {
    throw new RangeError(`${label} must be a whole number, got ${String(value)}`);
  }
  return value;
}

/** Returns the value unchanged when it is a whole number of cents; throws NotCentsError otherwise. */
export function assertCents(value: number, label = 'amount'): Cents {
  if (!isWholeNumber(value)) throw new NotCentsError(label, value);
  return value;
}

/** Sum of whole amounts; refuses a fractional or unsafe addend or result. */
export function sumCents(amounts: Iterable<Cents>, label = 'sum'): Cents {
  let total = 0n;
  for (const amount of amounts) total += BigInt(assertCents(amount, label));
  return bigintToCents(total, label);
}

/** Whole-number multiplication (e.g. quantity × unit price), refusing a fractional operand. */
export function multiplyCents(amountCents: Cents, factor: number, label = 'product'): Cents {
  return bigintToCents(
    BigInt(assertCents(amountCents, label)) * BigInt(assertWholeNumber(factor, label)),
    label,
  );
}

/**
 * numerator / denominator, rounded half-up to a whole number (half away from zero for a
 * negative numerator), by integer division with remainder. Both operands must be whole numbers;
 * the denominator must be positive.
 */
export function divideRoundHalfUp(numerator: number, denominator: number): number {
  return roundedQuotient(
    BigInt(assertWholeNumber(numerator, 'numerator')),
    denominatorOf(denominator),
  );
}

/** value × multiplier / divisor, rounded half-up, with the product formed exactly (BigInt). */
export function multiplyDivideRoundHalfUp(
  value: number,
  multiplier: number,
  divisor: number,
): number {
  const product =
    BigInt(assertWholeNumber(value, 'value')) * BigInt(assertWholeNumber(multiplier, 'multiplier'));
  return roundedQuotient(product, denominatorOf(divisor));
}

/** The given percentage of an amount, rounded half-up to the cent. */
export function percentageOfCents(amountCents: Cents, rateBasisPoints: BasisPoints): Cents {
  return multiplyDivideRoundHalfUp(amountCents, rateBasisPoints, BASIS_POINTS_PER_WHOLE);
}

/**
 * A percentage (e.g. 10, 12.5, 7.25) as whole basis points. Refuses a value with more than two
 * decimals, a negative value or a non-finite one, rather than rounding it silently.
 */
export function percentToBasisPoints(percent: number, label = 'percent'): BasisPoints {
  if (typeof percent !== 'number' || !Number.isFinite(percent) || percent < 0) {
    throw new RangeError(`${label} must be a percentage of 0 or more, got ${String(percent)}`);
  }
  const scaled = percent * BASIS_POINTS_PER_PERCENT;
  const basisPoints = Math.round(scaled);
  // A decimal percentage with two places times 100 lands within float noise of a whole number.
  if (Math.abs(scaled - basisPoints) > 1e-6 || !Number.isSafeInteger(basisPoints)) {
    throw new RangeError(`${label} may have at most two decimals, got ${percent}`);
  }
  return basisPoints;
}

function denominatorOf(denominator: number): bigint {
  if (!isWholeNumber(denominator) || denominator <= 0) {
    throw new RangeError(`denominator must be a positive whole number, got ${denominator}`);
  }
  return BigInt(denominator);
}

function roundedQuotient(numerator: bigint, denominator: bigint): number {
  const magnitude = numerator < 0n ? -numerator : numerator;
  const quotient = magnitude / denominator;
  const remainder = magnitude % denominator;
  // Half a cent or more rounds up: 2 × remainder ≥ denominator.
  const rounded = 2n * remainder >= denominator ? quotient + 1n : quotient;
  return bigintToCents(numerator < 0n ? -rounded : rounded, 'rounded amount');
}

function bigintToCents(value: bigint, label: string): Cents {
  if (value > BigInt(Number.MAX_SAFE_INTEGER) || value < BigInt(Number.MIN_SAFE_INTEGER)) {
    throw new RangeError(`${label} is too large to hold exactly in cents`);
  }
  return Number(value);
}

/** 123450 → "$1,234.50"; −500 → "−$5.00". For notes and messages, not for storage. */
export function formatCents(amountCents: Cents): string {
  const whole = assertCents(amountCents);
  const magnitude = Math.abs(whole);
  const dollars = Math.floor(magnitude / 100)
    .toString()
    .replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  const cents = String(magnitude % 100).padStart(2, '0');
  return `${whole < 0 ? '−' : ''}$${dollars}.${cents}`;
}

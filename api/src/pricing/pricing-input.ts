/**
 * Checks a pricing input before anything is priced: whole cents, whole counts, percentages with
 * at most two decimals, known kinds, a consistent deposit policy. The engine prices only input
 * that passes; the API can call `validatePricingInput` first and turn the issues into field
 * errors (the field paths follow the input's shape, e.g. `lines[2].unitPriceCents`).
 */
import { isWholeNumber, percentToBasisPoints } from './cents';
import {
  PRICING_BAY_KINDS,
  PRICING_PRODUCT_KINDS,
  type PricingInput,
  type PricingPolicy,
  type PackageLine,
  TAX_ROUNDING_METHODS,
} from './pricing.types';

/** Largest unit price, fee or levy: $10,000,000.00. */
export const MAX_UNIT_PRICE_CENTS = 1_000_000_000;
export const MAX_LINE_QUANTITY = 1_000;
export const MAX_LABOUR_MINUTES_PER_UNIT = 6_000;
/** $10,000.00 an hour. */
export const MAX_LABOUR_RATE_CENTS_PER_HOUR = 1_000_000;
export const MAX_PACKAGE_LINES = 200;
/** Wheels fitted or tyres replaced on one job (dual rear wheels and spares included). */
export const MAX_WHEELS_PER_JOB = 24;
export const MAX_LEAD_DAYS = 3_650;
export const MAX_QUOTE_VALID_DAYS = 365;

export interface PricingIssue {
  /** Path in the input, e.g. `policy.deposit.capCents` or `lines[0].quantity`. */
  field: string;
  message: string;
}

/** Thrown by `pricePackage` for input that `validatePricingInput` refuses. */
export class PricingInputError extends Error {
  readonly issues: readonly PricingIssue[];

  constructor(issues: readonly PricingIssue[]) {
    super(
      `Cannot price this package: ${issues.map((issue) => `${issue.field} ${issue.message}`).join('; ')}`,
    );
    this.name = 'PricingInputError';
    this.issues = issues;
  }
}

/** Every problem with the input; an empty list means it can be priced. */
export function validatePricingInput(input: PricingInput): PricingIssue[] {
  const issues: PricingIssue[] = [];
  const report = (field: string, message: string) => issues.push({ field, message });

  if (!Array.isArray(input.lines)) {
    report('lines', 'must be a list of package lines');
  } else {
    if (input.lines.length > MAX_PACKAGE_LINES) {
      report('lines', `must hold at most ${MAX_PACKAGE_LINES} lines`);
    }
    input.lines.forEach((line, index) => validateLine(line, `lines[${index}]`, report));
  }
  checkWhole(input.wheelsFitted, 'wheelsFitted', 0, MAX_WHEELS_PER_JOB, 'wheels', report);
  checkWhole(input.tyresReplaced, 'tyresReplaced', 0, MAX_WHEELS_PER_JOB, 'tyres', report);
  validatePolicy(input.policy, 'policy', report);
  if (input.workshopDiscountCents !== undefined) {
    checkCents(input.workshopDiscountCents, 'workshopDiscountCents', MAX_UNIT_PRICE_CENTS, report);
  }
  return issues;
}

/** Throws PricingInputError listing every issue, or returns normally. */
export function assertValidPricingInput(input: PricingInput): void {
  const issues = validatePricingInput(input);
  if (issues.length > 0) throw new PricingInputError(issues);
}

type Report = (field: string, message: string) => void;

function validateLine(line: PackageLine, path: string, report: Report): void {
  checkText(line.productId, `${path}.productId`, report);
  checkText(line.sku, `${path}.sku`, report);
  checkText(line.name, `${path}.name`, report);
  if (!PRICING_PRODUCT_KINDS.includes(line.kind)) {
    report(`${path}.kind`, `must be one of ${PRICING_PRODUCT_KINDS.join(', ')}`);
  }
  checkWhole(line.quantity, `${path}.quantity`, 1, MAX_LINE_QUANTITY, 'units', report);
  checkCents(line.unitPriceCents, `${path}.unitPriceCents`, MAX_UNIT_PRICE_CENTS, report);
  checkWhole(
    line.labourMinutes,
    `${path}.labourMinutes`,
    0,
    MAX_LABOUR_MINUTES_PER_UNIT,
    'minutes',
    report,
  );
  if (line.bayKind !== null && !PRICING_BAY_KINDS.includes(line.bayKind)) {
    report(`${path}.bayKind`, `must be one of ${PRICING_BAY_KINDS.join(', ')}, or null`);
  }
  checkWhole(line.leadDays, `${path}.leadDays`, 0, MAX_LEAD_DAYS, 'days', report);
  checkWhole(line.stockQty, `${path}.stockQty`, 0, Number.MAX_SAFE_INTEGER, 'units', report);
  if (line.perWheel !== undefined && typeof line.perWheel !== 'boolean') {
    report(`${path}.perWheel`, 'must be true or false');
  } else if (line.perWheel === true && line.kind !== 'service') {
    report(`${path}.perWheel`, 'applies to services only');
  }
}

function validatePolicy(policy: PricingPolicy, path: string, report: Report): void {
  if (typeof policy !== 'object' || policy === null) {
    report(path, 'is required');
    return;
  }
  checkCents(
    policy.labourRateCentsPerHour,
    `${path}.labourRateCentsPerHour`,
    MAX_LABOUR_RATE_CENTS_PER_HOUR,
    report,
  );
  if (typeof policy.pricesIncludeTax !== 'boolean') {
    report(`${path}.pricesIncludeTax`, 'must be true or false');
  }
  checkPercent(policy.taxRatePercent, `${path}.taxRatePercent`, report);
  if (
    policy.taxRoundingMethod !== undefined &&
    !TAX_ROUNDING_METHODS.includes(policy.taxRoundingMethod)
  ) {
    report(`${path}.taxRoundingMethod`, `must be one of ${TAX_ROUNDING_METHODS.join(', ')}`);
  }
  checkCents(
    policy.fittingBalancingCentsPerWheel,
    `${path}.fittingBalancingCentsPerWheel`,
    MAX_UNIT_PRICE_CENTS,
    report,
  );
  checkCents(
    policy.tyreDisposalCentsPerTyre,
    `${path}.tyreDisposalCentsPerTyre`,
    MAX_UNIT_PRICE_CENTS,
    report,
  );

  const bundle = policy.bundleDiscount;
  if (typeof bundle !== 'object' || bundle === null) {
    report(`${path}.bundleDiscount`, 'is required');
  } else {
    if (typeof bundle.enabled !== 'boolean') {
      report(`${path}.bundleDiscount.enabled`, 'must be true or false');
    }
    checkPercent(bundle.percent, `${path}.bundleDiscount.percent`, report);
    if (!Array.isArray(bundle.requiresKinds)) {
      report(`${path}.bundleDiscount.requiresKinds`, 'must be a list of product kinds');
    } else {
      if (bundle.enabled === true && bundle.requiresKinds.length === 0) {
        report(`${path}.bundleDiscount.requiresKinds`, 'must name at least one kind when enabled');
      }
      bundle.requiresKinds.forEach((kind, index) => {
        if (!PRICING_PRODUCT_KINDS.includes(kind)) {
          report(
            `${path}.bundleDiscount.requiresKinds[${index}]`,
            `must be one of ${PRICING_PRODUCT_KINDS.join(', ')}`,
          );
        }
      });
    }
  }

  const deposit = policy.deposit;
  if (typeof deposit !== 'object' || deposit === null) {
    report(`${path}.deposit`, 'is required');
  } else {
    const percentOk = checkPercent(deposit.percent, `${path}.deposit.percent`, report);
    const specialOk = checkPercent(
      deposit.specialOrderPercent,
      `${path}.deposit.specialOrderPercent`,
      report,
    );
    if (percentOk && specialOk && deposit.specialOrderPercent < deposit.percent) {
      report(`${path}.deposit.specialOrderPercent`, 'must not be below deposit.percent');
    }
    const floorOk = checkCents(
      deposit.floorCents,
      `${path}.deposit.floorCents`,
      Number.MAX_SAFE_INTEGER,
      report,
    );
    const capOk = checkCents(
      deposit.capCents,
      `${path}.deposit.capCents`,
      Number.MAX_SAFE_INTEGER,
      report,
    );
    if (floorOk && capOk && deposit.capCents < deposit.floorCents) {
      report(`${path}.deposit.capCents`, 'must not be below deposit.floorCents');
    }
  }

  checkWhole(
    policy.quoteValidDays,
    `${path}.quoteValidDays`,
    1,
    MAX_QUOTE_VALID_DAYS,
    'days',
    report,
  );
}

function checkText(value: unknown, field: string, report: Report): void {
  if (typeof value !== 'string' || value.trim() === '') report(field, 'is required');
}

function checkWhole(
  value: unknown,
  field: string,
  min: number,
  max: number,
  unit: string,
  report: Report,
): boolean {
  if (!isWholeNumber(value) || value < min || value > max) {
    report(field, `must be a whole number of ${unit} from ${min} to ${max}, got ${String(value)}`);
    return false;
  }
  return true;
}

function checkCents(value: unknown, field: string, max: number, report: Report): boolean {
  if (!isWholeNumber(value) || value < 0 || value > max) {
    report(field, `must be a whole number of cents from 0 to ${max}, got ${String(value)}`);
    return false;
  }
  return true;
}

function checkPercent(value: unknown, field: string, report: Report): boolean {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0 || value > 100) {
    report(field, `must be a percentage from 0 to 100, got ${String(value)}`);
    return false;
  }
  try {
    percentToBasisPoints(value, field);
  } catch {
    report(field, `may have at most two decimals, got ${value}`);
    return false;
  }
  return true;
}

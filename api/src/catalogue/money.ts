/**
 * Dollars as written in a price list ("1249.5", "1249.50", "0.95") to integer cents and back,
 * by string arithmetic: no binary floating point touches the amount.
 */

export type DollarsParse = { ok: true; cents: number } | { ok: false; reason: string };

/** Largest price the catalogue takes: $10,000,000.00 (well inside a 32-bit integer column). */
export const MAX_PRICE_CENTS = 1_000_000_000;

const AMOUNT = /^(\d+)(?:\.(\d*))?$/;

export function parseDollarsToCents(text: string): DollarsParse {
  const trimmed = text.trim();
  if (trimmed === '') return { ok: false, reason: 'is required (dollars, e.g. 1249.00)' };
  if (/^-/.test(trimmed)) return { ok: false, reason: 'must not be negative' };
  const match = AMOUNT.exec(trimmed);
  if (!match) {
    return { ok: false, reason: `'${trimmed}' is not an amount in dollars (e.g. 1249.00)` };
  }
  const [, wholeDollars, fraction = ''] = match;
  if (fraction.length > 2) return { ok: false, reason: 'has more than 2 decimals' };
  if (wholeDollars.length > 8) return { ok: false, reason: 'is more than $10,000,000.00' };
  const cents = Number(wholeDollars) * 100 + Number(fraction.padEnd(2, '0'));
  if (cents > MAX_PRICE_CENTS) return { ok: false, reason: 'is more than $10,000,000.00' };
  return { ok: true, cents };
}

/** 124950 → "1249.50". */
export function formatCentsAsDollars(cents: number): string {
  if (!Number.isSafeInteger(cents) || cents < 0) throw new Error(`Not a price in cents: ${cents}`);
  const dollars = Math.floor(cents / 100);
  const rest = cents % 100;
  return `${dollars}.${String(rest).padStart(2, '0')}`;
}

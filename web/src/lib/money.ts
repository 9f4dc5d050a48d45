/**
 * Money on the client: amounts travel as integer cents; people read and type dollars. Typed
 * dollars become cents by string arithmetic, so no binary floating point touches the amount
 * ("0.29" is 29 cents, never 28.999...).
 */

/** The workshop's currency. Prices include tax. */
export const CURRENCY = 'AUD';

/** Largest price the catalogue takes: $10,000,000.00 (the API's limit). */
export const MAX_PRICE_CENTS = 1_000_000_000;

/** Dollars as typed into a price field: whole dollars, optionally with one or two decimals. */
export const DOLLARS_PATTERN = /^\d{1,8}(?:\.\d{1,2})?$/;

const currencyFormat = new Intl.NumberFormat('en-AU', {
  style: 'currency',
  currency: CURRENCY,
  currencyDisplay: 'narrowSymbol',
});

/** 124950 → "$1,249.50"; a discount of -26405 → "−$264.05" (a true minus sign, as elsewhere). */
export function formatCents(cents: number): string {
  return currencyFormat.format(cents / 100).replace(/^-/, '\u2212');
}

/** 124950 → "1249.50", the form a price field shows and edits. */
export function centsToDollarsText(cents: number): string {
  const sign = cents < 0 ? '-' : '';
  const whole = Math.trunc(Math.abs(cents) / 100);
  const rest = Math.abs(cents) % 100;
  return `${sign}${whole}.${String(rest).padStart(2, '0')}`;
}

/**
 * "1249.5" → 124950. Null when the text is not dollars with at most two decimals (check with
 * DOLLARS_PATTERN first to tell the user why).
 */
export function dollarsTextToCents(text: string): number | null {
  const trimmed = text.trim();
  if (!DOLLARS_PATTERN.test(trimmed)) return null;
  const [whole, fraction = ''] = trimmed.split('.');
  return Number(whole) * 100 + Number(fraction.padEnd(2, '0'));
}

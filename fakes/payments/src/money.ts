/**
 * Amounts are integers in the currency's smallest unit, as the provider takes them. The number of
 * minor digits per currency comes from ISO 4217 as Node's ICU data carries it.
 */

const SUPPORTED = new Set(Intl.supportedValuesOf('currency').map((code) => code.toLowerCase()));

export function isCurrency(code: string): boolean {
  return /^[a-z]{3}$/.test(code) && SUPPORTED.has(code);
}

function formatter(currency: string): Intl.NumberFormat {
  return new Intl.NumberFormat('en', { style: 'currency', currency: currency.toUpperCase() });
}

export function minorDigits(currency: string): number {
  return formatter(currency).resolvedOptions().maximumFractionDigits ?? 2;
}

/** 12345 usd → "$123.45"; 500 jpy → "¥500". */
export function formatAmount(amount: number, currency: string): string {
  return formatter(currency).format(amount / 10 ** minorDigits(currency));
}

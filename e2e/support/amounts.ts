/** Cents as the screens show them ("$1,000.00"), by this Node process's Intl (not the app's). */
export function dollars(cents: number): string {
  return new Intl.NumberFormat('en-AU', {
    style: 'currency',
    currency: 'AUD',
    currencyDisplay: 'narrowSymbol',
  }).format(cents / 100);
}

/** Cents as digits only ("1,000.00"), for text that writes the currency its own way. */
export function amountDigits(cents: number): string {
  return new Intl.NumberFormat('en-AU', {
    minimumFractionDigits: 2,
    maximumFractionDigits: 2,
  }).format(cents / 100);
}

/** A card expiry date three years on, as MM/YY, for the payment provider's test page. */
export function futureExpiry(): string {
  const year = (new Date().getUTCFullYear() + 3) % 100;
  return `12/${String(year).padStart(2, '0')}`;
}

/**
 * The rounding and tax method in words, printed on the quote so the customer (and an auditor)
 * can redo every cent.
 */
import { formatCents } from './cents';
import type { DepositPolicy, TaxRoundingMethod } from './pricing.types';

export interface RoundingNoteFacts {
  pricesIncludeTax: boolean;
  taxRatePercent: number;
  taxRoundingMethod: TaxRoundingMethod;
  /** The bundle discount's percentage when it applies, else null. */
  bundleDiscountPercent: number | null;
  deposit: Pick<DepositPolicy, 'floorCents' | 'capCents'> & {
    percentApplied: number;
    specialOrder: boolean;
  };
}

/** "one eleventh" at 10 %, else the fraction rate / (100 + rate). */
export function inclusiveTaxFractionInWords(taxRatePercent: number): string {
  return taxRatePercent === 10 ? 'one eleventh' : `${taxRatePercent}/${100 + taxRatePercent}`;
}

export function roundingNote(facts: RoundingNoteFacts): string {
  const sentences = [
    'All amounts are in whole cents, rounded to the nearest cent with half a cent rounded up.',
    'Labour is charged per line as minutes × hourly rate ÷ 60, rounded to the cent.',
  ];
  if (facts.bundleDiscountPercent !== null) {
    sentences.push(
      `The bundle discount is ${facts.bundleDiscountPercent} % of the parts total, rounded to the cent.`,
    );
  }
  sentences.push(taxSentence(facts));
  sentences.push(
    `The deposit is ${facts.deposit.percentApplied} % of the total${facts.deposit.specialOrder ? ' (the special-order rate: a part must be ordered in)' : ''}, rounded to the cent, at least ${formatCents(facts.deposit.floorCents)} and at most ${formatCents(facts.deposit.capCents)}, and never more than the total.`,
  );
  return sentences.join(' ');
}

function taxSentence(facts: RoundingNoteFacts): string {
  const rate = `${facts.taxRatePercent} %`;
  const fraction = inclusiveTaxFractionInWords(facts.taxRatePercent);
  if (facts.taxRoundingMethod === 'per-invoice') {
    return facts.pricesIncludeTax
      ? `Prices include GST at ${rate}: the GST is ${fraction} of the invoice total, worked out once and rounded to the cent (per-invoice method).`
      : `Prices exclude GST: GST at ${rate} of the invoice subtotal is added, worked out once and rounded to the cent (per-invoice method).`;
  }
  const lines = facts.pricesIncludeTax
    ? `Prices include GST at ${rate}: the GST is ${fraction} of each line, rounded to the cent on that line, and the lines' GST is added up (per-line method).`
    : `Prices exclude GST: GST at ${rate} of each line is rounded to the cent on that line, and the lines' GST is added to the subtotal (per-line method).`;
  return facts.bundleDiscountPercent === null
    ? lines
    : `${lines} The bundle discount lowers the GST by ${facts.bundleDiscountPercent} % of the GST on the parts lines, rounded to the cent.`;
}

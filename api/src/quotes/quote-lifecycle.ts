/**
 * The states of a quote version and what may happen to it (docs/quotes.md). Pure: the caller
 * passes the clock. A draft or sent version past the end of its last valid day reads `expired`;
 * only the latest version, sent or accepted and still within its dates, can be booked.
 */
import { longDate } from '../workshop/workshop-time';
import type { QuoteVersionState } from './quote-states';

export interface VersionFacts {
  number: number;
  state: QuoteVersionState;
  /** The end of the last valid day (workshop time zone) as an instant. */
  validUntil: Date;
  /** That day as YYYY-MM-DD. */
  validUntilDate: string;
}

/** States that lapse when the quote's dates run out. */
const LAPSING: readonly QuoteVersionState[] = ['draft', 'sent'];

export function isPastValidity(version: VersionFacts, now: Date): boolean {
  return now.getTime() > version.validUntil.getTime();
}

/** The state as it stands now: a draft or sent version past its validity is expired. */
export function effectiveState(version: VersionFacts, now: Date): QuoteVersionState {
  return LAPSING.includes(version.state) && isPastValidity(version, now)
    ? 'expired'
    : version.state;
}

/** The latest version, sent or accepted, not past its validity. */
export function isBookable(version: VersionFacts, latestNumber: number, now: Date): boolean {
  const state = effectiveState(version, now);
  return (
    version.number === latestNumber &&
    (state === 'sent' || state === 'accepted') &&
    !isPastValidity(version, now)
  );
}

export function expiredMessage(validUntilDate: string): string {
  return `This quote expired on ${longDate(validUntilDate)}. Ask the workshop for a new one.`;
}

/**
 * Why the customer cannot accept or decline this version now (the 409 message), or null when
 * they can: only the latest version, as sent, within its dates.
 */
export function answerRefusal(
  version: VersionFacts,
  latestNumber: number,
  now: Date,
): string | null {
  const state = effectiveState(version, now);
  switch (state) {
    case 'superseded':
      return `Version ${version.number} was replaced by version ${latestNumber}. Look at the newest version.`;
    case 'expired':
      return expiredMessage(version.validUntilDate);
    case 'declined':
      return `Version ${version.number} was declined. Ask the workshop for a new quote.`;
    case 'accepted':
      return `Version ${version.number} is already accepted.`;
    case 'draft':
      return `The workshop has not sent version ${version.number} yet.`;
    case 'sent':
      return version.number === latestNumber
        ? null
        : `Version ${version.number} is not the newest version of this quote: look at version ${latestNumber}.`;
  }
}

/** Why the desk cannot send this version now, or null: only a draft within its dates. */
export function sendRefusal(version: VersionFacts, latestNumber: number, now: Date): string | null {
  const state = effectiveState(version, now);
  if (state === 'expired') {
    return `This draft expired on ${longDate(version.validUntilDate)}. Revise the quote for current prices.`;
  }
  if (state !== 'draft') return `Only a draft can be sent; version ${version.number} is ${state}.`;
  if (version.number !== latestNumber) {
    return `Version ${version.number} is not the newest version of this quote.`;
  }
  return null;
}

/** Why the version cannot be booked now (the 409 message), or null when it can. */
export function bookingRefusal(
  version: VersionFacts,
  latestNumber: number,
  now: Date,
): string | null {
  if (isBookable(version, latestNumber, now)) return null;
  const state = effectiveState(version, now);
  if (isPastValidity(version, now)) return expiredMessage(version.validUntilDate);
  if (version.number !== latestNumber || state === 'superseded') {
    return `Version ${version.number} was replaced by version ${latestNumber}: book the newest version.`;
  }
  if (state === 'draft') return `The workshop has not sent version ${version.number} yet.`;
  if (state === 'declined') {
    return `Version ${version.number} was declined. Ask the workshop for a new quote.`;
  }
  return `Version ${version.number} cannot be booked while it is ${state}.`;
}

import { formatCalendarDate } from '@/lib/format';
import type { Quote, QuoteVersion } from '@/types/api';

/** Why a version cannot be accepted or declined now, as the customer reads it. */
export interface AnswerRefusal {
  reason: 'missing' | 'replaced' | 'accepted' | 'declined' | 'expired' | 'not-sent';
  message: string;
  /** The version to look at instead (the latest), when another one replaced this. */
  latestVersionNumber?: number;
}

function latestOf(quote: Quote): QuoteVersion | undefined {
  return [...quote.versions].sort((a, b) => b.number - a.number)[0];
}

/**
 * Null when the customer can answer version `versionNumber` (it is the latest and it is open);
 * otherwise why not, in words. The server decides (409); this explains the quote as it stands,
 * e.g. after a refusal refreshed it.
 */
export function answerRefusal(quote: Quote, versionNumber: number): AnswerRefusal | null {
  const version = quote.versions.find((candidate) => candidate.number === versionNumber);
  if (!version) {
    return {
      reason: 'missing',
      message: `Quote ${quote.reference} has no version ${versionNumber}.`,
    };
  }
  const latest = latestOf(quote);
  if (version.state === 'superseded' || (latest && latest.number > version.number)) {
    const newer = latest && latest.number > version.number ? latest.number : undefined;
    return {
      reason: 'replaced',
      message: newer
        ? `Version ${version.number} has been replaced by version ${newer}, so it can no longer be accepted. Look at version ${newer} instead.`
        : `Version ${version.number} has been replaced, so it can no longer be accepted.`,
      latestVersionNumber: newer,
    };
  }
  switch (version.state) {
    case 'accepted':
      return {
        reason: 'accepted',
        message: `You have already accepted version ${version.number}.`,
      };
    case 'declined':
      return {
        reason: 'declined',
        message: `You have already declined version ${version.number}.`,
      };
    case 'expired':
      return {
        reason: 'expired',
        message: `The prices of version ${version.number} ran out on ${formatCalendarDate(version.validUntilDate)}. Ask the workshop for a new quote.`,
      };
    case 'draft':
      return {
        reason: 'not-sent',
        message: `Version ${version.number} has not been sent to you yet.`,
      };
    default:
      return null;
  }
}

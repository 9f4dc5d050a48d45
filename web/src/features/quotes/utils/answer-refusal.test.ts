import { describe, expect, it } from 'vitest';
import type { Quote, QuoteVersion, QuoteVersionState } from '@/types/api';
import { answerRefusal } from './answer-refusal';

function quoteWith(...states: QuoteVersionState[]): Quote {
  const versions = states.map(
    (state, index) =>
      ({ number: index + 1, state, validUntilDate: '2026-12-31' }) as unknown as QuoteVersion,
  );
  // Only the fields the explanation reads.
  return { reference: 'Q-000123', versions } as unknown as Quote;
}

describe('why a version cannot be answered now', () => {
  it('lets the customer answer the latest open version', () => {
    expect(answerRefusal(quoteWith('superseded', 'sent'), 2)).toBeNull();
  });

  it('says a replaced version was replaced, and by which', () => {
    const refusal = answerRefusal(quoteWith('superseded', 'superseded', 'sent'), 2);
    expect(refusal?.reason).toBe('replaced');
    expect(refusal?.latestVersionNumber).toBe(3);
    expect(refusal?.message).toContain('replaced by version 3');
  });

  it('says when the version was already answered or has run out', () => {
    expect(answerRefusal(quoteWith('superseded', 'accepted'), 2)?.reason).toBe('accepted');
    expect(answerRefusal(quoteWith('declined'), 1)?.reason).toBe('declined');
    const expired = answerRefusal(quoteWith('expired'), 1);
    expect(expired?.reason).toBe('expired');
    // Source: Unicode CLDR, en-AU long date format "d MMMM y" (31 December 2026).
    expect(expired?.message).toContain('31 December 2026');
  });

  it('says when there is no such version, or it was not sent', () => {
    expect(answerRefusal(quoteWith('sent'), 4)?.reason).toBe('missing');
    expect(answerRefusal(quoteWith('draft'), 1)?.reason).toBe('not-sent');
  });
});

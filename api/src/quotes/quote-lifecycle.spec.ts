import { describe, expect, it } from 'vitest';
import {
  answerRefusal,
  bookingRefusal,
  effectiveState,
  isBookable,
  sendRefusal,
  type VersionFacts,
} from './quote-lifecycle';
import type { QuoteVersionState } from './quote-states';

/** Valid until the end of 31 December 2026 in Sydney (AEDT, UTC+11). */
const VALID_UNTIL = new Date('2026-12-31T12:59:59.999Z');
const BEFORE = new Date('2026-12-31T12:59:59.999Z');
const AFTER = new Date('2026-12-31T13:00:00.000Z');

function version(state: QuoteVersionState, number = 1): VersionFacts {
  return { number, state, validUntil: VALID_UNTIL, validUntilDate: '2026-12-31' };
}

describe('quote version lifecycle', () => {
  it('reads a draft or sent version as expired only after the last millisecond of its last day', () => {
    expect(effectiveState(version('sent'), BEFORE)).toBe('sent');
    expect(effectiveState(version('sent'), AFTER)).toBe('expired');
    expect(effectiveState(version('draft'), AFTER)).toBe('expired');
  });

  it('keeps answered and replaced versions as they are after the dates pass', () => {
    for (const state of ['accepted', 'declined', 'superseded', 'expired'] as const) {
      expect(effectiveState(version(state), AFTER)).toBe(state);
    }
  });

  it('books only the latest version, sent or accepted, within its dates', () => {
    expect(isBookable(version('sent'), 1, BEFORE)).toBe(true);
    expect(isBookable(version('accepted'), 1, BEFORE)).toBe(true);
    expect(isBookable(version('accepted'), 1, AFTER)).toBe(false);
    expect(isBookable(version('sent'), 1, AFTER)).toBe(false);
    expect(isBookable(version('sent', 1), 2, BEFORE)).toBe(false);
    for (const state of ['draft', 'declined', 'superseded', 'expired'] as const) {
      expect(isBookable(version(state), 1, BEFORE)).toBe(false);
    }
  });

  it('lets the customer answer only the latest sent version, and says why not otherwise', () => {
    expect(answerRefusal(version('sent'), 1, BEFORE)).toBeNull();
    expect(answerRefusal(version('sent'), 1, AFTER)).toBe(
      'This quote expired on 31 December 2026. Ask the workshop for a new one.',
    );
    expect(answerRefusal(version('superseded', 1), 2, BEFORE)).toMatch(/replaced by version 2/);
    expect(answerRefusal(version('sent', 1), 2, BEFORE)).toMatch(/not the newest version/);
    expect(answerRefusal(version('declined'), 1, BEFORE)).toMatch(/was declined/);
    expect(answerRefusal(version('accepted'), 1, BEFORE)).toMatch(/already accepted/);
    expect(answerRefusal(version('draft'), 1, BEFORE)).toMatch(/not sent/);
  });

  it('lets the desk send only a draft within its dates', () => {
    expect(sendRefusal(version('draft'), 1, BEFORE)).toBeNull();
    expect(sendRefusal(version('draft'), 1, AFTER)).toMatch(/expired on 31 December 2026/);
    expect(sendRefusal(version('sent'), 1, BEFORE)).toMatch(/Only a draft can be sent/);
    expect(sendRefusal(version('accepted'), 1, BEFORE)).toMatch(/is accepted/);
  });

  it('gives a booking refusal for every version that cannot be booked', () => {
    expect(bookingRefusal(version('sent'), 1, BEFORE)).toBeNull();
    expect(bookingRefusal(version('sent'), 1, AFTER)).toMatch(/expired on 31 December 2026/);
    expect(bookingRefusal(version('sent', 1), 2, BEFORE)).toMatch(/replaced by version 2/);
    expect(bookingRefusal(version('draft'), 1, BEFORE)).toMatch(/not sent/);
    expect(bookingRefusal(version('declined'), 1, BEFORE)).toMatch(/declined/);
  });
});

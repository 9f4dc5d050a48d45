import { describe, expect, it } from 'vitest';
import { bayTimeInWords, minutesInWords, sameBayTime } from './booking-events';

describe('audit trail words', () => {
  it('says minutes as hours and minutes', () => {
    expect(minutesInWords(45)).toBe('45 min');
    expect(minutesInWords(60)).toBe('1 h');
    expect(minutesInWords(210)).toBe('3 h 30 min');
    expect(minutesInWords(0)).toBe('0 min');
  });

  it("says a plan's bay time in order, or that it has none", () => {
    expect(
      bayTimeInWords({
        segments: [
          { bayKind: 'hoist', minutes: 210 },
          { bayKind: 'alignment', minutes: 60 },
        ],
      }),
    ).toBe('hoist bay 3 h 30 min, alignment bay 1 h');
    expect(bayTimeInWords({ segments: [] })).toBe('no bay time');
  });

  it('compares plans by bay kind and minutes, segment by segment', () => {
    const plan = { segments: [{ bayKind: 'tyre', minutes: 60 }] };
    expect(sameBayTime(plan, { segments: [{ bayKind: 'tyre', minutes: 60 }] })).toBe(true);
    expect(sameBayTime(plan, { segments: [{ bayKind: 'tyre', minutes: 90 }] })).toBe(false);
    expect(sameBayTime(plan, { segments: [{ bayKind: 'hoist', minutes: 60 }] })).toBe(false);
    expect(
      sameBayTime(plan, {
        segments: [
          { bayKind: 'tyre', minutes: 60 },
          { bayKind: 'alignment', minutes: 30 },
        ],
      }),
    ).toBe(false);
  });
});

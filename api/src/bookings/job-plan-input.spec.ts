import { describe, expect, it } from 'vitest';
import type { PackagePrice, PricedLine } from '../pricing/pricing.types';
import { jobPlanInputOf } from './job-plan-input';

function priceWith(lines: Partial<PricedLine>[]): PackagePrice {
  return { lines } as unknown as PackagePrice;
}

describe('jobPlanInputOf', () => {
  it("takes the bay time of labour and service lines, fitting per wheel and the parts' lead times", () => {
    const input = jobPlanInputOf(
      {
        wheelsFitted: 4,
        price: priceWith([
          { kind: 'part', description: 'Lift kit', specialOrder: true, leadDays: 7 },
          { kind: 'part', description: 'Tyre', specialOrder: false, leadDays: 3 },
          { kind: 'labour', description: 'Labour: lift kit', labourMinutes: 270, bayKind: 'hoist' },
          { kind: 'service', description: 'Wheel alignment', bayMinutes: 60, bayKind: 'alignment' },
          { kind: 'service', description: 'Disposal levy', bayMinutes: 0, bayKind: null },
          { kind: 'fitting-balancing', description: 'Fitting and balancing' },
          { kind: 'bundle-discount', description: 'Package discount' },
        ]),
      },
      { fittingMinutesPerWheel: 15, leadTimeBufferDays: 1 },
      '2026-12-02',
    );
    expect(input).toEqual({
      work: [
        { bayKind: 'hoist', minutes: 270, description: 'Labour: lift kit' },
        { bayKind: 'alignment', minutes: 60, description: 'Wheel alignment' },
        { bayKind: null, minutes: 0, description: 'Disposal levy' },
        { bayKind: 'tyre', minutes: 60, description: 'Fitting and balancing, 4 wheels' },
      ],
      parts: [
        { description: 'Lift kit', specialOrder: true, leadDays: 7 },
        { description: 'Tyre', specialOrder: false, leadDays: 3 },
      ],
      leadTimeBufferDays: 1,
      todayLocalDate: '2026-12-02',
    });
  });

  it('adds no fitting time when no wheel is fitted or the workshop sets none', () => {
    const price = priceWith([
      { kind: 'labour', description: 'x', labourMinutes: 30, bayKind: 'hoist' },
    ]);
    const settings = { fittingMinutesPerWheel: 15, leadTimeBufferDays: 0 };
    expect(jobPlanInputOf({ wheelsFitted: 0, price }, settings, '2026-12-02').work).toHaveLength(1);
    expect(
      jobPlanInputOf(
        { wheelsFitted: 4, price },
        { ...settings, fittingMinutesPerWheel: 0 },
        '2026-12-02',
      ).work,
    ).toHaveLength(1);
  });
});

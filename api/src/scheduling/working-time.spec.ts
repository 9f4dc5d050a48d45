import { describe, expect, it } from 'vitest';
import { dayHoursIssues } from './working-time';

describe('dayHoursIssues', () => {
  it('accepts hours with and without a break', () => {
    expect(
      dayHoursIssues({
        opensAt: '07:30',
        closesAt: '17:00',
        breakStartsAt: '12:00',
        breakEndsAt: '12:30',
      }),
    ).toEqual([]);
    expect(
      dayHoursIssues({
        opensAt: '08:00',
        closesAt: '12:00',
        breakStartsAt: null,
        breakEndsAt: null,
      }),
    ).toEqual([]);
  });

  it('names the field that is wrong', () => {
    const fields = (
      opensAt: string,
      closesAt: string,
      breakStartsAt: string | null,
      breakEndsAt: string | null,
    ) =>
      dayHoursIssues({ opensAt, closesAt, breakStartsAt, breakEndsAt }).map((issue) => issue.field);
    expect(fields('7:30', '17:00', null, null)).toEqual(['opensAt']);
    expect(fields('07:30', '24:00', null, null)).toEqual(['closesAt']);
    expect(fields('17:00', '07:30', null, null)).toEqual(['closesAt']);
    expect(fields('07:30', '07:30', null, null)).toEqual(['closesAt']);
    expect(fields('07:30', '17:00', '12:00', null)).toEqual(['breakEndsAt']);
    expect(fields('07:30', '17:00', null, '12:30')).toEqual(['breakStartsAt']);
    expect(fields('07:30', '17:00', '07:30', '08:00')).toEqual(['breakStartsAt']);
    expect(fields('07:30', '17:00', '12:30', '12:00')).toEqual(['breakEndsAt']);
    expect(fields('07:30', '17:00', '12:00', '17:00')).toEqual(['breakEndsAt']);
  });
});

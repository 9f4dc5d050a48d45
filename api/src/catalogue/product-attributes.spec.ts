import { describe, expect, it } from 'vitest';
import { validateProductAttributes } from './product-attributes';

function errorsOf(value: unknown): Record<string, string[]> {
  const result = validateProductAttributes('component', value);
  if (result.ok) throw new Error(`expected ${JSON.stringify(value)} to be refused`);
  return result.fieldErrors;
}

describe('component attributes: hub-centric ring sizes', () => {
  it('takes ring sizes to 0.1 mm and stores them in the fixed key order', () => {
    const result = validateProductAttributes('component', {
      massKg: 0.2,
      ringInnerMm: 108.1,
      ringOuterMm: 110.1,
      role: 'hub-rings',
    });
    expect(result).toEqual({
      ok: true,
      attributes: { role: 'hub-rings', ringOuterMm: 110.1, ringInnerMm: 108.1, massKg: 0.2 },
    });
    if (!result.ok) return;
    expect(Object.keys(result.attributes)).toEqual([
      'role',
      'ringOuterMm',
      'ringInnerMm',
      'massKg',
    ]);
  });

  it('requires both sizes on hub-centric rings', () => {
    expect(errorsOf({ role: 'hub-rings' })).toEqual({
      'attributes.ringOuterMm': ['is required for hub-centric rings'],
      'attributes.ringInnerMm': ['is required for hub-centric rings'],
    });
    expect(errorsOf({ role: 'hub-rings', ringOuterMm: 110.1 })).toEqual({
      'attributes.ringInnerMm': ['is required for hub-centric rings'],
    });
  });

  it('refuses an inner size that is not smaller than the outer one', () => {
    expect(errorsOf({ role: 'hub-rings', ringOuterMm: 106.1, ringInnerMm: 110.1 })).toEqual({
      'attributes.ringInnerMm': ['must be less than ringOuterMm'],
    });
    expect(errorsOf({ role: 'hub-rings', ringOuterMm: 106.1, ringInnerMm: 106.1 })).toEqual({
      'attributes.ringInnerMm': ['must be less than ringOuterMm'],
    });
  });

  it('refuses sizes out of range, with more than one decimal, or not numbers', () => {
    expect(errorsOf({ role: 'hub-rings', ringOuterMm: 201, ringInnerMm: 108.1 })).toEqual({
      'attributes.ringOuterMm': ['must be 200 mm or less'],
    });
    expect(errorsOf({ role: 'hub-rings', ringOuterMm: 110.1, ringInnerMm: 39.9 })).toEqual({
      'attributes.ringInnerMm': ['must be 40 mm or more'],
    });
    expect(errorsOf({ role: 'hub-rings', ringOuterMm: 110.15, ringInnerMm: 108.1 })).toEqual({
      'attributes.ringOuterMm': ['must be a number with at most 1 decimals'],
    });
    expect(errorsOf({ role: 'hub-rings', ringOuterMm: '110.1', ringInnerMm: 108.1 })).toEqual({
      'attributes.ringOuterMm': ['must be a number with at most 1 decimals'],
    });
  });

  it('refuses ring sizes on other components', () => {
    expect(
      errorsOf({ role: 'steering-damper', ringOuterMm: 110.1, ringInnerMm: 106.1, massKg: 3 }),
    ).toEqual({
      'attributes.ringOuterMm': ['is only for hub-centric rings'],
      'attributes.ringInnerMm': ['is only for hub-centric rings'],
    });
    expect(errorsOf({ role: 'diff-drop', diffDropMm: 25, ringInnerMm: 106.1 })).toEqual({
      'attributes.ringInnerMm': ['is only for hub-centric rings'],
    });
  });

  it('keeps the diff-drop rules as they were', () => {
    expect(
      errorsOf({ role: 'hub-rings', ringOuterMm: 110.1, ringInnerMm: 106.1, diffDropMm: 25 }),
    ).toEqual({ 'attributes.diffDropMm': ['is only for a diff drop'] });
    expect(validateProductAttributes('component', { role: 'diff-drop', diffDropMm: 25 })).toEqual({
      ok: true,
      attributes: { role: 'diff-drop', diffDropMm: 25 },
    });
  });
});

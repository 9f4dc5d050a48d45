import type { FrontSuspensionKind, RearSuspensionKind } from '../fitment/fitment.types';

export const BODY_TYPES = ['ute', 'wagon'] as const;
export type BodyType = (typeof BODY_TYPES)[number];

export const FRONT_SUSPENSION_KINDS = [
  'independent',
  'solid-axle',
] as const satisfies readonly FrontSuspensionKind[];

export const REAR_SUSPENSION_KINDS = [
  'leaf',
  'coil',
  'independent',
] as const satisfies readonly RearSuspensionKind[];

/** "6x139.7": stud count x pitch circle diameter in mm. */
export const BOLT_PATTERN_PATTERN = /^(\d{1,2})x(\d{2,3}(?:\.\d{1,2})?)$/;

/** "M12x1.5": metric stud thread, diameter x pitch in mm. */
export const STUD_THREAD_PATTERN = /^M(\d{1,2}(?:\.\d)?)x(\d(?:\.\d{1,2})?)$/;

/** "6 X 139.7" → "6x139.7"; anything else unchanged. */
export function normaliseBoltPattern(value: unknown): unknown {
  return typeof value === 'string' ? value.trim().replace(/\s+/g, '').replace(/[X×]/g, 'x') : value;
}

/** "m12 x 1.5" → "M12x1.5"; anything else unchanged. */
export function normaliseStudThread(value: unknown): unknown {
  if (typeof value !== 'string') return value;
  const compact = value.trim().replace(/\s+/g, '').replace(/[X×]/g, 'x');
  return compact.length > 0 ? compact[0].toUpperCase() + compact.slice(1).toLowerCase() : compact;
}

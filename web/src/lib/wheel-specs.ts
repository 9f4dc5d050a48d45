/**
 * How wheel fitments are written, mirroring the API's rules: the bolt pattern as stud count x
 * pitch circle diameter in mm ("6x139.7") and the stud thread as metric diameter x pitch
 * ("M12x1.5"). Input is tidied the same way the API tidies it before checking.
 */

export const BOLT_PATTERN_PATTERN = /^(\d{1,2})x(\d{2,3}(?:\.\d{1,2})?)$/;
export const STUD_THREAD_PATTERN = /^M(\d{1,2}(?:\.\d)?)x(\d(?:\.\d{1,2})?)$/;

/** "6 X 139.7" → "6x139.7". */
export function normaliseBoltPattern(value: string): string {
  return value.trim().replace(/\s+/g, '').replace(/[X×]/g, 'x');
}

/** "m12 x 1.5" → "M12x1.5". */
export function normaliseStudThread(value: string): string {
  const compact = value.trim().replace(/\s+/g, '').replace(/[X×]/g, 'x');
  return compact.length > 0 ? compact[0].toUpperCase() + compact.slice(1).toLowerCase() : compact;
}

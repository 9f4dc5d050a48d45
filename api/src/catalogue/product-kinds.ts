export const PRODUCT_KINDS = ['wheel', 'tyre', 'suspension-kit', 'component', 'service'] as const;
export type ProductKind = (typeof PRODUCT_KINDS)[number];

export function isProductKind(value: unknown): value is ProductKind {
  return typeof value === 'string' && (PRODUCT_KINDS as readonly string[]).includes(value);
}

/** The bay a product's labour is done in (null: no bay time, e.g. a disposal levy). */
export const BAY_KINDS = ['hoist', 'alignment', 'tyre'] as const;
export type BayKind = (typeof BAY_KINDS)[number];

export const TREAD_TYPES = ['highway', 'all-terrain', 'mud-terrain'] as const;
export type TreadType = (typeof TREAD_TYPES)[number];

export const COMPONENT_ROLES = [
  'diff-drop',
  'greasable-shackles',
  'extended-brake-lines',
  'steering-damper',
  'hub-rings',
  'accessory',
] as const;
export type ComponentRole = (typeof COMPONENT_ROLES)[number];

export const SERVICE_ROLES = [
  'alignment',
  'fitting-balancing',
  'tyre-disposal',
  'headlight-re-aim',
  'speedometer-recalibration',
] as const;
export type ServiceRole = (typeof SERVICE_ROLES)[number];

/** SKU: upper-case letters, digits and hyphens, starting with a letter or digit. */
export const SKU_PATTERN = /^[A-Z0-9][A-Z0-9-]{1,39}$/;

/**
 * Text that a spreadsheet would run as a formula when the exported CSV is opened (OWASP CSV
 * injection): such names are refused, so the export needs no escaping and still round-trips.
 */
export const FORMULA_START_PATTERN = /^[=+\-@\t\r]/;

import * as yup from 'yup';
import {
  DOLLARS_PATTERN,
  MAX_PRICE_CENTS,
  centsToDollarsText,
  dollarsTextToCents,
} from '@/lib/money';
import {
  numberFromText,
  numberInRange,
  textFromNumber,
  type NumberRule,
} from '@/lib/number-fields';
import {
  BOLT_PATTERN_PATTERN,
  STUD_THREAD_PATTERN,
  normaliseBoltPattern,
  normaliseStudThread,
} from '@/lib/wheel-specs';
import type {
  BayKind,
  ComponentRole,
  CreateProductRequest,
  Product,
  ProductAttributes,
  ProductKind,
  ServiceRole,
  TreadType,
  UpdateProductRequest,
} from '@/types/api';

// ---- Names people read -------------------------------------------------------------------

export const productKinds: readonly ProductKind[] = [
  'suspension-kit',
  'wheel',
  'tyre',
  'component',
  'service',
];

export const kindLabels: Record<ProductKind, string> = {
  wheel: 'Wheel',
  tyre: 'Tyre',
  'suspension-kit': 'Suspension kit',
  component: 'Component',
  service: 'Service',
};

export const kindPluralLabels: Record<ProductKind, string> = {
  wheel: 'Wheels',
  tyre: 'Tyres',
  'suspension-kit': 'Suspension kits',
  component: 'Components',
  service: 'Services',
};

export const bayKinds: readonly BayKind[] = ['hoist', 'alignment', 'tyre'];

export const bayKindLabels: Record<BayKind, string> = {
  hoist: 'Hoist bay',
  alignment: 'Alignment bay',
  tyre: 'Tyre bay',
};

const treadTypeLabels: Record<TreadType, string> = {
  highway: 'Highway',
  'all-terrain': 'All-terrain',
  'mud-terrain': 'Mud-terrain',
};

const componentRoleLabels: Record<ComponentRole, string> = {
  'diff-drop': 'Diff drop',
  'greasable-shackles': 'Greasable shackles',
  'extended-brake-lines': 'Extended brake lines',
  'steering-damper': 'Steering damper',
  'hub-rings': 'Hub rings',
  accessory: 'Accessory',
};

const serviceRoleLabels: Record<ServiceRole, string> = {
  alignment: 'Wheel alignment',
  'fitting-balancing': 'Fitting and balancing',
  'tyre-disposal': 'Tyre disposal',
  'headlight-re-aim': 'Headlight re-aim',
  'speedometer-recalibration': 'Speedometer recalibration',
};

function optionsOf<T extends string>(labels: Record<T, string>) {
  return (Object.entries(labels) as [T, string][]).map(([value, label]) => ({ value, label }));
}

/** Product fields as a price-list preview names them (the API's field names). */
export const productFieldLabels: Record<string, string> = {
  sku: 'SKU',
  kind: 'Kind',
  name: 'Name',
  brand: 'Brand',
  description: 'Description',
  priceCents: 'Price',
  labourMinutes: 'Labour minutes',
  bayKind: 'Bay',
  stockQty: 'Stock',
  leadDays: 'Lead days',
  active: 'Active',
  attributes: 'Attributes',
  fitsVehicleModelIds: 'Fits vehicles',
};

// ---- Attributes of each kind, as data the form and the schema are built from ---------------

interface FieldBase {
  key: string;
  label: string;
  helperText?: string;
}

export type AttributeField =
  | (FieldBase & { type: 'number'; rule: NumberRule; optional?: boolean })
  | (FieldBase & {
      type: 'text';
      pattern?: RegExp;
      patternMessage?: string;
      normalise?: (value: string) => string;
      maxLength: number;
    })
  | (FieldBase & { type: 'select'; options: readonly { value: string; label: string }[] })
  | (FieldBase & { type: 'switch' });

export const attributeFields: Record<ProductKind, readonly AttributeField[]> = {
  wheel: [
    {
      key: 'diameterIn',
      label: 'Rim diameter (in)',
      type: 'number',
      rule: { min: 13, max: 26, unit: 'in', halfSteps: true },
    },
    {
      key: 'widthIn',
      label: 'Rim width (in)',
      type: 'number',
      rule: { min: 4, max: 14, unit: 'in', halfSteps: true },
    },
    {
      key: 'offsetMm',
      label: 'Offset (mm)',
      type: 'number',
      rule: { min: -80, max: 80, unit: 'mm', whole: true },
      helperText: 'ET; negative pushes the wheel out.',
    },
    {
      key: 'boltPattern',
      label: 'Bolt pattern',
      type: 'text',
      pattern: BOLT_PATTERN_PATTERN,
      patternMessage: 'Write stud count x PCD in mm, like 6x139.7.',
      normalise: normaliseBoltPattern,
      maxLength: 12,
      helperText: 'Stud count x PCD in mm, like 6x139.7.',
    },
    {
      key: 'centreBoreMm',
      label: 'Centre bore (mm)',
      type: 'number',
      rule: { min: 40, max: 200, unit: 'mm', decimals: 2 },
    },
    {
      key: 'studThread',
      label: 'Stud thread',
      type: 'text',
      pattern: STUD_THREAD_PATTERN,
      patternMessage: 'Write a metric thread, like M12x1.5.',
      normalise: normaliseStudThread,
      maxLength: 12,
      helperText: 'Metric diameter x pitch, like M12x1.5.',
    },
    {
      key: 'loadRatingKg',
      label: 'Load rating (kg per wheel)',
      type: 'number',
      rule: { min: 100, max: 3000, unit: 'kg', whole: true },
    },
  ],
  tyre: [
    {
      key: 'designation',
      label: 'Tyre size',
      type: 'text',
      maxLength: 40,
      normalise: (value) => value.trim().replace(/\s+/g, ' '),
      helperText: 'With load index and speed symbol, like 265/70R17 115T or LT285/70R17 121/118Q.',
    },
    {
      key: 'treadType',
      label: 'Tread',
      type: 'select',
      options: optionsOf(treadTypeLabels),
    },
    {
      key: 'approvedRimWidthMinIn',
      label: 'Narrowest approved rim (in)',
      type: 'number',
      optional: true,
      rule: { min: 4, max: 16, unit: 'in', halfSteps: true },
      helperText: "From the tyre maker's data; leave both empty to use the standard range.",
    },
    {
      key: 'approvedRimWidthMaxIn',
      label: 'Widest approved rim (in)',
      type: 'number',
      optional: true,
      rule: { min: 4, max: 16, unit: 'in', halfSteps: true },
    },
  ],
  'suspension-kit': [
    {
      key: 'frontLiftMm',
      label: 'Front lift (mm)',
      type: 'number',
      rule: { min: -100, max: 200, unit: 'mm', whole: true },
    },
    {
      key: 'rearLiftMm',
      label: 'Rear lift (mm)',
      type: 'number',
      rule: { min: -100, max: 200, unit: 'mm', whole: true },
    },
    {
      key: 'constantLoadMinKg',
      label: 'Constant load from (kg)',
      type: 'number',
      rule: { min: 0, max: 2000, unit: 'kg', whole: true },
    },
    {
      key: 'constantLoadMaxKg',
      label: 'Constant load up to (kg)',
      type: 'number',
      rule: { min: 0, max: 2000, unit: 'kg', whole: true },
    },
    {
      key: 'keepsTwoThirdsTravel',
      label: 'Keeps two thirds of the suspension travel',
      type: 'switch',
    },
    { key: 'includesGreasableShackles', label: 'Includes greasable shackles', type: 'switch' },
    { key: 'includesExtendedBrakeLines', label: 'Includes extended brake lines', type: 'switch' },
  ],
  component: [
    {
      key: 'role',
      label: 'Component type',
      type: 'select',
      options: optionsOf(componentRoleLabels),
    },
    {
      key: 'diffDropMm',
      label: 'Diff drop (mm)',
      type: 'number',
      optional: true,
      rule: { min: 1, max: 100, unit: 'mm', whole: true },
      helperText: 'Diff drops only: how far the front differential is lowered.',
    },
    {
      key: 'ringOuterMm',
      label: 'Ring outer diameter (mm)',
      type: 'number',
      optional: true,
      rule: { min: 40, max: 200, unit: 'mm', decimals: 1 },
      helperText: 'Hub-centric rings only: the wheel-bore side.',
    },
    {
      key: 'ringInnerMm',
      label: 'Ring inner diameter (mm)',
      type: 'number',
      optional: true,
      rule: { min: 40, max: 200, unit: 'mm', decimals: 1 },
      helperText: 'Hub-centric rings only: the hub side.',
    },
    {
      key: 'massKg',
      label: 'Added mass (kg)',
      type: 'number',
      optional: true,
      rule: { min: 0, max: 1000, unit: 'kg', decimals: 1 },
      helperText: 'Counted against the GVM.',
    },
  ],
  service: [
    { key: 'role', label: 'Service type', type: 'select', options: optionsOf(serviceRoleLabels) },
    {
      key: 'perWheel',
      label: 'Priced per wheel',
      type: 'switch',
      helperText: 'Like fitting and balancing, or tyre disposal.',
    },
  ],
};

export type AttributeValues = Record<string, string | boolean>;

/** A fresh kind's attribute fields, empty (switches off, selects on their first option). */
export function emptyAttributes(kind: ProductKind): AttributeValues {
  const values: AttributeValues = {};
  for (const field of attributeFields[kind]) {
    if (field.type === 'switch') values[field.key] = false;
    else if (field.type === 'select') values[field.key] = field.options[0]?.value ?? '';
    else values[field.key] = '';
  }
  return values;
}

function attributesAsValues(kind: ProductKind, attributes: ProductAttributes): AttributeValues {
  const stored = attributes as unknown as Record<string, unknown>;
  const values = emptyAttributes(kind);
  for (const field of attributeFields[kind]) {
    const value = stored[field.key];
    if (field.type === 'switch') values[field.key] = value === true;
    else if (field.type === 'number') values[field.key] = textFromNumber(value as number | null);
    else if (typeof value === 'string') values[field.key] = value;
  }
  return values;
}

function attributesFromValues(kind: ProductKind, values: AttributeValues): ProductAttributes {
  const attributes: Record<string, unknown> = {};
  for (const field of attributeFields[kind]) {
    const value = values[field.key];
    if (field.type === 'switch') attributes[field.key] = value === true;
    else if (field.type === 'number') {
      const number = numberFromText(String(value ?? ''));
      // Optional numbers are left out when empty, as the API expects.
      if (number !== null) attributes[field.key] = number;
    } else if (field.type === 'text') {
      const text = String(value ?? '');
      attributes[field.key] = field.normalise ? field.normalise(text) : text.trim();
    } else attributes[field.key] = value;
  }
  return attributes as unknown as ProductAttributes;
}

// ---- The schema (mirrors the API's product DTO and per-kind attribute DTOs) ---------------

/** SKU: upper-case letters, digits and hyphens, starting with a letter or digit (2..40). */
export const SKU_PATTERN = /^[A-Z0-9][A-Z0-9-]{1,39}$/;
/** Text a spreadsheet would run as a formula is refused by the API (CSV injection). */
const FORMULA_START_PATTERN = /^[=+\-@\t\r]/;

function text(label: string, min: number, max: number) {
  let schema = yup.string().trim().max(max, `Use at most ${max} characters.`);
  if (min > 0) schema = schema.required(`Enter the ${label}.`);
  return schema.test(
    'not-formula',
    'Do not start with =, +, - or @ (a spreadsheet would run it as a formula).',
    (value) => !value || !FORMULA_START_PATTERN.test(value),
  );
}

function attributeFieldSchema(field: AttributeField) {
  switch (field.type) {
    case 'number': {
      const schema = numberInRange(field.rule);
      return field.optional
        ? schema.optional()
        : schema.required(`Enter the ${lower(field.label)}.`);
    }
    case 'text': {
      let schema = yup
        .string()
        .transform((value: unknown) =>
          typeof value === 'string' && field.normalise ? field.normalise(value) : value,
        )
        .required(`Enter the ${lower(field.label)}.`)
        .max(field.maxLength, `Use at most ${field.maxLength} characters.`);
      if (field.pattern) schema = schema.matches(field.pattern, field.patternMessage);
      return schema;
    }
    case 'select':
      return yup
        .string()
        .oneOf(
          field.options.map((option) => option.value),
          `Choose a ${lower(field.label)}.`,
        )
        .required(`Choose a ${lower(field.label)}.`);
    case 'switch':
      return yup.boolean().required();
  }
}

/** "Rim width (in)" → "rim width". */
function lower(label: string): string {
  return label.replace(/\s*\(.*\)$/, '').toLowerCase();
}

function isSet(value: unknown): boolean {
  return value !== undefined && value !== null && value !== '';
}

/** The rules across a kind's attributes, as the API checks them. */
function attributeSchema(kind: ProductKind) {
  const shape: Record<string, yup.AnySchema> = {};
  for (const field of attributeFields[kind]) shape[field.key] = attributeFieldSchema(field);
  let schema: yup.AnyObjectSchema = yup.object(shape);
  if (kind === 'tyre') {
    schema = schema.test('rim-range', function check(value: Record<string, unknown>) {
      const min = value?.approvedRimWidthMinIn;
      const max = value?.approvedRimWidthMaxIn;
      if (isSet(min) !== isSet(max)) {
        return this.createError({
          path: `${this.path}.${isSet(min) ? 'approvedRimWidthMaxIn' : 'approvedRimWidthMinIn'}`,
          message: 'Give both ends of the approved rim range, or neither.',
        });
      }
      if (isSet(min) && Number(min) > Number(max)) {
        return this.createError({
          path: `${this.path}.approvedRimWidthMaxIn`,
          message: 'Must not be narrower than the narrowest approved rim.',
        });
      }
      return true;
    });
  }
  if (kind === 'suspension-kit') {
    schema = schema.test('load-range', function check(value: Record<string, unknown>) {
      if (Number(value?.constantLoadMinKg) > Number(value?.constantLoadMaxKg)) {
        return this.createError({
          path: `${this.path}.constantLoadMaxKg`,
          message: 'Must not be less than the constant load it starts from.',
        });
      }
      return true;
    });
  }
  if (kind === 'component') {
    schema = schema.test('diff-drop', function check(value: Record<string, unknown>) {
      const isDiffDrop = value?.role === 'diff-drop';
      if (isDiffDrop && !isSet(value?.diffDropMm)) {
        return this.createError({
          path: `${this.path}.diffDropMm`,
          message: 'Enter how far a diff drop lowers the differential.',
        });
      }
      if (!isDiffDrop && isSet(value?.diffDropMm)) {
        return this.createError({
          path: `${this.path}.diffDropMm`,
          message: 'Only a diff drop has this; leave it empty.',
        });
      }
      return true;
    });
    schema = schema.test('hub-rings', function check(value: Record<string, unknown>) {
      const isRings = value?.role === 'hub-rings';
      for (const key of ['ringOuterMm', 'ringInnerMm'] as const) {
        if (isRings && !isSet(value?.[key])) {
          return this.createError({
            path: `${this.path}.${key}`,
            message: 'Enter both ring diameters: the rings are checked against the wheel and hub.',
          });
        }
        if (!isRings && isSet(value?.[key])) {
          return this.createError({
            path: `${this.path}.${key}`,
            message: 'Only hub-centric rings have this; leave it empty.',
          });
        }
      }
      if (isRings && Number(value?.ringInnerMm) >= Number(value?.ringOuterMm)) {
        return this.createError({
          path: `${this.path}.ringInnerMm`,
          message: 'Must be smaller than the outer diameter.',
        });
      }
      return true;
    });
  }
  return schema;
}

export const productSchema = yup.object({
  sku: yup
    .string()
    .trim()
    .required('Enter the SKU.')
    .matches(SKU_PATTERN, 'Use 2 to 40 upper-case letters, digits and hyphens, like BR-STR-50-M.'),
  kind: yup
    .mixed<ProductKind>()
    .oneOf([...productKinds], 'Choose a kind.')
    .required('Choose a kind.'),
  name: text('name', 1, 120),
  brand: text('brand', 1, 60),
  description: yup.string().trim().max(2000, 'Use at most 2000 characters.'),
  price: yup
    .string()
    .trim()
    .required('Enter the price in dollars, like 1249.00.')
    .matches(
      DOLLARS_PATTERN,
      'Enter dollars with at most 2 decimals, like 1249.00 (no $ or commas).',
    )
    .test(
      'max-price',
      'Use at most $10,000,000.00.',
      (value) => !value || (dollarsTextToCents(value) ?? 0) <= MAX_PRICE_CENTS,
    ),
  labourMinutes: numberInRange({ min: 0, max: 6000, unit: 'minutes', whole: true }).required(
    'Enter the labour minutes (0 for none).',
  ),
  stockQty: numberInRange({ min: 0, max: 100000, whole: true }).required(
    'Enter how many are in stock (0 for none).',
  ),
  leadDays: numberInRange({ min: 0, max: 365, unit: 'days', whole: true }).required(
    'Enter the lead time in days (0 when on the shelf).',
  ),
  bayKind: yup.string().oneOf(['', ...bayKinds], 'Choose a bay.'),
  active: yup.boolean().required(),
  fitsVehicleModelIds: yup.array(yup.string().required()).max(200, 'Choose at most 200 vehicles.'),
  attributes: yup
    .object()
    .when('kind', ([kind]: ProductKind[], schema) =>
      productKinds.includes(kind) ? attributeSchema(kind) : schema,
    ),
});

// ---- Form values and requests --------------------------------------------------------------

export interface ProductFormValues {
  sku: string;
  kind: ProductKind;
  name: string;
  brand: string;
  description: string;
  /** Dollars, as typed ("1249.00"). */
  price: string;
  labourMinutes: string;
  stockQty: string;
  leadDays: string;
  /** '' for no bay time. */
  bayKind: BayKind | '';
  active: boolean;
  fitsVehicleModelIds: string[];
  attributes: AttributeValues;
}

const topLevelFields = [
  'sku',
  'kind',
  'name',
  'brand',
  'description',
  'price',
  'labourMinutes',
  'stockQty',
  'leadDays',
  'bayKind',
  'active',
  'fitsVehicleModelIds',
] as const;

/**
 * Every field name the form shows for a kind (attributes as "attributes.<key>"). An error about
 * the attributes as a whole has no field of its own and goes to the form's message.
 */
export function productFormFields(kind: ProductKind): string[] {
  return [...topLevelFields, ...attributeFields[kind].map((field) => `attributes.${field.key}`)];
}

/** The API's name for a value → the form field holding it. */
export function productFieldFor(property: string): string {
  return property === 'priceCents' ? 'price' : property;
}

export function newProductValues(kind: ProductKind = 'suspension-kit'): ProductFormValues {
  return {
    sku: '',
    kind,
    name: '',
    brand: '',
    description: '',
    price: '',
    labourMinutes: '0',
    stockQty: '0',
    leadDays: '0',
    bayKind: '',
    active: true,
    fitsVehicleModelIds: [],
    attributes: emptyAttributes(kind),
  };
}

export function productValues(product: Product): ProductFormValues {
  return {
    sku: product.sku,
    kind: product.kind,
    name: product.name,
    brand: product.brand,
    description: product.description,
    price: centsToDollarsText(product.priceCents),
    labourMinutes: String(product.labourMinutes),
    stockQty: String(product.stockQty),
    leadDays: String(product.leadDays),
    bayKind: product.bayKind ?? '',
    active: product.active,
    fitsVehicleModelIds: [...product.fitsVehicleModelIds],
    attributes: attributesAsValues(product.kind, product.attributes),
  };
}

/** The whole product as the API takes it (the values have passed the schema). */
export function productRequest(values: ProductFormValues): CreateProductRequest {
  const priceCents = dollarsTextToCents(values.price);
  if (priceCents === null) throw new Error('The price passed the schema but is not dollars.');
  return {
    sku: values.sku.trim(),
    kind: values.kind,
    name: values.name.trim(),
    brand: values.brand.trim(),
    description: values.description.trim(),
    priceCents,
    labourMinutes: Number(values.labourMinutes),
    bayKind: values.bayKind === '' ? null : values.bayKind,
    stockQty: Number(values.stockQty),
    leadDays: Number(values.leadDays),
    active: values.active,
    fitsVehicleModelIds: [...values.fitsVehicleModelIds].sort(),
    attributes: attributesFromValues(values.kind, values.attributes),
  };
}

function sameJson(a: unknown, b: unknown): boolean {
  return stableJson(a) === stableJson(b);
}

function stableJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stableJson).join(',')}]`;
  if (typeof value === 'object' && value !== null) {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, item]) => item !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([key, item]) => `${JSON.stringify(key)}:${stableJson(item)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** Only what changed, for PATCH. */
export function productChanges(product: Product, values: ProductFormValues): UpdateProductRequest {
  const next = productRequest(values);
  const current: CreateProductRequest = {
    sku: product.sku,
    kind: product.kind,
    name: product.name,
    brand: product.brand,
    description: product.description,
    priceCents: product.priceCents,
    labourMinutes: product.labourMinutes,
    bayKind: product.bayKind,
    stockQty: product.stockQty,
    leadDays: product.leadDays,
    active: product.active,
    fitsVehicleModelIds: [...product.fitsVehicleModelIds].sort(),
    attributes: product.attributes,
  };
  const changes: Record<string, unknown> = {};
  for (const key of Object.keys(next) as (keyof CreateProductRequest)[]) {
    if (!sameJson(next[key], current[key])) changes[key] = next[key];
  }
  return changes as UpdateProductRequest;
}

import * as yup from 'yup';
import { numberFromText, numberInRange, textFromNumber } from '@/lib/number-fields';
import {
  BOLT_PATTERN_PATTERN,
  STUD_THREAD_PATTERN,
  normaliseBoltPattern,
  normaliseStudThread,
} from '@/lib/wheel-specs';
import type {
  BodyType,
  FrontSuspensionKind,
  RearSuspensionKind,
  SpeedSymbol,
  UpdateVehicleModelRequest,
  VehicleModel,
  VehicleModelSpec,
} from '@/types/api';

// ---- Names people read -------------------------------------------------------------------

export const bodyTypeLabels: Record<BodyType, string> = { ute: 'Ute', wagon: 'Wagon' };

export const frontSuspensionLabels: Record<FrontSuspensionKind, string> = {
  independent: 'Independent',
  'solid-axle': 'Solid axle',
};

export const rearSuspensionLabels: Record<RearSuspensionKind, string> = {
  leaf: 'Leaf springs',
  coil: 'Coil springs',
  independent: 'Independent',
};

/** Speed symbols in ascending order of speed (H sits between U and V). */
export const speedSymbols: SpeedSymbol[] = [
  'L',
  'M',
  'N',
  'P',
  'Q',
  'R',
  'S',
  'T',
  'U',
  'H',
  'V',
  'W',
  'Y',
];

/** The form's schema lets only a listed symbol through; anything else is a programming error. */
function toSpeedSymbol(value: string): SpeedSymbol {
  const symbol = speedSymbols.find((candidate) => candidate === value);
  if (!symbol) throw new Error(`Not a speed symbol: ${value}`);
  return symbol;
}

/** The load indices the API's load table holds. */
export const LOWEST_LOAD_INDEX = 60;
export const HIGHEST_LOAD_INDEX = 150;

export function optionsOf<T extends string>(labels: Record<T, string>) {
  return (Object.entries(labels) as [T, string][]).map(([value, label]) => ({ value, label }));
}

export function vehicleName(vehicle: Pick<VehicleModel, 'make' | 'model' | 'variant'>): string {
  return `${vehicle.make} ${vehicle.model} ${vehicle.variant}`;
}

export function yearsText(vehicle: Pick<VehicleModel, 'yearFrom' | 'yearTo'>): string {
  return vehicle.yearFrom === vehicle.yearTo
    ? String(vehicle.yearFrom)
    : `${vehicle.yearFrom}–${vehicle.yearTo}`;
}

// ---- Form values ----------------------------------------------------------------------------

/** The spec sheet as the form edits it: numbers as the text typed. */
export interface VehicleModelFormValues {
  make: string;
  model: string;
  variant: string;
  yearFrom: string;
  yearTo: string;
  bodyType: BodyType;
  frontSuspension: FrontSuspensionKind;
  rearSuspension: RearSuspensionKind;
  boltPattern: string;
  studThread: string;
  centreBoreMm: string;
  stockTyre: string;
  largestSpecifiedTyre: string;
  stockWheel: { diameterIn: string; widthIn: string; offsetMm: string };
  gvmKg: string;
  frontAxleKg: string;
  rearAxleKg: string;
  kerbMassKg: string;
  placardLoadIndex: string;
  placardSpeedSymbol: string;
  frontHalfShaftLengthMm: string;
  offRoadCategory: boolean;
  topSpeedKmh: string;
}

/**
 * Every field the form shows (nested ones as dotted paths), for placing server errors; one about
 * the stock wheel as a whole goes to the form's message.
 */
export const vehicleModelFormFields = [
  'make',
  'model',
  'variant',
  'yearFrom',
  'yearTo',
  'bodyType',
  'frontSuspension',
  'rearSuspension',
  'boltPattern',
  'studThread',
  'centreBoreMm',
  'stockTyre',
  'largestSpecifiedTyre',
  'stockWheel.diameterIn',
  'stockWheel.widthIn',
  'stockWheel.offsetMm',
  'gvmKg',
  'frontAxleKg',
  'rearAxleKg',
  'kerbMassKg',
  'placardLoadIndex',
  'placardSpeedSymbol',
  'frontHalfShaftLengthMm',
  'offRoadCategory',
  'topSpeedKmh',
] as const;

export function newVehicleModelValues(): VehicleModelFormValues {
  return {
    make: '',
    model: '',
    variant: '',
    yearFrom: '',
    yearTo: '',
    bodyType: 'ute',
    frontSuspension: 'independent',
    rearSuspension: 'leaf',
    boltPattern: '',
    studThread: '',
    centreBoreMm: '',
    stockTyre: '',
    largestSpecifiedTyre: '',
    stockWheel: { diameterIn: '', widthIn: '', offsetMm: '' },
    gvmKg: '',
    frontAxleKg: '',
    rearAxleKg: '',
    kerbMassKg: '',
    placardLoadIndex: '',
    placardSpeedSymbol: 'S',
    frontHalfShaftLengthMm: '',
    offRoadCategory: true,
    topSpeedKmh: '',
  };
}

export function vehicleModelValues(vehicle: VehicleModel): VehicleModelFormValues {
  return {
    make: vehicle.make,
    model: vehicle.model,
    variant: vehicle.variant,
    yearFrom: String(vehicle.yearFrom),
    yearTo: String(vehicle.yearTo),
    bodyType: vehicle.bodyType,
    frontSuspension: vehicle.frontSuspension,
    rearSuspension: vehicle.rearSuspension,
    boltPattern: vehicle.boltPattern,
    studThread: vehicle.studThread,
    centreBoreMm: String(vehicle.centreBoreMm),
    stockTyre: vehicle.stockTyre,
    largestSpecifiedTyre: vehicle.largestSpecifiedTyre ?? '',
    stockWheel: {
      diameterIn: String(vehicle.stockWheel.diameterIn),
      widthIn: String(vehicle.stockWheel.widthIn),
      offsetMm: String(vehicle.stockWheel.offsetMm),
    },
    gvmKg: String(vehicle.gvmKg),
    frontAxleKg: String(vehicle.frontAxleKg),
    rearAxleKg: String(vehicle.rearAxleKg),
    kerbMassKg: String(vehicle.kerbMassKg),
    placardLoadIndex: String(vehicle.placardLoadIndex),
    placardSpeedSymbol: vehicle.placardSpeedSymbol,
    frontHalfShaftLengthMm: textFromNumber(vehicle.frontHalfShaftLengthMm),
    offRoadCategory: vehicle.offRoadCategory,
    topSpeedKmh: textFromNumber(vehicle.topSpeedKmh),
  };
}

function tyreText(value: string): string {
  return value.trim().replace(/\s+/g, ' ');
}

/** The whole spec sheet as the API takes it (the values have passed the schema). */
export function vehicleModelSpec(values: VehicleModelFormValues): VehicleModelSpec {
  const largest = tyreText(values.largestSpecifiedTyre);
  return {
    make: values.make.trim(),
    model: values.model.trim(),
    variant: values.variant.trim(),
    yearFrom: Number(values.yearFrom),
    yearTo: Number(values.yearTo),
    bodyType: values.bodyType,
    frontSuspension: values.frontSuspension,
    rearSuspension: values.rearSuspension,
    boltPattern: normaliseBoltPattern(values.boltPattern),
    studThread: normaliseStudThread(values.studThread),
    centreBoreMm: Number(values.centreBoreMm),
    stockTyre: tyreText(values.stockTyre),
    largestSpecifiedTyre: largest === '' ? null : largest,
    stockWheel: {
      diameterIn: Number(values.stockWheel.diameterIn),
      widthIn: Number(values.stockWheel.widthIn),
      offsetMm: Number(values.stockWheel.offsetMm),
    },
    gvmKg: Number(values.gvmKg),
    frontAxleKg: Number(values.frontAxleKg),
    rearAxleKg: Number(values.rearAxleKg),
    kerbMassKg: Number(values.kerbMassKg),
    placardLoadIndex: Number(values.placardLoadIndex),
    placardSpeedSymbol: toSpeedSymbol(values.placardSpeedSymbol),
    frontHalfShaftLengthMm: numberFromText(values.frontHalfShaftLengthMm),
    offRoadCategory: values.offRoadCategory,
    topSpeedKmh: numberFromText(values.topSpeedKmh),
  };
}

/** Only what changed, for PATCH (the stock wheel goes whole when any part of it changed). */
export function vehicleModelChanges(
  vehicle: VehicleModel,
  values: VehicleModelFormValues,
): UpdateVehicleModelRequest {
  const next = vehicleModelSpec(values);
  const changes: Record<string, unknown> = {};
  for (const key of Object.keys(next) as (keyof VehicleModelSpec)[]) {
    if (JSON.stringify(next[key]) !== JSON.stringify(vehicle[key])) changes[key] = next[key];
  }
  return changes as UpdateVehicleModelRequest;
}

// ---- The schema (mirrors the API's vehicle model DTO and its cross-field rules) -------------

function text(label: string, max: number) {
  return yup
    .string()
    .trim()
    .required(`Enter the ${label}.`)
    .max(max, `Use at most ${max} characters.`);
}

function required<T extends yup.NumberSchema<number | undefined>>(schema: T, label: string) {
  return schema.required(`Enter the ${label}.`);
}

const tyre = yup
  .string()
  .transform((value: unknown) => (typeof value === 'string' ? tyreText(value) : value))
  .max(40, 'Use at most 40 characters.');

const year = numberInRange({ min: 1950, max: 2100, whole: true });

export const vehicleModelSchema = yup.object({
  make: text('make', 60),
  model: text('model', 60),
  variant: text('variant', 80),
  yearFrom: required(year, 'first model year'),
  yearTo: required(year, 'last model year').test(
    'years-in-order',
    'Must not be before the first model year.',
    function check(value) {
      const from = this.parent.yearFrom as number | undefined;
      return value === undefined || from === undefined || value >= from;
    },
  ),
  bodyType: yup.mixed<BodyType>().oneOf(['ute', 'wagon'], 'Choose a body type.').required(),
  frontSuspension: yup
    .mixed<FrontSuspensionKind>()
    .oneOf(['independent', 'solid-axle'], 'Choose the front suspension.')
    .required(),
  rearSuspension: yup
    .mixed<RearSuspensionKind>()
    .oneOf(['leaf', 'coil', 'independent'], 'Choose the rear suspension.')
    .required(),
  boltPattern: yup
    .string()
    .transform((value: unknown) =>
      typeof value === 'string' ? normaliseBoltPattern(value) : value,
    )
    .required('Enter the bolt pattern, like 6x139.7.')
    .matches(BOLT_PATTERN_PATTERN, 'Write stud count x PCD in mm, like 6x139.7.'),
  studThread: yup
    .string()
    .transform((value: unknown) => (typeof value === 'string' ? normaliseStudThread(value) : value))
    .required('Enter the stud thread, like M12x1.5.')
    .matches(STUD_THREAD_PATTERN, 'Write a metric thread, like M12x1.5.'),
  centreBoreMm: required(
    numberInRange({ min: 40, max: 200, unit: 'mm', decimals: 2 }),
    'centre bore',
  ),
  // The API reads the designation with the fit engine's parser and names the wrong part.
  stockTyre: tyre.required('Enter the stock tyre, like 265/65R17 112S.'),
  largestSpecifiedTyre: tyre.optional(),
  stockWheel: yup.object({
    diameterIn: required(
      numberInRange({ min: 13, max: 26, unit: 'in', halfSteps: true }),
      'wheel diameter',
    ),
    widthIn: required(
      numberInRange({ min: 4, max: 14, unit: 'in', halfSteps: true }),
      'wheel width',
    ),
    offsetMm: required(numberInRange({ min: -80, max: 80, unit: 'mm', whole: true }), 'offset'),
  }),
  gvmKg: required(numberInRange({ min: 500, max: 10000, unit: 'kg', whole: true }), 'GVM').test(
    'more-than-kerb',
    'Must be more than the kerb mass.',
    function check(value) {
      const kerb = this.parent.kerbMassKg as number | undefined;
      return value === undefined || kerb === undefined || value > kerb;
    },
  ),
  frontAxleKg: required(
    numberInRange({ min: 200, max: 6000, unit: 'kg', whole: true }),
    'front axle rating',
  ),
  rearAxleKg: required(
    numberInRange({ min: 200, max: 6000, unit: 'kg', whole: true }),
    'rear axle rating',
  ).test(
    'axles-carry-gvm',
    'The axle ratings together must be at least the GVM.',
    function check(value) {
      const front = this.parent.frontAxleKg as number | undefined;
      const gvm = this.parent.gvmKg as number | undefined;
      return (
        value === undefined || front === undefined || gvm === undefined || front + value >= gvm
      );
    },
  ),
  kerbMassKg: required(
    numberInRange({ min: 300, max: 9000, unit: 'kg', whole: true }),
    'kerb mass',
  ),
  placardLoadIndex: required(
    numberInRange({ min: LOWEST_LOAD_INDEX, max: HIGHEST_LOAD_INDEX, whole: true }),
    'placard load index',
  ),
  placardSpeedSymbol: yup.string().oneOf(speedSymbols, 'Choose a speed symbol.').required(),
  frontHalfShaftLengthMm: numberInRange({ min: 200, max: 900, unit: 'mm', whole: true }).optional(),
  offRoadCategory: yup.boolean().required(),
  topSpeedKmh: numberInRange({ min: 60, max: 350, unit: 'km/h', whole: true }).optional(),
});

/**
 * The attributes of each product kind: the types stored in Product.attributes (jsonb), one
 * class-validator DTO per kind, and the one validation path used by POST, PATCH and the CSV
 * import. The validated value is rebuilt with its keys in a fixed order, so stored attributes
 * compare and export the same way every time.
 */
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { plainToInstance, Transform } from 'class-transformer';
import { IsIn, IsOptional, IsString, Matches, ValidateBy, validateSync } from 'class-validator';
import {
  BooleanField,
  HalfInchSteps,
  NumberInRange,
  WholeNumberInRange,
  oneOfMessage,
} from '../common/decorators/field-validators';
import type { FieldErrors } from '../common/errors/field-errors.exception';
import { toFieldErrors } from '../common/pipes/validation.pipe';
import { formatTyreDesignation, parseTyreDesignation } from '../fitment/tyre-designation';
import {
  BOLT_PATTERN_PATTERN,
  STUD_THREAD_PATTERN,
  normaliseBoltPattern,
  normaliseStudThread,
} from '../vehicles/vehicle-kinds';
import {
  COMPONENT_ROLES,
  type ComponentRole,
  type ProductKind,
  SERVICE_ROLES,
  type ServiceRole,
  TREAD_TYPES,
  type TreadType,
} from './product-kinds';

export interface WheelAttributes {
  diameterIn: number;
  widthIn: number;
  offsetMm: number;
  boltPattern: string;
  centreBoreMm: number;
  studThread: string;
  loadRatingKg: number;
}

export interface TyreAttributes {
  designation: string;
  treadType: TreadType;
  approvedRimWidthMinIn?: number;
  approvedRimWidthMaxIn?: number;
}

export interface SuspensionKitAttributes {
  frontLiftMm: number;
  rearLiftMm: number;
  constantLoadMinKg: number;
  constantLoadMaxKg: number;
  keepsTwoThirdsTravel: boolean;
  includesGreasableShackles: boolean;
  includesExtendedBrakeLines: boolean;
}

export interface ComponentAttributes {
  role: ComponentRole;
  diffDropMm?: number;
  /** Hub-centric rings only: outer diameter, mm (the side in the wheel's centre bore). */
  ringOuterMm?: number;
  /** Hub-centric rings only: inner diameter, mm (the side on the hub spigot). */
  ringInnerMm?: number;
  massKg?: number;
}

export interface ServiceAttributes {
  role: ServiceRole;
  perWheel: boolean;
}

export interface ProductAttributesByKind {
  wheel: WheelAttributes;
  tyre: TyreAttributes;
  'suspension-kit': SuspensionKitAttributes;
  component: ComponentAttributes;
  service: ServiceAttributes;
}

export type ProductAttributes = ProductAttributesByKind[ProductKind];

/** Ring diameters, mm: the range of wheel centre bores the catalogue takes (WheelAttributesDto). */
export const RING_DIAMETER_RANGE_MM = { min: 40, max: 200 } as const;

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

/** A tyre designation the fit engine reads, with its load index and speed symbol. */
function IsCatalogueTyreDesignation() {
  return ValidateBy({
    name: 'isCatalogueTyreDesignation',
    validator: {
      validate: (value: unknown) => {
        if (typeof value !== 'string') return false;
        const parsed = parseTyreDesignation(value);
        return (
          parsed.ok && parsed.size.loadIndexSingle !== null && parsed.size.speedSymbol !== null
        );
      },
      defaultMessage: (args) => {
        const value: unknown = args?.value;
        if (typeof value !== 'string') return 'must be a tyre size such as 265/70R17 115T';
        const parsed = parseTyreDesignation(value);
        if (!parsed.ok) return parsed.error.message;
        return 'must carry the load index and speed symbol, e.g. 265/70R17 115T';
      },
    },
  });
}

/** The canonical form of a readable designation; anything else is left for the validator. */
function canonicalDesignation({ value }: { value: unknown }): unknown {
  if (typeof value !== 'string') return value;
  const parsed = parseTyreDesignation(value);
  return parsed.ok ? formatTyreDesignation(parsed.size) : value;
}

export class WheelAttributesDto implements WheelAttributes {
  @ApiProperty({ minimum: 13, maximum: 26, example: 17, description: 'Rim diameter, inches' })
  @NumberInRange(13, 26, 'in')
  @HalfInchSteps()
  diameterIn!: number;

  @ApiProperty({ minimum: 4, maximum: 14, example: 8, description: 'Rim width, inches' })
  @NumberInRange(4, 14, 'in')
  @HalfInchSteps()
  widthIn!: number;

  @ApiProperty({ minimum: -80, maximum: 80, example: 20, description: 'Offset (ET), mm' })
  @WholeNumberInRange(-80, 80, 'mm')
  offsetMm!: number;

  @ApiProperty({ example: '6x139.7', description: 'Stud count x pitch circle diameter (mm)' })
  @Transform(({ value }: { value: unknown }) => normaliseBoltPattern(value))
  @IsString({ message: 'must be text like 6x139.7' })
  @Matches(BOLT_PATTERN_PATTERN, { message: 'must be stud count x PCD in mm, like 6x139.7' })
  boltPattern!: string;

  @ApiProperty({ minimum: 40, maximum: 200, example: 106.1, description: 'Centre bore, mm' })
  @NumberInRange(40, 200, 'mm', 2)
  centreBoreMm!: number;

  @ApiProperty({ example: 'M12x1.5', description: 'Wheel nut thread' })
  @Transform(({ value }: { value: unknown }) => normaliseStudThread(value))
  @IsString({ message: 'must be text like M12x1.5' })
  @Matches(STUD_THREAD_PATTERN, { message: 'must be a metric thread like M12x1.5' })
  studThread!: string;

  @ApiProperty({
    minimum: 100,
    maximum: 3000,
    example: 1250,
    description: 'Rated load per wheel, kg',
  })
  @WholeNumberInRange(100, 3000, 'kg')
  loadRatingKg!: number;
}

export class TyreAttributesDto implements TyreAttributes {
  @ApiProperty({
    example: 'LT285/70R17 121/118Q',
    description:
      'Size and service description (load index and speed symbol required); stored in canonical form',
  })
  @Transform(canonicalDesignation)
  @IsCatalogueTyreDesignation()
  designation!: string;

  @ApiProperty({ enum: TREAD_TYPES, enumName: 'TreadType' })
  @IsIn(TREAD_TYPES, { message: oneOfMessage(TREAD_TYPES) })
  treadType!: TreadType;

  @ApiPropertyOptional({
    minimum: 4,
    maximum: 16,
    description: "Tyre maker's narrowest approved rim, inches",
  })
  @IsOptional()
  @NumberInRange(4, 16, 'in')
  @HalfInchSteps()
  approvedRimWidthMinIn?: number;

  @ApiPropertyOptional({
    minimum: 4,
    maximum: 16,
    description: "Tyre maker's widest approved rim, inches",
  })
  @IsOptional()
  @NumberInRange(4, 16, 'in')
  @HalfInchSteps()
  approvedRimWidthMaxIn?: number;
}

export class SuspensionKitAttributesDto implements SuspensionKitAttributes {
  @ApiProperty({
    minimum: -100,
    maximum: 200,
    example: 50,
    description: 'Lift at the front wheels, mm',
  })
  @WholeNumberInRange(-100, 200, 'mm')
  frontLiftMm!: number;

  @ApiProperty({
    minimum: -100,
    maximum: 200,
    example: 50,
    description: 'Lift at the rear wheels, mm',
  })
  @WholeNumberInRange(-100, 200, 'mm')
  rearLiftMm!: number;

  @ApiProperty({
    minimum: 0,
    maximum: 2000,
    example: 0,
    description: 'Rated constant load from, kg',
  })
  @WholeNumberInRange(0, 2000, 'kg')
  constantLoadMinKg!: number;

  @ApiProperty({
    minimum: 0,
    maximum: 2000,
    example: 150,
    description: 'Rated constant load up to, kg',
  })
  @WholeNumberInRange(0, 2000, 'kg')
  constantLoadMaxKg!: number;

  @ApiProperty({ description: 'Keeps at least two thirds of the original suspension travel' })
  @BooleanField()
  keepsTwoThirdsTravel!: boolean;

  @ApiProperty()
  @BooleanField()
  includesGreasableShackles!: boolean;

  @ApiProperty()
  @BooleanField()
  includesExtendedBrakeLines!: boolean;
}

export class ComponentAttributesDto implements ComponentAttributes {
  @ApiProperty({ enum: COMPONENT_ROLES, enumName: 'ComponentRole' })
  @Transform(trim)
  @IsIn(COMPONENT_ROLES, { message: oneOfMessage(COMPONENT_ROLES) })
  role!: ComponentRole;

  @ApiPropertyOptional({
    minimum: 1,
    maximum: 100,
    description: 'Diff drops only: how far the front differential is lowered, mm',
  })
  @IsOptional()
  @WholeNumberInRange(1, 100, 'mm')
  diffDropMm?: number;

  @ApiPropertyOptional({
    minimum: RING_DIAMETER_RANGE_MM.min,
    maximum: RING_DIAMETER_RANGE_MM.max,
    example: 110.1,
    description:
      "Hub-centric rings only (required there): outer diameter, the wheel's centre-bore side, mm (0.1 mm steps)",
  })
  @IsOptional()
  @NumberInRange(RING_DIAMETER_RANGE_MM.min, RING_DIAMETER_RANGE_MM.max, 'mm', 1)
  ringOuterMm?: number;

  @ApiPropertyOptional({
    minimum: RING_DIAMETER_RANGE_MM.min,
    maximum: RING_DIAMETER_RANGE_MM.max,
    example: 106.1,
    description:
      'Hub-centric rings only (required there): inner diameter, the hub side, mm (0.1 mm steps); less than ringOuterMm',
  })
  @IsOptional()
  @NumberInRange(RING_DIAMETER_RANGE_MM.min, RING_DIAMETER_RANGE_MM.max, 'mm', 1)
  ringInnerMm?: number;

  @ApiPropertyOptional({
    minimum: 0,
    maximum: 1000,
    description: 'Mass added to the vehicle, kg (counted against the GVM)',
  })
  @IsOptional()
  @NumberInRange(0, 1000, 'kg', 1)
  massKg?: number;
}

export class ServiceAttributesDto implements ServiceAttributes {
  @ApiProperty({ enum: SERVICE_ROLES, enumName: 'ServiceRole' })
  @Transform(trim)
  @IsIn(SERVICE_ROLES, { message: oneOfMessage(SERVICE_ROLES) })
  role!: ServiceRole;

  @ApiProperty({ description: 'Priced per wheel (fitting and balancing, tyre disposal)' })
  @BooleanField()
  perWheel!: boolean;
}

export const ATTRIBUTE_DTOS = {
  wheel: WheelAttributesDto,
  tyre: TyreAttributesDto,
  'suspension-kit': SuspensionKitAttributesDto,
  component: ComponentAttributesDto,
  service: ServiceAttributesDto,
} as const satisfies Record<ProductKind, new () => object>;

export type AttributesValidation =
  { ok: true; attributes: ProductAttributes } | { ok: false; fieldErrors: FieldErrors };

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function addError(errors: FieldErrors, key: string, message: string): void {
  (errors[key] ??= []).push(message);
}

/** Rules across fields, checked once each field is valid on its own. */
function crossFieldErrors(kind: ProductKind, value: object, path: string): FieldErrors {
  const errors: FieldErrors = {};
  if (kind === 'tyre') {
    const tyre = value as TyreAttributes;
    const hasMin = tyre.approvedRimWidthMinIn !== undefined;
    const hasMax = tyre.approvedRimWidthMaxIn !== undefined;
    if (hasMin !== hasMax) {
      addError(
        errors,
        `${path}.${hasMin ? 'approvedRimWidthMaxIn' : 'approvedRimWidthMinIn'}`,
        'give both ends of the approved rim-width range, or neither',
      );
    } else if (hasMin && tyre.approvedRimWidthMinIn! > tyre.approvedRimWidthMaxIn!) {
      addError(
        errors,
        `${path}.approvedRimWidthMaxIn`,
        'must not be less than approvedRimWidthMinIn',
      );
    }
  }
  if (kind === 'suspension-kit') {
    const kit = value as SuspensionKitAttributes;
    if (kit.constantLoadMinKg > kit.constantLoadMaxKg) {
      addError(errors, `${path}.constantLoadMaxKg`, 'must not be less than constantLoadMinKg');
    }
  }
  if (kind === 'component') {
    const component = value as ComponentAttributes;
    if (component.role === 'diff-drop' && component.diffDropMm === undefined) {
      addError(errors, `${path}.diffDropMm`, 'is required for a diff drop');
    }
    if (component.role !== 'diff-drop' && component.diffDropMm !== undefined) {
      addError(errors, `${path}.diffDropMm`, 'is only for a diff drop');
    }
    for (const key of ['ringOuterMm', 'ringInnerMm'] as const) {
      if (component.role === 'hub-rings' && component[key] === undefined) {
        addError(errors, `${path}.${key}`, 'is required for hub-centric rings');
      }
      if (component.role !== 'hub-rings' && component[key] !== undefined) {
        addError(errors, `${path}.${key}`, 'is only for hub-centric rings');
      }
    }
    if (
      component.role === 'hub-rings' &&
      component.ringOuterMm !== undefined &&
      component.ringInnerMm !== undefined &&
      component.ringInnerMm >= component.ringOuterMm
    ) {
      addError(errors, `${path}.ringInnerMm`, 'must be less than ringOuterMm');
    }
  }
  return errors;
}

/** The validated attributes with their keys in the fixed order (optional ones only when set). */
function canonicalAttributes(kind: ProductKind, value: object): ProductAttributes {
  const pick = <T extends object>(source: T, keys: Array<keyof T>): T => {
    const result: Partial<T> = {};
    for (const key of keys) if (source[key] !== undefined) result[key] = source[key];
    return result as T;
  };
  switch (kind) {
    case 'wheel':
      return pick(value as WheelAttributes, [
        'diameterIn',
        'widthIn',
        'offsetMm',
        'boltPattern',
        'centreBoreMm',
        'studThread',
        'loadRatingKg',
      ]);
    case 'tyre':
      return pick(value as TyreAttributes, [
        'designation',
        'treadType',
        'approvedRimWidthMinIn',
        'approvedRimWidthMaxIn',
      ]);
    case 'suspension-kit':
      return pick(value as SuspensionKitAttributes, [
        'frontLiftMm',
        'rearLiftMm',
        'constantLoadMinKg',
        'constantLoadMaxKg',
        'keepsTwoThirdsTravel',
        'includesGreasableShackles',
        'includesExtendedBrakeLines',
      ]);
    case 'component':
      return pick(value as ComponentAttributes, [
        'role',
        'diffDropMm',
        'ringOuterMm',
        'ringInnerMm',
        'massKg',
      ]);
    case 'service':
      return pick(value as ServiceAttributes, ['role', 'perWheel']);
  }
}

/**
 * Validates a product's attributes for its kind with that kind's DTO. Field errors are keyed
 * under `path` ("attributes.offsetMm"), as the global validation pipe keys nested fields.
 */
export function validateProductAttributes(
  kind: ProductKind,
  value: unknown,
  path = 'attributes',
): AttributesValidation {
  if (!isRecord(value)) {
    return {
      ok: false,
      fieldErrors: { [path]: [`must be an object with the ${kind} attributes`] },
    };
  }
  const instance = plainToInstance(ATTRIBUTE_DTOS[kind] as new () => object, value);
  const errors = validateSync(instance, {
    whitelist: true,
    forbidNonWhitelisted: true,
    stopAtFirstError: true,
    validationError: { target: false, value: false },
  });
  const fieldErrors =
    errors.length > 0 ? toFieldErrors(errors, path) : crossFieldErrors(kind, instance, path);
  if (Object.keys(fieldErrors).length > 0) return { ok: false, fieldErrors };
  return { ok: true, attributes: canonicalAttributes(kind, instance) };
}

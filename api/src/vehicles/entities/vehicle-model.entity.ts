import { Check, Embedded, Entity, Enum, Property, Unique } from '@mikro-orm/core';
import type { FrontSuspensionKind, RearSuspensionKind } from '../../fitment/fitment.types';
import { BaseEntity } from '../../database/base.entity';
import {
  BODY_TYPES,
  type BodyType,
  FRONT_SUSPENSION_KINDS,
  REAR_SUSPENSION_KINDS,
} from '../vehicle-kinds';
import { StockWheel } from './stock-wheel.embeddable';

/** Everything a vehicle model's spec sheet holds (the constructor's argument). */
export interface VehicleModelSpec {
  make: string;
  model: string;
  variant: string;
  yearFrom: number;
  yearTo: number;
  bodyType: BodyType;
  frontSuspension: FrontSuspensionKind;
  rearSuspension: RearSuspensionKind;
  boltPattern: string;
  studThread: string;
  centreBoreMm: number;
  stockTyre: string;
  largestSpecifiedTyre: string | null;
  stockWheel: { diameterIn: number; widthIn: number; offsetMm: number };
  gvmKg: number;
  frontAxleKg: number;
  rearAxleKg: number;
  kerbMassKg: number;
  placardLoadIndex: number;
  placardSpeedSymbol: string;
  frontHalfShaftLengthMm: number | null;
  offRoadCategory: boolean;
  topSpeedKmh: number | null;
}

/** A vehicle model's specification sheet: what the fit report checks a package against. */
@Entity()
@Unique({
  name: 'vehicle_model_make_model_variant_unique',
  properties: ['make', 'model', 'variant'],
})
@Check({ name: 'vehicle_model_years_check', expression: 'year_to >= year_from' })
@Check({ name: 'vehicle_model_masses_check', expression: 'gvm_kg > kerb_mass_kg' })
export class VehicleModel extends BaseEntity {
  @Property({ type: 'string', length: 60 })
  make!: string;

  @Property({ type: 'string', length: 60 })
  model!: string;

  @Property({ type: 'string', length: 80 })
  variant!: string;

  @Property({ type: 'smallint' })
  yearFrom!: number;

  @Property({ type: 'smallint' })
  yearTo!: number;

  @Enum({ items: () => [...BODY_TYPES], type: 'string' })
  bodyType!: BodyType;

  @Enum({ items: () => [...FRONT_SUSPENSION_KINDS], type: 'string' })
  frontSuspension!: FrontSuspensionKind;

  @Enum({ items: () => [...REAR_SUSPENSION_KINDS], type: 'string' })
  rearSuspension!: RearSuspensionKind;

  /** "6x139.7". */
  @Property({ type: 'string', length: 12 })
  boltPattern!: string;

  /** "M12x1.5". */
  @Property({ type: 'string', length: 12 })
  studThread!: string;

  @Property({ type: 'decimal', precision: 5, scale: 2, runtimeType: 'number' })
  centreBoreMm!: number;

  /** Canonical designation with service description, e.g. "265/65R17 112S". */
  @Property({ type: 'string', length: 40 })
  stockTyre!: string;

  @Property({ type: 'string', length: 40, nullable: true })
  largestSpecifiedTyre: string | null = null;

  @Embedded(() => StockWheel, { prefix: 'stock_wheel_' })
  stockWheel!: StockWheel;

  @Property({ type: 'integer' })
  gvmKg!: number;

  @Property({ type: 'integer' })
  frontAxleKg!: number;

  @Property({ type: 'integer' })
  rearAxleKg!: number;

  @Property({ type: 'integer' })
  kerbMassKg!: number;

  @Property({ type: 'smallint' })
  placardLoadIndex!: number;

  @Property({ type: 'string', length: 1 })
  placardSpeedSymbol!: string;

  @Property({ type: 'integer', nullable: true })
  frontHalfShaftLengthMm: number | null = null;

  @Property({ type: 'boolean' })
  offRoadCategory!: boolean;

  @Property({ type: 'smallint', nullable: true })
  topSpeedKmh: number | null = null;

  constructor(spec: VehicleModelSpec) {
    super();
    this.applySpec(spec);
  }

  /** Sets every field from a complete spec sheet. */
  applySpec(spec: VehicleModelSpec): void {
    const { stockWheel, ...rest } = spec;
    Object.assign(this, rest);
    this.stockWheel = new StockWheel(
      stockWheel.diameterIn,
      stockWheel.widthIn,
      stockWheel.offsetMm,
    );
  }

  toSpec(): VehicleModelSpec {
    return {
      make: this.make,
      model: this.model,
      variant: this.variant,
      yearFrom: this.yearFrom,
      yearTo: this.yearTo,
      bodyType: this.bodyType,
      frontSuspension: this.frontSuspension,
      rearSuspension: this.rearSuspension,
      boltPattern: this.boltPattern,
      studThread: this.studThread,
      centreBoreMm: this.centreBoreMm,
      stockTyre: this.stockTyre,
      largestSpecifiedTyre: this.largestSpecifiedTyre,
      stockWheel: {
        diameterIn: this.stockWheel.diameterIn,
        widthIn: this.stockWheel.widthIn,
        offsetMm: this.stockWheel.offsetMm,
      },
      gvmKg: this.gvmKg,
      frontAxleKg: this.frontAxleKg,
      rearAxleKg: this.rearAxleKg,
      kerbMassKg: this.kerbMassKg,
      placardLoadIndex: this.placardLoadIndex,
      placardSpeedSymbol: this.placardSpeedSymbol,
      frontHalfShaftLengthMm: this.frontHalfShaftLengthMm,
      offRoadCategory: this.offRoadCategory,
      topSpeedKmh: this.topSpeedKmh,
    };
  }
}

import { ApiProperty } from '@nestjs/swagger';
import type { FrontSuspensionKind, RearSuspensionKind } from '../../fitment/fitment.types';
import { SPEED_SYMBOLS_ASCENDING } from '../../fitment/speed-symbols';
import type { VehicleModel } from '../entities/vehicle-model.entity';
import {
  BODY_TYPES,
  type BodyType,
  FRONT_SUSPENSION_KINDS,
  REAR_SUSPENSION_KINDS,
} from '../vehicle-kinds';

export class StockWheelResponse {
  @ApiProperty({ example: 17 })
  diameterIn!: number;

  @ApiProperty({ example: 7.5 })
  widthIn!: number;

  @ApiProperty({ example: 30 })
  offsetMm!: number;
}

export class VehicleModelResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ example: 'Vantrel' })
  make!: string;

  @ApiProperty({ example: 'Strata' })
  model!: string;

  @ApiProperty({ example: 'SR dual cab' })
  variant!: string;

  @ApiProperty({ example: 2016 })
  yearFrom!: number;

  @ApiProperty({ example: 2024 })
  yearTo!: number;

  @ApiProperty({ enum: BODY_TYPES, enumName: 'BodyType' })
  bodyType!: BodyType;

  @ApiProperty({ enum: FRONT_SUSPENSION_KINDS, enumName: 'FrontSuspensionKind' })
  frontSuspension!: FrontSuspensionKind;

  @ApiProperty({ enum: REAR_SUSPENSION_KINDS, enumName: 'RearSuspensionKind' })
  rearSuspension!: RearSuspensionKind;

  @ApiProperty({ example: '6x139.7' })
  boltPattern!: string;

  @ApiProperty({ example: 'M12x1.5' })
  studThread!: string;

  @ApiProperty({ example: 106.1 })
  centreBoreMm!: number;

  @ApiProperty({ example: '265/65R17 112S' })
  stockTyre!: string;

  @ApiProperty({ type: String, nullable: true, example: null })
  largestSpecifiedTyre!: string | null;

  @ApiProperty({ type: StockWheelResponse })
  stockWheel!: StockWheelResponse;

  @ApiProperty({ example: 3100 })
  gvmKg!: number;

  @ApiProperty({ example: 1330 })
  frontAxleKg!: number;

  @ApiProperty({ example: 1870 })
  rearAxleKg!: number;

  @ApiProperty({ example: 2110 })
  kerbMassKg!: number;

  @ApiProperty({ example: 112 })
  placardLoadIndex!: number;

  @ApiProperty({ enum: SPEED_SYMBOLS_ASCENDING, enumName: 'SpeedSymbol', example: 'S' })
  placardSpeedSymbol!: string;

  @ApiProperty({ type: Number, nullable: true, example: 455 })
  frontHalfShaftLengthMm!: number | null;

  @ApiProperty()
  offRoadCategory!: boolean;

  @ApiProperty({ type: Number, nullable: true, example: 180 })
  topSpeedKmh!: number | null;

  static from(vehicle: VehicleModel): VehicleModelResponse {
    return Object.assign(new VehicleModelResponse(), { id: vehicle.id, ...vehicle.toSpec() });
  }
}

export class VehicleModelListResponse {
  @ApiProperty({ type: [VehicleModelResponse] })
  items!: VehicleModelResponse[];
}

export class VehicleMakesResponse {
  @ApiProperty({ type: [String], example: ['Brellin', 'Korrabin', 'Oskerra', 'Vantrel'] })
  items!: string[];
}

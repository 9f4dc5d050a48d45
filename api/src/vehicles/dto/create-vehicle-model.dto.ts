import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  IsDefined,
  IsIn,
  IsObject,
  IsOptional,
  IsString,
  Matches,
  ValidateBy,
  ValidateNested,
} from 'class-validator';
import {
  BooleanField,
  HalfInchSteps,
  NumberInRange,
  TrimmedText,
  WholeNumberInRange,
  oneOfMessage,
} from '../../common/decorators/field-validators';
import { ReadableTyreDesignation } from '../../common/decorators/tyre-designation-field';
import type { FrontSuspensionKind, RearSuspensionKind } from '../../fitment/fitment.types';
import { HIGHEST_LOAD_INDEX, LOWEST_LOAD_INDEX, isKnownLoadIndex } from '../../fitment/load-index';
import { SPEED_SYMBOLS_ASCENDING } from '../../fitment/speed-symbols';
import {
  BODY_TYPES,
  BOLT_PATTERN_PATTERN,
  type BodyType,
  FRONT_SUSPENSION_KINDS,
  REAR_SUSPENSION_KINDS,
  STUD_THREAD_PATTERN,
  normaliseBoltPattern,
  normaliseStudThread,
} from '../vehicle-kinds';

export class StockWheelDto {
  @ApiProperty({ example: 17, minimum: 13, maximum: 26 })
  @NumberInRange(13, 26, 'in')
  @HalfInchSteps()
  diameterIn!: number;

  @ApiProperty({ example: 7.5, minimum: 4, maximum: 14 })
  @NumberInRange(4, 14, 'in')
  @HalfInchSteps()
  widthIn!: number;

  @ApiProperty({ example: 30, minimum: -80, maximum: 80, description: 'Offset (ET), mm' })
  @WholeNumberInRange(-80, 80, 'mm')
  offsetMm!: number;
}

const upperCase = ({ value }: { value: unknown }) =>
  typeof value === 'string' ? value.trim().toUpperCase() : value;

/** A vehicle model's spec sheet (POST; PATCH takes any part of it). */
export class CreateVehicleModelDto {
  @ApiProperty({ example: 'Vantrel', maxLength: 60 })
  @TrimmedText(1, 60)
  make!: string;

  @ApiProperty({ example: 'Strata', maxLength: 60 })
  @TrimmedText(1, 60)
  model!: string;

  @ApiProperty({ example: 'SR dual cab', maxLength: 80 })
  @TrimmedText(1, 80)
  variant!: string;

  @ApiProperty({ example: 2016, minimum: 1950, maximum: 2100 })
  @WholeNumberInRange(1950, 2100)
  yearFrom!: number;

  @ApiProperty({ example: 2024, minimum: 1950, maximum: 2100 })
  @WholeNumberInRange(1950, 2100)
  yearTo!: number;

  @ApiProperty({ enum: BODY_TYPES, enumName: 'BodyType' })
  @IsIn(BODY_TYPES, { message: oneOfMessage(BODY_TYPES) })
  bodyType!: BodyType;

  @ApiProperty({ enum: FRONT_SUSPENSION_KINDS, enumName: 'FrontSuspensionKind' })
  @IsIn(FRONT_SUSPENSION_KINDS, { message: oneOfMessage(FRONT_SUSPENSION_KINDS) })
  frontSuspension!: FrontSuspensionKind;

  @ApiProperty({ enum: REAR_SUSPENSION_KINDS, enumName: 'RearSuspensionKind' })
  @IsIn(REAR_SUSPENSION_KINDS, { message: oneOfMessage(REAR_SUSPENSION_KINDS) })
  rearSuspension!: RearSuspensionKind;

  @ApiProperty({ example: '6x139.7', description: 'Stud count x pitch circle diameter (mm)' })
  @Transform(({ value }: { value: unknown }) => normaliseBoltPattern(value))
  @IsString({ message: 'must be text like 6x139.7' })
  @Matches(BOLT_PATTERN_PATTERN, { message: 'must be stud count x PCD in mm, like 6x139.7' })
  boltPattern!: string;

  @ApiProperty({ example: 'M12x1.5' })
  @Transform(({ value }: { value: unknown }) => normaliseStudThread(value))
  @IsString({ message: 'must be text like M12x1.5' })
  @Matches(STUD_THREAD_PATTERN, { message: 'must be a metric thread like M12x1.5' })
  studThread!: string;

  @ApiProperty({ example: 106.1, minimum: 40, maximum: 200, description: 'Hub spigot, mm' })
  @NumberInRange(40, 200, 'mm', 2)
  centreBoreMm!: number;

  @ApiProperty({ example: '265/65R17 112S', description: 'Stored in canonical form' })
  @ReadableTyreDesignation()
  stockTyre!: string;

  @ApiPropertyOptional({
    type: String,
    nullable: true,
    example: '265/70R17 115S',
    description:
      'Largest tyre the maker specifies (base of the diameter limit); null: the stock tyre',
  })
  @IsOptional()
  @ReadableTyreDesignation()
  largestSpecifiedTyre?: string | null;

  @ApiProperty({ type: StockWheelDto })
  @IsDefined({ message: 'is required' })
  @IsObject({ message: 'must be an object with diameterIn, widthIn and offsetMm' })
  @ValidateNested()
  @Type(() => StockWheelDto)
  stockWheel!: StockWheelDto;

  @ApiProperty({ example: 3100, minimum: 500, maximum: 10000 })
  @WholeNumberInRange(500, 10000, 'kg')
  gvmKg!: number;

  @ApiProperty({ example: 1330, minimum: 200, maximum: 6000 })
  @WholeNumberInRange(200, 6000, 'kg')
  frontAxleKg!: number;

  @ApiProperty({ example: 1870, minimum: 200, maximum: 6000 })
  @WholeNumberInRange(200, 6000, 'kg')
  rearAxleKg!: number;

  @ApiProperty({ example: 2110, minimum: 300, maximum: 9000 })
  @WholeNumberInRange(300, 9000, 'kg')
  kerbMassKg!: number;

  @ApiProperty({ example: 112, minimum: LOWEST_LOAD_INDEX, maximum: HIGHEST_LOAD_INDEX })
  @WholeNumberInRange(LOWEST_LOAD_INDEX, HIGHEST_LOAD_INDEX)
  @ValidateBy({
    name: 'knownLoadIndex',
    validator: {
      validate: (value: unknown) => typeof value === 'number' && isKnownLoadIndex(value),
      defaultMessage: () => 'is not in the load index table',
    },
  })
  placardLoadIndex!: number;

  @ApiProperty({ enum: SPEED_SYMBOLS_ASCENDING, enumName: 'SpeedSymbol', example: 'S' })
  @Transform(upperCase)
  @IsIn(SPEED_SYMBOLS_ASCENDING, { message: oneOfMessage(SPEED_SYMBOLS_ASCENDING) })
  placardSpeedSymbol!: string;

  @ApiPropertyOptional({ type: Number, nullable: true, example: 455, minimum: 200, maximum: 900 })
  @IsOptional()
  @WholeNumberInRange(200, 900, 'mm')
  frontHalfShaftLengthMm?: number | null;

  @ApiProperty({ description: 'Has off-road features (off-road passenger vehicle category)' })
  @BooleanField()
  offRoadCategory!: boolean;

  @ApiPropertyOptional({ type: Number, nullable: true, example: 180, minimum: 60, maximum: 350 })
  @IsOptional()
  @WholeNumberInRange(60, 350, 'km/h')
  topSpeedKmh?: number | null;
}

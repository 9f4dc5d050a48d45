import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import { FieldErrorsException, type FieldErrors } from '../common/errors/field-errors.exception';
import { toFieldErrors } from '../common/pipes/validation.pipe';
import { CreateVehicleModelDto } from './dto/create-vehicle-model.dto';
import type { VehicleModelSpec } from './entities/vehicle-model.entity';

/** Rules across the fields of a spec sheet. */
export function vehicleSpecCrossFieldErrors(spec: VehicleModelSpec): FieldErrors {
  const errors: FieldErrors = {};
  if (spec.yearTo < spec.yearFrom) errors.yearTo = ['must not be before yearFrom'];
  if (spec.gvmKg <= spec.kerbMassKg) errors.gvmKg = ['must be more than kerbMassKg'];
  if (spec.frontAxleKg + spec.rearAxleKg < spec.gvmKg) {
    errors.rearAxleKg = ['the axle ratings together must be at least the GVM'];
  }
  return errors;
}

/**
 * The whole spec sheet, validated (the same DTO as POST) and normalised; throws a 400 with
 * field errors. PATCH merges its changes into the stored sheet and calls this.
 */
export function validVehicleSpec(candidate: Record<string, unknown>): VehicleModelSpec {
  const dto = plainToInstance(CreateVehicleModelDto, candidate);
  const errors = validateSync(dto, {
    whitelist: true,
    forbidNonWhitelisted: true,
    stopAtFirstError: true,
    validationError: { target: false, value: false },
  });
  if (errors.length > 0) throw new FieldErrorsException(toFieldErrors(errors));
  const spec: VehicleModelSpec = {
    make: dto.make,
    model: dto.model,
    variant: dto.variant,
    yearFrom: dto.yearFrom,
    yearTo: dto.yearTo,
    bodyType: dto.bodyType,
    frontSuspension: dto.frontSuspension,
    rearSuspension: dto.rearSuspension,
    boltPattern: dto.boltPattern,
    studThread: dto.studThread,
    centreBoreMm: dto.centreBoreMm,
    stockTyre: dto.stockTyre,
    largestSpecifiedTyre: dto.largestSpecifiedTyre ?? null,
    stockWheel: {
      diameterIn: dto.stockWheel.diameterIn,
      widthIn: dto.stockWheel.widthIn,
      offsetMm: dto.stockWheel.offsetMm,
    },
    gvmKg: dto.gvmKg,
    frontAxleKg: dto.frontAxleKg,
    rearAxleKg: dto.rearAxleKg,
    kerbMassKg: dto.kerbMassKg,
    placardLoadIndex: dto.placardLoadIndex,
    placardSpeedSymbol: dto.placardSpeedSymbol,
    frontHalfShaftLengthMm: dto.frontHalfShaftLengthMm ?? null,
    offRoadCategory: dto.offRoadCategory,
    topSpeedKmh: dto.topSpeedKmh ?? null,
  };
  const crossFieldErrors = vehicleSpecCrossFieldErrors(spec);
  if (Object.keys(crossFieldErrors).length > 0) throw new FieldErrorsException(crossFieldErrors);
  return spec;
}

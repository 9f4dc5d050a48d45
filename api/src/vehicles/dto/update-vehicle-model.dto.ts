import { PartialType } from '@nestjs/swagger';
import { CreateVehicleModelDto } from './create-vehicle-model.dto';

/** Any part of the spec sheet; the merged sheet is validated again as a whole. */
export class UpdateVehicleModelDto extends PartialType(CreateVehicleModelDto) {}

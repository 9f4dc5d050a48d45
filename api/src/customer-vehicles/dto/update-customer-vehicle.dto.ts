import { PartialType } from '@nestjs/swagger';
import { CreateCustomerVehicleDto } from './create-customer-vehicle.dto';

/** Any of the fields; null clears nickname, rego or year. */
export class UpdateCustomerVehicleDto extends PartialType(CreateCustomerVehicleDto) {}

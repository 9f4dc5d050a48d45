import { ApiProperty } from '@nestjs/swagger';
import { VehicleModelResponse } from '../../vehicles/dto/vehicle-model.response';
import type { CustomerVehicle } from '../entities/customer-vehicle.entity';

export class CustomerVehicleResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ format: 'uuid' })
  vehicleModelId!: string;

  @ApiProperty({ type: VehicleModelResponse, description: "The model's spec sheet" })
  vehicleModel!: VehicleModelResponse;

  @ApiProperty({ type: String, nullable: true })
  nickname!: string | null;

  @ApiProperty({ type: String, nullable: true })
  rego!: string | null;

  @ApiProperty({ type: Number, nullable: true })
  year!: number | null;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt!: string;

  /** `vehicle.vehicleModel` must be loaded. */
  static from(vehicle: CustomerVehicle): CustomerVehicleResponse {
    return Object.assign(new CustomerVehicleResponse(), {
      id: vehicle.id,
      vehicleModelId: vehicle.vehicleModel.id,
      vehicleModel: VehicleModelResponse.from(vehicle.vehicleModel),
      nickname: vehicle.nickname,
      rego: vehicle.rego,
      year: vehicle.year,
      createdAt: vehicle.createdAt.toISOString(),
    });
  }
}

export class CustomerVehicleListResponse {
  @ApiProperty({ type: [CustomerVehicleResponse] })
  items!: CustomerVehicleResponse[];
}

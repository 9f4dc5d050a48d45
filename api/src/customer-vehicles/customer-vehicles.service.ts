import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable, NotFoundException } from '@nestjs/common';
import { FieldErrorsException, type FieldErrors } from '../common/errors/field-errors.exception';
import type { User } from '../users/entities/user.entity';
import { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import type { CreateCustomerVehicleDto } from './dto/create-customer-vehicle.dto';
import {
  type CustomerVehicleListResponse,
  CustomerVehicleResponse,
} from './dto/customer-vehicle.response';
import type { UpdateCustomerVehicleDto } from './dto/update-customer-vehicle.dto';
import { CustomerVehicle } from './entities/customer-vehicle.entity';

export const CUSTOMER_VEHICLE_NOT_FOUND = 'You have no vehicle with this id';

@Injectable()
export class CustomerVehiclesService {
  constructor(private readonly em: EntityManager) {}

  async list(owner: User): Promise<CustomerVehicleListResponse> {
    const vehicles = await this.em.find(
      CustomerVehicle,
      { owner },
      { populate: ['vehicleModel'], orderBy: { createdAt: 'asc', id: 'asc' } },
    );
    return { items: vehicles.map((vehicle) => CustomerVehicleResponse.from(vehicle)) };
  }

  async create(owner: User, dto: CreateCustomerVehicleDto): Promise<CustomerVehicleResponse> {
    const model = await this.modelOrFieldError(dto.vehicleModelId);
    this.checkYear(model, dto.year ?? null);
    const vehicle = new CustomerVehicle(owner, model);
    vehicle.nickname = dto.nickname ?? null;
    vehicle.rego = dto.rego ?? null;
    vehicle.year = dto.year ?? null;
    await this.em.persistAndFlush(vehicle);
    return CustomerVehicleResponse.from(vehicle);
  }

  /** Only the owner's own vehicles are found: another customer's id is a 404. */
  async update(
    owner: User,
    id: string,
    dto: UpdateCustomerVehicleDto,
  ): Promise<CustomerVehicleResponse> {
    const vehicle = await this.em.findOne(
      CustomerVehicle,
      { id, owner },
      { populate: ['vehicleModel'] },
    );
    if (!vehicle) throw new NotFoundException(CUSTOMER_VEHICLE_NOT_FOUND);
    const errors: FieldErrors = {};
    if (dto.vehicleModelId === null) errors.vehicleModelId = ['must be a UUID'];
    if (Object.keys(errors).length > 0) throw new FieldErrorsException(errors);
    const model =
      dto.vehicleModelId !== undefined && dto.vehicleModelId !== null
        ? await this.modelOrFieldError(dto.vehicleModelId)
        : vehicle.vehicleModel;
    const year = dto.year !== undefined ? dto.year : vehicle.year;
    this.checkYear(model, year);

    vehicle.vehicleModel = model;
    if (dto.nickname !== undefined) vehicle.nickname = dto.nickname;
    if (dto.rego !== undefined) vehicle.rego = dto.rego;
    vehicle.year = year;
    await this.em.flush();
    return CustomerVehicleResponse.from(vehicle);
  }

  private async modelOrFieldError(id: string): Promise<VehicleModel> {
    const model = await this.em.findOne(VehicleModel, { id });
    if (!model)
      throw new FieldErrorsException({ vehicleModelId: ['no vehicle model has this id'] });
    return model;
  }

  private checkYear(model: VehicleModel, year: number | null): void {
    if (year !== null && (year < model.yearFrom || year > model.yearTo)) {
      throw new FieldErrorsException({
        year: [
          `must be from ${model.yearFrom} to ${model.yearTo} for the ${model.make} ${model.model} ${model.variant}`,
        ],
      });
    }
  }
}

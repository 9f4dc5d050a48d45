import { type FilterQuery } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/postgresql';
import { HttpStatus, Injectable, NotFoundException } from '@nestjs/common';
import { FieldErrorsException } from '../common/errors/field-errors.exception';
import type { CreateVehicleModelDto } from './dto/create-vehicle-model.dto';
import type { UpdateVehicleModelDto } from './dto/update-vehicle-model.dto';
import type { VehicleModelQueryDto } from './dto/vehicle-model-query.dto';
import {
  type VehicleMakesResponse,
  type VehicleModelListResponse,
  VehicleModelResponse,
} from './dto/vehicle-model.response';
import { VehicleModel, type VehicleModelSpec } from './entities/vehicle-model.entity';
import { validVehicleSpec } from './vehicle-spec-validation';

/** `%`, `_` and `\` match literally in an ILIKE pattern. */
export function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (character) => `\\${character}`);
}

export const VEHICLE_MODEL_NOT_FOUND = 'No vehicle model has this id';

@Injectable()
export class VehiclesService {
  constructor(private readonly em: EntityManager) {}

  async list(query: VehicleModelQueryDto): Promise<VehicleModelListResponse> {
    const conditions: FilterQuery<VehicleModel>[] = [];
    for (const word of (query.q ?? '').split(/\s+/).filter(Boolean)) {
      const pattern = `%${escapeLike(word)}%`;
      conditions.push({
        $or: [
          { make: { $ilike: pattern } },
          { model: { $ilike: pattern } },
          { variant: { $ilike: pattern } },
        ],
      });
    }
    if (query.make) {
      conditions.push({ make: { $ilike: escapeLike(query.make) } });
    }
    if (query.year !== undefined) {
      conditions.push({ yearFrom: { $lte: query.year }, yearTo: { $gte: query.year } });
    }
    const vehicles = await this.em.find(
      VehicleModel,
      { $and: conditions },
      { orderBy: { make: 'asc', model: 'asc', variant: 'asc', yearFrom: 'asc' } },
    );
    return { items: vehicles.map((vehicle) => VehicleModelResponse.from(vehicle)) };
  }

  async makes(): Promise<VehicleMakesResponse> {
    const rows = await this.em
      .createQueryBuilder(VehicleModel, 'vehicle')
      .select('vehicle.make', true)
      .orderBy({ make: 'asc' })
      .execute<Array<{ make: string }>>('all');
    return { items: rows.map((row) => row.make) };
  }

  async get(id: string): Promise<VehicleModelResponse> {
    return VehicleModelResponse.from(await this.load(id));
  }

  async create(dto: CreateVehicleModelDto): Promise<VehicleModelResponse> {
    const spec = validVehicleSpec({ ...dto });
    await this.refuseDuplicate(spec);
    const vehicle = new VehicleModel(spec);
    await this.em.persistAndFlush(vehicle);
    return VehicleModelResponse.from(vehicle);
  }

  async update(id: string, dto: UpdateVehicleModelDto): Promise<VehicleModelResponse> {
    const vehicle = await this.load(id);
    const changes = Object.fromEntries(
      Object.entries(dto).filter(([, value]) => value !== undefined),
    );
    const spec = validVehicleSpec({ ...vehicle.toSpec(), ...changes });
    await this.refuseDuplicate(spec, vehicle.id);
    vehicle.applySpec(spec);
    await this.em.flush();
    return VehicleModelResponse.from(vehicle);
  }

  async load(id: string): Promise<VehicleModel> {
    const vehicle = await this.em.findOne(VehicleModel, { id });
    if (!vehicle) throw new NotFoundException(VEHICLE_MODEL_NOT_FOUND);
    return vehicle;
  }

  private async refuseDuplicate(spec: VehicleModelSpec, exceptId?: string): Promise<void> {
    const existing = await this.em.findOne(VehicleModel, {
      make: spec.make,
      model: spec.model,
      variant: spec.variant,
      ...(exceptId ? { id: { $ne: exceptId } } : {}),
    });
    if (existing) {
      throw new FieldErrorsException(
        { variant: ['a vehicle model with this make, model and variant already exists'] },
        'This vehicle model already exists',
        HttpStatus.CONFLICT,
      );
    }
  }
}

import { type FilterQuery } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/postgresql';
import { ForbiddenException, HttpStatus, Injectable, NotFoundException } from '@nestjs/common';
import { FieldErrorsException } from '../common/errors/field-errors.exception';
import { FitReportsService, isMadeFor } from '../fit-reports/fit-reports.service';
import type { User } from '../users/entities/user.entity';
import { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import { escapeLike } from '../vehicles/vehicles.service';
import type { CreateProductDto } from './dto/create-product.dto';
import type { ProductQueryDto } from './dto/product-query.dto';
import {
  type ProductListResponse,
  ProductResponse,
  ProductWithFitResponse,
} from './dto/product.response';
import type { UpdateProductDto } from './dto/update-product.dto';
import { Product, type ProductFields } from './entities/product.entity';
import { PRODUCT_KINDS } from './product-kinds';
import { validateProductFields } from './product-validation';

export const PRODUCT_NOT_FOUND = 'No product has this id';

function isManager(user: User | null): boolean {
  return user?.role === 'manager';
}

function catalogueOrder(a: Product, b: Product): number {
  return (
    PRODUCT_KINDS.indexOf(a.kind) - PRODUCT_KINDS.indexOf(b.kind) ||
    a.brand.localeCompare(b.brand) ||
    a.name.localeCompare(b.name) ||
    a.sku.localeCompare(b.sku)
  );
}

@Injectable()
export class ProductsService {
  constructor(
    private readonly em: EntityManager,
    private readonly fitReports: FitReportsService,
  ) {}

  async list(query: ProductQueryDto, user: User | null): Promise<ProductListResponse> {
    if (query.includeInactive && !isManager(user)) {
      throw new ForbiddenException('Only a manager can list switched-off products');
    }
    const conditions: FilterQuery<Product>[] = [];
    if (!query.includeInactive) conditions.push({ active: true });
    if (query.kind) conditions.push({ kind: query.kind });
    for (const word of (query.q ?? '').split(/\s+/).filter(Boolean)) {
      const pattern = `%${escapeLike(word)}%`;
      conditions.push({
        $or: [
          { sku: { $ilike: pattern } },
          { name: { $ilike: pattern } },
          { brand: { $ilike: pattern } },
        ],
      });
    }
    let products = (
      await this.em.find(Product, { $and: conditions }, { populate: ['fitsVehicleModels'] })
    ).sort(catalogueOrder);

    if (!query.vehicleModelId) {
      return { items: products.map((product) => ProductResponse.from(product)) };
    }
    const vehicle = await this.em.findOne(VehicleModel, { id: query.vehicleModelId });
    if (!vehicle) {
      throw new FieldErrorsException({ vehicleModelId: ['no vehicle model has this id'] });
    }
    products = products.filter((product) => isMadeFor(product, vehicle.id));
    const ruleSet = await this.fitReports.engineRuleSet();
    if (!ruleSet) throw new Error('No default rule set');
    const kits = products.some((product) => product.kind === 'suspension-kit')
      ? await this.em.find(
          Product,
          { kind: 'suspension-kit', active: true },
          { populate: ['fitsVehicleModels'] },
        )
      : [];
    const fits = this.fitReports.productFits(
      vehicle,
      products,
      kits,
      ruleSet,
      query.constantLoadKg,
    );
    return {
      items: products.map((product) =>
        Object.assign(new ProductWithFitResponse(), ProductResponse.from(product), {
          fit: fits.get(product.id),
        }),
      ),
    };
  }

  async get(id: string, user: User | null): Promise<ProductResponse> {
    const product = await this.em.findOne(Product, { id }, { populate: ['fitsVehicleModels'] });
    if (!product || (!product.active && !isManager(user))) {
      throw new NotFoundException(PRODUCT_NOT_FOUND);
    }
    return ProductResponse.from(product);
  }

  async create(dto: CreateProductDto): Promise<ProductResponse> {
    const fields = this.validFields({
      sku: dto.sku,
      kind: dto.kind,
      name: dto.name,
      brand: dto.brand,
      priceCents: dto.priceCents,
      labourMinutes: dto.labourMinutes ?? 0,
      bayKind: dto.bayKind ?? null,
      stockQty: dto.stockQty ?? 0,
      leadDays: dto.leadDays ?? 0,
      active: dto.active ?? true,
      attributes: dto.attributes,
    });
    await this.refuseTakenSku(fields.sku);
    const fitsVehicles = await this.vehiclesOf(dto.fitsVehicleModelIds ?? []);
    const product = new Product(fields);
    product.description = dto.description ?? '';
    product.fitsVehicleModels.set(fitsVehicles);
    await this.em.persistAndFlush(product);
    return ProductResponse.from(product);
  }

  async update(id: string, dto: UpdateProductDto): Promise<ProductResponse> {
    const product = await this.em.findOne(Product, { id }, { populate: ['fitsVehicleModels'] });
    if (!product) throw new NotFoundException(PRODUCT_NOT_FOUND);
    const { description, fitsVehicleModelIds, ...changes } = dto;
    const definedChanges = Object.fromEntries(
      Object.entries(changes).filter(([, value]) => value !== undefined),
    );
    const fields = this.validFields({ ...product.fields(), ...definedChanges });
    if (fields.sku !== product.sku) await this.refuseTakenSku(fields.sku);
    const fitsVehicles =
      fitsVehicleModelIds !== undefined ? await this.vehiclesOf(fitsVehicleModelIds) : null;

    product.assignFields(fields);
    if (description !== undefined) product.description = description;
    if (fitsVehicles) product.fitsVehicleModels.set(fitsVehicles);
    await this.em.flush();
    return ProductResponse.from(product);
  }

  private validFields(candidate: Record<string, unknown>): ProductFields {
    const validation = validateProductFields(candidate);
    if (!validation.ok) throw new FieldErrorsException(validation.fieldErrors);
    return validation.fields;
  }

  private async refuseTakenSku(sku: string): Promise<void> {
    if ((await this.em.count(Product, { sku })) > 0) {
      throw new FieldErrorsException(
        { sku: ['another product has this SKU'] },
        'This SKU is taken',
        HttpStatus.CONFLICT,
      );
    }
  }

  private async vehiclesOf(ids: string[]): Promise<VehicleModel[]> {
    const unique = [...new Set(ids)];
    if (unique.length === 0) return [];
    const vehicles = await this.em.find(VehicleModel, { id: { $in: unique } });
    const missing = unique.filter((id) => !vehicles.some((vehicle) => vehicle.id === id));
    if (missing.length > 0) {
      throw new FieldErrorsException({
        fitsVehicleModelIds: [`no vehicle model has the id ${missing.join(', ')}`],
      });
    }
    return vehicles;
  }
}

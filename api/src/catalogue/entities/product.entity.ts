import { Check, Collection, Entity, Enum, Index, ManyToMany, Property } from '@mikro-orm/core';
import { sameJson } from '../../common/same-json';
import { BaseEntity } from '../../database/base.entity';
import { VehicleModel } from '../../vehicles/entities/vehicle-model.entity';
import type { ProductAttributes } from '../product-attributes';
import { BAY_KINDS, type BayKind, PRODUCT_KINDS, type ProductKind } from '../product-kinds';

/** The fields a price-list row (CSV) or a create request sets. */
export interface ProductFields {
  sku: string;
  kind: ProductKind;
  name: string;
  brand: string;
  priceCents: number;
  labourMinutes: number;
  bayKind: BayKind | null;
  stockQty: number;
  leadDays: number;
  active: boolean;
  attributes: ProductAttributes;
}

/** Something the workshop sells: a part (wheel, tyre, kit, component) or a service. */
@Entity()
@Index({ name: 'product_kind_index', properties: ['kind'] })
@Check({ name: 'product_price_cents_check', expression: 'price_cents >= 0' })
@Check({ name: 'product_labour_minutes_check', expression: 'labour_minutes >= 0' })
@Check({ name: 'product_stock_qty_check', expression: 'stock_qty >= 0' })
@Check({ name: 'product_lead_days_check', expression: 'lead_days >= 0' })
export class Product extends BaseEntity<'description'> {
  @Property({ type: 'string', length: 40, unique: true })
  sku!: string;

  @Enum({ items: () => [...PRODUCT_KINDS], type: 'string' })
  kind!: ProductKind;

  @Property({ type: 'string', length: 120 })
  name!: string;

  @Property({ type: 'string', length: 60 })
  brand!: string;

  @Property({ type: 'text', default: '' })
  description: string = '';

  /** Price including tax, integer cents. */
  @Property({ type: 'integer' })
  priceCents!: number;

  @Property({ type: 'integer' })
  labourMinutes!: number;

  @Enum({ items: () => [...BAY_KINDS], type: 'string', nullable: true })
  bayKind!: BayKind | null;

  @Property({ type: 'integer' })
  stockQty!: number;

  /** Days to get the part in when it is not in stock (0: on the shelf or same day). */
  @Property({ type: 'integer' })
  leadDays!: number;

  @Property({ type: 'boolean' })
  active!: boolean;

  /** Per kind (see product-attributes.ts); validated before every write. */
  @Property({ type: 'json' })
  attributes!: ProductAttributes;

  /** Empty: fits any vehicle (the fit report decides). */
  @ManyToMany(() => VehicleModel, undefined, {
    owner: true,
    pivotTable: 'product_fits_vehicle_model',
    joinColumn: 'product_id',
    inverseJoinColumn: 'vehicle_model_id',
  })
  fitsVehicleModels = new Collection<VehicleModel>(this);

  constructor(fields: ProductFields) {
    super();
    this.assignFields(fields);
  }

  assignFields(fields: ProductFields): void {
    this.sku = fields.sku;
    this.kind = fields.kind;
    this.name = fields.name;
    this.brand = fields.brand;
    this.priceCents = fields.priceCents;
    this.labourMinutes = fields.labourMinutes;
    this.bayKind = fields.bayKind;
    this.stockQty = fields.stockQty;
    this.leadDays = fields.leadDays;
    this.active = fields.active;
    // jsonb reorders keys: only replace a value that really differs.
    if (this.attributes === undefined || !sameJson(this.attributes, fields.attributes)) {
      this.attributes = fields.attributes;
    }
  }

  fields(): ProductFields {
    return {
      sku: this.sku,
      kind: this.kind,
      name: this.name,
      brand: this.brand,
      priceCents: this.priceCents,
      labourMinutes: this.labourMinutes,
      bayKind: this.bayKind,
      stockQty: this.stockQty,
      leadDays: this.leadDays,
      active: this.active,
      attributes: this.attributes,
    };
  }
}

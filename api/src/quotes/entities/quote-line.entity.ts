import { Check, Entity, Enum, ManyToOne, Property } from '@mikro-orm/core';
import { Product } from '../../catalogue/entities/product.entity';
import {
  BAY_KINDS,
  type BayKind,
  PRODUCT_KINDS,
  type ProductKind,
} from '../../catalogue/product-kinds';
import { BaseEntity } from '../../database/base.entity';
import { QuoteVersion } from './quote-version.entity';

/** The catalogue values of one product as a quote version was priced from them (a snapshot). */
export interface QuoteLineFields {
  position: number;
  product: Product | null;
  sku: string;
  name: string;
  brand: string;
  kind: ProductKind;
  quantity: number;
  unitPriceCents: number;
  labourMinutes: number;
  bayKind: BayKind | null;
  leadDays: number;
  stockQty: number;
  perWheel: boolean;
}

@Entity()
@Check({ name: 'quote_line_quantity_check', expression: 'quantity > 0' })
@Check({ name: 'quote_line_unit_price_cents_check', expression: 'unit_price_cents >= 0' })
export class QuoteLine extends BaseEntity {
  @ManyToOne(() => QuoteVersion, { deleteRule: 'cascade', index: true })
  version: QuoteVersion;

  @Property({ type: 'smallint' })
  position!: number;

  /** The product it came from; null when the product was later deleted (the snapshot stays). */
  @ManyToOne(() => Product, { deleteRule: 'set null', nullable: true })
  product!: Product | null;

  @Property({ type: 'string', length: 40 })
  sku!: string;

  @Property({ type: 'string', length: 120 })
  name!: string;

  @Property({ type: 'string', length: 60 })
  brand!: string;

  @Enum({ items: () => [...PRODUCT_KINDS], type: 'string' })
  kind!: ProductKind;

  @Property({ type: 'smallint' })
  quantity!: number;

  @Property({ type: 'integer' })
  unitPriceCents!: number;

  @Property({ type: 'integer' })
  labourMinutes!: number;

  @Enum({ items: () => [...BAY_KINDS], type: 'string', nullable: true })
  bayKind!: BayKind | null;

  @Property({ type: 'integer' })
  leadDays!: number;

  @Property({ type: 'integer' })
  stockQty!: number;

  @Property({ type: 'boolean' })
  perWheel!: boolean;

  constructor(version: QuoteVersion, fields: QuoteLineFields) {
    super();
    this.version = version;
    Object.assign(this, fields);
  }
}

import {
  Check,
  Collection,
  Entity,
  Enum,
  ManyToOne,
  OneToMany,
  Property,
  Unique,
} from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';
import type { FitReport } from '../../fitment/fitment.types';
import type { PackagePrice } from '../../pricing/pricing.types';
import { User } from '../../users/entities/user.entity';
import { QUOTE_VERSION_STATES, type QuoteVersionState } from '../quote-states';
import { QuoteLine } from './quote-line.entity';
import { Quote } from './quote.entity';

/**
 * One priced version of a quote. `price` and `fitReport` are the engines' outputs at the time
 * of saving and `lines` the catalogue values they were computed from, so a later catalogue or
 * policy change does not alter it. Only `state` (and the time it changed) moves afterwards.
 */
@Entity()
@Unique({ name: 'quote_version_quote_number_unique', properties: ['quote', 'number'] })
@Check({ name: 'quote_version_total_cents_check', expression: 'total_cents >= 0' })
@Check({ name: 'quote_version_deposit_cents_check', expression: 'deposit_cents >= 0' })
export class QuoteVersion extends BaseEntity<'revisionReason' | 'stateChangedAt'> {
  @ManyToOne(() => Quote, { deleteRule: 'cascade' })
  quote: Quote;

  /** 1, 2, ... within the quote. */
  @Property({ type: 'smallint' })
  number: number;

  @Enum({ items: () => [...QUOTE_VERSION_STATES], type: 'string' })
  state: QuoteVersionState;

  @Property({ type: 'datetime', columnType: 'timestamptz' })
  stateChangedAt: Date = new Date();

  /** Why the desk revised it (null for version 1). */
  @Property({ type: 'text', nullable: true })
  revisionReason: string | null = null;

  @ManyToOne(() => User, { deleteRule: 'restrict' })
  createdBy: User;

  @Property({ type: 'smallint' })
  wheelsFitted: number;

  @Property({ type: 'smallint' })
  tyresReplaced: number;

  /** The last calendar day (workshop time zone) the prices hold. */
  @Property({ type: 'string', length: 10 })
  validUntilDate: string;

  /** The end of that day as a UTC instant. */
  @Property({ type: 'datetime', columnType: 'timestamptz' })
  validUntil: Date;

  @Property({ type: 'integer' })
  totalCents: number;

  @Property({ type: 'integer' })
  depositCents: number;

  /** The pricing engine's result, as saved. */
  @Property({ type: 'json' })
  price: PackagePrice;

  /** The fit report, as saved. */
  @Property({ type: 'json' })
  fitReport: FitReport;

  @OneToMany(() => QuoteLine, (line) => line.version, { orderBy: { position: 'asc' } })
  lines = new Collection<QuoteLine>(this);

  constructor(fields: {
    quote: Quote;
    number: number;
    state: QuoteVersionState;
    createdBy: User;
    wheelsFitted: number;
    tyresReplaced: number;
    validUntilDate: string;
    validUntil: Date;
    price: PackagePrice;
    fitReport: FitReport;
  }) {
    super();
    this.quote = fields.quote;
    this.number = fields.number;
    this.state = fields.state;
    this.createdBy = fields.createdBy;
    this.wheelsFitted = fields.wheelsFitted;
    this.tyresReplaced = fields.tyresReplaced;
    this.validUntilDate = fields.validUntilDate;
    this.validUntil = fields.validUntil;
    this.price = fields.price;
    this.fitReport = fields.fitReport;
    this.totalCents = fields.price.totalCents;
    this.depositCents = fields.price.depositCents;
  }
}

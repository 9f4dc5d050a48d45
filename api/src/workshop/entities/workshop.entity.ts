import { Check, Entity, Enum, Property } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';
import {
  type PricingProductKind,
  TAX_ROUNDING_METHODS,
  type TaxRoundingMethod,
} from '../../pricing/pricing.types';

/** The workshop's card: what a quote, a PDF and an e-mail show about the shop. */
export interface WorkshopCardFields {
  name: string;
  addressLine: string;
  town: string;
  phone: string;
  email: string;
  /** IANA time zone name, e.g. Australia/Sydney. */
  timeZone: string;
  /** ISO 4217 code. */
  currency: string;
}

/**
 * The one workshop this installation serves: its card and its pricing policy (Manage →
 * Policies). Percentages are stored as whole basis points (1000 = 10 %), money as integer cents.
 */
@Entity()
@Check({
  name: 'workshop_full_refund_hours_before_check',
  expression: 'full_refund_hours_before >= 0',
})
@Check({
  name: 'workshop_late_cancel_refund_percent_check',
  expression: 'late_cancel_refund_percent >= 0 and late_cancel_refund_percent <= 100',
})
export class Workshop extends BaseEntity<
  | 'holidayRegion'
  | 'slotStepMinutes'
  | 'holdMinutes'
  | 'leadTimeBufferDays'
  | 'fittingMinutesPerWheel'
  | 'fullRefundHoursBefore'
  | 'lateCancelRefundPercent'
> {
  @Property({ type: 'string', length: 120 })
  name!: string;

  @Property({ type: 'string', length: 160 })
  addressLine!: string;

  @Property({ type: 'string', length: 80 })
  town!: string;

  @Property({ type: 'string', length: 40 })
  phone!: string;

  @Property({ type: 'string', length: 254 })
  email!: string;

  @Property({ type: 'string', length: 64 })
  timeZone!: string;

  @Property({ type: 'string', length: 3 })
  currency!: string;

  @Property({ type: 'integer' })
  labourRateCentsPerHour!: number;

  @Property({ type: 'boolean' })
  pricesIncludeTax!: boolean;

  @Property({ type: 'integer' })
  taxRateBasisPoints!: number;

  @Enum({ items: () => [...TAX_ROUNDING_METHODS], type: 'string' })
  taxRoundingMethod!: TaxRoundingMethod;

  @Property({ type: 'integer' })
  fittingBalancingCentsPerWheel!: number;

  @Property({ type: 'integer' })
  tyreDisposalCentsPerTyre!: number;

  @Property({ type: 'boolean' })
  bundleDiscountEnabled!: boolean;

  @Property({ type: 'integer' })
  bundleDiscountBasisPoints!: number;

  /** The package must hold a line of each of these kinds for the bundle discount. */
  @Property({ type: 'json' })
  bundleRequiresKinds!: PricingProductKind[];

  @Property({ type: 'integer' })
  depositBasisPoints!: number;

  @Property({ type: 'integer' })
  depositFloorCents!: number;

  @Property({ type: 'integer' })
  depositCapCents!: number;

  @Property({ type: 'integer' })
  depositSpecialOrderBasisPoints!: number;

  @Property({ type: 'integer' })
  quoteValidDays!: number;

  // ---- Calendar (Manage → Workshop) ----

  /** Public holidays from the date-holidays data of this region: 'AU-NSW', 'NZ'. */
  @Property({ type: 'string', length: 20, default: 'AU-NSW' })
  holidayRegion: string = 'AU-NSW';

  /** Start times are offered every this many minutes from opening. */
  @Property({ type: 'smallint', default: 30 })
  slotStepMinutes: number = 30;

  /** How long a held time is kept for the customer before it is released. */
  @Property({ type: 'smallint', default: 15 })
  holdMinutes: number = 15;

  /** Calendar days added after the longest lead time of special-order parts (and to today). */
  @Property({ type: 'smallint', default: 1 })
  leadTimeBufferDays: number = 1;

  /** Bay time to mount, balance and fit one wheel (tyre bay, or the hoist when there is one). */
  @Property({ type: 'smallint', default: 15 })
  fittingMinutesPerWheel: number = 15;

  // ---- Cancellation policy (Manage → Workshop, with the calendar) ----

  /** A booking cancelled at least this many hours before its start gets its deposit back in full. */
  @Property({ type: 'smallint', default: 48 })
  fullRefundHoursBefore: number = 48;

  /** Cancelled later than that: this percentage of the deposit comes back (0 to 100; 0: none). */
  @Property({ type: 'smallint', default: 0 })
  lateCancelRefundPercent: number = 0;
}

import type { EntityManager } from '@mikro-orm/core';
import { Seeder } from '@mikro-orm/seeder';
import type { PricingPolicy } from '../../pricing/pricing.types';
import { type WorkshopCardFields, Workshop } from '../../workshop/entities/workshop.entity';
import { assignPolicy, policyFieldErrors } from '../../workshop/policy-mapping';
import { isKnownTimeZone } from '../../workshop/workshop-time';

/**
 * The demo workshop. Invented: the business, the town, the street; the phone number is in the
 * range reserved for fiction and the address is on a reserved .example domain.
 */
export const DEMO_WORKSHOP_CARD: WorkshopCardFields = {
  name: 'Kestrelmere 4x4 & Tyre',
  addressLine: '7 Quarry Flat Road',
  town: 'Tallowgate',
  phone: '0491 570 006',
  email: 'bookings@kestrelmere.example',
  timeZone: 'Australia/Sydney',
  currency: 'AUD',
};

/**
 * The demo pricing policy, the one docs/pricing.md works its examples with (invented values; a
 * workshop sets its own): GST-inclusive prices at 10 % rounded per invoice, $140.00/h labour,
 * $35.00 a wheel fitting and balancing, $6.50 a tyre disposal, 5 % off parts with a kit, wheels
 * and tyres, a 20 % deposit of at least $100.00 and at most $1,000.00 (50 % for special orders),
 * quotes valid 30 days.
 */
export const DEMO_PRICING_POLICY: PricingPolicy = {
  labourRateCentsPerHour: 14000,
  pricesIncludeTax: true,
  taxRatePercent: 10,
  taxRoundingMethod: 'per-invoice',
  fittingBalancingCentsPerWheel: 3500,
  tyreDisposalCentsPerTyre: 650,
  bundleDiscount: { enabled: true, percent: 5, requiresKinds: ['suspension-kit', 'wheel', 'tyre'] },
  deposit: { percent: 20, floorCents: 10000, capCents: 100000, specialOrderPercent: 50 },
  quoteValidDays: 30,
};

/**
 * Creates the workshop row when there is none. An existing row is left exactly as it is: the
 * manager's policy survives every `npm start` (which seeds again).
 */
export class DemoWorkshopSeeder extends Seeder {
  async run(em: EntityManager): Promise<void> {
    if ((await em.count(Workshop, {})) > 0) return;
    const errors = policyFieldErrors(DEMO_PRICING_POLICY);
    if (Object.keys(errors).length > 0 || !isKnownTimeZone(DEMO_WORKSHOP_CARD.timeZone)) {
      throw new Error(`The demo workshop is not valid: ${JSON.stringify(errors)}`);
    }
    const workshop = Object.assign(new Workshop(), DEMO_WORKSHOP_CARD);
    assignPolicy(workshop, DEMO_PRICING_POLICY);
    await em.persistAndFlush(workshop);
  }
}

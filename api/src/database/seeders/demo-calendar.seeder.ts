import type { EntityManager } from '@mikro-orm/core';
import { Seeder } from '@mikro-orm/seeder';
import type { BayKind } from '../../catalogue/product-kinds';
import { Bay } from '../../workshop/entities/bay.entity';
import {
  type OpeningHoursFields,
  OpeningHours,
} from '../../workshop/entities/opening-hours.entity';

/** The demo workshop's bays (invented): three hoists, the alignment bay and a tyre bay. */
export const DEMO_BAYS: { name: string; kind: BayKind }[] = [
  { name: 'Hoist 1', kind: 'hoist' },
  { name: 'Hoist 2', kind: 'hoist' },
  { name: 'Hoist 3', kind: 'hoist' },
  { name: 'Alignment bay', kind: 'alignment' },
  { name: 'Tyre bay', kind: 'tyre' },
];

const WEEKDAY: Omit<OpeningHoursFields, 'weekday'> = {
  opensAt: '07:30',
  closesAt: '17:00',
  breakStartsAt: '12:00',
  breakEndsAt: '12:30',
};

/** Monday to Friday 7:30–17:00 with a half-hour break at noon, Saturday 8:00–12:00, Sunday shut. */
export const DEMO_OPENING_HOURS: OpeningHoursFields[] = [
  ...[1, 2, 3, 4, 5].map((weekday) => ({ weekday, ...WEEKDAY })),
  { weekday: 6, opensAt: '08:00', closesAt: '12:00', breakStartsAt: null, breakEndsAt: null },
];

/**
 * Bays and opening hours when there are none. Existing ones are left as the manager set them
 * (every `npm start` seeds again). The calendar settings (slot step, hold length, holiday region)
 * have their defaults on the workshop row.
 */
export class DemoCalendarSeeder extends Seeder {
  async run(em: EntityManager): Promise<void> {
    if ((await em.count(Bay, {})) === 0) {
      DEMO_BAYS.forEach((bay, index) => em.persist(new Bay({ ...bay, position: index + 1 })));
    }
    if ((await em.count(OpeningHours, {})) === 0) {
      for (const hours of DEMO_OPENING_HOURS) em.persist(new OpeningHours(hours));
    }
    await em.flush();
  }
}

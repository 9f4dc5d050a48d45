import type { EntityManager } from '@mikro-orm/core';
import { Seeder } from '@mikro-orm/seeder';
import { DemoCatalogueSeeder } from './demo-catalogue.seeder';
import { DemoUsersSeeder } from './demo-users.seeder';
import { DemoWorkshopSeeder } from './demo-workshop.seeder';
import { DemoCalendarSeeder } from './demo-calendar.seeder';

/** Demo data only; running it again changes nothing. */
export class DatabaseSeeder extends Seeder {
  run(em: EntityManager): Promise<void> {
    return this.call(em, [
      DemoUsersSeeder,
      DemoCatalogueSeeder,
      DemoWorkshopSeeder,
      DemoCalendarSeeder,
    ]);
  }
}

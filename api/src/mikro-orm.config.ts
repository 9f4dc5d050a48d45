import { join } from 'node:path';
import { Migrator } from '@mikro-orm/migrations';
import { defineConfig, type Options } from '@mikro-orm/postgresql';
import { SeedManager } from '@mikro-orm/seeder';
import { BookingEvent } from './bookings/entities/booking-event.entity';
import { Booking } from './bookings/entities/booking.entity';
import { Reservation } from './bookings/entities/reservation.entity';
import { AuthThrottleCounter } from './auth/entities/auth-throttle-counter.entity';
import { HttpSession } from './auth/entities/http-session.entity';
import { PasswordResetToken } from './auth/entities/password-reset-token.entity';
import { CatalogueRevision } from './catalogue/entities/catalogue-revision.entity';
import { Product } from './catalogue/entities/product.entity';
import { validateDatabaseEnvironment } from './config/environment';
import { CustomerVehicle } from './customer-vehicles/entities/customer-vehicle.entity';
import { MIGRATIONS } from './database/migrations-list';
import { OUTBOX_SCHEMA } from './notifications/outbox-schema';
import { Payment } from './payments/entities/payment.entity';
import { ProcessedWebhookEvent } from './payments/entities/processed-webhook-event.entity';
import { Refund } from './payments/entities/refund.entity';
import { QuoteLine } from './quotes/entities/quote-line.entity';
import { QuoteVersion } from './quotes/entities/quote-version.entity';
import { Quote } from './quotes/entities/quote.entity';
import { RuleSet } from './rule-sets/entities/rule-set.entity';
import { Upload } from './uploads/entities/upload.entity';
import { User } from './users/entities/user.entity';
import { StockWheel } from './vehicles/entities/stock-wheel.embeddable';
import { VehicleModel } from './vehicles/entities/vehicle-model.entity';
import { Bay } from './workshop/entities/bay.entity';
import { Closure } from './workshop/entities/closure.entity';
import { HolidayOverride } from './workshop/entities/holiday-override.entity';
import { OpeningHours } from './workshop/entities/opening-hours.entity';
import { Workshop } from './workshop/entities/workshop.entity';

/**
 * The one ORM configuration, used by MikroOrmModule.forRootAsync, by database/cli.ts and by the
 * MikroORM CLI (default export). The schema changes only through migrations: nothing here
 * creates or updates tables at start-up. `writeSnapshot: false` for commands that only run
 * migrations.
 */
export function createOrmConfig(databaseUrl: string, { writeSnapshot = true } = {}): Options {
  return defineConfig({
    clientUrl: databaseUrl,
    entities: [
      User,
      PasswordResetToken,
      HttpSession,
      AuthThrottleCounter,
      VehicleModel,
      StockWheel,
      CustomerVehicle,
      Product,
      CatalogueRevision,
      RuleSet,
      Workshop,
      Quote,
      QuoteVersion,
      QuoteLine,
      Upload,
      Bay,
      OpeningHours,
      Closure,
      HolidayOverride,
      Booking,
      BookingEvent,
      Reservation,
      Payment,
      Refund,
      ProcessedWebhookEvent,
    ],
    forceUtcTimezone: true,
    ensureDatabase: false,
    debug: false,
    extensions: [Migrator, SeedManager],
    // pg-boss (the e-mail outbox) keeps its own tables in its own schema and migrates them
    // itself: they are not ours to diff, create or drop.
    schemaGenerator: { ignoreSchema: [OUTBOX_SCHEMA] },
    migrations: {
      tableName: 'mikro_orm_migrations',
      // Compiled migrations run from dist; new ones are written as TypeScript into src.
      path: join(__dirname, 'database', 'migrations'),
      pathTs: join(__dirname, '..', 'src', 'database', 'migrations'),
      emit: 'ts',
      // The snapshot changes only when a migration is created (running migrations would
      // otherwise rewrite the committed file from the database).
      snapshot: writeSnapshot,
      snapshotName: '.snapshot-liftwright',
      migrationsList: MIGRATIONS,
      transactional: true,
      allOrNothing: true,
      dropTables: true,
      safe: false,
    },
    seeder: {
      path: join(__dirname, 'database', 'seeders'),
      pathTs: join(__dirname, '..', 'src', 'database', 'seeders'),
      defaultSeeder: 'DatabaseSeeder',
    },
  });
}

/** For the MikroORM CLI (`npx mikro-orm ...` in api/, after a build): reads DATABASE_URL. */
export default function ormConfigFromEnvironment(): Options {
  return createOrmConfig(validateDatabaseEnvironment(process.env).DATABASE_URL);
}

import { Global, Inject, Logger, Module, type OnApplicationShutdown } from '@nestjs/common';
import { Pool } from 'pg';
import { AppConfigService } from '../config/app-config.service';

/** A small pg pool for the libraries that speak to PostgreSQL directly (sessions, throttling). */
export const PG_POOL = Symbol('PG_POOL');

@Global()
@Module({
  providers: [
    {
      provide: PG_POOL,
      inject: [AppConfigService],
      useFactory: (config: AppConfigService) => {
        const pool = new Pool({
          connectionString: config.databaseUrl,
          max: 5,
          idleTimeoutMillis: 30_000,
        });
        // An idle connection that the server drops must not crash the process.
        pool.on('error', (error) => new Logger('PgPool').error(error.message));
        return pool;
      },
    },
  ],
  exports: [PG_POOL],
})
export class PgPoolModule implements OnApplicationShutdown {
  constructor(@Inject(PG_POOL) private readonly pool: Pool) {}

  async onApplicationShutdown(): Promise<void> {
    await this.pool.end();
  }
}

import { MikroORM } from '@mikro-orm/postgresql';
import {
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnApplicationShutdown,
} from '@nestjs/common';
import { AppConfigService } from '../config/app-config.service';
import { expireLapsedHolds } from './holds';

/**
 * Every HOLD_SWEEP_SECONDS: holds past their time become `expired` and free their bays.
 * Availability and new holds already ignore a lapsed hold; the sweep makes the state visible
 * (My bookings, the desk) and keeps the table tidy.
 */
@Injectable()
export class HoldSweeperService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger(HoldSweeperService.name);
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<unknown> | null = null;

  constructor(
    private readonly orm: MikroORM,
    private readonly config: AppConfigService,
  ) {}

  onApplicationBootstrap(): void {
    this.timer = setInterval(() => void this.sweep(), this.config.holdSweepMs);
    this.timer.unref();
  }

  async onApplicationShutdown(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    await this.running;
  }

  /** One sweep; returns how many holds expired. */
  async sweep(now = new Date()): Promise<number> {
    if (this.running) return 0;
    const run = expireLapsedHolds(this.orm.em.fork(), now);
    this.running = run.catch(() => undefined);
    try {
      const expired = await run;
      if (expired > 0) this.logger.log(`${expired} lapsed hold(s) expired`);
      return expired;
    } catch (error) {
      this.logger.error(`The hold sweep failed: ${String(error)}`);
      return 0;
    } finally {
      this.running = null;
    }
  }
}

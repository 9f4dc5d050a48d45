import { EntityManager, MikroORM } from '@mikro-orm/postgresql';
import {
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnApplicationShutdown,
} from '@nestjs/common';
import { AppConfigService } from '../config/app-config.service';
import { bookingReminderMessage } from '../notifications/messages/booking-messages';
import { NotificationsService } from '../notifications/notifications.service';
import { localDateOf } from '../workshop/workshop-time';
import { loadWorkshop } from '../workshop/workshop.service';
import { addLocalDays, startOfLocalDate } from './booking-times';
import { Booking } from './entities/booking.entity';

/** The cause of a booking's reminder: one per booking and start, so a moved booking gets anew. */
export function reminderCauseKey(bookingId: string, startsAt: Date): string {
  return `booking-reminder:${bookingId}:${startsAt.toISOString()}`;
}

/**
 * Every REMINDER_SWEEP_SECONDS (default 15 minutes; 0 is off; never on its own under
 * NODE_ENV=test): each confirmed booking whose start falls on the next calendar day in the
 * workshop's time zone gets its reminder queued, exactly once per booking and start (the
 * outbox refuses a cause queued before). "Tomorrow" is the workshop's next local date, from
 * its midnight to the following one, so a day of 23 or 25 hours (a daylight-saving change) is
 * still one day.
 */
@Injectable()
export class ReminderSweeperService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger(ReminderSweeperService.name);
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<unknown> | null = null;

  constructor(
    private readonly orm: MikroORM,
    private readonly config: AppConfigService,
    private readonly notifications: NotificationsService,
  ) {}

  onApplicationBootstrap(): void {
    const everyMs = this.config.reminderSweepMs;
    if (everyMs === 0 || this.config.nodeEnv === 'test') return;
    this.timer = setInterval(() => void this.sweep().catch(() => undefined), everyMs);
    this.timer.unref();
  }

  async onApplicationShutdown(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    await this.running;
  }

  /** One sweep as of `now`; returns how many reminders it queued (0 for those queued before). */
  async sweep(now = new Date()): Promise<number> {
    if (this.running) return 0;
    const run = this.queueReminders(this.orm.em.fork(), now);
    this.running = run.catch(() => undefined);
    try {
      const queued = await run;
      if (queued > 0) this.logger.log(`${queued} day-before reminder(s) queued`);
      return queued;
    } catch (error) {
      this.logger.error(`The reminder sweep failed: ${String(error)}`);
      throw error;
    } finally {
      this.running = null;
    }
  }

  private async queueReminders(em: EntityManager, now: Date): Promise<number> {
    const { timeZone } = await loadWorkshop(em);
    const tomorrow = addLocalDays(localDateOf(now, timeZone), 1);
    const from = new Date(startOfLocalDate(tomorrow, timeZone));
    const to = new Date(startOfLocalDate(addLocalDays(tomorrow, 1), timeZone));
    const due = await em.find(
      Booking,
      { state: 'confirmed', startsAt: { $gte: from, $lt: to } },
      { fields: ['id'] },
    );
    let queued = 0;
    for (const { id } of due) {
      // One transaction per booking, with its row locked: a move or cancellation meanwhile
      // either waits or has already happened (and is seen here).
      const sent = await em.fork().transactional(async (tx) => {
        await tx.execute('select id from booking where id = ? for update', [id]);
        const booking = await tx.findOneOrFail(Booking, id, {
          populate: ['customer', 'quoteVersion', 'quoteVersion.quote.vehicleModel'],
          refresh: true,
        });
        if (booking.state !== 'confirmed' || booking.startsAt < from || booking.startsAt >= to) {
          return false;
        }
        return this.notifications.queue(tx, {
          causeKey: reminderCauseKey(booking.id, booking.startsAt),
          to: booking.customer.email,
          content: bookingReminderMessage(await this.notifications.bookingInput(tx, booking, now)),
        });
      });
      if (sent) queued += 1;
    }
    return queued;
  }
}

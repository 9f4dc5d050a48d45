import { EntityManager } from '@mikro-orm/postgresql';
import {
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnApplicationShutdown,
} from '@nestjs/common';
import PgBoss from 'pg-boss';
import { AppConfigService } from '../config/app-config.service';
import {
  MailService,
  SMTP_CONNECTION_TIMEOUT_MS,
  SMTP_GREETING_TIMEOUT_MS,
  SMTP_SOCKET_TIMEOUT_MS,
} from '../mail/mail.service';
import type { OutgoingMail } from '../mail/templates/mail-content';
import { loadWorkshop } from '../workshop/workshop.service';
import { bookingReference } from '../bookings/booking-states';
import type { Booking } from '../bookings/entities/booking.entity';
import { vehicleName } from '../fit-reports/fit-reports.service';
import { quoteReference } from '../quotes/quote-reference';
import { type BookingMessageInput, bookingConfirmedMessage } from './messages/booking-messages';
import type { CustomerMessage } from './messages/customer-message';
import { mailDomainOf, outboxJobId, outboxMessageId, toKnexBindings } from './outbox-key';
import { CUSTOMER_MAIL_QUEUE, OUTBOX_SCHEMA } from './outbox-schema';

/** A message to queue: who gets it, what it says and the key of what caused it. */
export interface QueuedMessage {
  /**
   * What caused the message, unique per cause (`booking-moved:<booking id>:<sequence>`): the job
   * id is made from it, so the same cause queued again is not a second message.
   */
  causeKey: string;
  to: string;
  content: CustomerMessage;
}

/**
 * Messages fetched at a time. pg-boss's worker waits a polling interval between fetches even
 * when it found work, so one at a time would mean at most one message per interval. A batch is
 * sent one message after another, so the whole batch at the transport's longest wait per
 * message must fit in a job's expiry (below), or a job still being sent would be handed out
 * again and could go out twice.
 */
const BATCH_SIZE = 10;
const WORST_SEND_SECONDS =
  (SMTP_CONNECTION_TIMEOUT_MS + SMTP_GREETING_TIMEOUT_MS + SMTP_SOCKET_TIMEOUT_MS) / 1000;
/** A job's time to be sent before pg-boss takes it back: the whole batch at its worst, and half again. */
export const JOB_EXPIRY_SECONDS = Math.ceil(BATCH_SIZE * WORST_SEND_SECONDS * 1.5);

/** How long a completed or failed job stays in pg-boss's archive (and a repeat is still seen). */
const ARCHIVE_DAYS = 30;

/**
 * The e-mail outbox. `queue()` writes a message as a pg-boss job on the connection of the
 * caller's transaction, so the message exists exactly when the change that caused it commits.
 * The worker (in the API process, on unless OUTBOX_WORKER=false) sends each job through
 * nodemailer; a failure leaves the job to be retried with exponential backoff.
 */
@Injectable()
export class NotificationsService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger(NotificationsService.name);
  private readonly boss: PgBoss;
  private started: Promise<void> | null = null;

  constructor(
    private readonly config: AppConfigService,
    private readonly mail: MailService,
  ) {
    this.boss = new PgBoss({
      connectionString: config.databaseUrl,
      schema: OUTBOX_SCHEMA,
      max: 3,
      application_name: 'liftwright-outbox',
      // Nothing is scheduled by cron; the archive keeps finished jobs for the duplicate check.
      schedule: false,
      archiveCompletedAfterSeconds: 60 * 60,
      deleteAfterDays: ARCHIVE_DAYS,
    });
    this.boss.on('error', (error) => this.logger.error(`Outbox: ${error.message}`));
  }

  async onApplicationBootstrap(): Promise<void> {
    await this.start();
  }

  async onApplicationShutdown(): Promise<void> {
    if (!this.started) return;
    await this.started.catch(() => undefined);
    // Waits for a message being sent now; one still unsent stays queued for the next start.
    await this.boss.stop({ graceful: true, wait: true, timeout: 10_000 });
  }

  /** Creates (or migrates) pg-boss's schema and the queue, then starts the worker if enabled. */
  start(): Promise<void> {
    this.started ??= (async () => {
      await this.boss.start();
      const queue: PgBoss.Queue = {
        name: CUSTOMER_MAIL_QUEUE,
        policy: 'standard',
        retryLimit: this.config.outboxRetryLimit,
        retryDelay: this.config.outboxRetryDelaySeconds,
        retryBackoff: true,
        expireInSeconds: JOB_EXPIRY_SECONDS,
      };
      await this.boss.createQueue(CUSTOMER_MAIL_QUEUE, queue);
      // createQueue leaves an existing queue as it was: these settings win on every start.
      await this.boss.updateQueue(CUSTOMER_MAIL_QUEUE, queue);
      if (this.config.outboxWorker) {
        await this.boss.work<OutgoingMail>(
          CUSTOMER_MAIL_QUEUE,
          { pollingIntervalSeconds: this.config.outboxPollSeconds, batchSize: BATCH_SIZE },
          (jobs) => this.deliver(jobs),
        );
      }
    })();
    return this.started;
  }

  /**
   * Sends a batch one message at a time, each job completed or failed on its own (a failure
   * does not send the batch's other messages again). pg-boss's own completion of the batch
   * afterwards touches only jobs still active: none.
   */
  private async deliver(jobs: PgBoss.Job<OutgoingMail>[]): Promise<void> {
    for (const job of jobs) {
      try {
        await this.mail.deliver(job.data);
        await this.boss.complete(CUSTOMER_MAIL_QUEUE, job.id);
      } catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        this.logger.warn(`Could not send "${job.data.subject}" (${job.id}): ${message}`);
        await this.boss.fail(CUSTOMER_MAIL_QUEUE, job.id, { message });
      }
    }
  }

  /**
   * Queues the message inside `em`'s transaction (it must be inside `em.transactional`): the job
   * is written on that transaction's connection and is rolled back with it. The workshop's mail
   * domain names the Message-ID. Returns false when the same cause was queued before.
   */
  async queue(em: EntityManager, message: QueuedMessage): Promise<boolean> {
    const transaction = em.getTransactionContext();
    if (!transaction) {
      throw new Error('NotificationsService.queue runs inside the change’s own transaction');
    }
    const id = outboxJobId(message.causeKey);
    const connection = em.getConnection();
    const db: PgBoss.Db = {
      executeSql: async (text, values) => {
        const { sql, bindings } = toKnexBindings(text, values);
        const rows = await connection.execute<Record<string, unknown>[]>(
          sql,
          bindings,
          'all',
          transaction,
        );
        return { rows };
      },
    };
    if (await this.known(db, id)) return false;
    const workshop = await loadWorkshop(em);
    const mail: OutgoingMail = {
      to: message.to,
      replyTo: workshop.email,
      messageId: outboxMessageId(id, mailDomainOf(workshop.email)),
      subject: message.content.subject,
      text: message.content.text,
      html: message.content.html,
      attachments: message.content.attachments,
    };
    const queued = await this.boss.send(CUSTOMER_MAIL_QUEUE, mail, { id, db });
    if (queued) return true;
    // No row: either a concurrent transaction queued this cause a moment ago, or the queue is
    // missing (pg-boss not started) — the second must not pass silently.
    if (await this.known(db, id)) return false;
    throw new Error(`The e-mail outbox did not take "${message.content.subject}"`);
  }

  /** Whether a job with this id is queued, being sent, or was sent or given up on (archived). */
  private async known(db: PgBoss.Db, id: string): Promise<boolean> {
    const { rows } = await db.executeSql(
      `select 1 from ${OUTBOX_SCHEMA}.job where name = $1 and id = $2
       union all select 1 from ${OUTBOX_SCHEMA}.archive where name = $1 and id = $2`,
      [CUSTOMER_MAIL_QUEUE, id],
    );
    return rows.length > 0;
  }

  /**
   * What a booking message shows of `booking` (populated with customer, quoteVersion.quote and
   * its vehicleModel) and the workshop.
   */
  async bookingInput(em: EntityManager, booking: Booking, now: Date): Promise<BookingMessageInput> {
    const workshop = await loadWorkshop(em);
    const version = booking.quoteVersion;
    return {
      customer: { name: booking.customer.name, email: booking.customer.email },
      workshop,
      timeZone: workshop.timeZone,
      bookingId: booking.id,
      bookingReference: bookingReference(booking.number),
      quoteReference: `${quoteReference(version.quote.number)} v${version.number}`,
      vehicleName: vehicleName(version.quote.vehicleModel),
      startsAt: booking.startsAt,
      endsAt: booking.endsAt,
      calendarSequence: booking.calendarSequence,
      now,
    };
  }

  /**
   * For the desk's confirm: queues "booking confirmed" with its calendar invitation (the
   * booking's current SEQUENCE), inside the confirming transaction.
   */
  async queueBookingConfirmed(
    em: EntityManager,
    booking: Booking,
    now = new Date(),
  ): Promise<void> {
    await this.queue(em, {
      causeKey: `booking-confirmed:${booking.id}:${booking.calendarSequence}`,
      to: booking.customer.email,
      content: bookingConfirmedMessage(await this.bookingInput(em, booking, now)),
    });
  }
}

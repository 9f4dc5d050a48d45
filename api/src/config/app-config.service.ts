import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Environment, LogLevel, NodeEnv } from './environment';

/** Typed, already validated settings; the only place that reads ConfigService. */
@Injectable()
export class AppConfigService {
  constructor(private readonly config: ConfigService<Environment, true>) {}

  get nodeEnv(): NodeEnv {
    return this.config.get('NODE_ENV', { infer: true });
  }

  get port(): number {
    return this.config.get('PORT', { infer: true });
  }

  get host(): string {
    return this.config.get('HOST', { infer: true });
  }

  get databaseUrl(): string {
    return this.config.get('DATABASE_URL', { infer: true });
  }

  get sessionSecret(): string {
    return this.config.get('SESSION_SECRET', { infer: true });
  }

  /** PUBLIC_URL without a trailing slash, ready to have a path appended. */
  get publicUrl(): string {
    return this.config.get('PUBLIC_URL', { infer: true }).replace(/\/+$/, '');
  }

  /** Cookies are marked Secure when the public address is served over https. */
  get secureCookies(): boolean {
    return new URL(this.publicUrl).protocol === 'https:';
  }

  get smtpUrl(): string {
    return this.config.get('SMTP_URL', { infer: true });
  }

  get mailFrom(): string {
    return this.config.get('MAIL_FROM', { infer: true });
  }

  get webDistDir(): string | undefined {
    return this.config.get('WEB_DIST_DIR', { infer: true });
  }

  get logLevel(): LogLevel {
    return this.config.get('LOG_LEVEL', { infer: true });
  }

  get holdSweepMs(): number {
    return this.config.get('HOLD_SWEEP_SECONDS', { infer: true }) * 1000;
  }

  /** 0: the day-before reminder sweep is off. */
  get reminderSweepMs(): number {
    return this.config.get('REMINDER_SWEEP_SECONDS', { infer: true }) * 1000;
  }

  get sessionIdleMs(): number {
    return this.config.get('SESSION_IDLE_MINUTES', { infer: true }) * 60_000;
  }

  get sessionMaxAgeMs(): number {
    return this.config.get('SESSION_MAX_HOURS', { infer: true }) * 3_600_000;
  }

  get outboxWorker(): boolean {
    return this.config.get('OUTBOX_WORKER', { infer: true });
  }

  get outboxRetryLimit(): number {
    return this.config.get('OUTBOX_RETRY_LIMIT', { infer: true });
  }

  get outboxRetryDelaySeconds(): number {
    return this.config.get('OUTBOX_RETRY_DELAY_SECONDS', { infer: true });
  }

  get outboxPollSeconds(): number {
    return this.config.get('OUTBOX_POLL_SECONDS', { infer: true });
  }

  get trustProxy(): boolean {
    return this.config.get('TRUST_PROXY', { infer: true });
  }

  /** Absolute path of the customer photo folder (exists and is writable: checked at start-up). */
  get uploadDir(): string {
    return this.config.get('UPLOAD_DIR', { infer: true });
  }

  get paymentsSecretKey(): string {
    return this.config.get('PAYMENTS_SECRET_KEY', { infer: true });
  }

  get paymentsWebhookSecret(): string {
    return this.config.get('PAYMENTS_WEBHOOK_SECRET', { infer: true });
  }

  /** The provider's API address when it is not the provider's own (undefined: the real API). */
  get paymentsApiUrl(): string | undefined {
    return this.config.get('PAYMENTS_API_URL', { infer: true });
  }
}

import { Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';
import { createTransport, type Transporter } from 'nodemailer';
import { AppConfigService } from '../config/app-config.service';
import type { MailContent, OutgoingMail } from './templates/mail-content';

/** The longest the transport waits to connect, for the greeting and on a silent socket. */
export const SMTP_CONNECTION_TIMEOUT_MS = 10_000;
export const SMTP_GREETING_TIMEOUT_MS = 10_000;
export const SMTP_SOCKET_TIMEOUT_MS = 30_000;

/** Sends e-mail through the SMTP server named by SMTP_URL. */
@Injectable()
export class MailService implements OnApplicationShutdown {
  private readonly logger = new Logger(MailService.name);
  private readonly transport: Transporter;

  constructor(private readonly config: AppConfigService) {
    this.transport = createTransport({
      url: config.smtpUrl,
      // Bounded waits, so one slow server cannot hold a message past its outbox job's expiry
      // (notifications.service.ts: the job would be handed out again while still being sent).
      connectionTimeout: SMTP_CONNECTION_TIMEOUT_MS,
      greetingTimeout: SMTP_GREETING_TIMEOUT_MS,
      socketTimeout: SMTP_SOCKET_TIMEOUT_MS,
    });
  }

  async send(to: string, content: MailContent): Promise<void> {
    await this.transport.sendMail({
      from: this.config.mailFrom,
      to,
      subject: content.subject,
      text: content.text,
      html: content.html,
    });
  }

  /**
   * Sends one message of the outbox with the Message-ID it was given when it was queued, so a
   * second try of the same job is the same message (mail clients keep one of them). Throws
   * when the SMTP server does not take it: the queue tries again later.
   */
  async deliver(message: OutgoingMail): Promise<void> {
    await this.transport.sendMail({
      from: this.config.mailFrom,
      to: message.to,
      ...(message.replyTo ? { replyTo: message.replyTo } : {}),
      messageId: message.messageId,
      subject: message.subject,
      text: message.text,
      html: message.html,
      attachments: message.attachments.map((attachment) => ({
        filename: attachment.filename,
        contentType: attachment.contentType,
        content: attachment.content,
        ...(attachment.encoding ? { encoding: attachment.encoding } : {}),
      })),
    });
  }

  /** Sends without making the caller wait; a failure is logged, not thrown. */
  sendInBackground(to: string, content: MailContent): void {
    this.send(to, content).catch((error: unknown) => {
      this.logger.error(
        `Could not send "${content.subject}": ${error instanceof Error ? error.message : String(error)}`,
      );
    });
  }

  onApplicationShutdown(): void {
    this.transport.close();
  }
}

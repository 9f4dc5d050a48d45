import type { AddressInfo } from 'node:net';
import { simpleParser, type ParsedMail } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface ReceivedMail {
  to: string[];
  /** The Message-ID header, with its angle brackets. */
  messageId: string;
  subject: string;
  text: string;
  html: string;
  /** The attachments as the parser found them (bytes decoded from their transfer encoding). */
  attachments: { filename: string; contentType: string; content: Buffer }[];
  raw: string;
}

/** A local SMTP server that keeps what it receives, for the API's real nodemailer transport. */
export class Mailbox {
  readonly messages: ReceivedMail[] = [];
  private server: SMTPServer | null = null;
  private port = 0;

  /** A new server each start: a closed SMTPServer answers every later command with 421. */
  private createServer(): SMTPServer {
    return new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      logger: false,
      onData: (stream, session, callback) => {
        const chunks: Buffer[] = [];
        stream.on('data', (chunk: Buffer) => chunks.push(chunk));
        stream.on('end', () => {
          const raw = Buffer.concat(chunks).toString('utf8');
          const recipients = session.envelope.rcptTo.map((address) =>
            address.address.toLowerCase(),
          );
          simpleParser(raw)
            .then((parsed: ParsedMail) => {
              this.messages.push({
                to: recipients,
                messageId: parsed.messageId ?? '',
                subject: parsed.subject ?? '',
                text: parsed.text ?? '',
                html: typeof parsed.html === 'string' ? parsed.html : '',
                attachments: parsed.attachments.map((attachment) => ({
                  filename: attachment.filename ?? '',
                  contentType: attachment.contentType,
                  content: attachment.content,
                })),
                raw,
              });
              callback();
            })
            .catch((error: Error) => callback(error));
        });
      },
    });
  }

  get url(): string {
    return `smtp://127.0.0.1:${this.port}`;
  }

  /**
   * Listens on a free port the first time, then on the same port again after stop(): the API's
   * SMTP_URL keeps pointing here while the server is down (connections are refused).
   */
  start(): Promise<void> {
    const server = this.createServer();
    this.server = server;
    return new Promise((resolve) => {
      server.listen(this.port, '127.0.0.1', () => {
        this.port = (server.server.address() as AddressInfo).port;
        resolve();
      });
    });
  }

  stop(): Promise<void> {
    const server = this.server;
    this.server = null;
    return new Promise((resolve) => (server ? server.close(() => resolve()) : resolve()));
  }

  /**
   * Waits until at least `count` messages to `to` have arrived (the outbox delivers a moment
   * after the change commits), up to `timeoutMs`; returns them.
   */
  async waitForCount(to: string, count: number, timeoutMs = 15_000): Promise<ReceivedMail[]> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      const found = this.messages.filter((message) => message.to.includes(to.toLowerCase()));
      if (found.length >= count) return found;
      if (Date.now() >= deadline) {
        throw new Error(
          `${found.length} of ${count} e-mails to ${to} arrived within ${timeoutMs} ms`,
        );
      }
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
  }

  /**
   * The next message to `to` (and matching `match`, when given) that arrives after `afterCount`
   * messages, waiting up to 5 s.
   */
  async waitFor(
    to: string,
    afterCount = 0,
    timeoutMs = 5000,
    match: (message: ReceivedMail) => boolean = () => true,
  ): Promise<ReceivedMail> {
    const deadline = Date.now() + timeoutMs;
    while (Date.now() < deadline) {
      const found = this.messages
        .slice(afterCount)
        .find((message) => message.to.includes(to.toLowerCase()) && match(message));
      if (found) return found;
      await new Promise((resolve) => setTimeout(resolve, 25));
    }
    throw new Error(`No e-mail to ${to} arrived within ${timeoutMs} ms`);
  }

  countTo(to: string): number {
    return this.messages.filter((message) => message.to.includes(to.toLowerCase())).length;
  }
}

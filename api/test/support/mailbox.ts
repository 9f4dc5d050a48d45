import type { AddressInfo } from 'node:net';
import { simpleParser, type ParsedMail } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface ReceivedMail {
  to: string[];
  subject: string;
  text: string;
  html: string;
  raw: string;
}

/** A local SMTP server that keeps what it receives, for the API's real nodemailer transport. */
export class Mailbox {
  readonly messages: ReceivedMail[] = [];
  private readonly server: SMTPServer;
  private port = 0;

  constructor() {
    this.server = new SMTPServer({
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
                subject: parsed.subject ?? '',
                text: parsed.text ?? '',
                html: typeof parsed.html === 'string' ? parsed.html : '',
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

  start(): Promise<void> {
    return new Promise((resolve) => {
      this.server.listen(0, '127.0.0.1', () => {
        this.port = (this.server.server.address() as AddressInfo).port;
        resolve();
      });
    });
  }

  stop(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }

  /** The next message to `to` that arrives after `afterCount` messages, waiting up to 5 s. */
  async waitFor(to: string, afterCount = 0, timeoutMs = 5000): Promise<ReceivedMail> {
    const deadline = Date.now() + timeoutMs;
    while (Date.now() < deadline) {
      const found = this.messages
        .slice(afterCount)
        .find((message) => message.to.includes(to.toLowerCase()));
      if (found) return found;
      await new Promise((resolve) => setTimeout(resolve, 25));
    }
    throw new Error(`No e-mail to ${to} arrived within ${timeoutMs} ms`);
  }

  countTo(to: string): number {
    return this.messages.filter((message) => message.to.includes(to.toLowerCase())).length;
  }
}

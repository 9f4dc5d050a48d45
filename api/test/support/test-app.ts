import { mkdtempSync, rmSync } from 'node:fs';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Pool } from 'pg';
import { createApp } from '../../src/create-app';
import { Mailbox } from './mailbox';
import { type PaymentsStandIn, startPaymentsStandIn } from './payments-stand-in';
import { testDatabaseUrl } from './test-database';

export interface TestApp {
  app: NestExpressApplication;
  /** The HTTP server to hand to supertest. */
  server: ReturnType<NestExpressApplication['getHttpServer']>;
  mailbox: Mailbox;
  /** The payments stand-in the API talks to (PAYMENTS_API_URL), its webhooks come back here. */
  payments: PaymentsStandIn;
  /** Direct database access, to look at or age rows the API wrote. */
  db: Pool;
  /**
   * Waits until the e-mail outbox has nothing left to send (no job created, waiting for a retry
   * or being sent), up to `timeoutMs`: after it, every message queued so far has been delivered
   * or given up on, so counting the mailbox is final.
   */
  outboxIdle(timeoutMs?: number): Promise<void>;
  close(): Promise<void>;
}

/**
 * The real application (createApp(), as main.ts runs it) against the migrated test database,
 * sending e-mail to a local SMTP server started here (SMTP_URL points at it) and taking payments
 * through the payments stand-in started here in-process (PAYMENTS_API_URL points at it). The
 * application listens on a free loopback port, so the stand-in can deliver its webhooks.
 */
export async function startTestApp(options: { smtpUrl?: string } = {}): Promise<TestApp> {
  const mailbox = new Mailbox();
  await mailbox.start();
  // A spec may send to another SMTP server of its own (the outbox spec uses MailDev).
  process.env.SMTP_URL = options.smtpUrl ?? mailbox.url;
  const payments = await startPaymentsStandIn();
  process.env.PAYMENTS_API_URL = payments.apiUrl;
  // Photos go to a folder of this run (a spec may set its own UPLOAD_DIR to look into it).
  const ownUploadDir = process.env.UPLOAD_DIR
    ? undefined
    : mkdtempSync(join(tmpdir(), 'liftwright-test-uploads-'));
  if (ownUploadDir) process.env.UPLOAD_DIR = ownUploadDir;
  const app = await createApp();
  await app.listen(0, '127.0.0.1');
  const { port } = (app.getHttpServer() as Server).address() as AddressInfo;
  payments.relay.target = `http://127.0.0.1:${port}`;
  const db = new Pool({ connectionString: testDatabaseUrl(), max: 2 });
  return {
    app,
    server: app.getHttpServer(),
    mailbox,
    payments,
    db,
    async outboxIdle(timeoutMs = 15_000) {
      const deadline = Date.now() + timeoutMs;
      for (;;) {
        const { rows } = await db.query<{ count: string }>(
          `select count(*) from pgboss.job where state in ('created', 'retry', 'active')`,
        );
        if (Number(rows[0].count) === 0) return;
        if (Date.now() > deadline) {
          throw new Error(`The outbox still had ${rows[0].count} message(s) after ${timeoutMs} ms`);
        }
        await new Promise((resolve) => setTimeout(resolve, 50));
      }
    },
    async close() {
      await payments.close();
      await app.close();
      await db.end();
      await mailbox.stop();
      if (ownUploadDir) {
        rmSync(ownUploadDir, { recursive: true, force: true });
        delete process.env.UPLOAD_DIR;
      }
    },
  };
}

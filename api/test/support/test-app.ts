import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Pool } from 'pg';
import { createApp } from '../../src/create-app';
import { Mailbox } from './mailbox';
import { testDatabaseUrl } from './test-database';

export interface TestApp {
  app: NestExpressApplication;
  /** The HTTP server to hand to supertest. */
  server: ReturnType<NestExpressApplication['getHttpServer']>;
  mailbox: Mailbox;
  /** Direct database access, to look at or age rows the API wrote. */
  db: Pool;
  close(): Promise<void>;
}

/**
 * The real application (createApp(), as main.ts runs it) against the migrated test database,
 * sending e-mail to a local SMTP server started here (SMTP_URL points at it).
 */
export async function startTestApp(): Promise<TestApp> {
  const mailbox = new Mailbox();
  await mailbox.start();
  process.env.SMTP_URL = mailbox.url;
  // Photos go to a folder of this run (a spec may set its own UPLOAD_DIR to look into it).
  const ownUploadDir = process.env.UPLOAD_DIR
    ? undefined
    : mkdtempSync(join(tmpdir(), 'liftwright-test-uploads-'));
  if (ownUploadDir) process.env.UPLOAD_DIR = ownUploadDir;
  const app = await createApp();
  await app.init();
  const db = new Pool({ connectionString: testDatabaseUrl(), max: 2 });
  return {
    app,
    server: app.getHttpServer(),
    mailbox,
    db,
    async close() {
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
